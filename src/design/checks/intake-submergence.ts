/**
 * Check `intake-submergence`: a suction inlet too shallow below a free surface, where
 * air-entraining vortices form.
 *
 * @module
 */
import { minimumSubmergence } from '../../pumps/index';
import type { Flow, Length } from '../../units/index';
import type { Say } from '../say';
import { short } from '../say';
import type { Check } from '../types';
import type { CandidateCheck, CandidateCheckContext } from './candidate-context';
import { type CheckInfo, check } from './check';

const SOURCE = 'ANSI/HI 9.8-1998 Pump Intake Design, S = D (1 + 2.3 F_D) (from memory)';

export const INTAKE_SUBMERGENCE: CheckInfo = {
  id: 'intake-submergence',
  guards: 'air-entraining surface vortices at a shallow suction inlet',
  inputs:
    "intake block (depth of the inlet below the suction surface in the design case, inlet diameter); a free-surface suction end; the set's flow in each case",
  severity:
    'warning when the inlet lies less deep than the minimum submergence in a case; note with the numbers otherwise, or when inputs are missing',
  source: SOURCE,
};

function run(x: CandidateCheckContext): Check[] {
  const ask = x.input.intake;
  if (ask === undefined || ask === null) return [];
  const c = x.candidate;
  const missing: string[] = [];
  if (ask.depth === undefined) missing.push('intake.depth');
  if (ask.diameter === undefined) missing.push('intake.diameter');
  const design = x.family[0];
  if (design?.curve.definition.suction.velocityDiameter !== undefined) {
    missing.push('a free-surface suction end (the suction end is a point in a pipe)');
  }
  if (missing.length > 0 || ask.depth === undefined || ask.diameter === undefined || !design) {
    return [
      check(INTAKE_SUBMERGENCE.id, 'info', c.name, undefined, {}, SOURCE, {
        missing: missing.join(', '),
      }),
    ];
  }
  const level0 = design.curve.definition.suction.elevation;
  let worst: { check: Check; score: number } | undefined;
  x.family.forEach((s, i) => {
    const flow = x.cases[i]?.flow;
    if (flow === undefined || !(flow > 0)) return;
    const depth = (ask.depth as number) + (s.curve.definition.suction.elevation - level0);
    const sub = minimumSubmergence({
      flow: flow as Flow,
      inletDiameter: ask.diameter as Length,
      ...(s.curve.definition.g === undefined ? {} : { g: s.curve.definition.g }),
    });
    const short_ = depth < sub.submergence;
    const k = check(
      INTAKE_SUBMERGENCE.id,
      short_ ? 'warning' : 'info',
      c.name,
      s.name,
      {
        flow,
        depth,
        diameter: ask.diameter as number,
        inletVelocity: sub.inletVelocity,
        froude: sub.froudeNumber,
        minimum: sub.submergence,
      },
      SOURCE,
    );
    const score = sub.submergence / depth;
    if (worst === undefined || score > worst.score) worst = { check: k, score };
  });
  return worst === undefined ? [] : [worst.check];
}

/** The check, run once per candidate; it reports the case with the least submergence margin. */
export const intakeSubmergence: CandidateCheck = { info: INTAKE_SUBMERGENCE, run };

/** The message of an `intake-submergence` finding. */
export function intakeSubmergenceMessage(c: Check, s: Say): string {
  const n = (k: string): number => c.values[k] ?? Number.NaN;
  const missing = c.words['missing'] ?? '';
  if (missing !== '' || c.values['minimum'] === undefined) {
    return `Intake submergence could not be checked: it needs ${missing || 'its inputs'}.`;
  }
  const head = `Suction inlet ${s.length(n('diameter'))} across, ${s.length(n('depth'))} below the surface, at ${s.flow(n('flow'))} (inlet velocity ${s.velocity(n('inletVelocity'))}, Froude number ${short(n('froude'), 3)}): minimum submergence ${s.length(n('minimum'))}.`;
  return c.severity === 'warning'
    ? `${head} Too shallow: air-entraining vortices can form; lower the inlet, raise the low level, or fit a vortex suppressor (check the intake layout against ANSI/HI 9.8).`
    : head;
}

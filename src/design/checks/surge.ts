/**
 * Check `surge`: a screening estimate of the pressure surge on a pump trip or a sudden valve
 * closure, up against the design pressure and down against the vapour pressure.
 *
 * @module
 */

import type { FluidState } from '../../fluids/index';
import { material as pipeMaterial } from '../../pipes/index';
import { closureSurgeHead, type PipeRunInput, waveSpeed } from '../../system/index';
import {
  type Acceleration,
  type Length,
  STANDARD_GRAVITY,
  type Time,
  type Velocity,
} from '../../units/index';
import type { Say } from '../say';
import { short } from '../say';
import type { CaseDuty, Check, DesignInput } from '../types';
import type { CaseCheck } from './case-context';
import { type CheckInfo, check } from './check';
import type { Limits } from './context';

const SOURCE =
  'Joukowsky (1898) within the round trip 2L/a, Michaud for slower closures; wave speed by Korteweg (1878) with the restraint factor of Wylie and Streeter, Fluid Transients in Systems (1993); screening estimate';

export const SURGE: CheckInfo = {
  id: 'surge',
  guards:
    'burst piping from the up-surge, and column separation (vapour cavities that collapse) from the down-surge, on a pump trip or a fast valve closure',
  inputs:
    'surge block (closureTime, default 0: sudden); pumpLocation; fluid bulk modulus; the discharge runs (length; pipe size, wall and material for the wave speed, else the rigid-pipe limit); limits.designPressure; fluid vapour pressure',
  severity:
    'warning (never an error: a screening estimate) when steady + surge exceeds the design pressure or steady - surge falls to the vapour pressure; note with the numbers otherwise, or when inputs are missing',
  source: SOURCE,
};

/** The discharge line's plain runs (after the suction runs; parallel groups left out). */
function dischargeRuns(input: DesignInput): PipeRunInput[] {
  const n = input.pumpLocation?.suctionRuns ?? 1;
  const runs: PipeRunInput[] = [];
  input.system.runs.forEach((el, i) => {
    if (i < n) return;
    if (!('kind' in el && el.kind === 'parallel')) runs.push(el as PipeRunInput);
  });
  return runs;
}

/** The surge check in one case at the duty flow, or undefined when the file does not ask. */
export function surgeCheck(
  input: DesignInput,
  duty: CaseDuty,
  fluid: Pick<FluidState, 'density' | 'bulkModulus' | 'vaporPressure'>,
  g: Acceleration | undefined,
  limits: Limits,
): Check | undefined {
  if (input.surge === undefined || input.surge === null) return undefined;
  const missing: string[] = [];
  if (input.pumpLocation === undefined) missing.push('pumpLocation');
  if (fluid.bulkModulus === undefined) missing.push("the fluid's bulk modulus");
  const runs = dischargeRuns(input);
  if (runs.length === 0) missing.push('a discharge run');
  const steady = duty.pumpDischargePressure;
  if (missing.length > 0 || steady === undefined || fluid.bulkModulus === undefined) {
    return check(SURGE.id, 'info', undefined, duty.case, {}, SOURCE, {
      missing: missing.join(', '),
    });
  }
  const n = input.pumpLocation?.suctionRuns ?? 1;
  const first = runs[0] as PipeRunInput;
  const details = duty.runs[n];
  const d = details?.insideDiameter ?? first.insideDiameter ?? first.pipe?.insideDiameter;
  const wall = first.pipe?.wallThickness;
  const mat = first.material === undefined ? undefined : pipeMaterial(first.material);
  const elastic = d !== undefined && wall !== undefined && mat !== undefined;
  const a = elastic
    ? waveSpeed({
        bulkModulus: fluid.bulkModulus,
        density: fluid.density,
        insideDiameter: d,
        wallThickness: wall,
        elasticModulus: mat.elasticModulus,
        anchoring: 'anchored-throughout',
        poissonRatio: mat.poissonRatio,
      })
    : waveSpeed({ bulkModulus: fluid.bulkModulus, density: fluid.density });
  const length = runs.reduce((sum, r) => sum + r.length, 0);
  const velocity = details?.velocity ?? 0;
  const closureTime = input.surge.closureTime ?? 0;
  const grav = g ?? STANDARD_GRAVITY;
  const surge = closureSurgeHead({
    waveSpeed: a,
    length: length as Length,
    velocityChange: velocity as Velocity,
    closureTime: closureTime as Time,
    g: grav as Acceleration,
  });
  const surgePressure = fluid.density * grav * surge.head;
  const highPressure = steady + surgePressure;
  const lowPressure = steady - surgePressure;
  const over = limits.designPressure !== undefined && highPressure > limits.designPressure;
  const under = fluid.vaporPressure !== undefined && lowPressure <= fluid.vaporPressure;
  const values: Record<string, number> = {
    waveSpeed: a,
    length,
    velocity,
    closureTime,
    roundTripTime: surge.roundTripTime,
    surgeHead: surge.head,
    surgePressure,
    steadyPressure: steady,
    highPressure,
    lowPressure,
  };
  if (limits.designPressure !== undefined) values['designPressure'] = limits.designPressure;
  if (fluid.vaporPressure !== undefined) values['vaporPressure'] = fluid.vaporPressure;
  return check(SURGE.id, over || under ? 'warning' : 'info', undefined, duty.case, values, SOURCE, {
    method: surge.method,
    pipe: elastic ? 'elastic' : 'rigid',
    over: over ? 'yes' : 'no',
    under: under ? 'yes' : 'no',
  });
}

/** The check, run in every case at the duty flow. */
export const surge: CaseCheck = {
  info: SURGE,
  run: (x) => {
    const def = x.scenario.curve.definition;
    const k = surgeCheck(x.input, x.duty, def.fluid, def.g, x.limits);
    return k === undefined ? [] : [k];
  },
};

const REMEDIES =
  'slower valve closure, a surge vessel, air (vacuum-breaking) valves, a flywheel on the pump, or a bypass';

/** The down-surge in words: steady less the surge, against the vapour pressure. */
function lowest(c: Check, s: Say): string {
  const low = c.values['lowPressure'] ?? Number.NaN;
  const pv = c.values['vaporPressure'];
  if (pv === undefined)
    return `lowest (steady less the surge) ${s.absolute(low)} (no vapour pressure given).`;
  if (c.words['under'] === 'yes') {
    return `steady less the surge falls below the vapour pressure ${s.absolute(pv)} (the estimate gives ${s.absolute(low)}): column separation risk, and a larger up-surge when the column rejoins.`;
  }
  return `lowest (steady less the surge) ${s.absolute(low)}, above the vapour pressure ${s.absolute(pv)}.`;
}

/** The message of a `surge` finding. */
export function surgeMessage(c: Check, s: Say): string {
  const n = (k: string): number => c.values[k] ?? Number.NaN;
  const w = (k: string): string => c.words[k] ?? '';
  if (w('missing') !== '' || c.values['surgeHead'] === undefined) {
    return `Surge screening could not run: it needs ${w('missing') || 'its inputs'}.`;
  }
  const how =
    w('method') === 'joukowsky'
      ? `a stop within the wave's round trip ${short(n('roundTripTime'), 3)} s (Joukowsky)`
      : `a stop over ${short(n('closureTime'), 3)} s, longer than the round trip ${short(n('roundTripTime'), 3)} s (Michaud)`;
  const pipe = w('pipe') === 'rigid' ? ', rigid-pipe limit: no wall data' : '';
  const parts = [
    `Surge screening estimate on a pump trip or valve closure: wave speed ${s.velocity(n('waveSpeed'))}${pipe} over ${s.length(n('length'))}, ${s.velocity(n('velocity'))} brought to rest in ${how}: surge ${s.head(n('surgeHead'))}.`,
    `Highest pressure ${s.absolute(n('highPressure'))}${c.values['designPressure'] === undefined ? ' (no design pressure given)' : w('over') === 'yes' ? `, above the design pressure ${s.absolute(n('designPressure'))}` : `, within the design pressure ${s.absolute(n('designPressure'))}`};`,
    lowest(c, s),
    `A transient analysis is needed for design${c.severity === 'warning' ? `; usual remedies: ${REMEDIES}` : ''}.`,
  ];
  return parts.join(' ');
}

/**
 * Check `low-flow-heating`: the liquid's temperature rise through the pump at the lowest flow
 * it can see, against the margin to boiling at the suction and a stated limit.
 *
 * @module
 */
import type { Fluid } from '../../fluids/index';
import { temperatureRise } from '../../pumps/index';
import type { Flow, Power, SpecificHeat } from '../../units/index';
import { STANDARD_GRAVITY } from '../../units/index';
import type { Say } from '../say';
import { short } from '../say';
import type { Check } from '../types';
import type { CandidateCheck, CandidateCheckContext } from './candidate-context';
import { type CheckInfo, check } from './check';

/** Default largest temperature rise through the pump (K): common practice. */
export const LOW_FLOW_MAX_RISE = 8;

const SOURCE =
  'energy balance dT = (P_shaft - P_hyd) / (rho c_p Q) (common practice); limit 8 K by default (common practice)';

export const LOW_FLOW_HEATING: CheckInfo = {
  id: 'low-flow-heating',
  guards: 'a liquid that heats and flashes in a pump running near shut-off',
  inputs:
    "lowFlow block (minimumFlow, default the low end of the allowable region or of the curve; maxTemperatureRise, default 8 K); fluid specific heat; pumpLocation and the liquid's vapour pressure for the margin to boiling",
  severity:
    'error when the rise reaches the margin to boiling at the suction; warning above the limit; note with the numbers otherwise, or when inputs are missing',
  source: SOURCE,
};

/** Saturation temperature of the liquid at an absolute pressure (K), by bisection. */
function saturationTemperature(liquid: Fluid, from: number, pressure: number): number | undefined {
  if (!liquid.hasVaporPressure) return undefined;
  const out = new Float64Array(1);
  const pv = (t: number): number => liquid.vaporPressureInto([t], out)[0] ?? Number.NaN;
  let lo = from;
  let hi = liquid.validRange.maxTemperature as number;
  if (!(pv(lo) < pressure) || pv(hi) < pressure) return undefined;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (pv(mid) < pressure) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

function run(x: CandidateCheckContext): Check[] {
  const ask = x.input.lowFlow;
  if (ask === undefined || ask === null) return [];
  const c = x.candidate;
  const minimum =
    ask.minimumFlow ?? c.fullSpeed.allowableRegion?.min ?? (c.fullSpeed.flowRange.min as number);
  const limit = ask.maxTemperatureRise ?? LOW_FLOW_MAX_RISE;
  const stated = ask.minimumFlow === undefined ? 'region' : 'stated';
  const missing: string[] = [];
  if (x.family.some((s) => s.curve.definition.fluid.specificHeat === undefined)) {
    missing.push("the fluid's specific heat");
  }
  if (!(minimum > 0)) missing.push('a minimum flow above zero (lowFlow.minimumFlow)');
  if (missing.length > 0) {
    return [
      check(LOW_FLOW_HEATING.id, 'info', c.name, undefined, {}, SOURCE, {
        missing: missing.join(', '),
      }),
    ];
  }
  let worst: { check: Check; score: number } | undefined;
  for (const [i, s] of x.family.entries()) {
    const pump = (x.inCase[i] ?? c).fullSpeed;
    const def = s.curve.definition;
    const fluid = def.fluid;
    const g = def.g ?? STANDARD_GRAVITY;
    const q = minimum as Flow;
    const shaft = pump.shaftPower(q, fluid.density, def.g);
    const hydraulic = fluid.density * g * q * pump.head(q);
    const rise = temperatureRise(
      shaft,
      Math.min(hydraulic, shaft) as Power,
      fluid.density,
      fluid.specificHeat as SpecificHeat,
      q,
    );
    const npsha = x.npshAvailableAt(s.curve, c.setFlow(minimum));
    let margin: number | undefined;
    if (npsha !== undefined && fluid.vaporPressure !== undefined && x.input.liquid !== undefined) {
      const pressure = fluid.vaporPressure + fluid.density * g * npsha;
      const tsat = saturationTemperature(x.input.liquid, fluid.temperature, pressure);
      margin = tsat === undefined ? undefined : tsat - fluid.temperature;
    }
    const flashes = margin !== undefined && rise >= margin;
    const severity: Check['severity'] = flashes ? 'error' : rise > limit ? 'warning' : 'info';
    const values: Record<string, number> = {
      flow: minimum,
      shaftPower: shaft,
      hydraulicPower: Math.min(hydraulic, shaft),
      rise,
      limit,
      temperature: fluid.temperature,
    };
    if (margin !== undefined) values['margin'] = margin;
    const k = check(LOW_FLOW_HEATING.id, severity, c.name, s.name, values, SOURCE, {
      flowFrom: stated,
    });
    const score = Math.max(rise / limit, margin === undefined ? 0 : rise / margin);
    if (worst === undefined || score > worst.score) worst = { check: k, score };
  }
  return worst === undefined ? [] : [worst.check];
}

/** The check, run once per candidate; it reports the case where the rise is most critical. */
export const lowFlowHeating: CandidateCheck = { info: LOW_FLOW_HEATING, run };

/** A temperature difference in the report's units. */
function delta(s: Say, k: number): string {
  return s.system === 'us' ? `${short(1.8 * k, 3)} degF` : `${short(k, 3)} K`;
}

/** The message of a `low-flow-heating` finding. */
export function lowFlowHeatingMessage(c: Check, s: Say): string {
  const n = (k: string): number => c.values[k] ?? Number.NaN;
  const missing = c.words['missing'] ?? '';
  if (missing !== '' || c.values['rise'] === undefined) {
    return `Low-flow heating could not be checked: it needs ${missing || 'its inputs'}.`;
  }
  const where =
    c.words['flowFrom'] === 'stated'
      ? 'the minimum flow the design states'
      : 'the low end of its allowable region';
  const margin =
    c.values['margin'] === undefined
      ? 'the margin to boiling at the suction is not known (no vapour pressure, pump location or liquid data)'
      : `the margin to boiling at the suction is ${delta(s, n('margin'))}`;
  const head = `At ${s.flow(n('flow'))} per pump (${where}) the liquid heats by ${delta(s, n('rise'))} through the pump (${s.power(n('shaftPower'))} shaft, ${s.power(n('hydraulicPower'))} hydraulic); ${margin}; the limit is ${delta(s, n('limit'))}.`;
  if (c.severity === 'error') {
    return `${head} The liquid would flash in the pump: raise the minimum flow with a bypass or recirculation line, or a low-flow trip.`;
  }
  if (c.severity === 'warning') {
    return `${head} Above the limit: keep a minimum-flow bypass or a low-flow trip.`;
  }
  return head;
}

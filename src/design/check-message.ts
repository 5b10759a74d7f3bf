/**
 * A check's message in words, built from its values at render time in the unit system the
 * reader asked for: the report stores numbers (SI) and words (names, reasons), never a
 * sentence in one unit system.
 *
 * @module
 */
import { guardNumber, guardOneOf, guardRecord, guardString } from '../guards';
import { type Pressure, to } from '../units/index';
import { intakeSubmergenceMessage } from './checks/intake-submergence';
import { lowFlowHeatingMessage } from './checks/low-flow-heating';
import { surgeMessage } from './checks/surge';
import { viscousCorrectionMessage } from './checks/viscous-correction';
import { pressureUnit, type Say, type SymbolStyle, sayIn, short } from './say';
import type { Check, UnitSystem } from './types';

const n = (check: Check, key: string): number => check.values[key] ?? Number.NaN;
const w = (check: Check, key: string): string => check.words[key] ?? '';
const pct = (fraction: number, digits = 3): string => `${short(100 * fraction, digits)} %`;

function motorName(c: Check, s: Say, prefix: string): string {
  const unit = w(c, `${prefix}Unit`) === 'hp' ? 'hp' : 'kW';
  return s.motor(n(c, prefix), n(c, `${prefix}Nameplate`), unit);
}

/** Why there is no operating point, from the reason's values. */
function noPoint(c: Check, s: Say): string {
  switch (w(c, 'reason')) {
    case 'cannot-reach':
      return `the set's head at the start of its curve (${s.head(n(c, 'pumpHead'))}) is below the system's ${s.head(n(c, 'systemHead'))} there: it cannot lift the liquid.`;
    case 'run-out':
      return `the system needs more flow than the catalogue curve covers: at its end (${s.flow(n(c, 'maxFlow'))}) the set still gives ${s.head(n(c, 'pumpHead'))} against the system's ${s.head(n(c, 'systemHead'))}.`;
    case 'beyond-curve':
      return `at the drive's highest speed (${s.speed(n(c, 'maxSpeed'))}) the catalogue curve ends at ${s.flow(n(c, 'maxFlow'))}, short of the duty ${s.flow(n(c, 'dutyFlow'))}.`;
    case 'too-little-head':
      return `even at the drive's highest speed (${s.speed(n(c, 'maxSpeed'))}) the set gives ${s.head(n(c, 'pumpHead'))} at the duty ${s.flow(n(c, 'dutyFlow'))}, below the system's ${s.head(n(c, 'systemHead'))}.`;
    case 'below-curve':
      return `the duty ${s.flow(n(c, 'dutyFlow'))} at ${s.head(n(c, 'systemHead'))} needs a speed at which that flow lies past the end of the catalogue curve.`;
    default:
      return w(c, 'detail') || 'the pump curve and the system curve do not meet.';
  }
}

/** A gauge pressure from an absolute one: `215 kPa gauge`, `31.2 psig`. */
function gauge(s: Say, absolute: number, atmosphere: number): string {
  const x = absolute - atmosphere;
  return Number.isFinite(x)
    ? `${short(to(x as Pressure, s.units.pressure), 4)} ${pressureUnit(s.system, 'gauge')}`
    : '-';
}

/** A pressure difference: `35 kPa`, `5.1 psi`. */
function difference(s: Say, x: number): string {
  return Number.isFinite(x)
    ? `${short(to(x as Pressure, s.units.pressure), 3)} ${s.sym(s.units.pressure)}`
    : '-';
}

function dutyFlow(c: Check, s: Say): string {
  const flow = n(c, 'flow');
  const duty = n(c, 'dutyFlow');
  const tolerance = pct(n(c, 'tolerance'));
  const short_ = (duty - flow) / duty;
  if (short_ > 0 && c.severity === 'error') {
    return `Delivers ${s.flow(flow)}, ${pct(short_)} short of the duty ${s.flow(duty)}: more than the duty-flow tolerance of ${tolerance}.`;
  }
  if (short_ > 0) {
    return `Delivers ${s.flow(flow)}, ${pct(short_)} short of the duty ${s.flow(duty)}: within the duty-flow tolerance of ${tolerance} (limits.dutyFlowTolerance).`;
  }
  return `Runs at ${s.flow(flow)}, ${pct(-short_)} above the duty ${s.flow(duty)}: a valve would throttle it (or trim the impeller).`;
}

function message(c: Check, s: Say): string {
  switch (c.id) {
    case 'near-boiling':
      return `The liquid is near boiling at the suction: vapour pressure ${s.absolute(n(c, 'vaporPressure'))} is ${pct(n(c, 'ratio'))} of the suction surface pressure ${s.absolute(n(c, 'suctionPressure'))}. Small changes of temperature or pressure can flash it; check NPSH with care.`;
    case 'flow-regime':
      return w(c, 'regime') === 'laminar'
        ? `Run '${w(c, 'run')}' is laminar at the duty (Re ${short(n(c, 'reynolds'))}): catalogue pump curves are for water; a viscous liquid lowers head and efficiency (correct the curves, for example by ANSI/HI 9.6.7).`
        : `Run '${w(c, 'run')}' is in the laminar-turbulent transition at the duty (Re ${short(n(c, 'reynolds'))}): its friction is uncertain; the loss uses the conservative friction factor.`;
    case 'velocity': {
      const side = w(c, 'side');
      const v = n(c, 'velocity');
      const why =
        v > n(c, 'max')
          ? ' (erosion, noise, surge and suction losses grow).'
          : ' (settling, air pockets, an oversized pipe).';
      return `Velocity in ${side} run '${w(c, 'run')}' is ${s.velocity(v)}, outside the usual ${s.velocity(n(c, 'min'))} to ${s.velocity(n(c, 'max'))} for ${side} lines${why}`;
    }
    case 'npsh-data':
      return c.candidate === undefined
        ? 'The fluid has no vapour pressure: NPSH available cannot be computed and cavitation is not checked.'
        : `No NPSH-required data at ${s.flow(n(c, 'flow'))}: cavitation is not checked. Ask the manufacturer for NPSH3 over the whole range.`;
    case 'duty-flow':
      return dutyFlow(c, s);
    case 'preferred-region':
      return `Runs at ${short(n(c, 'percentOfBep'), 3)} % of its BEP flow, outside its preferred operating region.`;
    case 'allowable-region':
      return `Runs at ${short(n(c, 'percentOfBep'), 3)} % of its BEP flow, outside its allowable operating region (vibration, recirculation, overheating).`;
    case 'no-operating-point':
      return `No operating point: ${noPoint(c, s)}`;
    case 'npsh-margin':
      return c.severity === 'error'
        ? `Cavitation: NPSH available ${s.head(n(c, 'npshAvailable'))} is below NPSH required ${s.head(n(c, 'npshRequired'))} (per pump). Raise the suction level or pressure, lower the pump, shorten or enlarge the suction line, or cool the liquid.`
        : `NPSH margin too small: ${s.head(n(c, 'npshAvailable'))} available against ${s.head(n(c, 'npshRequired'))} required per pump (ratio ${short(n(c, 'ratio'), 3)}); the design asks for at least ${s.head(n(c, 'requiredAvailable'))}.`;
    case 'motor-overload':
      return c.case === undefined
        ? `The ${s.power(n(c, 'motorRating'))} motor would overload if the pump ran out to the end of its curve (${s.power(n(c, 'maxShaftPower'))} per pump).`
        : `Motor overload: the pump needs ${s.power(n(c, 'shaftPower'))}, above the ${s.power(n(c, 'motorRating'))} motor${n(c, 'serviceFactor') > 1 ? ` times its service factor ${short(n(c, 'serviceFactor'))}` : ''}.`;
    case 'motor-sizing':
      return c.severity === 'error'
        ? `No standard motor found: the pump can draw ${s.power(n(c, 'power'))}, beyond the largest rating of the series.`
        : `A ${motorName(c, s, 'dutyOnly')} motor covers the duty points, but the pump can draw ${s.power(n(c, 'maxShaftPower'))} at the end of its curve (a burst pipe, an open bypass, a low static head): the ${motorName(c, s, 'nonOverloading')} motor never overloads.`;
    case 'energy':
      return `The duty profile cannot be met at ${s.flow(n(c, 'flow'))}: ${w(c, 'detail') || 'the set cannot run there'}.`;
    case 'dead-head':
      return `Against a closed discharge the set runs at shut-off (${s.head(n(c, 'shutoffHead'))}) and heats the liquid it churns: provide a minimum-flow bypass, a low-flow trip or interlocked valves.`;
    case 'service-pressure':
      return `Node '${w(c, 'node')}' is at ${gauge(s, n(c, 'pressure'), n(c, 'atmosphere'))}, ${difference(s, n(c, 'shortfall'))} below its service minimum of ${gauge(s, n(c, 'minPressure'), n(c, 'atmosphere'))}: more head, a larger pipe or a booster nearer the node.`;
    case 'node-vapour-pressure':
      return `Node '${w(c, 'node')}' is at ${s.absolute(n(c, 'pressure'))}, below the liquid's vapour pressure ${s.absolute(n(c, 'vaporPressure'))}: the liquid would boil there and the steady result is not physical. Lower that part of the network or raise the pressure there.`;
    case 'node-below-atmosphere':
      return `Node '${w(c, 'node')}' is below the atmosphere (${gauge(s, n(c, 'pressure'), n(c, 'atmosphere'))}): air is drawn in at leaks and air valves there.`;
    case 'shutoff-pressure':
      if (w(c, 'node') !== '') {
        return `At shut-off, with everything downstream closed, node '${w(c, 'node')}' reaches ${s.absolute(n(c, 'maxPressure'))}, above the piping's design pressure ${s.absolute(n(c, 'designPressure'))}: use a lower-head pump, a relief valve or a higher pressure rating.`;
      }
      return `At shut-off the discharge pressure reaches ${s.absolute(n(c, 'maxPressure'))}, above the piping's design pressure ${s.absolute(n(c, 'designPressure'))}: use a lower-head pump, a relief valve or a higher pressure rating.`;
    case 'curve-fit':
      return w(c, 'curve') === 'efficiency'
        ? `The efficiency fit (${w(c, 'fit')}) misses a catalogue point by ${short(100 * n(c, 'maxResidual'), 3)} percentage points, more than the tolerance of ${short(100 * n(c, 'tolerance'), 2)} percentage point: the BEP, the power and the yearly energy move with it. Use the default fit or another degree.`
        : `The head fit (${w(c, 'fit')}) misses a catalogue point by ${pct(n(c, 'maxRelativeResidual'))} of its head (${s.head(n(c, 'maxResidual'))}), more than the tolerance of ${pct(n(c, 'tolerance'), 2)}: the operating points and power move with it. Use the default fit (through every point) or another degree.`;
    case 'viscous-correction':
      return viscousCorrectionMessage(c, s);
    case 'surge':
      return surgeMessage(c, s);
    case 'low-flow-heating':
      return lowFlowHeatingMessage(c, s);
    case 'intake-submergence':
      return intakeSubmergenceMessage(c, s);
    default:
      return c.message;
  }
}

/**
 * A check's message in a unit system, built from its `values` and `words`: every number in
 * the units of that system (an SI report never shows feet, a US report never metres).
 * Checks this version does not know keep the message they came with.
 *
 * @param check - a check of a design report
 * @param units - `'si'` or `'us'`
 * @param style - `'ascii'` (`m3/h`, the default) or `'unicode'` (`m³/h`)
 * @returns the message, one line
 * @throws HeadflowError `INVALID_ARGUMENT` for units other than `'si'` and `'us'`.
 * @example
 * ```ts
 * // check = report.candidates[1].checks.find((k) => k.id === 'dead-head')
 * checkMessage(check, 'us'); // 'Against a closed discharge the set runs at shut-off (210 ft) ...'
 * ```
 */
export function checkMessage(
  check: Check,
  units: UnitSystem,
  style: SymbolStyle = 'ascii',
): string {
  const c = guardRecord('check', check);
  guardString('check.id', c['id']);
  const system = guardOneOf('units', units, ['si', 'us'] as const);
  const symbols = guardOneOf('style', style, ['ascii', 'unicode'] as const);
  const values = c['values'] === undefined ? {} : guardRecord('check.values', c['values']);
  for (const [k, v] of Object.entries(values)) {
    // Missing or non-finite numbers are said as a dash; other kinds cannot be said.
    if (v !== undefined && typeof v !== 'number') guardNumber(`check.values.${k}`, v);
  }
  const words = c['words'] === undefined ? {} : guardRecord('check.words', c['words']);
  for (const [k, w] of Object.entries(words)) guardString(`check.words.${k}`, w, 10_000);
  const known = { ...check, values: values as Check['values'], words: words as Check['words'] };
  const said = message(known, sayIn(system, symbols));
  return typeof said === 'string' ? said : '';
}

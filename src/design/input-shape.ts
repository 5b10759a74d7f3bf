/**
 * The shape checks at the entry of {@link evaluateDesign}: every object, list, name and choice
 * of a design input is what it should be before any work starts, so that a design built by
 * hand (not read from a file) is refused with a HeadflowError naming the field, never with a
 * TypeError from deep inside. The values themselves are checked where they are used.
 *
 * @module
 */
import { argumentError } from '../errors';
import {
  guardArray,
  guardFunction,
  guardNumber,
  guardOneOf,
  guardRange,
  guardRecord,
  guardString,
} from '../guards';
import type { DesignInput } from './types';

/**
 * Largest flow of a profile row (m3/s): the largest flow of `PHYSICAL_RANGE` in
 * scenario-values.ts (a test holds the two equal).
 */
export const MAX_PROFILE_FLOW = 1e3;

/** Smallest motor or drive efficiency a design takes: the scenario reader's `SMALLEST_FRACTION`. */
export const SMALLEST_EFFICIENCY = 1e-3;

/** Largest number of candidates, cases and profile rows a design takes. */
const MAX_ITEMS = 1000;

/** Throws `INVALID_ARGUMENT` naming the first field of `input` that has the wrong shape. */
export function checkDesignShape(input: DesignInput): void {
  guardRecord('input', input);
  guardString('name', input.name);
  const system = guardRecord('system', input.system);
  const fluid = guardRecord('system.fluid', system['fluid']);
  guardNumber('system.fluid.temperature', fluid['temperature'], 'K');
  guardNumber('system.fluid.density', fluid['density'], 'kg/m3');
  for (const [i, run] of guardArray('system.runs', system['runs'], { max: 10_000 }).entries()) {
    guardRecord(`system.runs[${i}]`, run);
  }
  if (input.fluidName !== undefined) guardString('fluidName', input.fluidName);
  checkSharedShape(input);
}

/**
 * The parts a line and a network design share: name, cases (a list), candidates, duty
 * profile, energy price, limits and units. Throws as {@link checkDesignShape}.
 */
export function checkSharedShape(
  input: Pick<
    DesignInput,
    'name' | 'candidates' | 'profile' | 'energyPrice' | 'limits' | 'units' | 'pumpLocation'
  > & { readonly cases?: readonly unknown[] | undefined },
): void {
  guardRecord('input', input);
  guardString('name', input.name);
  if (input.cases !== undefined) guardArray('cases', input.cases, { max: MAX_ITEMS });
  if (input.pumpLocation !== undefined) {
    guardNumber(
      'pumpLocation.elevation',
      guardRecord('pumpLocation', input.pumpLocation)['elevation'],
      'm',
    );
  }
  if (input.candidates !== undefined) {
    guardArray('candidates', input.candidates, { max: MAX_ITEMS });
    input.candidates.forEach((c, i) => {
      const at = `candidates[${i}]`;
      const candidate = guardRecord(at, c);
      guardString(`${at}.name`, candidate['name']);
      const pump = guardRecord(`${at}.pump`, candidate['pump']);
      for (const m of ['head', 'efficiency', 'shaftPower', 'atSpeed', 'shares'] as const) {
        guardFunction(`${at}.pump.${m}`, pump[m]);
      }
      guardRange(`${at}.pump.speed`, pump['speed'], { min: 0, minOpen: true, unit: 'rad/s' });
      // An efficiency of 1e-300 would carry an input power of Infinity into the report: below
      // the scenario reader's smallest fraction (0.1 %) it is refused, as the reader refuses it.
      for (const k of ['motorEfficiency', 'driveEfficiency'] as const) {
        const eff = candidate[k];
        if (typeof eff === 'number' && eff > 0 && eff < SMALLEST_EFFICIENCY) {
          throw argumentError(
            'OUT_OF_RANGE',
            `${at}.${k}`,
            eff,
            undefined,
            `${SMALLEST_EFFICIENCY} to 1`,
          );
        }
      }
      if (candidate['motorSeries'] !== undefined) {
        guardOneOf(`${at}.motorSeries`, candidate['motorSeries'], ['nema', 'iec'] as const);
      }
    });
  }
  if (input.profile !== undefined) {
    guardArray('profile', input.profile, { max: MAX_ITEMS * 100 });
    for (const [i, row] of input.profile.entries()) {
      const flow = guardRecord(`profile[${i}]`, row)['flow'];
      // A flow past the physical range would overflow in the energy sums (a check reporting
      // a flow of Infinity): refused as the scenario reader refuses it.
      if (typeof flow === 'number' && Math.abs(flow) > MAX_PROFILE_FLOW) {
        throw argumentError(
          'OUT_OF_RANGE',
          `profile[${i}].flow`,
          flow,
          'm3/s',
          `<= ${MAX_PROFILE_FLOW}`,
        );
      }
    }
  }
  if (input.energyPrice !== undefined) {
    const price = guardRecord('energyPrice', input.energyPrice);
    guardRange('energyPrice.perKWh', price['perKWh'], { min: 0 });
    guardString('energyPrice.currency', price['currency']);
  }
  if (input.limits !== undefined) {
    const limits = guardRecord('limits', input.limits);
    for (const k of ['suctionVelocity', 'dischargeVelocity'] as const) {
      if (limits[k] !== undefined) guardRecord(`limits.${k}`, limits[k]);
    }
  }
  if (input.units !== undefined) guardOneOf('units', input.units, ['si', 'us'] as const);
}

import { checkPositive, HeadflowError } from '../errors';
import { guardOptions } from '../guards';
import { brent } from '../numeric/brent';
import {
  type Acceleration,
  type Density,
  type Flow,
  type Length,
  type Power,
  STANDARD_GRAVITY,
} from '../units/index';
import { fmt, guardPump, systemHeadOf } from './internal';
import type { Pump, PumpShare, SystemCurveLike } from './types';

/** Options of {@link operatingPoint}. */
export interface OperatingPointOptions {
  /** Liquid density, for shaft power; without it `shaftPower` is undefined. */
  readonly density?: Density;
  /** Gravity (m/s^2); default 9.80665. */
  readonly g?: Acceleration;
}

/** Where a pump runs on a system curve. */
export interface OperatingPoint {
  readonly flow: Flow;
  readonly head: Length;
  /** Pump (or combination) efficiency, or undefined without efficiency data. */
  readonly efficiency: number | undefined;
  /** Shaft power, or undefined without efficiency data or `density`. */
  readonly shaftPower: Power | undefined;
  /** NPSH required, or undefined where the NPSH data do not cover the flow. */
  readonly npshRequired: Length | undefined;
  /** Flow as a percentage of BEP flow, or undefined (no efficiency data, or a combination). */
  readonly percentOfBep: number | undefined;
  readonly inPreferredRegion: boolean | undefined;
  readonly inAllowableRegion: boolean | undefined;
  /** Each pump's flow and head (one share for a single pump). */
  readonly shares: readonly PumpShare[];
  /** Root-finder iterations and function evaluations. */
  readonly iterations: number;
  readonly evaluations: number;
  /** Conditions worth a look (no NPSH data at this flow, outside the preferred region ...). */
  readonly warnings: readonly string[];
}

/**
 * Finds where a pump runs on a system: the flow at which pump head equals system head, by
 * Brent's bracketed root finding on `H_pump(Q) - H_sys(Q)` over the pump's catalogue flow
 * range `[Q_min, Q_max]` only (never past the last catalogue point).
 *
 * The difference is non-increasing in Q (pump head falls, system head rises), so there is at
 * most one crossing and a bracket exists exactly when the pump is above the system at Q_min
 * and below it at Q_max. When it does not, `NO_SOLUTION` says which end fails.
 *
 * @param pump - a pump curve, an affinity-scaled curve or a parallel/series combination
 * @param system - any object with `head(flow)` and `staticHead` (see {@link SystemCurveLike})
 * @throws HeadflowError `NO_SOLUTION` when "the pump cannot reach the static head" (shut-off
 *   head below the system's head at zero flow) or "the system needs more flow than the
 *   catalogue covers" (pump still above the system at the last catalogue flow);
 *   `INVALID_ARGUMENT` for a bad density or g, or a system head that is NaN.
 * @example
 * ```ts
 * // pump H = 40 - 0.001 Q^2, system H = 10 + 0.002 Q^2 (Q in m3/h): Q = 100 m3/h, H = 30 m
 * const op = operatingPoint(pump, { staticHead: q(10, 'm'), head: (f) => q(10 + 0.002 * to(f, 'm3/h') ** 2, 'm') });
 * to(op.flow, 'm3/h'); // 100.00000000
 * ```
 */
export function operatingPoint(
  pump: Pump,
  system: SystemCurveLike,
  options?: OperatingPointOptions | null,
): OperatingPoint {
  guardPump('pump', pump);
  const systemHead = systemHeadOf('system', system);
  const o = guardOptions<OperatingPointOptions>('options', options);
  const g = (o.g ?? STANDARD_GRAVITY) as Acceleration;
  checkPositive('g', g, 'm/s2');
  const density = o.density as Density | undefined;
  if (density !== undefined) checkPositive('density', density, 'kg/m3');
  const { min, max } = pump.flowRange;
  const diff = (q: number): number => pump.head(q as Flow) - systemHead(q as Flow);
  const atMin = diff(min);
  const atMax = diff(max);
  if (Number.isNaN(atMin) || Number.isNaN(atMax)) {
    throw new HeadflowError('INVALID_ARGUMENT', 'the system head is NaN at the flow range ends.', {
      parameter: 'system',
    });
  }
  if (atMin < 0) {
    const hp = pump.head(min);
    const hs = systemHead(min);
    const message =
      min === 0
        ? `the pump cannot reach the static head: shut-off ${fmt(hp)} m < static ${fmt(hs)} m.`
        : `the pump cannot reach the system head at its first catalogue flow ${fmt(min)} m3/s: ` +
          `pump ${fmt(hp)} m < system ${fmt(hs)} m (the catalogue has no lower flows).`;
    throw new HeadflowError('NO_SOLUTION', `No operating point: ${message}`, {
      parameter: 'system',
      value: hs,
      unit: 'm',
      allowed: `<= ${fmt(hp)} m`,
    });
  }
  if (atMax > 0) {
    throw new HeadflowError(
      'NO_SOLUTION',
      'No operating point: the system needs more flow than the catalogue covers: the pump runs ' +
        `out past Q_max = ${fmt(max)} m3/s (pump ${fmt(pump.head(max))} m > system ` +
        `${fmt(systemHead(max))} m there).`,
      { parameter: 'system', value: max, unit: 'm3/s', allowed: `<= ${fmt(max)} m3/s` },
    );
  }
  const r = brent(diff, min, max, { xTolerance: 1e-13 * max });
  const flow = r.root as Flow;
  return describePoint(pump, flow, density, g, r.iterations, r.evaluations);
}

/** The operating-point record of a pump at a known flow. @internal */
export function describePoint(
  pump: Pump,
  flow: Flow,
  density: Density | undefined,
  g: Acceleration,
  iterations: number,
  evaluations: number,
): OperatingPoint {
  const head = pump.head(flow);
  const warnings: string[] = [];
  const efficiency = pump.hasEfficiency ? pump.efficiency(flow) : undefined;
  const shaftPower =
    pump.hasEfficiency && density !== undefined ? pump.shaftPower(flow, density, g) : undefined;
  let npshRequired: Length | undefined;
  const nr = pump.npshRange;
  if (nr === undefined) {
    warnings.push('no NPSH-required data: check cavitation against the manufacturer data.');
  } else if (flow < nr.min * (1 - 1e-12) || flow > nr.max * (1 + 1e-12)) {
    warnings.push(
      `NPSH required is not known at ${fmt(flow)} m3/s (data cover ${fmt(nr.min)} to ${fmt(nr.max)} m3/s).`,
    );
  } else {
    npshRequired = pump.npshRequired(flow);
  }
  const shares = pump.shares(flow);
  const bep = pump.bestEfficiencyPoint;
  const percentOfBep = bep === undefined ? undefined : (100 * flow) / bep.flow;
  const inside = (r: { min: number; max: number } | undefined): boolean | undefined =>
    r === undefined ? undefined : flow >= r.min * (1 - 1e-12) && flow <= r.max * (1 + 1e-12);
  const inPreferredRegion = inside(pump.preferredRegion);
  const inAllowableRegion = inside(pump.allowableRegion);
  if (inPreferredRegion === false) {
    warnings.push(
      `outside the preferred operating region (${fmt(percentOfBep ?? 0)} % of BEP flow).`,
    );
  }
  if (inAllowableRegion === false) warnings.push('outside the allowable operating region.');
  for (const [i, s] of shares.entries()) {
    if (shares.length > 1 && s.inPreferredRegion === false) {
      warnings.push(
        `pump ${i + 1} runs outside its preferred operating region (${fmt(s.percentOfBep ?? 0)} % of its BEP flow).`,
      );
    }
    if (shares.length > 1 && s.flow === 0) {
      warnings.push(`pump ${i + 1} delivers no flow (its shut-off head is below the common head).`);
    }
  }
  return {
    flow,
    head,
    efficiency,
    shaftPower,
    npshRequired,
    percentOfBep,
    inPreferredRegion,
    inAllowableRegion,
    shares,
    iterations,
    evaluations,
    warnings,
  };
}

import { argumentError, checkPositive, HeadflowError } from '../errors';
import { guardFunction, guardOptions, guardRange } from '../guards';
import { brent } from '../numeric/brent';
import type { Flow, Length, RotationalSpeed } from '../units/index';
import { fmt, guardPump, systemHeadOf } from './internal';
import type { PumpCurve, SystemCurveLike } from './types';

/** Options of {@link speedForFlow}. */
export interface SpeedForFlowOptions {
  /** Highest speed the drive may run (rad/s). Default: the curve's own speed. */
  readonly maxSpeed?: RotationalSpeed;
}

/** Result of {@link speedForFlow}. */
export interface SpeedForFlowResult {
  /** The speed (rad/s); read with `to(speed, 'rpm')`. */
  readonly speed: RotationalSpeed;
  /** Speed as a fraction of the curve's own speed. */
  readonly speedRatio: number;
  /** Head at the duty: the system's head at the required flow. */
  readonly head: Length;
  /** The pump curve at that speed. */
  readonly pump: PumpCurve;
  /** Efficiency at the duty (affinity-scaled), or undefined without efficiency data. */
  readonly efficiency: number | undefined;
  readonly iterations: number;
  readonly evaluations: number;
}

/**
 * The speed at which a pump meets the system at the required flow, exactly on the system
 * curve: solves `r^2 H(Q / r) = H_sys(Q)` for the speed ratio r by Brent's method, where H is
 * the pump curve at its own speed (affinity laws). The system head is taken at the required
 * flow itself, so a static head is honoured (this is not the parabola `H ~ Q^2` through the
 * origin that the affinity laws alone would follow).
 *
 * The left side increases with r (head falls with flow), so the root is unique. The search
 * covers ratios for which `Q / r` lies on the catalogue curve, up to `maxSpeed`.
 *
 * @param pump - a pump curve (with the affinity laws)
 * @param system - the system it serves
 * @param flow - the required flow, > 0
 * @throws HeadflowError `INVALID_ARGUMENT` for a flow <= 0 or a bad `maxSpeed`;
 *   `NO_SOLUTION` when even `maxSpeed` cannot deliver the flow against the system, or when
 *   the duty needs a speed so low that the flow falls past the end of the catalogue curve.
 * @example
 * ```ts
 * // pump H = 40 - 0.001 Q^2 at 1750 rpm, system H = 10 + 0.002 Q^2 (Q in m3/h)
 * const s = speedForFlow(pump, system, q(80, 'm3/h'));
 * to(s.speed, 'rpm'); // 1750 sqrt(19.6 / 33.6) = 1336.6
 * ```
 */
export function speedForFlow(
  pump: PumpCurve,
  system: SystemCurveLike,
  flow: Flow,
  options?: SpeedForFlowOptions | null,
): SpeedForFlowResult {
  guardPump('pump', pump);
  guardFunction('pump.atSpeed', (pump as unknown as Record<string, unknown>)['atSpeed']);
  guardRange('pump.speed', pump.speed, { min: 0, minOpen: true, unit: 'rad/s' });
  const systemHead = systemHeadOf('system', system);
  const o = guardOptions<SpeedForFlowOptions>('options', options);
  if (typeof flow !== 'number' || !Number.isFinite(flow) || flow <= 0) {
    throw argumentError('INVALID_ARGUMENT', 'flow', flow, 'm3/s', 'a finite flow > 0');
  }
  const n0 = pump.speed;
  const maxSpeed = (o.maxSpeed ?? n0) as RotationalSpeed;
  checkPositive('maxSpeed', maxSpeed, 'rad/s');
  const need = systemHead(flow) as Length;
  if (Number.isNaN(need)) {
    throw new HeadflowError('INVALID_ARGUMENT', 'the system head is NaN at the required flow.', {
      parameter: 'system',
    });
  }
  const { min, max } = pump.flowRange;
  const rLo = flow / max;
  const rHi = Math.min(maxSpeed / n0, min > 0 ? flow / min : Number.POSITIVE_INFINITY);
  const g = (r: number): number => r * r * pump.head((flow / r) as Flow) - need;
  if (!(rHi >= rLo)) {
    throw new HeadflowError(
      'NO_SOLUTION',
      `the pump cannot deliver ${fmt(flow)} m3/s up to ${fmt(maxSpeed)} rad/s: at that speed its ` +
        `catalogue ends at ${fmt((max * maxSpeed) / n0)} m3/s.`,
      { parameter: 'flow', value: flow, unit: 'm3/s' },
    );
  }
  const gHi = g(rHi);
  if (gHi < 0) {
    throw new HeadflowError(
      'NO_SOLUTION',
      `the pump cannot deliver ${fmt(flow)} m3/s against the system even at ` +
        `${fmt(rHi * n0)} rad/s: pump head ${fmt(gHi + need)} m < system head ${fmt(need)} m.`,
      { parameter: 'flow', value: flow, unit: 'm3/s' },
    );
  }
  const gLo = g(rLo);
  if (gLo > 0) {
    throw new HeadflowError(
      'NO_SOLUTION',
      `the duty ${fmt(flow)} m3/s at ${fmt(need)} m needs a speed below ${fmt(rLo * n0)} rad/s, ` +
        'where that flow lies past the end of the catalogue curve.',
      { parameter: 'flow', value: flow, unit: 'm3/s' },
    );
  }
  const r = brent(g, rLo, rHi, { xTolerance: 1e-15 * rHi });
  const speed = (r.root * n0) as RotationalSpeed;
  const scaled = pump.atSpeed(speed);
  return {
    speed,
    speedRatio: r.root,
    head: need,
    pump: scaled,
    efficiency: scaled.hasEfficiency ? scaled.efficiency(flow) : undefined,
    iterations: r.iterations,
    evaluations: r.evaluations,
  };
}

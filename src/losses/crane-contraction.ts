import type { Length } from '../units/index';
import { checkAngle, diameterRatio } from './diameters';

const CONTRACTION_HINT =
  'A contraction goes from d1 (large, upstream) to d2 (small, downstream); for d2 > d1 use the expansion functions.';

/**
 * Loss coefficient of a gradual (conical) contraction from `d1` to `d2` with total included
 * cone angle `angle`, referred to the velocity head in the smaller, downstream pipe `d2`:
 *
 * - `angle <= 45 deg`: `K = 0.8 sin(angle/2) (1 - beta^2)`  (Crane formula 1)
 * - `45 deg < angle <= 180 deg`: `K = 0.5 sqrt(sin(angle/2)) (1 - beta^2)`  (Crane formula 2)
 *
 * with `beta = d2 / d1`. At 180 degrees this is the sudden contraction
 * `K = 0.5 (1 - beta^2)` ({@link suddenContractionK}). At 45 degrees the two branches agree
 * within 1.1 % (0.3061 against 0.3093 times (1 - beta^2)).
 *
 * Validity: turbulent flow. Source and note as {@link gradualExpansionK}: Crane TP-410,
 * page A-26, formulas 1 and 2, K1 referred to the smaller diameter (via Ludwig, Table 2-2).
 * The square root in formula 2 is from memory: the reproduction in hand is illegible at that
 * symbol; the continuity of the two branches at 45 degrees supports it.
 *
 * @param d1 - inside diameter upstream, the larger pipe (m), finite and > 0
 * @param d2 - inside diameter downstream, the smaller pipe (m), finite, > 0 and <= d1
 * @param angle - total included angle of the cone (degrees), 0 < angle <= 180
 * @returns K referred to the velocity head in `d2` (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for non-positive or NaN diameters, d2 > d1, or an
 *   angle outside (0, 180].
 * @example
 * ```ts
 * gradualContractionK(q(100, 'mm'), q(50, 'mm'), 30); // 0.8 sin(15 deg) 0.75 = 0.15529
 * ```
 */
export function gradualContractionK(d1: Length, d2: Length, angle: number): number {
  const beta = diameterRatio('d2', d2, 'd1', d1, CONTRACTION_HINT);
  checkAngle(angle);
  const r = 1 - beta * beta;
  const half = (angle * Math.PI) / 360;
  if (angle <= 45) return 0.8 * Math.sin(half) * r;
  return 0.5 * Math.sqrt(Math.sin(half)) * r;
}

/**
 * Loss coefficient of a sudden (square-edged) contraction from `d1` to `d2`:
 * `K = 0.5 (1 - (d2/d1)^2)`, referred to the velocity head in the smaller, downstream pipe
 * `d2`. It is {@link gradualContractionK} at 180 degrees; at `d1 -> infinity` it gives 0.5,
 * the sharp-edged entrance from a tank.
 *
 * Validity: turbulent flow. Source: Crane TP-410, page A-26, formula 2 at 180 degrees (via
 * Ludwig, Table 2-2).
 *
 * @param d1 - inside diameter upstream, the larger pipe (m), finite and > 0
 * @param d2 - inside diameter downstream, the smaller pipe (m), finite, > 0 and <= d1
 * @returns K referred to the velocity head in `d2` (dimensionless, 0 <= K < 0.5)
 * @throws HeadflowError `INVALID_ARGUMENT` for non-positive or NaN diameters or d2 > d1.
 * @example
 * ```ts
 * suddenContractionK(q(100, 'mm'), q(50, 'mm')); // 0.5 x 0.75 = 0.375
 * ```
 */
export function suddenContractionK(d1: Length, d2: Length): number {
  const beta = diameterRatio('d2', d2, 'd1', d1, CONTRACTION_HINT);
  return 0.5 * (1 - beta * beta);
}

import { checkFinite, checkPositive } from '../errors';
import { guardResult } from '../guards';
import type { Length } from '../units/index';

/**
 * Refers a loss coefficient from the velocity head in one diameter to that in another:
 * `K_to = K_from (D_to / D_from)^4`.
 *
 * The head loss is the same whichever velocity it is written with:
 * `K_from V_from^2 = K_to V_to^2`, and at one flow `V ~ 1 / D^2`. Exact (continuity only).
 *
 * Source: continuity and the definition of K; as in Crane TP-410, page A-26, "K2 = K1 / beta^4".
 *
 * @param k - loss coefficient referred to `fromDiameter`, finite (a negative K, a gain, is kept)
 * @param fromDiameter - the diameter K is referred to now (m), finite and > 0
 * @param toDiameter - the diameter to refer it to (m), finite and > 0
 * @returns K referred to `toDiameter`
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinite K or non-positive diameters.
 * @example
 * ```ts
 * referK(0.5625, q(50, 'mm'), q(100, 'mm')); // 0.5625 x 16 = 9
 * ```
 */
export function referK(k: number, fromDiameter: Length, toDiameter: Length): number {
  checkFinite('k', k);
  checkPositive('fromDiameter', fromDiameter, 'm');
  checkPositive('toDiameter', toDiameter, 'm');
  const r = toDiameter / fromDiameter;
  const r2 = r * r;
  return guardResult('referK', k * r2 * r2, 'OUT_OF_RANGE');
}

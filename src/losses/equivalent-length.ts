import { checkNonNegative, checkPositive } from '../errors';
import { guardResult } from '../guards';
import type { Length } from '../units/index';

/**
 * The length of straight pipe with the same head loss as a loss coefficient K:
 * `L = K D / f`, from Darcy-Weisbach `h = f (L/D) V^2/(2g)` and `h = K V^2/(2g)`.
 *
 * The equivalent length holds only at the friction factor it was computed with: f changes
 * with Reynolds number and roughness while K (for turbulent flow) hardly does, so convert
 * at the operating f of the pipe, not once for all flows.
 *
 * Source: the definitions of K and of Darcy-Weisbach (for example Crane TP-410, "K = f L/D").
 *
 * @param k - loss coefficient referred to the pipe's velocity head, finite and >= 0
 * @param frictionFactor - Darcy friction factor f of the pipe, finite and > 0
 * @param diameter - inside diameter of the pipe (m), finite and > 0
 * @returns the equivalent length (m)
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinite or out-of-range values.
 * @example
 * ```ts
 * equivalentLength(0.75, 0.02, q(100, 'mm')); // 0.75 x 0.1 / 0.02 = 3.75 m
 * ```
 */
export function equivalentLength(k: number, frictionFactor: number, diameter: Length): Length {
  checkNonNegative('k', k);
  checkPositive('frictionFactor', frictionFactor);
  checkPositive('diameter', diameter, 'm');
  return guardResult('equivalentLength', (k * diameter) / frictionFactor, 'OUT_OF_RANGE') as Length;
}

/**
 * The loss coefficient of a length of straight pipe: `K = f L / D`, the inverse of
 * {@link equivalentLength} (same source and caveat).
 *
 * @param length - equivalent length (m), finite and >= 0
 * @param frictionFactor - Darcy friction factor f, finite and > 0
 * @param diameter - inside diameter of the pipe (m), finite and > 0
 * @returns K referred to the pipe's velocity head (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinite or out-of-range values.
 * @example
 * ```ts
 * kFromEquivalentLength(q(3.75, 'm'), 0.02, q(100, 'mm')); // 0.75
 * ```
 */
export function kFromEquivalentLength(
  length: Length,
  frictionFactor: number,
  diameter: Length,
): number {
  checkNonNegative('length', length, 'm');
  checkPositive('frictionFactor', frictionFactor);
  checkPositive('diameter', diameter, 'm');
  return guardResult('kFromEquivalentLength', (frictionFactor * length) / diameter, 'OUT_OF_RANGE');
}

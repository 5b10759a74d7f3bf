/**
 * Flow area of a full circular bore.
 *
 * @module
 */

import { checkPositive } from '../errors';
import { guardResult } from '../guards';
import type { Area, Length } from '../units/index';

/**
 * Cross-sectional area of a circular bore running full: `A = pi * d^2 / 4`.
 *
 * @param insideDiameter - inside diameter (m), finite and > 0
 * @returns the area (m^2)
 * @throws HeadflowError `INVALID_ARGUMENT` for a diameter that is NaN, infinite, zero or
 *   negative.
 * @example
 * ```ts
 * flowArea(pipeSize('4', '40').insideDiameter); // 0.008213 m2 (12.73 in2)
 * ```
 */
export function flowArea(insideDiameter: Length): Area {
  checkPositive('insideDiameter', insideDiameter, 'm');
  return guardResult(
    'flowArea',
    (Math.PI * insideDiameter * insideDiameter) / 4,
    'OUT_OF_RANGE',
  ) as Area;
}

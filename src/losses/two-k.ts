import { checkPositive } from '../errors';
import { guardResult } from '../guards';
import type { Length } from '../units/index';
import { checkConstant, checkReynoldsNumber, METRES_PER_INCH } from './validate';

/**
 * Loss coefficient of a fitting by the 2-K method of Hooper:
 * `K = K1 / Re + Kinf (1 + 1 / D_in)`, with `D_in` the inside diameter in inches.
 *
 * The first term carries the laminar (viscous) part of the loss, which grows as 1/Re; the
 * second the turbulent part, larger in small fittings. K is referred to the velocity head
 * `V^2 / (2 g)` of the pipe of diameter `diameter` (the pipe the fitting is in).
 *
 * Validity: the method is meant for every Reynolds number, laminar to fully turbulent, and
 * for the fitting sizes of ordinary process piping; the constants come from the source's
 * table for each fitting type. Results are only as good as those constants.
 *
 * Source: W. B. Hooper, "The two-K method predicts head losses in pipe fittings", Chemical
 * Engineering 88(17) (24 August 1981) 96-100.
 *
 * @param k1 - the fitting's laminar constant K1 (dimensionless), finite and >= 0
 * @param kInf - the fitting's turbulent constant K-infinity (dimensionless), finite and >= 0
 * @param re - Reynolds number of the flow in the pipe (dimensionless), finite and > 0
 * @param diameter - inside diameter of the pipe (m), finite and > 0
 * @returns K referred to the velocity head in `diameter` (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinite or negative constants, Re <= 0
 *   or a diameter <= 0.
 * @example
 * ```ts
 * twoK(800, 0.25, 1e5, q(4, 'in')); // 0.008 + 0.25 * 1.25 = 0.3205
 * ```
 */
export function twoK(k1: number, kInf: number, re: number, diameter: Length): number {
  checkConstant('k1', k1);
  checkConstant('kInf', kInf);
  checkReynoldsNumber(re);
  checkPositive('diameter', diameter, 'm');
  return guardResult('twoK', k1 / re + kInf * (1 + METRES_PER_INCH / diameter), 'OUT_OF_RANGE');
}

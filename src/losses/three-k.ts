import { checkPositive } from '../errors';
import { guardResult } from '../guards';
import type { Length } from '../units/index';
import { checkConstant, checkReynoldsNumber, METRES_PER_INCH } from './validate';

/**
 * Loss coefficient of a fitting by the 3-K method of Darby:
 * `K = K1 / Re + Ki (1 + Kd / D_in^0.3)`, with `D_in` the pipe diameter in inches.
 *
 * The first term is the laminar part; `Ki` the turbulent loss of a large fitting; `Kd` scales
 * it up for small sizes (the D^0.3 dependence follows the fitted data better than the 1/D of
 * the 2-K method, by the source's account). K is referred to the velocity head `V^2 / (2 g)`
 * of the pipe the fitting is in.
 *
 * Diameter: the source correlates against the nominal pipe size in inches. Passing the inside
 * diameter instead changes the size term by `(D_nominal / D_inside)^0.3`, for example 1.4 %
 * for 1 in schedule 40 (1.049 in bore) and 0.2 % for 4 in schedule 40 (4.026 in); pass the
 * nominal size where you want the source's exact form.
 *
 * Validity: laminar through fully turbulent flow; the constants of each fitting come from the
 * source's table. The source reports the correlation as more accurate than single-K or 2-K
 * forms over the range of sizes and Reynolds numbers it fitted (ranges not restated here:
 * see the source).
 *
 * Source: R. Darby, "Correlate pressure drops through fittings", Chemical Engineering 106(7)
 * (July 1999) 101-104; R. Darby, "Chemical Engineering Fluid Mechanics", 2nd ed., Marcel
 * Dekker, 2001, Table 7-3.
 *
 * @param k1 - the fitting's laminar constant K1 (dimensionless), finite and >= 0
 * @param kInf - the fitting's turbulent constant Ki (dimensionless), finite and >= 0
 * @param kd - the fitting's size constant Kd (in^0.3), finite and >= 0
 * @param re - Reynolds number of the flow in the pipe (dimensionless), finite and > 0
 * @param diameter - pipe diameter (m), finite and > 0; see "Diameter" above
 * @returns K referred to the velocity head in the pipe (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinite or negative constants, Re <= 0
 *   or a diameter <= 0.
 * @example
 * ```ts
 * // Standard threaded 90 degree elbow (Darby Table 7-3: 800, 0.14, 4.0) in 1 in pipe:
 * threeK(800, 0.14, 4.0, 1e5, q(1, 'in')); // 0.008 + 0.14 * 5 = 0.708
 * ```
 */
export function threeK(k1: number, kInf: number, kd: number, re: number, diameter: Length): number {
  checkConstant('k1', k1);
  checkConstant('kInf', kInf);
  checkConstant('kd', kd);
  checkReynoldsNumber(re);
  checkPositive('diameter', diameter, 'm');
  return guardResult(
    'threeK',
    k1 / re + kInf * (1 + kd / (diameter / METRES_PER_INCH) ** 0.3),
    'OUT_OF_RANGE',
  );
}

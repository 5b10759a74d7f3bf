import { guardResult } from '../guards';
import {
  checkRelativeRoughness,
  checkReynolds,
  type RoughnessOptions,
  roughnessOptions,
} from './validate';

/** @internal Unchecked kernel of {@link churchill}. */
export function churchillKernel(re: number, relativeRoughness: number): number {
  const a = (2.457 * Math.log(1 / ((7 / re) ** 0.9 + 0.27 * relativeRoughness))) ** 16;
  const b = (37530 / re) ** 16;
  const t = (a + b) ** -1.5;
  if (re >= 8) return 8 * ((8 / re) ** 12 + t) ** (1 / 12);
  // Below Re 8, 8 [(8/Re)^12 + t]^(1/12) written as (64/Re) [1 + t (Re/8)^12]^(1/12): the same
  // value, but (8/Re)^12 no longer overflows to Infinity (it did below Re about 6e-25).
  const r = re / 8;
  return (8 / r) * (1 + t * r ** 12) ** (1 / 12);
}

/**
 * Darcy friction factor from Churchill's (1977) single equation for all flow regimes
 * (laminar, transition and turbulent):
 * `f = 8 [ (8/Re)^12 + (A + B)^-1.5 ]^(1/12)`, with
 * `A = [ 2.457 ln( 1 / ((7/Re)^0.9 + 0.27 eps/D) ) ]^16` and `B = (37530/Re)^16`.
 *
 * Validity (published): all Re > 0 and the roughness range of the Moody chart
 * (0 <= eps/D <= 0.05). It tends to 64/Re in laminar flow and is continuous through the
 * transition band, where no formula is accurate (the flow itself is intermittent).
 *
 * Accuracy: no bound against Colebrook is quoted in the source at hand; this project
 * observes at most 3.16 % for 4000 <= Re <= 1e8, 1e-6 <= eps/D <= 0.05 (1.72 % for smooth
 * pipe), and the tests check 3.2 %.
 *
 * Source: S. W. Churchill, 1977, "Friction-factor equation spans all fluid-flow regimes",
 * Chemical Engineering 84(24):91-92.
 *
 * @param re - Reynolds number (dimensionless), > 0
 * @param relativeRoughness - eps/D (dimensionless), 0 to 0.1 (0.5 with `allowLargeRoughness`)
 * @param options - `allowLargeRoughness` to accept eps/D above 0.1
 * @returns the Darcy friction factor (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for Re <= 0, NaN, Infinity, negative eps/D or
 *   eps/D > 0.5; `OUT_OF_RANGE` for 0.1 < eps/D <= 0.5 without `allowLargeRoughness`, and
 *   where f is not a finite number (64/Re overflows, Re below about 3.6e-307).
 * @example
 * ```ts
 * churchill(1e5, 1e-4); // 0.018462624566280075
 * churchill(1000, 0); // 0.06400000000000129 (64/Re = 0.064)
 * ```
 */
export function churchill(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions | null,
): number {
  checkReynolds(re);
  checkRelativeRoughness(relativeRoughness, roughnessOptions(options));
  return guardResult('churchill', churchillKernel(re, relativeRoughness), 'OUT_OF_RANGE');
}

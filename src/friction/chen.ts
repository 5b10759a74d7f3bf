import {
  checkApproximationReynolds,
  checkRelativeRoughness,
  type RoughnessOptions,
  roughnessOptions,
} from './validate';

/** @internal Unchecked kernel of {@link chen}. */
export function chenKernel(re: number, relativeRoughness: number): number {
  const inner = Math.log10(relativeRoughness ** 1.1098 / 2.8257 + 5.8506 / re ** 0.8981);
  const s = -2 * Math.log10(relativeRoughness / 3.7065 - (5.0452 / re) * inner);
  return 1 / (s * s);
}

/**
 * Darcy friction factor from the explicit approximation of Chen (1979):
 * `1/sqrt(f) = -2 log10[ (eps/D)/3.7065 - (5.0452/Re) log10( (eps/D)^1.1098/2.8257
 *  + 5.8506/Re^0.8981 ) ]`.
 *
 * Validity (published): 4000 <= Re <= 4e8 and 1e-7 <= eps/D <= 0.05. Outside it the formula
 * is still evaluated and is documented as unvalidated.
 *
 * Accuracy: no bound is quoted from the source at hand; this project observes at most
 * 0.326 % over the published range (tests check 0.33 %).
 *
 * Source: N. H. Chen, 1979, "An explicit equation for friction factor in pipe",
 * Ind. Eng. Chem. Fundam. 18(3):296-297.
 *
 * @param re - Reynolds number (dimensionless), > 0
 * @param relativeRoughness - eps/D (dimensionless), 0 to 0.1 (0.5 with `allowLargeRoughness`)
 * @param options - `allowLargeRoughness` to accept eps/D above 0.1
 * @returns the Darcy friction factor (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for Re <= 0, NaN, Infinity, negative eps/D or
 *   eps/D > 0.5; `OUT_OF_RANGE` for 0.1 < eps/D <= 0.5 without `allowLargeRoughness` and for
 *   Re below 100 ({@link MIN_APPROXIMATION_REYNOLDS}).
 * @example
 * ```ts
 * chen(1e5, 1e-4); // 0.018552814878262533
 * ```
 */
export function chen(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions | null,
): number {
  checkApproximationReynolds(re);
  checkRelativeRoughness(relativeRoughness, roughnessOptions(options));
  return chenKernel(re, relativeRoughness);
}

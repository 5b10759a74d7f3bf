import {
  checkApproximationReynolds,
  checkRelativeRoughness,
  type RoughnessOptions,
  roughnessOptions,
} from './validate';

/** @internal Unchecked kernel of {@link zigrangSylvester}. */
export function zigrangSylvesterKernel(re: number, relativeRoughness: number): number {
  const k = relativeRoughness / 3.7;
  const r = 5.02 / re;
  const s = -2 * Math.log10(k - r * Math.log10(k - r * Math.log10(k + 13 / re)));
  return 1 / (s * s);
}

/**
 * Darcy friction factor from the explicit approximation of Zigrang and Sylvester (1982):
 * `1/sqrt(f) = -2 log10[ (eps/D)/3.7 - (5.02/Re) log10( (eps/D)/3.7
 *  - (5.02/Re) log10( (eps/D)/3.7 + 13/Re ) ) ]`.
 *
 * Validity (published): 4000 <= Re <= 1e8 and 4e-5 <= eps/D <= 0.05. Outside it the formula
 * is still evaluated and is documented as unvalidated.
 *
 * Accuracy: no bound is quoted from the source at hand; this project observes at
 * most 0.103 % over the published range (tests check 0.11 %).
 *
 * Source: D. J. Zigrang, N. D. Sylvester, 1982, "Explicit approximations to the solution of
 * Colebrook's friction factor equation", AIChE J. 28(3):514-515.
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
 * zigrangSylvester(1e5, 1e-4); // 0.01850021312358548
 * ```
 */
export function zigrangSylvester(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions | null,
): number {
  checkApproximationReynolds(re);
  checkRelativeRoughness(relativeRoughness, roughnessOptions(options));
  return zigrangSylvesterKernel(re, relativeRoughness);
}

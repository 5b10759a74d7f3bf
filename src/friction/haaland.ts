import {
  checkApproximationReynolds,
  checkRelativeRoughness,
  type RoughnessOptions,
  roughnessOptions,
} from './validate';

/** @internal Unchecked kernel of {@link haaland}. */
export function haalandKernel(re: number, relativeRoughness: number): number {
  const s = -1.8 * Math.log10((relativeRoughness / 3.7) ** 1.11 + 6.9 / re);
  return 1 / (s * s);
}

/**
 * Darcy friction factor from the explicit approximation of Haaland (1983):
 * `1/sqrt(f) = -1.8 log10[ ((eps/D)/3.7)^1.11 + 6.9/Re ]`.
 *
 * Validity (published): 4000 <= Re <= 1e8 and 1e-6 <= eps/D <= 0.05. Outside it the formula
 * is still evaluated and is documented as unvalidated.
 *
 * Accuracy: published as within 1.5 % of Colebrook over that range (Haaland 1983; from
 * memory); this project observes at most 1.43 %
 * over that range (tests check 1.5 %).
 *
 * Source: S. E. Haaland, 1983, "Simple and explicit formulas for the friction factor in
 * turbulent pipe flow", J. Fluids Eng. 105(1):89-90.
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
 * haaland(1e5, 1e-4); // 0.018265053014793857
 * ```
 */
export function haaland(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions | null,
): number {
  checkApproximationReynolds(re);
  checkRelativeRoughness(relativeRoughness, roughnessOptions(options));
  return haalandKernel(re, relativeRoughness);
}

import {
  checkApproximationReynolds,
  checkRelativeRoughness,
  type RoughnessOptions,
  roughnessOptions,
} from './validate';

/** @internal Unchecked kernel of {@link swameeJain}. */
export function swameeJainKernel(re: number, relativeRoughness: number): number {
  const l = Math.log10(relativeRoughness / 3.7 + 5.74 / re ** 0.9);
  return 0.25 / (l * l);
}

/**
 * Darcy friction factor from the explicit approximation of Swamee and Jain (1976):
 * `f = 0.25 / [ log10( (eps/D)/3.7 + 5.74/Re^0.9 ) ]^2`.
 *
 * Validity (published): 5000 <= Re <= 1e8 and 1e-6 <= eps/D <= 1e-2. Outside it the formula
 * is still evaluated and is documented as unvalidated.
 *
 * Accuracy: published as within 1 % of Colebrook over that range (Swamee and Jain 1976;
 * from memory); this project observes up to 2.83 % over
 * the published range (largest at Re 5000, eps/D 0.01), so the quoted 1 % does not hold at the
 * low-Re, rough corner; the tests check 2.9 %.
 *
 * Source: P. K. Swamee, A. K. Jain, 1976, "Explicit equations for pipe-flow problems",
 * J. Hydraulics Division ASCE 102(HY5):657-664.
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
 * swameeJain(1e5, 1e-4); // 0.01845244530756638 (Colebrook 0.0185138660774716)
 * ```
 */
export function swameeJain(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions | null,
): number {
  checkApproximationReynolds(re);
  checkRelativeRoughness(relativeRoughness, roughnessOptions(options));
  return swameeJainKernel(re, relativeRoughness);
}

import {
  checkApproximationReynolds,
  checkRelativeRoughness,
  type RoughnessOptions,
  roughnessOptions,
} from './validate';

/** @internal Unchecked kernel of {@link serghides}. */
export function serghidesKernel(re: number, relativeRoughness: number): number {
  const k = relativeRoughness / 3.7;
  const a = -2 * Math.log10(k + 12 / re);
  const b = -2 * Math.log10(k + (2.51 * a) / re);
  const c = -2 * Math.log10(k + (2.51 * b) / re);
  const d = b - a;
  const den = c - 2 * b + a;
  // Where the three iterates already agree (very large Re), the acceleration is 0/0: keep c.
  const s = den === 0 ? c : a - (d * d) / den;
  return 1 / (s * s);
}

/**
 * Darcy friction factor from the explicit approximation of Serghides (1984), Steffensen's
 * acceleration of three fixed-point steps of Colebrook:
 * `A = -2 log10((eps/D)/3.7 + 12/Re)`, `B = -2 log10((eps/D)/3.7 + 2.51 A/Re)`,
 * `C = -2 log10((eps/D)/3.7 + 2.51 B/Re)`, `1/sqrt(f) = A - (B - A)^2 / (C - 2B + A)`.
 *
 * Validity (published): turbulent flow, 2100 <= Re <= 1e8 (from memory) and
 * 0 <= eps/D <= 0.05.
 *
 * Accuracy: published as within 0.0023 % of Colebrook (Serghides 1984; from memory);
 * this project observes up to 0.0031 %
 * (Re near 1.6e5 to 1.8e5, smooth to eps/D 1e-6), slightly above the quoted figure; the
 * tests check 0.0032 %.
 *
 * Source: T. K. Serghides, 1984, "Estimate friction factor accurately", Chemical Engineering
 * 91(5):63-64.
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
 * serghides(1e5, 1e-4); // 0.01851358983180063
 * ```
 */
export function serghides(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions | null,
): number {
  checkApproximationReynolds(re);
  checkRelativeRoughness(relativeRoughness, roughnessOptions(options));
  return serghidesKernel(re, relativeRoughness);
}

import {
  checkApproximationReynolds,
  checkRelativeRoughness,
  type RoughnessOptions,
  roughnessOptions,
} from './validate';

const A = 2 / Math.LN10;
const D_PER_RE = Math.LN10 / 5.02;

/** @internal Unchecked kernel of {@link goudarSonnad}. */
export function goudarSonnadKernel(re: number, relativeRoughness: number): number {
  const b = relativeRoughness / 3.7;
  const d = D_PER_RE * re;
  const s = b * d + Math.log(d);
  const q = s ** (s / (s + 1));
  const g = b * d + Math.log(d / q);
  const z = Math.log(q / g);
  const dla = (z * g) / (g + 1);
  const gp1 = g + 1;
  const dcfa = dla * (1 + z / 2 / (gp1 * gp1 + (z / 3) * (2 * g - 1)));
  const x = A * (Math.log(d / q) + dcfa);
  return 1 / (x * x);
}

/**
 * Darcy friction factor from the explicit form of Goudar and Sonnad (2008), built on the
 * exact Lambert-W rearrangement of Colebrook with a continued-fraction correction:
 * `a = 2/ln 10`, `b = (eps/D)/3.7`, `d = Re ln(10)/5.02`, `s = b d + ln d`,
 * `q = s^(s/(s+1))`, `g = b d + ln(d/q)`, `z = ln(q/g)`, `dLA = z g/(g+1)`,
 * `dCFA = dLA (1 + (z/2) / ((g+1)^2 + (z/3)(2g - 1)))`,
 * `1/sqrt(f) = a (ln(d/q) + dCFA)`.
 *
 * Validity (published): 4000 <= Re <= 1e8 and 1e-6 <= eps/D <= 0.05.
 *
 * Accuracy: effectively exact; this project observes a relative difference from
 * Colebrook of at most 1.04e-12 over the published range, largest at Re 4000 (tests check
 * 2e-12). Use {@link colebrook}, which is exact and cheaper.
 *
 * Source: C. T. Goudar, J. R. Sonnad, 2008, "Comparison of the iterative approximations of
 * the Colebrook-White equation", Hydrocarbon Processing 87(8):79-83.
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
 * goudarSonnad(1e5, 1e-4); // 0.018513866077472442
 * ```
 */
export function goudarSonnad(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions | null,
): number {
  checkApproximationReynolds(re);
  checkRelativeRoughness(relativeRoughness, roughnessOptions(options));
  return goudarSonnadKernel(re, relativeRoughness);
}

import { checkRelativeRoughness, checkReynolds, type RoughnessOptions } from './validate';

// Colebrook rewritten for Clamond's iteration (Clamond 2009, eqs. for x1, x2 and y):
//   1/sqrt(f) = -2 log10(K/3.7 + 2.51/(Re sqrt f))
// with y = (ln 10 / 2) / sqrt(f) becomes  y + ln(x1 + y) - x2 = 0, where
//   x1 = K Re ln(10) / (3.7 x 5.02)   and   x2 = ln(Re) + ln(ln(10) / 5.02).
/** ln(10) / (3.7 x 5.02) = ln(10) / 18.574. */
const X1_PER_K_RE = Math.LN10 / 18.574;
/** ln(ln(10) / 5.02). */
const X2_SHIFT = Math.log(Math.LN10 / 5.02);
/** ln(10) / 2: f = (ln(10) / (2 y))^2. */
const HALF_LN10 = Math.LN10 / 2;
/** Number of correction steps: two reach machine precision over Re 2e3..1e9, K 0..0.05. */
const STEPS = 2;

/**
 * Unchecked Colebrook kernel on plain numbers (two Clamond correction steps, unrolled).
 * @internal
 */
export function colebrookKernel(re: number, relativeRoughness: number): number {
  const x1 = relativeRoughness * re * X1_PER_K_RE;
  const x2 = Math.log(re) + X2_SHIFT;
  // Initial guess y0 = x2 - 0.2 (Clamond 2009).
  let y = x2 - 0.2;
  // Step 1. With c = x1 + y and e = g(y) / (1 + c), the third-order correction is
  //   y <- y - c e (1 + c + e/2) / (1 + c + e (1 + e/3)).
  let c = x1 + y;
  let e = (Math.log(c) + y - x2) / (1 + c);
  y -= (c * e * (1 + c + 0.5 * e)) / (1 + c + e * (1 + e / 3));
  // Step 2.
  c = x1 + y;
  e = (Math.log(c) + y - x2) / (1 + c);
  y -= (c * e * (1 + c + 0.5 * e)) / (1 + c + e * (1 + e / 3));
  const s = HALF_LN10 / y;
  return s * s;
}

/**
 * Darcy friction factor from the Colebrook (Colebrook-White) equation, solved to machine
 * precision.
 *
 * Equation (Colebrook 1939):
 * `1/sqrt(f) = -2 log10( (eps/D)/3.7 + 2.51/(Re sqrt(f)) )`.
 *
 * Method: Clamond (2009) writes the equation as `y + ln(x1 + y) = x2` with
 * `y = ln(10)/(2 sqrt f)`, `x1 = (eps/D) Re ln(10)/18.574`, `x2 = ln(Re) + ln(ln(10)/5.02)`,
 * starts from `y0 = x2 - 0.2` and applies two steps of a third-order correction. Against a
 * 45-digit Newton solution (tests/reference/colebrook-decimal.test.ts) the relative error
 * stays below 1e-14 (observed at most about 2e-15) for 2000 <= Re <= 1e9 and
 * 0 <= eps/D <= 0.05; the equation's residual at the result is of order 1e-15.
 *
 * Validity: the Colebrook equation is a turbulent-flow law, fitted to data for roughly
 * 4000 <= Re <= 1e8 and 0 <= eps/D <= 0.05; below Re 4000 it is an extrapolation (use
 * {@link frictionFactor} for the regime policy). The solver itself is exact for any accepted
 * input.
 *
 * Cost: three natural logarithms, no powers; allocates nothing.
 *
 * Sources: C. F. Colebrook, 1939, "Turbulent flow in pipes, with particular reference to the
 * transition region between the smooth and rough pipe laws", J. Inst. Civil Eng. 11:133-156.
 * D. Clamond, 2009, "Efficient resolution of the Colebrook equation", Ind. Eng. Chem. Res.
 * 48(7):3665-3671.
 *
 * @param re - Reynolds number (dimensionless), > 0
 * @param relativeRoughness - eps/D (dimensionless), 0 to 0.1 (0.5 with `allowLargeRoughness`)
 * @param options - `allowLargeRoughness` to accept eps/D above 0.1
 * @returns the Darcy friction factor f (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for Re <= 0, NaN, Infinity, negative eps/D or
 *   eps/D > 0.5; `OUT_OF_RANGE` for 0.1 < eps/D <= 0.5 without `allowLargeRoughness`.
 * @example
 * ```ts
 * colebrook(1e5, 1e-4); // 0.018513866077471648 (45-digit solution 0.0185138660774716427)
 * ```
 */
export function colebrook(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions,
): number {
  checkReynolds(re);
  checkRelativeRoughness(relativeRoughness, options);
  return colebrookKernel(re, relativeRoughness);
}

/**
 * Residual of the Colebrook equation at a given f:
 * `1/sqrt(f) + 2 log10( (eps/D)/3.7 + 2.51/(Re sqrt(f)) )` (zero at the exact solution; in
 * units of 1/sqrt(f), whose values lie between about 2 and 20). Inputs are not checked.
 *
 * @param re - Reynolds number
 * @param relativeRoughness - eps/D
 * @param f - a Darcy friction factor
 * @returns the residual (dimensionless)
 * @example
 * ```ts
 * colebrookResidual(1e5, 1e-4, colebrook(1e5, 1e-4)); // about 1e-15 in magnitude
 * ```
 */
export function colebrookResidual(re: number, relativeRoughness: number, f: number): number {
  const s = 1 / Math.sqrt(f);
  return s + 2 * Math.log10(relativeRoughness / 3.7 + (2.51 * s) / re);
}

/** What {@link colebrookSolve} reports. */
export interface ColebrookSolution {
  /** Darcy friction factor. */
  readonly f: number;
  /** Correction steps made (always 2: the method has a fixed cost). */
  readonly iterations: number;
  /** {@link colebrookResidual} at `f`. */
  readonly residual: number;
}

/**
 * {@link colebrook} with its work shown: the friction factor, the number of correction steps
 * and the residual of the equation at the result. Allocates one small object; use
 * {@link colebrook} in loops.
 *
 * @param re - Reynolds number (dimensionless), > 0
 * @param relativeRoughness - eps/D (dimensionless), 0 to 0.1 (0.5 with `allowLargeRoughness`)
 * @param options - `allowLargeRoughness` to accept eps/D above 0.1
 * @returns `{ f, iterations, residual }`
 * @throws HeadflowError as {@link colebrook}.
 * @example
 * ```ts
 * colebrookSolve(1e5, 1e-4); // { f: 0.018513866077471648, iterations: 2, residual: ~1e-15 }
 * ```
 */
export function colebrookSolve(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions,
): ColebrookSolution {
  const f = colebrook(re, relativeRoughness, options);
  return { f, iterations: STEPS, residual: colebrookResidual(re, relativeRoughness, f) };
}

import { argumentError } from '../errors';
import { guardRange, guardResult } from '../guards';
import {
  checkRelativeRoughness,
  checkReynolds,
  type RoughnessOptions,
  roughnessOptions,
} from './validate';

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
 * Below this value of `x1 + x2` (about Re 45 in a smooth pipe) Clamond's start `x2 - 0.2` can
 * lie where `ln(x1 + y)` has no value (it did for every Re below about 2.8); the kernel then
 * starts from an approximation of the Lambert W function instead and takes one step more.
 */
const LOW_Z = 3;
/** Correction steps from the low-Re start (its error is at most about 2 %). */
const LOW_STEPS = 3;
/**
 * Smallest Reynolds number {@link colebrook} accepts: below it f (about 6.3/Re^2 there) would
 * exceed the largest floating-point number.
 */
export const COLEBROOK_MIN_REYNOLDS = 1e-150;

/**
 * Unchecked Colebrook kernel on plain numbers (two Clamond correction steps, unrolled).
 * @internal
 */
export function colebrookKernel(re: number, relativeRoughness: number): number {
  const x1 = relativeRoughness * re * X1_PER_K_RE;
  const x2 = Math.log(re) + X2_SHIFT;
  if (x1 + x2 < LOW_Z) return colebrookLowKernel(x1, x2);
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
 * The kernel for small `z = x1 + x2` (low Re). With `c = x1 + y` the equation reads
 * `c + ln c = z`, so `c = W(e^z)` (Lambert W). Start from Winitzki's approximation
 * `W(a) ~ L (1 - ln(1 + L) / (2 + L))`, `L = ln(1 + a)` (error at most about 2 % for a >= 0;
 * S. Winitzki, 2003, "Uniform approximations for transcendental functions", LNCS 2667:780-789),
 * then apply Clamond's third-order correction {@link LOW_STEPS} times.
 */
function colebrookLowKernel(x1: number, x2: number): number {
  const a = Math.exp(x1 + x2);
  const l = Math.log1p(a);
  let y = l * (1 - Math.log1p(l) / (2 + l)) - x1;
  for (let i = 0; i < LOW_STEPS; i++) {
    const c = x1 + y;
    const e = (Math.log(c) + y - x2) / (1 + c);
    y -= (c * e * (1 + c + 0.5 * e)) / (1 + c + e * (1 + e / 3));
  }
  const s = HALF_LN10 / y;
  return s * s;
}

/** Correction steps the kernel takes for (re, relativeRoughness). @internal */
export function colebrookSteps(re: number, relativeRoughness: number): number {
  return relativeRoughness * re * X1_PER_K_RE + Math.log(re) + X2_SHIFT < LOW_Z ? LOW_STEPS : STEPS;
}

/** Refuses Re below {@link COLEBROOK_MIN_REYNOLDS}. @internal */
export function checkColebrookReynolds(re: number, parameter = 're'): void {
  if (re < COLEBROOK_MIN_REYNOLDS) {
    throw argumentError(
      'OUT_OF_RANGE',
      parameter,
      re,
      undefined,
      `>= ${COLEBROOK_MIN_REYNOLDS}`,
      'Below it the Colebrook friction factor exceeds the largest floating-point number.',
    );
  }
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
 * 0 <= eps/D <= 0.05; the equation's residual at the result is of order 1e-15. Where
 * `x1 + x2 < 3` (low Re, below about 45 in a smooth pipe) Clamond's start has no logarithm,
 * so the solver starts from Winitzki's approximation of the Lambert W function and takes three
 * steps; against the same 45-digit solution it stays within 1e-14 for 1e-6 <= Re <= 2000.
 *
 * Validity: the Colebrook equation is a turbulent-flow law, fitted to data for roughly
 * 4000 <= Re <= 1e8 and 0 <= eps/D <= 0.05; below Re 4000 it is an extrapolation (use
 * {@link frictionFactor} for the regime policy). The solver itself is exact for any accepted
 * input: every Re from {@link COLEBROOK_MIN_REYNOLDS} (1e-150) up; below that f would not be
 * a finite number and Re is refused with `OUT_OF_RANGE`.
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
 *   eps/D > 0.5; `OUT_OF_RANGE` for 0.1 < eps/D <= 0.5 without `allowLargeRoughness`, for
 *   Re below 1e-150, and for Re so large (above about 5e306 in a rough pipe) that the solver
 *   leaves the floating-point range.
 * @example
 * ```ts
 * colebrook(1e5, 1e-4); // 0.018513866077471648 (45-digit solution 0.0185138660774716427)
 * ```
 */
export function colebrook(
  re: number,
  relativeRoughness: number,
  options?: RoughnessOptions | null,
): number {
  checkReynolds(re);
  checkColebrookReynolds(re);
  checkRelativeRoughness(relativeRoughness, roughnessOptions(options));
  // Above Re of about 5e306 (rough pipe) the correction step overflows: refused, not NaN.
  return guardResult('colebrook', colebrookKernel(re, relativeRoughness), 'OUT_OF_RANGE');
}

/**
 * Residual of the Colebrook equation at a given f:
 * `1/sqrt(f) + 2 log10( (eps/D)/3.7 + 2.51/(Re sqrt(f)) )` (zero at the exact solution; in
 * units of 1/sqrt(f), whose values lie between about 2 and 20).
 *
 * @param re - Reynolds number
 * @param relativeRoughness - eps/D
 * @param f - a Darcy friction factor
 * @returns the residual (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for Re <= 0, a negative or non-finite eps/D, or
 *   f <= 0 (NaN and Infinity included); `NO_SOLUTION` where the residual is not a finite
 *   number (f or Re so extreme that the logarithm's argument is 0).
 * @example
 * ```ts
 * colebrookResidual(1e5, 1e-4, colebrook(1e5, 1e-4)); // about 1e-15 in magnitude
 * ```
 */
export function colebrookResidual(re: number, relativeRoughness: number, f: number): number {
  checkReynolds(re);
  guardRange('relativeRoughness', relativeRoughness, { min: 0 });
  guardRange('f', f, { min: 0, minOpen: true });
  return guardResult('colebrookResidual', residualKernel(re, relativeRoughness, f));
}

function residualKernel(re: number, relativeRoughness: number, f: number): number {
  const s = 1 / Math.sqrt(f);
  return s + 2 * Math.log10(relativeRoughness / 3.7 + (2.51 * s) / re);
}

/** What {@link colebrookSolve} reports. */
export interface ColebrookSolution {
  /** Darcy friction factor. */
  readonly f: number;
  /** Correction steps made (2; 3 at low Re, where `x1 + x2 < 3`: the method has a fixed cost). */
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
  options?: RoughnessOptions | null,
): ColebrookSolution {
  const f = colebrook(re, relativeRoughness, options);
  return {
    f,
    iterations: colebrookSteps(re, relativeRoughness),
    residual: residualKernel(re, relativeRoughness, f),
  };
}

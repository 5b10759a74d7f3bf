import { HeadflowError } from '../errors';

/** Options of {@link brent}. */
export interface BrentOptions {
  /** Absolute tolerance on x (default 1e-12 times the bracket's scale, at least 1e-300). */
  readonly xTolerance?: number;
  /** Stop when |f(x)| <= this (default 0: only the x tolerance stops). */
  readonly fTolerance?: number;
  /** Iteration cap (default 200). */
  readonly maxIterations?: number;
  /** Words for the error when the bracket does not change sign ("the pump cannot reach ..."). */
  readonly noBracketReason?: string;
}

/** Result of {@link brent}. */
export interface BrentResult {
  /** The root. */
  readonly root: number;
  /** f(root). */
  readonly residual: number;
  /** Iterations used (function evaluations less the two at the bracket ends). */
  readonly iterations: number;
  /** Function evaluations, the two at the bracket ends included. */
  readonly evaluations: number;
}

/**
 * Finds a root of `f` in `[a, b]` by Brent's method (inverse quadratic interpolation and
 * secant steps safeguarded by bisection), which never leaves the bracket and converges
 * superlinearly on smooth functions.
 *
 * Source: R. P. Brent (1973), "Algorithms for Minimization without Derivatives",
 * Prentice-Hall, chapter 4 (the zero-finding algorithm), written here from the method.
 *
 * @param f - continuous on [a, b]
 * @param a - one end of the bracket
 * @param b - the other end
 * @throws HeadflowError `INVALID_ARGUMENT` for a non-finite bracket or f value; `NO_SOLUTION`
 *   when f(a) and f(b) have the same sign (with `noBracketReason`), or when the iteration cap
 *   is reached (with the last iterate).
 * @example
 * ```ts
 * brent((x) => x * x - 2, 0, 2).root; // 1.4142135623730951
 * ```
 */
export function brent(
  f: (x: number) => number,
  a: number,
  b: number,
  options: BrentOptions = {},
): BrentResult {
  if (!Number.isFinite(a) || !Number.isFinite(b)) {
    throw new HeadflowError('INVALID_ARGUMENT', `bracket [${a}, ${b}] is not finite.`, {
      parameter: 'bracket',
      value: [a, b],
    });
  }
  const maxIterations = options.maxIterations ?? 200;
  const fTol = options.fTolerance ?? 0;
  let fa = f(a);
  let fb = f(b);
  let evaluations = 2;
  if (Number.isNaN(fa) || Number.isNaN(fb)) {
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `the function is NaN at the bracket [${a}, ${b}].`,
      {
        parameter: 'f',
      },
    );
  }
  if (fa === 0) return { root: a, residual: 0, iterations: 0, evaluations };
  if (fb === 0) return { root: b, residual: 0, iterations: 0, evaluations };
  if (fa > 0 === fb > 0) {
    const reason = options.noBracketReason ?? 'the function has the same sign at both ends';
    throw new HeadflowError(
      'NO_SOLUTION',
      `no root between ${a} and ${b}: ${reason} (f = ${fa} and ${fb}).`,
      { value: [a, b] },
    );
  }
  const scale = Math.max(Math.abs(a), Math.abs(b));
  const xTol = options.xTolerance ?? Math.max(1e-12 * scale, 1e-300);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    if (fb > 0 === fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * xTol;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0 || Math.abs(fb) <= fTol) {
      return { root: b, residual: fb, iterations: iteration - 1, evaluations };
    }
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Interpolate: secant when a == c, inverse quadratic otherwise.
      const s = fb / fa;
      let p: number;
      let qq: number;
      if (a === c) {
        p = 2 * m * s;
        qq = 1 - s;
      } else {
        const r = fa / fc;
        const t = fb / fc;
        p = s * (2 * m * r * (r - t) - (b - a) * (t - 1));
        qq = (r - 1) * (t - 1) * (s - 1);
      }
      if (p > 0) qq = -qq;
      else p = -p;
      if (2 * p < Math.min(3 * m * qq - Math.abs(tol * qq), Math.abs(e * qq))) {
        e = d;
        d = p / qq;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    evaluations++;
    if (Number.isNaN(fb)) {
      throw new HeadflowError('INVALID_ARGUMENT', `the function is NaN at x = ${b}.`, {
        parameter: 'f',
      });
    }
  }
  throw new HeadflowError(
    'NO_SOLUTION',
    `root finding did not converge in ${maxIterations} iterations (last x = ${b}, f = ${fb}).`,
    { value: b },
  );
}

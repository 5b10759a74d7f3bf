/**
 * Monotone piecewise cubic interpolation (Steffen 1990), for tables of properties and for
 * curves through catalogue points.
 *
 * @module
 */
import { argumentError, HeadflowError } from '../errors';

/**
 * A monotone piecewise cubic through tabulated points. Build it once with
 * {@link monotoneCubic}; evaluating allocates nothing.
 */
export interface MonotoneCubic {
  /** Smallest abscissa of the table (x0). */
  readonly xMin: number;
  /** Largest abscissa of the table (xn). */
  readonly xMax: number;
  /** Number of tabulated points. */
  readonly size: number;
  /** True when `x` lies in [xMin, xMax] (false for NaN). */
  covers(x: number): boolean;
  /**
   * The interpolated value at `x`.
   * @throws HeadflowError `OUT_OF_RANGE` when `x` is outside [xMin, xMax] or NaN: callers that
   *   want their own message check {@link MonotoneCubic.covers} first.
   */
  evaluate(x: number): number;
  /** The first derivative dy/dx of the interpolant at `x` (same range rule as `evaluate`). */
  derivative(x: number): number;
  /** Evaluates at every `xs[i]` into `out[i]` and returns `out` (lengths must match). */
  evaluateInto(xs: ArrayLike<number>, out: Float64Array): Float64Array;
}

function sign(v: number): number {
  return v > 0 ? 1 : v < 0 ? -1 : 0;
}

/**
 * Builds the monotone piecewise cubic Hermite interpolant of Steffen (1990) through the points
 * (xs[i], ys[i]).
 *
 * Method: on each interval `[x_i, x_i+1]` of width `h_i` and secant slope `s_i`, a cubic
 * Hermite polynomial with node slopes
 * `y'_i = (sign(s_i-1) + sign(s_i)) min(|s_i-1|, |s_i|, |p_i| / 2)`, where
 * `p_i = (s_i-1 h_i + s_i h_i-1) / (h_i-1 + h_i)` is the slope of the parabola through three
 * neighbouring points (Steffen eq. 11). At the two ends the slope of the parabola through the
 * first (last) three points is limited to `[0, 2 s]` in the direction of the end secant
 * (Steffen eqs. 26-27). With two points the interpolant is the straight line.
 *
 * Properties: passes through every point; continuous with a continuous first derivative; on
 * every interval where the data are monotone the interpolant is monotone, and it has no
 * extremum except at a tabulated point (no overshoot).
 *
 * Source: M. Steffen, "A simple method for monotonic interpolation in one dimension",
 * Astronomy and Astrophysics 239 (1990) 443-450.
 *
 * @param xs - abscissae, finite and strictly increasing, at least 2
 * @param ys - ordinates, finite, as many as `xs`
 * @throws HeadflowError `INVALID_ARGUMENT` for fewer than 2 points, arrays of different length,
 *   a non-finite value or abscissae that do not strictly increase.
 * @example
 * ```ts
 * const f = monotoneCubic([0, 1, 2], [0, 1, 4]);
 * f.evaluate(1); // 1
 * f.evaluate(1.5); // 2.25
 * ```
 */
export function monotoneCubic(xs: ArrayLike<number>, ys: ArrayLike<number>): MonotoneCubic {
  const n = xs.length;
  if (n < 2) {
    throw argumentError('INVALID_ARGUMENT', 'xs', n, 'points', 'at least 2 points');
  }
  if (ys.length !== n) {
    throw argumentError('INVALID_ARGUMENT', 'ys', ys.length, 'points', `${n} values, one per x`);
  }
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const xi = xs[i] as number;
    const yi = ys[i] as number;
    if (typeof xi !== 'number' || !Number.isFinite(xi)) {
      throw argumentError('INVALID_ARGUMENT', `xs[${i}]`, xi, undefined, 'a finite number');
    }
    if (typeof yi !== 'number' || !Number.isFinite(yi)) {
      throw argumentError('INVALID_ARGUMENT', `ys[${i}]`, yi, undefined, 'a finite number');
    }
    if (i > 0 && !(xi > (x[i - 1] as number))) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `xs[${i}]`,
        xi,
        undefined,
        `> xs[${i - 1}] = ${String(x[i - 1])} (strictly increasing)`,
      );
    }
    x[i] = xi;
    y[i] = yi;
  }
  const m = n - 1;
  const h = new Float64Array(m);
  const s = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const hi = (x[i + 1] as number) - (x[i] as number);
    h[i] = hi;
    s[i] = ((y[i + 1] as number) - (y[i] as number)) / hi;
  }
  const d = new Float64Array(n);
  if (n === 2) {
    d[0] = s[0] as number;
    d[1] = s[0] as number;
  } else {
    for (let i = 1; i < m; i++) {
      const s0 = s[i - 1] as number;
      const s1 = s[i] as number;
      const h0 = h[i - 1] as number;
      const h1 = h[i] as number;
      const p = (s0 * h1 + s1 * h0) / (h0 + h1);
      d[i] = (sign(s0) + sign(s1)) * Math.min(Math.abs(s0), Math.abs(s1), 0.5 * Math.abs(p));
    }
    d[0] = endSlope(s[0] as number, s[1] as number, h[0] as number, h[1] as number);
    d[m] = endSlope(s[m - 1] as number, s[m - 2] as number, h[m - 1] as number, h[m - 2] as number);
  }
  // Cubic on interval i in t = x - x_i: y_i + d_i t + b_i t^2 + a_i t^3.
  const a = new Float64Array(m);
  const b = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const hi = h[i] as number;
    const si = s[i] as number;
    const di = d[i] as number;
    const dj = d[i + 1] as number;
    a[i] = (di + dj - 2 * si) / (hi * hi);
    b[i] = (3 * si - 2 * di - dj) / hi;
  }
  const xMin = x[0] as number;
  const xMax = x[m] as number;

  const locate = (v: number): number => {
    if (!(v >= xMin && v <= xMax)) {
      throw new HeadflowError(
        'OUT_OF_RANGE',
        `x = ${String(v)} is outside the interpolation table [${String(xMin)}, ${String(xMax)}]; ` +
          'the interpolant never extrapolates.',
        { parameter: 'x', value: v, allowed: `${String(xMin)} to ${String(xMax)}` },
      );
    }
    let lo = 0;
    let hi = m - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >>> 1;
      if ((x[mid] as number) <= v) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  };
  const evaluate = (v: number): number => {
    const i = locate(v);
    const t = v - (x[i] as number);
    return (
      (y[i] as number) + t * ((d[i] as number) + t * ((b[i] as number) + t * (a[i] as number)))
    );
  };
  return {
    xMin,
    xMax,
    size: n,
    covers: (v: number): boolean => v >= xMin && v <= xMax,
    evaluate,
    derivative: (v: number): number => {
      const i = locate(v);
      const t = v - (x[i] as number);
      return (d[i] as number) + t * (2 * (b[i] as number) + 3 * t * (a[i] as number));
    },
    evaluateInto: (vs: ArrayLike<number>, out: Float64Array): Float64Array => {
      if (out.length !== vs.length) {
        throw argumentError('INVALID_ARGUMENT', 'out', out.length, 'elements', `${vs.length}`);
      }
      for (let k = 0; k < vs.length; k++) out[k] = evaluate(vs[k] as number);
      return out;
    },
  };
}

/** Steffen (1990) eqs. 26-27: the end slope from the parabola through three end points. */
function endSlope(sEnd: number, sNext: number, hEnd: number, hNext: number): number {
  const p = sEnd * (1 + hEnd / (hEnd + hNext)) - (sNext * hEnd) / (hEnd + hNext);
  if (p * sEnd <= 0) return 0;
  if (Math.abs(p) > 2 * Math.abs(sEnd)) return 2 * sEnd;
  return p;
}

/**
 * Least-squares polynomial fits on a scaled abscissa, solved by Householder QR so that the
 * normal equations (and their squared condition number) are never formed.
 *
 * @module
 */
import { argumentError } from '../errors';

/** Options of {@link polynomialLeastSquares}. */
export interface PolynomialFitOptions {
  /**
   * Leave out the constant term, so the polynomial passes through the origin
   * (`y = c1 x + c2 x^2 + ...`). Default false.
   */
  readonly throughOrigin?: boolean;
  /** Abscissa scale: the basis is `(x / scale)^k`. Default: the largest |x|. */
  readonly scale?: number;
}

/** A fitted polynomial and how well it fits. Evaluating allocates nothing. */
export interface PolynomialFit {
  /** Highest power. */
  readonly degree: number;
  /** Lowest power (1 when fitted through the origin, else 0). */
  readonly lowestPower: number;
  /** Abscissa scale of the basis. */
  readonly scale: number;
  /** Coefficients of `(x / scale)^k` for k = lowestPower..degree. */
  readonly coefficients: Float64Array;
  /** Root mean square of the residuals `y_i - p(x_i)`, in the unit of y. */
  readonly rms: number;
  /** Largest |residual|, in the unit of y. */
  readonly maxResidual: number;
  /** Coefficient of determination `1 - SS_res / SS_tot` (1 when the data are constant and fitted exactly). */
  readonly rSquared: number;
  /** p(x). */
  evaluate(x: number): number;
  /** dp/dx. */
  derivative(x: number): number;
}

/**
 * Fits a polynomial of a given degree to points (xs[i], ys[i]) in the least-squares sense.
 *
 * Method: the design matrix `A[i][k] = (x_i / s)^k` is reduced by Householder reflections to
 * `Q R`, and `R c = Q^T y` is solved by back substitution (G. H. Golub and C. F. Van Loan,
 * "Matrix Computations", 4th ed., 2013, section 5.3.3, written here from the method). Scaling
 * x by its largest magnitude keeps the columns of comparable size, so catalogue flows in m3/s
 * (1e-3 .. 1) do not ruin the conditioning.
 *
 * @param xs - abscissae, finite
 * @param ys - ordinates, finite, as many as xs
 * @param degree - integer >= 0 (>= 1 when fitted through the origin)
 * @throws HeadflowError `INVALID_ARGUMENT` for non-finite data, arrays of different length,
 *   a bad degree, fewer points than coefficients, or data that cannot determine the
 *   coefficients (repeated abscissae leaving the design matrix rank-deficient).
 * @example
 * ```ts
 * const fit = polynomialLeastSquares([0, 1, 2, 3], [1, 3, 9, 19], 2);
 * fit.evaluate(4); // 33 (the data lie on 1 + 2x^2 - 0x)
 * fit.rms; // ~1e-15
 * ```
 */
export function polynomialLeastSquares(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  degree: number,
  options: PolynomialFitOptions = {},
): PolynomialFit {
  const n = xs.length;
  if (ys.length !== n) {
    throw argumentError('INVALID_ARGUMENT', 'ys', ys.length, 'points', `${n} values, one per x`);
  }
  const low = options.throughOrigin === true ? 1 : 0;
  if (!Number.isInteger(degree) || degree < low || degree > 12) {
    throw argumentError('INVALID_ARGUMENT', 'degree', degree, undefined, `an integer ${low} to 12`);
  }
  const m = degree - low + 1;
  if (n < m) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'points',
      n,
      'points',
      `at least ${m} points for ${m} coefficients (degree ${degree})`,
    );
  }
  let maxAbs = 0;
  for (let i = 0; i < n; i++) {
    const x = xs[i] as number;
    const y = ys[i] as number;
    if (typeof x !== 'number' || !Number.isFinite(x)) {
      throw argumentError('INVALID_ARGUMENT', `xs[${i}]`, x, undefined, 'a finite number');
    }
    if (typeof y !== 'number' || !Number.isFinite(y)) {
      throw argumentError('INVALID_ARGUMENT', `ys[${i}]`, y, undefined, 'a finite number');
    }
    maxAbs = Math.max(maxAbs, Math.abs(x));
  }
  const scale = options.scale ?? (maxAbs > 0 ? maxAbs : 1);
  if (!Number.isFinite(scale) || scale <= 0) {
    throw argumentError('INVALID_ARGUMENT', 'scale', scale, undefined, 'a finite number > 0');
  }
  // Column-major design matrix a[k * n + i] and right-hand side b.
  const a = new Float64Array(n * m);
  const b = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const t = (xs[i] as number) / scale;
    let p = low === 1 ? t : 1;
    for (let k = 0; k < m; k++) {
      a[k * n + i] = p;
      p *= t;
    }
    b[i] = ys[i] as number;
  }
  let colNorm0 = 0;
  for (let k = 0; k < m; k++) {
    let s = 0;
    for (let i = 0; i < n; i++) s += (a[k * n + i] as number) ** 2;
    colNorm0 = Math.max(colNorm0, Math.sqrt(s));
  }
  // Householder QR, applied to b as it goes.
  const diag = new Float64Array(m);
  for (let k = 0; k < m; k++) {
    let norm = 0;
    for (let i = k; i < n; i++) norm += (a[k * n + i] as number) ** 2;
    norm = Math.sqrt(norm);
    if (!(norm > 1e-13 * colNorm0)) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'xs',
        n,
        'points',
        `at least ${m} distinct abscissae`,
        'The points cannot determine the polynomial (repeated flows?).',
      );
    }
    const akk = a[k * n + k] as number;
    const alpha = akk > 0 ? -norm : norm;
    // v = x - alpha e1, stored in place; v_k = akk - alpha.
    a[k * n + k] = akk - alpha;
    let vv = 0;
    for (let i = k; i < n; i++) vv += (a[k * n + i] as number) ** 2;
    for (let j = k + 1; j < m; j++) {
      let dot = 0;
      for (let i = k; i < n; i++) dot += (a[k * n + i] as number) * (a[j * n + i] as number);
      const f = (2 * dot) / vv;
      for (let i = k; i < n; i++)
        a[j * n + i] = (a[j * n + i] as number) - f * (a[k * n + i] as number);
    }
    let dotb = 0;
    for (let i = k; i < n; i++) dotb += (a[k * n + i] as number) * (b[i] as number);
    const fb = (2 * dotb) / vv;
    for (let i = k; i < n; i++) b[i] = (b[i] as number) - fb * (a[k * n + i] as number);
    diag[k] = alpha;
  }
  const c = new Float64Array(m);
  for (let k = m - 1; k >= 0; k--) {
    let s = b[k] as number;
    for (let j = k + 1; j < m; j++) s -= (a[j * n + k] as number) * (c[j] as number);
    c[k] = s / (diag[k] as number);
  }
  const evaluate = (x: number): number => {
    const t = x / scale;
    let acc = 0;
    for (let k = m - 1; k >= 0; k--) acc = acc * t + (c[k] as number);
    return low === 1 ? acc * t : acc;
  };
  const derivative = (x: number): number => {
    const t = x / scale;
    let acc = 0;
    if (low === 1) {
      // d/dt of sum c_k t^(k+1) = sum (k+1) c_k t^k
      for (let k = m - 1; k >= 0; k--) acc = acc * t + (k + 1) * (c[k] as number);
    } else {
      // d/dt of sum c_k t^k = sum k c_k t^(k-1)
      for (let k = m - 1; k >= 1; k--) acc = acc * t + k * (c[k] as number);
    }
    return acc / scale;
  };
  let ssRes = 0;
  let maxRes = 0;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += ys[i] as number;
  mean /= n;
  let ssTot = 0;
  for (let i = 0; i < n; i++) {
    const y = ys[i] as number;
    const r = y - evaluate(xs[i] as number);
    ssRes += r * r;
    maxRes = Math.max(maxRes, Math.abs(r));
    ssTot += (y - mean) ** 2;
  }
  const rSquared = ssTot > 0 ? 1 - ssRes / ssTot : ssRes === 0 ? 1 : 0;
  return {
    degree,
    lowestPower: low,
    scale,
    coefficients: c,
    rms: Math.sqrt(ssRes / n),
    maxResidual: maxRes,
    rSquared,
    evaluate,
    derivative,
  };
}

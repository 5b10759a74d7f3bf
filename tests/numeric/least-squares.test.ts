import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { polynomialLeastSquares } from '../../src/numeric/least-squares';
import { expectAbsolute, expectHeadflowError, expectRelative } from '../helpers/expect';

describe('polynomialLeastSquares', () => {
  it('rejects impossible input', () => {
    expectHeadflowError(() => polynomialLeastSquares([0, 1], [0, 1, 2], 1), 'INVALID_ARGUMENT');
    expectHeadflowError(() => polynomialLeastSquares([0, 1], [0, 1], 2), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => polynomialLeastSquares([0, 1, 2], [0, 1, 2], 1.5),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => polynomialLeastSquares([0, 1, 2], [0, 1, 2], 0, { throughOrigin: true }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => polynomialLeastSquares([0, Number.NaN, 2], [0, 1, 2], 1),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => polynomialLeastSquares([0, 1, 2], [0, Infinity, 2], 1),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => polynomialLeastSquares([0, 1, 2], [0, 1, 2], 1, { scale: 0 }),
      'INVALID_ARGUMENT',
    );
    // repeated abscissae cannot fix a quadratic
    expectHeadflowError(
      () => polynomialLeastSquares([1, 1, 1, 2], [1, 2, 3, 4], 2),
      'INVALID_ARGUMENT',
    );
  });
  it('reproduces the doc example (data on 1 + 2x^2)', () => {
    const fit = polynomialLeastSquares([0, 1, 2, 3], [1, 3, 9, 19], 2);
    expectRelative(fit.evaluate(4), 33, 1e-13);
    expectAbsolute(fit.rms, 0, 1e-13);
    expectRelative(fit.rSquared, 1, 1e-14);
    expectRelative(fit.derivative(2), 8, 1e-13);
  });
  it('a constant data set fitted exactly has R^2 = 1', () => {
    const fit = polynomialLeastSquares([0, 1, 2], [5, 5, 5], 0);
    expect(fit.rSquared).toBe(1);
    expect(fit.derivative(1)).toBe(0);
  });
  it('straight-line regression matches the closed-form slope and intercept', () => {
    // Closed form of simple linear regression (any statistics text).
    const xs = [1, 2, 3, 4, 5];
    const ys = [2.1, 3.9, 6.2, 7.8, 10.1];
    const n = xs.length;
    const mx = xs.reduce((a, b) => a + b) / n;
    const my = ys.reduce((a, b) => a + b) / n;
    let sxy = 0;
    let sxx = 0;
    for (let i = 0; i < n; i++) {
      sxy += ((xs[i] as number) - mx) * ((ys[i] as number) - my);
      sxx += ((xs[i] as number) - mx) ** 2;
    }
    const slope = sxy / sxx;
    const fit = polynomialLeastSquares(xs, ys, 1);
    expectRelative(fit.derivative(3), slope, 1e-13);
    expectRelative(fit.evaluate(0), my - slope * mx, 1e-12);
    let ss = 0;
    let max = 0;
    for (let i = 0; i < n; i++) {
      const r = (ys[i] as number) - (my + slope * ((xs[i] as number) - mx));
      ss += r * r;
      max = Math.max(max, Math.abs(r));
    }
    expectRelative(fit.rms, Math.sqrt(ss / n), 1e-10);
    expectRelative(fit.maxResidual, max, 1e-10);
  });
  it('through the origin: the fit of y = x (1 - x) has no constant term', () => {
    const xs = [0.25, 0.5, 0.75, 1];
    const fit = polynomialLeastSquares(
      xs,
      xs.map((x) => x * (1 - x)),
      2,
      { throughOrigin: true },
    );
    expect(fit.lowestPower).toBe(1);
    expect(fit.evaluate(0)).toBe(0);
    expectRelative(fit.derivative(0), 1, 1e-13);
    expectRelative(fit.evaluate(0.6), 0.24, 1e-13);
  });
  it('recovers any cubic from exact samples on a badly scaled axis (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 4, maxLength: 4 }),
        (c) => {
          // x in m3/s-like magnitudes (1e-3 .. 5e-2): conditioning kept sane by the scaling.
          const xs = Array.from({ length: 9 }, (_, i) => 1e-3 + (i * 5e-2) / 8);
          const p = (x: number): number => {
            const t = x / 0.05;
            return (
              (c[0] as number) +
              t * ((c[1] as number) + t * ((c[2] as number) + t * (c[3] as number)))
            );
          };
          const fit = polynomialLeastSquares(xs, xs.map(p), 3);
          for (const x of xs) expectAbsolute(fit.evaluate(x), p(x), 1e-11);
        },
      ),
    );
  });
});

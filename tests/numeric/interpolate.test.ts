import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { monotoneCubic } from '../../src/numeric/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

describe('monotoneCubic: special values and bad input', () => {
  it('refuses too few points, length mismatch, non-finite and non-increasing x', () => {
    expectHeadflowError(() => monotoneCubic([1], [1]), 'INVALID_ARGUMENT');
    expectHeadflowError(() => monotoneCubic([1, 2], [1]), 'INVALID_ARGUMENT');
    expectHeadflowError(() => monotoneCubic([1, Number.NaN], [1, 2]), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => monotoneCubic([1, 2], [1, Number.POSITIVE_INFINITY]),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => monotoneCubic([1, 1], [1, 2]), 'INVALID_ARGUMENT');
    expectHeadflowError(() => monotoneCubic([2, 1, 3], [1, 2, 3]), 'INVALID_ARGUMENT');
  });
  it('never extrapolates: outside [x0, xn] and NaN are OUT_OF_RANGE; covers() says so first', () => {
    const f = monotoneCubic([0, 1, 2], [0, 1, 4]);
    expect(f.xMin).toBe(0);
    expect(f.xMax).toBe(2);
    expect(f.size).toBe(3);
    expect(f.covers(2)).toBe(true);
    expect(f.covers(2.0001)).toBe(false);
    expect(f.covers(Number.NaN)).toBe(false);
    expectHeadflowError(() => f.evaluate(-1e-9), 'OUT_OF_RANGE');
    expectHeadflowError(() => f.evaluate(Number.NaN), 'OUT_OF_RANGE');
    expectHeadflowError(() => f.derivative(3), 'OUT_OF_RANGE');
    expectHeadflowError(() => f.evaluateInto([0, 1], new Float64Array(3)), 'INVALID_ARGUMENT');
  });
});

describe('monotoneCubic: values', () => {
  it('the doc example: through (0,0), (1,1), (2,4)', () => {
    const f = monotoneCubic([0, 1, 2], [0, 1, 4]);
    expect(f.evaluate(1)).toBe(1);
    expect(f.evaluate(1.5)).toBe(2.25);
    expect(f.evaluate(2)).toBe(4);
    expect(f.evaluateInto([0, 1.5, 2], new Float64Array(3))).toEqual(Float64Array.of(0, 2.25, 4));
  });
  it('two points give the straight line', () => {
    const f = monotoneCubic([1, 3], [10, 20]);
    expect(f.evaluate(2)).toBe(15);
    expect(f.derivative(1.2)).toBe(5);
  });
  it('reproduces a straight line exactly through many uneven points', () => {
    const xs = [0, 0.3, 1, 2.5, 2.6, 7];
    const f = monotoneCubic(
      xs,
      xs.map((x) => 3 * x - 2),
    );
    for (const x of [0.1, 0.7, 2.55, 5, 7])
      expectRelative(f.evaluate(x), 3 * x - 2, 1e-14, `x=${x}`);
  });
  it('flat data stay flat (no overshoot at a plateau next to a step)', () => {
    const f = monotoneCubic([0, 1, 2, 3], [0, 0, 1, 1]);
    for (let x = 0; x <= 1; x += 0.05) expect(f.evaluate(x)).toBe(0);
    for (let x = 2; x <= 3; x += 0.05) expect(f.evaluate(x)).toBe(1);
  });
});

describe('monotoneCubic: laws (fast-check)', () => {
  const table = fc
    .array(
      fc.tuple(
        fc.double({ min: 0.01, max: 10, noNaN: true }),
        // subnormal increments lose relative precision in any arithmetic: keep them out
        fc.double({ min: 0, max: 100, noNaN: true }).map((v) => (v < 1e-300 ? 0 : v)),
      ),
      {
        minLength: 2,
        maxLength: 12,
      },
    )
    .map((steps) => {
      let x = 0;
      let y = 0;
      const xs = [0];
      const ys = [0];
      for (const [dx, dy] of steps) {
        x += dx;
        y += dy;
        xs.push(x);
        ys.push(y);
      }
      return { xs, ys };
    });
  it('passes through every point and is monotone (non-decreasing data)', () => {
    fc.assert(
      fc.property(
        table,
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 2, maxLength: 20 }),
        ({ xs, ys }, us) => {
          const f = monotoneCubic(xs, ys);
          xs.forEach((x, i) => {
            expectRelative(f.evaluate(x), ys[i] ?? 0, 1e-12, `node ${i}`);
          });
          const pts = us.map((u) => f.xMin + u * (f.xMax - f.xMin)).sort((a, b) => a - b);
          for (let i = 1; i < pts.length; i++) {
            const a = f.evaluate(pts[i - 1] ?? 0);
            const b = f.evaluate(pts[i] ?? 0);
            expect(b).toBeGreaterThanOrEqual(a - 1e-9 * (1 + Math.abs(a)));
          }
        },
      ),
    );
  });
  it('stays within the values of the neighbouring points (no overshoot)', () => {
    fc.assert(
      fc.property(table, fc.double({ min: 0, max: 1, noNaN: true }), ({ xs, ys }, u) => {
        const f = monotoneCubic(xs, ys);
        const x = f.xMin + u * (f.xMax - f.xMin);
        let i = 0;
        while (i < xs.length - 2 && (xs[i + 1] ?? 0) < x) i++;
        const v = f.evaluate(x);
        const lo = Math.min(ys[i] ?? 0, ys[i + 1] ?? 0);
        const hi = Math.max(ys[i] ?? 0, ys[i + 1] ?? 0);
        expect(v).toBeGreaterThanOrEqual(lo - 1e-9 * (1 + hi));
        expect(v).toBeLessThanOrEqual(hi + 1e-9 * (1 + hi));
      }),
    );
  });
  it('has a continuous first derivative at the interior points', () => {
    fc.assert(
      fc.property(table, ({ xs, ys }) => {
        const f = monotoneCubic(xs, ys);
        // largest secant slope: scale of the derivative and of its change over eps
        let sMax = 0;
        for (let i = 1; i < xs.length; i++) {
          const dx = (xs[i] ?? 0) - (xs[i - 1] ?? 0);
          sMax = Math.max(sMax, Math.abs(((ys[i] ?? 0) - (ys[i - 1] ?? 0)) / dx));
        }
        for (let i = 1; i < xs.length - 1; i++) {
          const x = xs[i] ?? 0;
          const eps = 1e-10 * Math.max(1, Math.abs(x));
          const left = f.derivative(x - eps);
          const right = f.derivative(x);
          expect(Math.abs(left - right)).toBeLessThanOrEqual(1e-4 * (1 + sMax));
        }
      }),
    );
  });
});

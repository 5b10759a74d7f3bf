import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { brent } from '../../src/numeric/brent';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

describe('brent', () => {
  it('rejects non-finite brackets and NaN functions', () => {
    expectHeadflowError(() => brent((x) => x, Number.NaN, 1), 'INVALID_ARGUMENT');
    expectHeadflowError(() => brent(() => Number.NaN, 0, 1), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => brent((x) => (x > 0.3 ? Number.NaN : x - 0.5), 0, 1),
      'INVALID_ARGUMENT',
    );
  });
  it('says why when the bracket does not change sign', () => {
    const err = expectHeadflowError(
      () => brent((x) => x * x + 1, -1, 1, { noBracketReason: 'the curve never reaches zero' }),
      'NO_SOLUTION',
    );
    expect(err.message).toContain('the curve never reaches zero');
    expect(
      expectHeadflowError(() => brent((x) => x * x + 1, -1, 1), 'NO_SOLUTION').message,
    ).toContain('same sign');
  });
  it('reports the last iterate when the cap is reached', () => {
    const err = expectHeadflowError(
      () => brent((x) => x ** 3 - 2, 0, 2, { maxIterations: 2 }),
      'NO_SOLUTION',
    );
    expect(err.message).toContain('did not converge in 2 iterations');
  });
  it('returns an end point that is a root', () => {
    expect(brent((x) => x, 0, 1)).toEqual({ root: 0, residual: 0, iterations: 0, evaluations: 2 });
    expect(brent((x) => x - 1, 0, 1).root).toBe(1);
  });
  it('solves x^2 = 2 to machine precision in few iterations', () => {
    const r = brent((x) => x * x - 2, 0, 2, { xTolerance: 0 });
    expectRelative(r.root, Math.SQRT2, 4e-16);
    // default tolerance: 1e-12 of the bracket's scale
    expect(Math.abs(brent((x) => x * x - 2, 0, 2).root - Math.SQRT2)).toBeLessThanOrEqual(2e-12);
    expect(r.iterations).toBeLessThanOrEqual(10);
    expect(r.evaluations).toBe(r.iterations + 2);
  });
  it('stops early on the f tolerance', () => {
    const r = brent((x) => x - 0.3, 0, 1, { fTolerance: 0.5 });
    expect(r.iterations).toBe(0);
  });
  it('finds the root of monotone cubics anywhere in the bracket (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), (root) => {
        const r = brent((x) => (x - root) ** 3 + (x - root), -101, 103);
        expect(Math.abs(r.root - root)).toBeLessThanOrEqual(1e-9);
        expect(r.iterations).toBeLessThanOrEqual(60);
      }),
    );
  });
});

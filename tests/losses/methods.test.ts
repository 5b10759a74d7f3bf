import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { threeK, twoK } from '../../src/losses';
import { type Length, q } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const inch = q(1, 'in');

describe('twoK (Hooper 1981)', () => {
  it('special values: zero constants give zero, huge Re leaves the turbulent term', () => {
    expect(twoK(0, 0, 1e5, inch)).toBe(0);
    expect(twoK(800, 0.25, Number.MAX_VALUE, q(4, 'in'))).toBe(0.25 * 1.25);
    // 1 in pipe: the size term doubles K-infinity.
    expect(twoK(0, 0.4, 1, inch)).toBe(0.8);
  });
  it('rejects impossible input with INVALID_ARGUMENT naming the parameter', () => {
    expect(expectHeadflowError(() => twoK(800, 0.25, 0, inch), 'INVALID_ARGUMENT').parameter).toBe(
      're',
    );
    expectHeadflowError(() => twoK(800, 0.25, -5, inch), 'INVALID_ARGUMENT');
    expectHeadflowError(() => twoK(800, 0.25, Number.NaN, inch), 'INVALID_ARGUMENT');
    expectHeadflowError(() => twoK(800, 0.25, Number.POSITIVE_INFINITY, inch), 'INVALID_ARGUMENT');
    const e = expectHeadflowError(() => twoK(800, 0.25, 1e5, q(0, 'm')), 'INVALID_ARGUMENT');
    expect(e.parameter).toBe('diameter');
    expect(e.message).toContain('diameter = 0 m');
    expect(expectHeadflowError(() => twoK(-1, 0.25, 1e5, inch), 'INVALID_ARGUMENT').parameter).toBe(
      'k1',
    );
    expect(
      expectHeadflowError(() => twoK(800, Number.NaN, 1e5, inch), 'INVALID_ARGUMENT').parameter,
    ).toBe('kInf');
  });
  it('matches its equation (doc example)', () => {
    expectRelative(twoK(800, 0.25, 1e5, q(4, 'in')), 0.008 + 0.25 * 1.25, 1e-15);
  });
  it('falls with Re and with size (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1e8, noNaN: true }),
        fc.double({ min: 1e-3, max: 2, noNaN: true }),
        (re, d) => {
          const k = twoK(800, 0.25, re, d as Length);
          expect(twoK(800, 0.25, re * 2, d as Length)).toBeLessThan(k);
          expect(twoK(800, 0.25, re, (d * 2) as Length)).toBeLessThan(k);
        },
      ),
    );
  });
});

describe('threeK (Darby 1999/2001)', () => {
  it('special values', () => {
    expect(threeK(0, 0, 0, 1e5, inch)).toBe(0);
    expect(threeK(800, 0.14, 0, Number.MAX_VALUE, inch)).toBe(0.14);
    // 1 in: D^0.3 = 1, so K = K1/Re + Ki (1 + Kd).
    expect(threeK(0, 0.14, 4, 1, inch)).toBe(0.7000000000000001);
  });
  it('rejects impossible input', () => {
    expectHeadflowError(() => threeK(800, 0.14, 4, 0, inch), 'INVALID_ARGUMENT');
    expectHeadflowError(() => threeK(800, 0.14, 4, 1e5, q(-1, 'mm')), 'INVALID_ARGUMENT');
    expect(
      expectHeadflowError(() => threeK(800, 0.14, -4, 1e5, inch), 'INVALID_ARGUMENT').parameter,
    ).toBe('kd');
  });
  it('doc example: standard threaded elbow, 1 in, Re 1e5', () => {
    expectRelative(threeK(800, 0.14, 4.0, 1e5, inch), 0.708, 1e-14);
  });
  it('size term scales as D^-0.3 (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), (dIn) => {
        const k = threeK(0, 1, 4, 1, q(dIn, 'in'));
        expectRelative(k - 1, 4 / dIn ** 0.3, 1e-12, `D = ${dIn} in`);
      }),
    );
  });
});

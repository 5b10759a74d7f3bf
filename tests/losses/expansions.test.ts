import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  equivalentLength,
  gradualContractionK,
  gradualExpansionK,
  kFromEquivalentLength,
  referK,
  suddenContractionK,
  suddenExpansionK,
} from '../../src/losses';
import { type Length, q } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const mm = (x: number): Length => q(x, 'mm');
const pair = fc
  .tuple(
    fc.double({ min: 1e-3, max: 2, noNaN: true }),
    fc.double({ min: 1e-3, max: 2, noNaN: true }),
  )
  .map(([a, b]) => [Math.min(a, b) as Length, Math.max(a, b) as Length] as const);

describe('suddenExpansionK (Borda-Carnot)', () => {
  it('special values: equal pipes lose nothing; an infinite tank loses the velocity head', () => {
    expect(suddenExpansionK(mm(50), mm(50))).toBe(0);
    expectRelative(suddenExpansionK(mm(1), q(1e6, 'm')), 1, 1e-15);
  });
  it('rejects bad diameters', () => {
    expect(
      expectHeadflowError(() => suddenExpansionK(mm(0), mm(50)), 'INVALID_ARGUMENT').parameter,
    ).toBe('d1');
    expectHeadflowError(() => suddenExpansionK(mm(50), mm(-1)), 'INVALID_ARGUMENT');
    const e = expectHeadflowError(() => suddenExpansionK(mm(100), mm(50)), 'INVALID_ARGUMENT');
    expect(e.message).toContain('suddenContractionK');
  });
  it('doc example', () => {
    expect(suddenExpansionK(mm(50), mm(100))).toBe(0.5625);
  });
  it('equals the momentum-balance closed form (V1 - V2)^2 / V1^2 at one flow (fast-check)', () => {
    fc.assert(
      fc.property(pair, ([d1, d2]) => {
        const a1 = (Math.PI * d1 * d1) / 4;
        const a2 = (Math.PI * d2 * d2) / 4;
        const v1 = 1 / a1;
        const v2 = 1 / a2;
        const closed = ((v1 - v2) * (v1 - v2)) / (v1 * v1);
        expect(Math.abs(suddenExpansionK(d1, d2) - closed)).toBeLessThan(4e-15);
      }),
    );
  });
});

describe('gradual expansions and contractions (Crane TP-410 formulas 1-4)', () => {
  it('reject bad angles and reversed diameters', () => {
    expectHeadflowError(() => gradualExpansionK(mm(50), mm(100), 0), 'INVALID_ARGUMENT');
    expectHeadflowError(() => gradualExpansionK(mm(50), mm(100), 181), 'INVALID_ARGUMENT');
    expectHeadflowError(() => gradualExpansionK(mm(50), mm(100), Number.NaN), 'INVALID_ARGUMENT');
    expectHeadflowError(() => gradualExpansionK(mm(100), mm(50), 20), 'INVALID_ARGUMENT');
    expectHeadflowError(() => gradualContractionK(mm(50), mm(100), 20), 'INVALID_ARGUMENT');
    expectHeadflowError(() => gradualContractionK(mm(100), mm(50), -5), 'INVALID_ARGUMENT');
    expect(
      expectHeadflowError(() => suddenContractionK(mm(50), mm(100)), 'INVALID_ARGUMENT').parameter,
    ).toBe('d2');
  });
  it('doc examples', () => {
    expectRelative(gradualExpansionK(mm(50), mm(100), 20), 0.25396, 1e-4);
    expectRelative(gradualContractionK(mm(100), mm(50), 30), 0.15529, 1e-4);
    expect(suddenContractionK(mm(100), mm(50))).toBe(0.375);
  });
  it('180 degrees is the sudden change; the branches meet near 45 degrees', () => {
    fc.assert(
      fc.property(pair, ([small, large]) => {
        expect(gradualExpansionK(small, large, 180)).toBe(suddenExpansionK(small, large));
        expectRelative(
          gradualContractionK(large, small, 180),
          suddenContractionK(large, small),
          1e-15,
        );
        const e45 = gradualExpansionK(small, large, 45);
        const e46 = gradualExpansionK(small, large, 45.000001);
        expect(Math.abs(e45 - e46)).toBeLessThanOrEqual(0.006 * e46 + 1e-15);
        const c45 = gradualContractionK(large, small, 45);
        const c46 = gradualContractionK(large, small, 45.000001);
        expect(Math.abs(c45 - c46)).toBeLessThanOrEqual(0.011 * c46 + 1e-15);
      }),
    );
  });
  it('K grows with the cone angle up to 45 degrees (fast-check)', () => {
    fc.assert(
      fc.property(pair, fc.double({ min: 1, max: 44, noNaN: true }), ([s, l], angle) => {
        expect(gradualExpansionK(s, l, angle + 1)).toBeGreaterThanOrEqual(
          gradualExpansionK(s, l, angle),
        );
        expect(gradualContractionK(l, s, angle + 1)).toBeGreaterThanOrEqual(
          gradualContractionK(l, s, angle),
        );
      }),
    );
  });
});

describe('referK and equivalent length', () => {
  it('reject bad input', () => {
    expectHeadflowError(() => referK(Number.NaN, mm(50), mm(100)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => referK(1, mm(0), mm(100)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => equivalentLength(-1, 0.02, mm(100)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => equivalentLength(1, 0, mm(100)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => kFromEquivalentLength(q(-1, 'm'), 0.02, mm(100)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => kFromEquivalentLength(q(1, 'm'), 0.02, mm(0)), 'INVALID_ARGUMENT');
  });
  it('doc examples', () => {
    expect(referK(0.5625, mm(50), mm(100))).toBe(9);
    expectRelative(equivalentLength(0.75, 0.02, mm(100)), 3.75, 1e-15);
    expectRelative(kFromEquivalentLength(q(3.75, 'm'), 0.02, mm(100)), 0.75, 1e-15);
  });
  it('referK keeps the head loss at one flow and round trips (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e4, noNaN: true }), pair, (k, [a, b]) => {
        const kb = referK(k, a, b);
        // K_a V_a^2 = K_b V_b^2 with V ~ 1/D^2 at one flow.
        expectRelative(kb / b ** 4, k / a ** 4, 1e-14);
        expectRelative(referK(kb, b, a), k, 1e-14);
      }),
    );
  });
  it('equivalent length round trips (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 1e4, noNaN: true }),
        fc.double({ min: 0.005, max: 0.1, noNaN: true }),
        fc.double({ min: 1e-3, max: 3, noNaN: true }),
        (k, f, d) => {
          expectRelative(
            kFromEquivalentLength(equivalentLength(k, f, d as Length), f, d as Length),
            k,
            1e-15,
          );
        },
      ),
    );
  });
});

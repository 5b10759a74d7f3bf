import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { curveLoss, ratedLoss } from '../../src/losses';
import { type Flow, type Pressure, q, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const points = [
  { flow: q(10, 'm3/h'), pressureDrop: q(4, 'kPa') },
  { flow: q(20, 'm3/h'), pressureDrop: q(15, 'kPa') },
  { flow: q(30, 'm3/h'), pressureDrop: q(33, 'kPa') },
];

describe('ratedLoss', () => {
  it('rejects bad rated points and inputs', () => {
    expectHeadflowError(
      () => ratedLoss({ pressureDrop: q(1, 'bar'), flow: q(0, 'm3/h') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => ratedLoss({ pressureDrop: q(-1, 'bar'), flow: q(1, 'm3/h') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => ratedLoss({ pressureDrop: Number.NaN as Pressure, flow: q(1, 'm3/h') }),
      'INVALID_ARGUMENT',
    );
    const r = ratedLoss({ pressureDrop: q(1, 'bar'), flow: q(1, 'm3/h') });
    expectHeadflowError(() => r.pressureDrop(Number.NaN as Flow), 'INVALID_ARGUMENT');
    expectHeadflowError(() => r.headLoss(q(1, 'm3/h'), q(0, 'kg/m3')), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => r.headLoss(q(1, 'm3/h'), q(1000, 'kg/m3'), q(0, 'm/s2')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => r.pressureDropInto([1], new Float64Array(2)), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => r.pressureDropInto([Number.NaN], new Float64Array(1)),
      'INVALID_ARGUMENT',
    );
  });
  it('zero flow, zero drop; doc example; head at 1000 kg/m3', () => {
    const s = ratedLoss({ pressureDrop: q(0.2, 'bar'), flow: q(50, 'm3/h') });
    expect(s.pressureDrop(q(0, 'm3/h'))).toBe(0);
    expectRelative(to(s.pressureDrop(q(25, 'm3/h')), 'bar'), 0.05, 1e-14);
    expectRelative(s.headLoss(q(50, 'm3/h'), q(1000, 'kg/m3')), 20000 / (1000 * 9.80665), 1e-14);
    expect(
      ratedLoss({ pressureDrop: q(0, 'bar'), flow: q(1, 'm3/h') }).pressureDrop(q(5, 'm3/h')),
    ).toBe(0);
  });
  it('scales as Q|Q| and is odd in Q (fast-check)', () => {
    const s = ratedLoss({ pressureDrop: q(30, 'kPa'), flow: q(0.01, 'm3/s') });
    fc.assert(
      fc.property(fc.double({ min: -1, max: 1, noNaN: true }), (x) => {
        const dp = s.pressureDrop(x as Flow);
        // Above 1e-150 m3/s the result is a normal number and keeps full relative precision.
        if (Math.abs(x) > 1e-150) expectRelative(dp, 30000 * x * Math.abs(x) * 1e4, 1e-14);
        expect(s.pressureDrop(-x as Flow) + dp).toBe(0);
      }),
    );
  });
});

describe('curveLoss', () => {
  it('rejects bad curves', () => {
    expectHeadflowError(() => curveLoss([]), 'INVALID_ARGUMENT');
    expectHeadflowError(() => curveLoss([points[0] as never]), 'INVALID_ARGUMENT');
    expectHeadflowError(() => curveLoss(null as never), 'INVALID_ARGUMENT');
    const p = (f: number, dp: number) => ({ flow: f as Flow, pressureDrop: dp as Pressure });
    expect(
      expectHeadflowError(() => curveLoss([p(1, 1), p(1, 2)]), 'INVALID_ARGUMENT').parameter,
    ).toBe('points[1].flow');
    expectHeadflowError(() => curveLoss([p(1, 2), p(2, 1)]), 'INVALID_ARGUMENT');
    expectHeadflowError(() => curveLoss([p(-1, 0), p(2, 1)]), 'INVALID_ARGUMENT');
    expectHeadflowError(() => curveLoss([p(0, 1), p(2, 1)]), 'INVALID_ARGUMENT');
    expectHeadflowError(() => curveLoss([p(1, Number.NaN), p(2, 1)]), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => curveLoss([p(1, 1), p(Number.POSITIVE_INFINITY, 1)]),
      'INVALID_ARGUMENT',
    );
  });
  it('passes through its points and (0, 0); doc example; extrapolates by Q^2 and says so', () => {
    const c = curveLoss(points);
    expect(c.pressureDrop(q(0, 'm3/h'))).toBe(0);
    for (const pt of points) expectRelative(c.pressureDrop(pt.flow), pt.pressureDrop, 1e-12);
    expectRelative(to(c.pressureDrop(q(60, 'm3/h')), 'kPa'), 132, 1e-12);
    expect(c.covers(q(30, 'm3/h'))).toBe(true);
    expect(c.covers(q(-30, 'm3/h'))).toBe(true);
    expect(c.covers(q(31, 'm3/h'))).toBe(false);
    expectRelative(c.lastFlow, q(30, 'm3/h'), 1e-15);
    const withOrigin = curveLoss([{ flow: q(0, 'm3/h'), pressureDrop: q(0, 'kPa') }, ...points]);
    expectRelative(withOrigin.pressureDrop(q(15, 'm3/h')), c.pressureDrop(q(15, 'm3/h')), 1e-12);
  });
  it('is monotone, odd, and continuous at the last point (fast-check)', () => {
    const c = curveLoss(points);
    const last = q(30, 'm3/h');
    expectRelative(c.pressureDrop((last * (1 + 1e-12)) as Flow), c.pressureDrop(last), 1e-9);
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        (a, b) => {
          const [lo, hi] = a < b ? [a, b] : [b, a];
          expect(c.pressureDrop(hi as Flow)).toBeGreaterThanOrEqual(c.pressureDrop(lo as Flow));
          expect(c.pressureDrop(-a as Flow) + c.pressureDrop(a as Flow)).toBe(0);
        },
      ),
    );
    const out = c.pressureDropInto([0, last], new Float64Array(2));
    expectRelative(out[1] ?? 0, 33000, 1e-12);
    expectRelative(c.headLoss(last, q(1000, 'kg/m3')), 33000 / 9806.65, 1e-12);
  });
});

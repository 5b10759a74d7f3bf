import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { operatingPoint, pumpCurve, pumpsInParallel, pumpsInSeries } from '../../src/pumps/index';
import { type Flow, type Length, q, to } from '../../src/units';
import { expectAbsolute, expectHeadflowError, expectRelative } from '../helpers/expect';
import { EXACT_FITS, PUMP_A, quadraticPoints, quadraticPump, quadraticSystem } from './fixtures';

const pump = quadraticPump();
const small = pumpCurve({
  speed: q(1750, 'rpm'),
  points: quadraticPoints({ h0: 30, a: 0.002, b: 0.02, c: 0.00015, qMax: 110 }),
  fit: EXACT_FITS,
});

describe('pumpsInParallel', () => {
  it('rejects an empty list and pumps with no common head range', () => {
    expectHeadflowError(() => pumpsInParallel([]), 'INVALID_ARGUMENT');
    const low = pumpCurve({
      speed: q(1750, 'rpm'),
      points: quadraticPoints({ h0: 7, a: 0.0001, b: 0.015, c: 0.000075, qMax: 180 }).slice(1),
      fit: EXACT_FITS,
    });
    // low's data start at 6.9 m, below the 7.6 m where the other pump's data end
    expectHeadflowError(() => pumpsInParallel([pump, low]), 'NO_SOLUTION');
  });
  it('two identical pumps give twice the flow of one at any head (fast-check)', () => {
    const two = pumpsInParallel([pump, pump]);
    expectRelative(to(two.shutoffHead ?? q(0, 'm'), 'm'), 40, 1e-12);
    expectRelative(two.flowRange.max, 2 * pump.flowRange.max, 1e-12);
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), (u) => {
        const q1 = (u * pump.flowRange.max) as Flow;
        expectRelative(two.head((2 * q1) as Flow), pump.head(q1), 1e-12);
        const s = two.shares((2 * q1) as Flow);
        // Each share is a flow found from a head; near shut-off dH/dQ tends to zero and that
        // inversion is ill-conditioned, so the flows are compared to 1e-10 of the curve's
        // flow range rather than of the (possibly tiny) flow itself.
        const scale = pump.flowRange.max;
        expectAbsolute(s[0]?.flow ?? 0, q1, 1e-10 * scale);
        expectAbsolute(s[1]?.flow ?? 0, q1, 1e-10 * scale);
        // efficiency of the pair equals each pump's
        expectRelative(two.efficiency((2 * q1) as Flow), pump.efficiency(q1), 1e-9);
      }),
    );
  });
  it('operating point of identical pumps: closed form, each at half the flow', () => {
    // 40 - 0.001 (Q/2)^2 = 10 + 0.002 Q^2  ->  Q = sqrt(30 / 0.00225) m3/h
    const two = pumpsInParallel([pump, pump]);
    const op = operatingPoint(two, quadraticSystem(10, 0.002), { density: q(1000, 'kg/m3') });
    const Q = Math.sqrt(30 / 0.00225);
    expectRelative(to(op.flow, 'm3/h'), Q, 1e-9);
    expectRelative(to(op.shares[0]?.flow ?? q(0, 'm3/h'), 'm3/h'), Q / 2, 1e-9);
    expectRelative(
      op.shaftPower ?? 0,
      2 * pump.shaftPower((op.flow / 2) as Flow, q(1000, 'kg/m3')),
      1e-9,
    );
    expectRelative(op.percentOfBep ?? 0, (100 * Q) / 200, 1e-6);
    expect(op.inPreferredRegion).toBeUndefined();
    expect(op.shares[0]?.percentOfBep).toBeCloseTo((100 * Q) / 2 / 100, 5);
    expectRelative(to(op.npshRequired ?? q(0, 'm'), 'm'), 1 + 0.0002 * (Q / 2) ** 2, 1e-8);
    const bep = two.bestEfficiencyPoint;
    expectRelative(to(bep?.flow ?? q(0, 'm3/h'), 'm3/h'), 200, 1e-6);
  });
  it('different pumps: the smaller one is shut out above its shut-off head', () => {
    const pair = pumpsInParallel([pump, small]);
    // at 35 m the small pump (30 m shut-off) gives nothing
    const qAt35 = Math.sqrt((40 - 35) / 0.001);
    const s = pair.shares(q(qAt35, 'm3/h'));
    expect(s[1]?.flow).toBe(0);
    expectRelative(to(pair.head(q(qAt35, 'm3/h')), 'm'), 35, 1e-10);
    // at 20 m both run: flows add
    const q1 = Math.sqrt(20 / 0.001);
    const q2 = Math.sqrt(10 / 0.002);
    expectRelative(to(pair.head(q(q1 + q2, 'm3/h')), 'm'), 20, 1e-10);
    const op = operatingPoint(pair, quadraticSystem(33, 0.0005));
    expect(op.warnings.join(' ')).toContain('pump 2 delivers no flow');
    expectHeadflowError(() => pair.head(q(1000, 'm3/h')), 'OUT_OF_RANGE');
    expect(pair.npshRange).toBeDefined();
    expect(pair.npshRequired(q(q1 + q2, 'm3/h'))).toBeGreaterThan(0);
  });
  it('a member whose data start above zero flow limits the combined head range', () => {
    const late = pumpCurve({
      speed: q(1750, 'rpm'),
      points: quadraticPoints(PUMP_A).slice(1),
      fit: EXACT_FITS,
    });
    const pair = pumpsInParallel([pump, late]);
    expect(pair.shutoffHead).toBeUndefined();
    // top of the combined range: late's first point (30 m3/h at 39.1 m), plus pump's 30 m3/h
    expectRelative(to(pair.flowRange.min, 'm3/h'), 60, 1e-9);
    expectRelative(to(pair.head(pair.flowRange.min), 'm'), 39.1, 1e-12);
  });
  it('without efficiency data the combination has none', () => {
    const bare = pumpCurve({
      speed: q(1750, 'rpm'),
      points: quadraticPoints(PUMP_A, 5, false).map((p) => ({ flow: p.flow, head: p.head })),
    });
    const pair = pumpsInParallel([bare, bare]);
    expect(pair.hasEfficiency).toBe(false);
    expect(pair.bestEfficiencyPoint).toBeUndefined();
    expect(pair.npshRange).toBeUndefined();
  });
});

describe('pumpsInSeries', () => {
  it('rejects an empty list and pumps with no common flow range', () => {
    expectHeadflowError(() => pumpsInSeries([]), 'INVALID_ARGUMENT');
    const late = pumpCurve({
      speed: q(1750, 'rpm'),
      points: quadraticPoints({ h0: 100, a: 0.001, b: 0.006, c: 0.00001, qMax: 300 }).slice(4),
      fit: EXACT_FITS,
    });
    expectHeadflowError(() => pumpsInSeries([small, late]), 'NO_SOLUTION');
  });
  it('two identical pumps give twice the head of one at any flow (fast-check)', () => {
    const two = pumpsInSeries([pump, pump]);
    expectRelative(to(two.shutoffHead ?? q(0, 'm'), 'm'), 80, 1e-12);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (u) => {
        const x = (u * pump.flowRange.max) as Flow;
        expectRelative(two.head(x), 2 * pump.head(x), 1e-14);
        if (x > 1e-9) expectRelative(two.efficiency(x), pump.efficiency(x), 1e-12);
      }),
    );
  });
  it("operating point: closed form; NPSH required is the first pump's", () => {
    // 80 - 0.002 Q^2 = 20 + 0.004 Q^2 -> Q = 100 m3/h
    const two = pumpsInSeries([pump, pump]);
    const op = operatingPoint(two, quadraticSystem(20, 0.004));
    expectRelative(to(op.flow, 'm3/h'), 100, 1e-9);
    expectRelative(to(op.shares[1]?.head ?? q(0, 'm'), 'm'), 30, 1e-9);
    expectRelative(to(op.npshRequired ?? q(0, 'm'), 'm'), 3, 1e-9);
    const mixed = pumpsInSeries([small, pump]);
    expectRelative(to(mixed.flowRange.max, 'm3/h'), 110, 1e-12);
    expect(mixed.head(q(50, 'm3/h')) as Length).toBeCloseTo(30 - 5 + 40 - 2.5, 10);
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type CataloguePoint, pumpCurve } from '../../src/pumps/index';
import { type Flow, type Length, q, to } from '../../src/units';
import { expectAbsolute, expectHeadflowError, expectRelative } from '../helpers/expect';
import { EXACT_FITS, PUMP_A, quadraticPoints, quadraticPump } from './fixtures';

const rpm = q(1750, 'rpm');

describe('pumpCurve: bad input', () => {
  it('fewer than 3 points', () => {
    const pts = quadraticPoints(PUMP_A).slice(0, 2);
    expectHeadflowError(() => pumpCurve({ speed: rpm, points: pts }), 'INVALID_ARGUMENT');
  });
  it('a rising head curve is refused with a clear message', () => {
    const pts: CataloguePoint[] = [
      { flow: q(0, 'm3/h'), head: q(30, 'm') },
      { flow: q(50, 'm3/h'), head: q(32, 'm') },
      { flow: q(100, 'm3/h'), head: q(25, 'm') },
    ];
    const err = expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: pts }),
      'INVALID_ARGUMENT',
    );
    expect(err.parameter).toBe('points[1].head');
    expect(err.message).toContain('non-increasing');
  });
  it('efficiency above 1, below 0, or non-zero at zero flow', () => {
    const pts = quadraticPoints(PUMP_A);
    const bad = (i: number, e: number): CataloguePoint[] =>
      pts.map((p, k) => (k === i ? { ...p, efficiency: e } : p));
    expect(
      expectHeadflowError(() => pumpCurve({ speed: rpm, points: bad(3, 1.2) }), 'INVALID_ARGUMENT')
        .parameter,
    ).toBe('points[3].efficiency');
    expectHeadflowError(() => pumpCurve({ speed: rpm, points: bad(3, -0.1) }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: bad(3, Number.NaN) }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => pumpCurve({ speed: rpm, points: bad(0, 0.1) }), 'INVALID_ARGUMENT');
  });
  it('negative, NaN or non-increasing flow; non-positive head', () => {
    const pts = quadraticPoints(PUMP_A);
    const withFlow = (i: number, f: number): CataloguePoint[] =>
      pts.map((p, k) => (k === i ? { ...p, flow: f as Flow } : p));
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: withFlow(0, -1e-3) }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: withFlow(2, Number.NaN) }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: withFlow(2, pts[1]?.flow ?? 0) }),
      'INVALID_ARGUMENT',
    );
    const zeroHead = pts.map((p, k) => (k === 6 ? { ...p, head: 0 as Length } : p));
    expectHeadflowError(() => pumpCurve({ speed: rpm, points: zeroHead }), 'INVALID_ARGUMENT');
  });
  it('speed, diameter and mixed data', () => {
    const pts = quadraticPoints(PUMP_A);
    expectHeadflowError(() => pumpCurve({ speed: q(0, 'rpm'), points: pts }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: pts, impellerDiameter: q(-1, 'mm') }),
      'INVALID_ARGUMENT',
    );
    const partial = pts.map((p, k) => (k === 2 ? { flow: p.flow, head: p.head } : p));
    expectHeadflowError(() => pumpCurve({ speed: rpm, points: partial }), 'INVALID_ARGUMENT');
    const both = pts.map((p) => ({ ...p, shaftPower: q(5, 'kW') }));
    expectHeadflowError(() => pumpCurve({ speed: rpm, points: both }), 'INVALID_ARGUMENT');
    const power = pts.map((p) => ({ flow: p.flow, head: p.head, shaftPower: q(5, 'kW') }));
    expectHeadflowError(() => pumpCurve({ speed: rpm, points: power }), 'INVALID_ARGUMENT');
    const onePartialNpsh = pts.map((p, k) => ({
      flow: p.flow,
      head: p.head,
      ...(k === 3 ? { npshRequired: q(2, 'm') } : {}),
    }));
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: onePartialNpsh }),
      'INVALID_ARGUMENT',
    );
    const badNpsh = pts.map((p, k) => (k === 3 ? { ...p, npshRequired: q(-2, 'm') } : p));
    expectHeadflowError(() => pumpCurve({ speed: rpm, points: badNpsh }), 'INVALID_ARGUMENT');
    const badPower = pts.map((p, k) => ({
      flow: p.flow,
      head: p.head,
      shaftPower: q(k === 2 ? -1 : 5, 'kW'),
    }));
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: badPower, catalogueDensity: q(1000, 'kg/m3') }),
      'INVALID_ARGUMENT',
    );
  });
  it('fits that cannot be made or leave their bounds', () => {
    const pts = quadraticPoints(PUMP_A, 4);
    expectHeadflowError(
      () =>
        pumpCurve({ speed: rpm, points: pts, fit: { head: { method: 'polynomial', degree: 4 } } }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        pumpCurve({
          speed: rpm,
          points: pts,
          fit: { head: { method: 'spline' } as unknown as { method: 'monotone' } },
        }),
      'INVALID_ARGUMENT',
    );
    // A cubic through four points of a curve with a flat top rises between them.
    const flatTop: CataloguePoint[] = [
      { flow: q(0, 'm3/h'), head: q(30, 'm') },
      { flow: q(10, 'm3/h'), head: q(30, 'm') },
      { flow: q(100, 'm3/h'), head: q(29.9, 'm') },
      { flow: q(110, 'm3/h'), head: q(10, 'm') },
    ];
    const err = expectHeadflowError(
      () =>
        pumpCurve({
          speed: rpm,
          points: flatTop,
          fit: { head: { method: 'polynomial', degree: 3 } },
        }),
      'INVALID_ARGUMENT',
    );
    expect(err.parameter).toBe('fit.head');
    // the monotone cubic takes the same points
    expect(pumpCurve({ speed: rpm, points: flatTop }).head(q(5, 'm3/h'))).toBeCloseTo(30, 12);
    // an efficiency fit of degree 1 (a line through the origin) exceeds 1 for these data
    const steep = quadraticPoints(PUMP_A).map((p, k) => ({
      ...p,
      efficiency: k === 0 ? 0 : k === 6 ? 0.99 : 0.9,
    }));
    expectHeadflowError(
      () =>
        pumpCurve({
          speed: rpm,
          points: steep,
          fit: { efficiency: { method: 'polynomial', degree: 1 } },
        }),
      'INVALID_ARGUMENT',
    );
  });
  it('regions must be ordered fractions', () => {
    const pts = quadraticPoints(PUMP_A);
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: pts, regions: { preferred: [1.2, 0.7] } }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: pts, regions: { allowable: [-0.1, 1] } }),
      'INVALID_ARGUMENT',
    );
  });
});

describe('pumpCurve: evaluation and no silent extrapolation', () => {
  const pump = quadraticPump();
  it('reproduces the exact quadratic head and efficiency (doc example)', () => {
    expectRelative(to(pump.head(q(120, 'm3/h')), 'm'), 25.6, 1e-13);
    expectRelative(pump.efficiency(q(60, 'm3/h')), 0.015 * 60 - 0.000075 * 3600, 1e-13);
    expectAbsolute(pump.fits.head.rms, 0, 1e-13);
    expect(pump.fits.head.method).toBe('polynomial');
    expect(pump.fits.efficiency?.degree).toBe(2);
    expect(pump.fits.npshRequired?.method).toBe('monotone');
    expect(pump.fits.shaftPower).toBeUndefined();
    expect(to(pump.shutoffHead ?? q(0, 'm'), 'm')).toBeCloseTo(40, 12);
    expectRelative(to(pump.flowRange.max, 'm3/h'), 180, 1e-15);
  });
  it('throws OUT_OF_RANGE past the last catalogue point, with the range in the message', () => {
    const err = expectHeadflowError(() => pump.head(q(181, 'm3/h')), 'OUT_OF_RANGE');
    expect(err.message).toContain('0 to 0.05 m3/s');
    expectHeadflowError(() => pump.efficiency(q(200, 'm3/h')), 'OUT_OF_RANGE');
    expectHeadflowError(() => pump.shaftPower(q(200, 'm3/h'), q(1000, 'kg/m3')), 'OUT_OF_RANGE');
    expectHeadflowError(() => pump.npshRequired(q(10, 'm3/h')), 'OUT_OF_RANGE');
    expectHeadflowError(() => pump.head(q(-1, 'm3/h')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => pump.head(Number.NaN as Flow), 'INVALID_ARGUMENT');
    // the last point itself is inside
    expectRelative(to(pump.head(q(180, 'm3/h')), 'm'), 40 - 0.001 * 180 * 180, 1e-13);
  });
  it('a catalogue starting above zero flow has no shut-off head unless asked', () => {
    const pts = quadraticPoints(PUMP_A).slice(1);
    const p = pumpCurve({ speed: rpm, points: pts, fit: EXACT_FITS });
    expect(p.shutoffHead).toBeUndefined();
    expectRelative(to(p.flowRange.min, 'm3/h'), 30, 1e-14);
    expectHeadflowError(() => p.head(q(10, 'm3/h')), 'OUT_OF_RANGE');
    const e = pumpCurve({ speed: rpm, points: pts, fit: EXACT_FITS, extrapolateShutoff: true });
    expectRelative(to(e.shutoffHead ?? q(0, 'm'), 'm'), 40, 1e-12);
    expect(e.flowRange.min).toBe(0);
    expectHeadflowError(
      () => pumpCurve({ speed: rpm, points: pts, extrapolateShutoff: true }),
      'INVALID_ARGUMENT',
    );
  });
  it('best efficiency point at the maximum of the efficiency fit (b / 2c = 100 m3/h, 0.75)', () => {
    const bep = pump.bestEfficiencyPoint;
    // A maximum located by comparing values is fixed only to about sqrt(machine epsilon)
    // relative (the function is flat there): 1e-7 allows for that, the value itself is exact.
    expectRelative(to(bep?.flow ?? q(0, 'm3/h'), 'm3/h'), 100, 1e-7);
    expectRelative(bep?.efficiency ?? 0, 0.75, 1e-14);
    expectRelative(to(bep?.head ?? q(0, 'm'), 'm'), 30, 1e-7);
  });
  it('preferred region 70-120 % of BEP flow (ANSI/HI 9.6.3), allowable = catalogue range', () => {
    // 1e-7: the BEP flow's own accuracy (see above)
    expectRelative(to(pump.preferredRegion?.min ?? q(0, 'm3/h'), 'm3/h'), 70, 1e-7);
    expectRelative(to(pump.preferredRegion?.max ?? q(0, 'm3/h'), 'm3/h'), 120, 1e-7);
    expectAbsolute(to(pump.allowableRegion?.min ?? q(1, 'm3/h'), 'm3/h'), 0, 1e-12);
    expectRelative(to(pump.allowableRegion?.max ?? q(0, 'm3/h'), 'm3/h'), 180, 1e-12);
    expect(pump.shares(q(100, 'm3/h'))[0]?.inPreferredRegion).toBe(true);
    expect(pump.shares(q(150, 'm3/h'))[0]?.inPreferredRegion).toBe(false);
    const custom = pumpCurve({
      speed: rpm,
      points: quadraticPoints(PUMP_A),
      fit: EXACT_FITS,
      regions: { preferred: [0.8, 1.1], allowable: [0.5, 1.3] },
    });
    expectRelative(to(custom.allowableRegion?.max ?? q(0, 'm3/h'), 'm3/h'), 130, 1e-7);
    expectRelative(to(custom.preferredRegion?.min ?? q(0, 'm3/h'), 'm3/h'), 80, 1e-7);
  });
  it('shaft power = rho g Q H / eta, finite at zero flow', () => {
    const Q = q(100, 'm3/h');
    const P = pump.shaftPower(Q, q(1000, 'kg/m3'));
    expectRelative(P, (1000 * 9.80665 * (100 / 3600) * 30) / 0.75, 1e-12);
    // limit at Q -> 0: rho g H0 / eta'(0), eta'(0) = b per (m3/h) = 0.015 * 3600 per (m3/s)
    expectRelative(
      pump.shaftPower(q(0, 'm3/h'), q(1000, 'kg/m3')),
      (1000 * 9.80665 * 40) / (0.015 * 3600),
      1e-9,
    );
    expectHeadflowError(() => pump.shaftPower(Q, q(0, 'kg/m3')), 'INVALID_ARGUMENT');
  });
  it('NPSH required from the monotone fit through its points', () => {
    expectRelative(to(pump.npshRequired(q(90, 'm3/h')), 'm'), 1 + 0.0002 * 8100, 1e-13);
    expectRelative(to(pump.npshRange?.min ?? q(0, 'm3/h'), 'm3/h'), 30, 1e-14);
  });
  it('a pump without efficiency or NPSH data says so', () => {
    const p = pumpCurve({
      speed: rpm,
      points: quadraticPoints(PUMP_A, 5, false).map((x) => ({ flow: x.flow, head: x.head })),
    });
    expect(p.hasEfficiency).toBe(false);
    expect(p.bestEfficiencyPoint).toBeUndefined();
    expect(p.preferredRegion).toBeUndefined();
    expect(p.shares(q(50, 'm3/h'))[0]?.efficiency).toBeUndefined();
    expectHeadflowError(() => p.efficiency(q(50, 'm3/h')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => p.shaftPower(q(50, 'm3/h'), q(1000, 'kg/m3')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => p.npshRequired(q(50, 'm3/h')), 'INVALID_ARGUMENT');
  });
  it('catalogue shaft power instead of efficiency', () => {
    const rho = 998.2;
    const pts = quadraticPoints(PUMP_A).map((p) => {
      const x = to(p.flow, 'm3/h');
      const eta = 0.015 * x - 0.000075 * x * x;
      const P =
        x === 0
          ? (rho * 9.80665 * 40) / (0.015 * 3600)
          : (rho * 9.80665 * (x / 3600) * p.head) / eta;
      return { flow: p.flow, head: p.head, shaftPower: P as never };
    });
    const p = pumpCurve({
      speed: rpm,
      points: pts,
      catalogueDensity: q(rho, 'kg/m3'),
      fit: { head: { method: 'polynomial', degree: 2 } },
    });
    expectRelative(p.efficiency(q(90, 'm3/h')), 0.015 * 90 - 0.000075 * 8100, 2e-3);
    expectRelative(p.efficiency(q(60, 'm3/h')), 0.015 * 60 - 0.000075 * 3600, 1e-13);
    expect(p.efficiency(q(0, 'm3/h'))).toBe(0);
    // at 1000 kg/m3 the power scales with density
    expectRelative(
      p.shaftPower(q(60, 'm3/h'), q(1000, 'kg/m3')),
      (pts[2]?.shaftPower ?? 0) * (1000 / rho),
      1e-13,
    );
    expect(p.fits.shaftPower?.method).toBe('monotone');
    expectRelative(to(p.bestEfficiencyPoint?.flow ?? q(0, 'm3/h'), 'm3/h'), 100, 0.05);
    expectHeadflowError(
      () =>
        pumpCurve({
          speed: rpm,
          points: pts.slice(1),
          catalogueDensity: q(rho, 'kg/m3'),
          extrapolateShutoff: true,
          fit: { head: { method: 'polynomial', degree: 2 } },
        }),
      'INVALID_ARGUMENT',
    );
  });
  it('fitted head is non-increasing between points for any decreasing catalogue (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 5, noNaN: true }), { minLength: 3, maxLength: 8 }),
        (drops) => {
          let h = 50;
          const pts: CataloguePoint[] = drops.map((d, i) => {
            h -= d;
            return { flow: q(20 * i, 'm3/h'), head: q(Math.max(h, 1e-3), 'm') };
          });
          if (pts.some((p, i) => i > 0 && p.head > (pts[i - 1]?.head ?? 0))) return;
          const p = pumpCurve({ speed: rpm, points: pts });
          let prev = Number.POSITIVE_INFINITY;
          for (let k = 0; k <= 100; k++) {
            const v = p.head(((p.flowRange.max * k) / 100) as Flow);
            expect(v).toBeLessThanOrEqual(prev + 1e-12);
            prev = v;
          }
        },
      ),
    );
  });
});

describe('NPSH data that start above zero flow', () => {
  it('builds when the last grid flow would round past the last NPSH point', () => {
    // flows 100, 175 and 230 gal/min: (xMax - xMin) * 512 / 512 + xMin rounds above xMax
    const pump = pumpCurve({
      speed: q(3500, 'rpm'),
      points: [
        { flow: q(0, 'gal/min'), head: q(120, 'ft'), efficiency: 0 },
        { flow: q(100, 'gal/min'), head: q(115, 'ft'), efficiency: 0.55, npshRequired: q(6, 'ft') },
        { flow: q(175, 'gal/min'), head: q(104, 'ft'), efficiency: 0.68, npshRequired: q(8, 'ft') },
        { flow: q(230, 'gal/min'), head: q(90, 'ft'), efficiency: 0.66, npshRequired: q(11, 'ft') },
      ],
    });
    expect(to(pump.npshRequired(q(230, 'gal/min')), 'ft')).toBeCloseTo(11, 12);
  });
});

import { describe, expect, it } from 'vitest';
import { selectPumps } from '../../src/select/index';
import { q, to } from '../../src/units/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';
import { catalogueOf, parabolicDesign, parabolicPoints, parabolicPump } from './fixtures';

const A = 40;
const B = 0.001;
const design = parabolicDesign(10, 0.002, 80);
const catalogue = catalogueOf(parabolicPump('P', A, B, 110));

describe('selectPumps input', () => {
  it('refuses impossible input with the field named', () => {
    expectHeadflowError(() => selectPumps(null as never, catalogue), 'INVALID_ARGUMENT');
    expectHeadflowError(() => selectPumps(design, null as never), 'INVALID_ARGUMENT');
    expectHeadflowError(() => selectPumps({} as never, catalogue), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => selectPumps({ ...design, dutyFlow: Number.NaN } as never, catalogue),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => selectPumps({ ...design, cases: 'all' } as never, catalogue),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => selectPumps(design, { pumps: [] }), 'INVALID_ARGUMENT');
    const noMotor = expectHeadflowError(
      () => selectPumps(design, { pumps: [parabolicPump('P', A, B, 110)] }),
      'INVALID_ARGUMENT',
    );
    expect(noMotor.parameter).toBe('catalogue.pumps[0].motorEfficiency');
    const bad = [
      { methods: ['valve'] },
      { methods: [] },
      { costs: { price: 3 } },
      { costs: { installation: -5 } },
      { costs: { years: 0 } },
      { costs: { trim: Number.NaN } },
      { energyPrice: { perKWh: -1, currency: 'EUR' } },
      { lowestTrimRatio: 0 },
      { trimLawAccurateRatio: 2 },
      'fast',
    ];
    for (const options of bad) {
      expectHeadflowError(
        () => selectPumps(design, catalogue, options as never),
        'INVALID_ARGUMENT',
      );
    }
    const speed = expectHeadflowError(
      () =>
        selectPumps(
          design,
          catalogueOf(
            parabolicPump('P', A, B, 110, {
              drive: { minSpeed: q(1800, 'rpm'), maxSpeed: q(1700, 'rpm') },
            }),
          ),
        ),
      'INVALID_ARGUMENT',
    );
    expect(speed.parameter).toBe('catalogue.pumps[0].drive.maxSpeed');
  });

  it('accepts null options and keeps to the methods asked for', () => {
    const all = selectPumps(design, catalogue, null);
    expect(all.ranked.map((e) => e.method).sort()).toEqual(['throttle', 'trim']);
    const trimOnly = selectPumps(design, catalogue, { methods: ['trim'] });
    expect(trimOnly.ranked.map((e) => e.method)).toEqual(['trim']);
    expect(all.rankedBy).toBe('energy');
    expect(all.currency).toBe('EUR');
  });

  it('reports a drive that cannot turn slowly enough as an error check', () => {
    const sel = selectPumps(
      design,
      catalogueOf(
        parabolicPump('P', A, B, 110, {
          drive: { minSpeed: q(1600, 'rpm'), maxSpeed: q(1750, 'rpm') },
        }),
      ),
    );
    const speed = sel.ranked.find((e) => e.method === 'speed');
    expect(speed?.passed).toBe(false);
    expect(speed?.checks.some((c) => c.id === 'drive-speed' && c.severity === 'error')).toBe(true);
  });

  it('prices the life-cycle cost from the pump, drive and trim', () => {
    const priced = catalogueOf(
      parabolicPump('P', A, B, 110, {
        price: 5000,
        drive: { minSpeed: q(600, 'rpm'), maxSpeed: q(1750, 'rpm'), price: 2000 },
      }),
    );
    const sel = selectPumps(design, priced, {
      costs: { years: 1, trim: 300, installation: 700 },
      energyPrice: { perKWh: 0.1, currency: 'EUR' },
    });
    expect(sel.rankedBy).toBe('life-cycle cost');
    for (const e of sel.ranked) {
      const extra = e.method === 'speed' ? 2000 : e.method === 'trim' ? 300 : 0;
      expect(e.lifeCycleCost?.initial).toBe(5000 + extra);
      expect(e.lifeCycleCost?.installation).toBe(700);
      // One year, no discount: the energy component is the year's energy cost.
      expectRelative(e.lifeCycleCost?.energy ?? 0, (e.energy?.kWh ?? 0) * 0.1, 1e-12);
    }
  });
});

describe('trim between catalogue curves', () => {
  // Curves at 250 mm and 225 mm (the trim law's image of the first, r2 = 0.9). Between them,
  // at a fraction t, points at the same share of each flow range are averaged, so for the
  // parabola H0(x) = A - B x^2 the interpolated curve is, with r(t) = 1 - 0.1 (1 - t) and
  // s2(t) = 0.81 + 0.19 t (the average of the squares),
  //   H(Q) = s2(t) (A - B (Q / r(t))^2)                       (algebra on the two curves)
  const full = parabolicPoints(A, B, 110);
  const small = full.map((p) => ({
    ...p,
    flow: q(0.9 * to(p.flow, 'm3/h'), 'm3/h'),
    head: q(0.81 * to(p.head, 'm'), 'm'),
  }));
  const pump = parabolicPump('P', A, B, 110, {
    curves: [{ impellerDiameter: q(225, 'mm'), points: small }],
    minImpellerDiameter: q(200, 'mm'),
  });

  it('finds the diameter where the interpolated head meets the duty', () => {
    const sel = selectPumps(parabolicDesign(14, 0.002, 80), catalogueOf(pump), {
      methods: ['trim'],
    });
    const trim = sel.ranked[0];
    expect(trim?.trimBasis).toBe('interpolated');
    const need = 14 + 0.002 * 6400;
    // Solve s2(t) (A - B (80 / r(t))^2) = need for t by bisection (the left side rises with t).
    const f = (t: number): number => {
      const r = 1 - 0.1 * (1 - t);
      return (0.81 + 0.19 * t) * (A - B * (80 / r) ** 2) - need;
    };
    let lo = 0;
    let hi = 1;
    for (let i = 0; i < 200; i++) {
      const mid = (lo + hi) / 2;
      if (f(mid) < 0) lo = mid;
      else hi = mid;
    }
    const d = 225 + 25 * hi;
    expectRelative(to(trim?.trimDiameter ?? q(0, 'm'), 'mm'), d, 1e-9);
    // The built curve goes through 11 interpolated points with the default monotone cubic; at
    // the duty it holds the head within 0.1 % (a fit between points, not the formula).
    expectRelative(to(trim?.curve.head(q(80, 'm3/h')) ?? q(0, 'm'), 'm'), need, 1e-3);
  });

  it('scales the smallest catalogue curve by the trim law below it', () => {
    const sel = selectPumps(parabolicDesign(7, 0.002, 80), catalogueOf(pump), {
      methods: ['trim'],
    });
    const trim = sel.ranked[0];
    expect(trim?.trimBasis).toBe('trim law');
    // Below 225 mm the law scales the 225 mm curve: r = sqrt((Hs + (k + B) Q^2) / (0.81 A)).
    const r = Math.sqrt((7 + 0.003 * 6400) / (0.81 * A)); // 0.8992: 202.3 mm
    expectRelative(to(trim?.trimDiameter ?? q(0, 'm'), 'mm'), 225 * r, 1e-9);
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { constantFluid, type FluidState, water } from '../../src/fluids/index';
import {
  correctForViscosity,
  hydraulicPower,
  minimumSubmergence,
  pumpCurve,
  temperatureRise,
  viscosityCorrectionFactors,
} from '../../src/pumps/index';
import { type Density, type Flow, type Power, q, type SpecificHeat, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

/** An invented pump for the tests (demo numbers, not a real product). */
function demoPump() {
  return pumpCurve({
    speed: q(1450, 'rpm'),
    points: [
      { flow: q(0, 'm3/h'), head: q(48, 'm'), efficiency: 0 },
      { flow: q(50, 'm3/h'), head: q(46, 'm'), efficiency: 0.55, npshRequired: q(2, 'm') },
      { flow: q(100, 'm3/h'), head: q(40, 'm'), efficiency: 0.76, npshRequired: q(3, 'm') },
      { flow: q(150, 'm3/h'), head: q(29, 'm'), efficiency: 0.68, npshRequired: q(5, 'm') },
    ],
  });
}

const BEP = {
  flowAtBep: q(100, 'm3/h'),
  headAtBep: q(40, 'm'),
  speed: q(1450, 'rpm'),
};

describe('viscosityCorrectionFactors (ANSI/HI 9.6.7-2010, from memory)', () => {
  it('refuses bad input, and B >= 40 or more than 3000 cSt with OUT_OF_RANGE', () => {
    expectHeadflowError(
      () => viscosityCorrectionFactors({ ...BEP, kinematicViscosity: q(0, 'cSt') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        viscosityCorrectionFactors({
          ...BEP,
          flowAtBep: Number.NaN as Flow,
          kinematicViscosity: q(10, 'cSt'),
        }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => viscosityCorrectionFactors({ ...BEP, kinematicViscosity: q(10, 'cSt') }, { stages: 0 }),
      'INVALID_ARGUMENT',
    );
    const big = expectHeadflowError(
      () => viscosityCorrectionFactors({ ...BEP, kinematicViscosity: q(3500, 'cSt') }),
      'OUT_OF_RANGE',
    );
    expect(big.message).toContain('3000 cSt');
    const tiny = expectHeadflowError(
      () =>
        viscosityCorrectionFactors({
          flowAtBep: q(3, 'm3/h'),
          headAtBep: q(80, 'm'),
          speed: q(1450, 'rpm'),
          kinematicViscosity: q(2500, 'cSt'),
        }),
      'OUT_OF_RANGE',
    );
    expect(tiny.message).toContain('B =');
  });
  it('factors are 1 for water-like liquids (B <= 1 or at most 1 cSt)', () => {
    const w = viscosityCorrectionFactors({ ...BEP, kinematicViscosity: q(1.0034, 'cSt') });
    expect(w.b).toBeLessThanOrEqual(1);
    expect([w.applies, w.flow, w.headAtBep, w.efficiency]).toEqual([false, 1, 1, 1]);
    expect(w.headAt(q(120, 'm3/h'))).toBe(1);
    // a small fast pump reaches B > 1 on 1 cSt already; still water-like by the 1 cSt rule
    const small = viscosityCorrectionFactors({
      flowAtBep: q(3, 'm3/h'),
      headAtBep: q(60, 'm'),
      speed: q(2900, 'rpm'),
      kinematicViscosity: q(1, 'cSt'),
    });
    expect(small.b).toBeGreaterThan(1);
    expect(small.applies).toBe(false);
    expect(small.efficiency).toBe(1);
  });
  it('doc example: 100 m3/h at 40 m, 1450 rpm, 200 cSt', () => {
    const f = viscosityCorrectionFactors({ ...BEP, kinematicViscosity: q(200, 'cSt') });
    const b = (16.5 * Math.sqrt(200) * 40 ** 0.0625) / (100 ** 0.375 * 1450 ** 0.25);
    expectRelative(f.b, b, 1e-12);
    expectRelative(f.b, 8.468094, 1e-6);
    expectRelative(f.flow, 2.71 ** (-0.165 * Math.log10(b) ** 3.15), 1e-14);
    expectRelative(f.efficiency, b ** -(0.0547 * b ** 0.69), 1e-14);
    expect(f.headAtBep).toBe(f.flow);
    expectRelative(f.headAt(q(120, 'm3/h')), 1 - (1 - f.flow) * 1.2 ** 0.75, 1e-14);
    expect(f.notes).toEqual([]);
  });
  it('C_H is 1 at shut-off, C_BEP-H at the BEP flow, and falls with flow', () => {
    const f = viscosityCorrectionFactors({ ...BEP, kinematicViscosity: q(300, 'cSt') });
    expect(f.headAt(q(0, 'm3/h'))).toBe(1);
    expectRelative(f.headAt(q(100, 'm3/h')), f.headAtBep, 1e-14);
    expect(f.headAt(q(150, 'm3/h'))).toBeLessThan(f.headAt(q(50, 'm3/h')));
  });
  it('the head per stage enters B; notes flag a pump outside the test data', () => {
    const one = viscosityCorrectionFactors({ ...BEP, kinematicViscosity: q(100, 'cSt') });
    const three = viscosityCorrectionFactors(
      { ...BEP, headAtBep: q(120, 'm'), kinematicViscosity: q(100, 'cSt') },
      { stages: 3 },
    );
    expectRelative(three.b, one.b, 1e-14);
    const big = viscosityCorrectionFactors({
      flowAtBep: q(800, 'm3/h'),
      headAtBep: q(200, 'm'),
      speed: q(1450, 'rpm'),
      kinematicViscosity: q(100, 'cSt'),
    });
    expect(big.notes.length).toBe(2);
  });
  it('every factor falls monotonically as the viscosity rises (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 250, noNaN: true }), // Q_BEP m3/h
        fc.double({ min: 8, max: 120, noNaN: true }), // H_BEP m
        fc.constantFrom(960, 1450, 2900),
        fc.double({ min: 0.5, max: 2000, noNaN: true }), // nu cSt
        fc.double({ min: 1.01, max: 1.5, noNaN: true }), // viscosity ratio
        (qh, h, rpm, nu, ratio) => {
          const input = {
            flowAtBep: q(qh, 'm3/h'),
            headAtBep: q(h, 'm'),
            speed: q(rpm, 'rpm'),
          };
          let lo: ReturnType<typeof viscosityCorrectionFactors>;
          let hi: ReturnType<typeof viscosityCorrectionFactors>;
          try {
            lo = viscosityCorrectionFactors({ ...input, kinematicViscosity: q(nu, 'cSt') });
            hi = viscosityCorrectionFactors({ ...input, kinematicViscosity: q(nu * ratio, 'cSt') });
          } catch {
            return true; // past B = 40: refused, nothing to compare
          }
          const at = q(1.3 * qh, 'm3/h');
          return (
            hi.flow <= lo.flow &&
            hi.efficiency <= lo.efficiency &&
            hi.headAtBep <= lo.headAtBep &&
            hi.headAt(at) <= lo.headAt(at) &&
            lo.flow <= 1 &&
            lo.efficiency <= 1 &&
            hi.efficiency > 0
          );
        },
      ),
    );
  });
});

describe('correctForViscosity', () => {
  const oil = constantFluid({
    name: 'demo oil (invented)',
    density: q(880, 'kg/m3'),
    dynamicViscosity: q(176, 'cP'),
  });
  it('returns the same curve for water', () => {
    const pump = demoPump();
    const c = correctForViscosity(pump, water().at(q(20, 'degC')));
    expect(c.applied).toBe(false);
    expect(c.curve).toBe(pump);
  });
  it('refuses a pump without efficiency data, a state without viscosity, bad options', () => {
    const bare = pumpCurve({
      speed: q(1450, 'rpm'),
      points: [
        { flow: q(0, 'm3/h'), head: q(48, 'm') },
        { flow: q(50, 'm3/h'), head: q(46, 'm') },
        { flow: q(100, 'm3/h'), head: q(40, 'm') },
      ],
    });
    expectHeadflowError(() => correctForViscosity(bare, oil.at(q(40, 'degC'))), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => correctForViscosity(demoPump(), {} as FluidState),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => correctForViscosity(demoPump(), oil.at(q(40, 'degC')), { points: 2 }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => correctForViscosity(null as never, oil.at(q(40, 'degC'))),
      'INVALID_ARGUMENT',
    );
  });
  it('refuses a liquid outside the method with OUT_OF_RANGE', () => {
    const tar = constantFluid({
      name: 'demo tar (invented)',
      density: q(1000, 'kg/m3'),
      dynamicViscosity: q(5000, 'cP'),
    });
    expectHeadflowError(
      () => correctForViscosity(demoPump(), tar.at(q(40, 'degC'))),
      'OUT_OF_RANGE',
    );
  });
  it('maps the BEP by C_Q, C_BEP-H, C_eta; keeps the shut-off head; needs more power', () => {
    const pump = demoPump();
    const c = correctForViscosity(pump, oil.at(q(40, 'degC')));
    expect(c.applied).toBe(true);
    const w = pump.bestEfficiencyPoint;
    const v = c.curve.bestEfficiencyPoint;
    if (!w || !v) throw new Error('BEP expected');
    // the BEP search is a bounded golden-section search: 1e-7 relative
    expectRelative(v.flow, c.factors.flow * w.flow, 1e-7);
    expectRelative(v.head, c.factors.headAtBep * w.head, 1e-7);
    expectRelative(v.efficiency, c.factors.efficiency * w.efficiency, 1e-9);
    expect(c.curve.shutoffHead).toBe(pump.shutoffHead);
    const duty = q(80, 'm3/h');
    const rho = q(880, 'kg/m3');
    expect(c.curve.shaftPower(duty, rho)).toBeGreaterThan(pump.shaftPower(duty, rho));
    expect(c.curve.head(duty)).toBeLessThan(pump.head(duty));
    // every sampled water point lies on the corrected curve, scaled by the factors
    for (const qwh of [25, 60, 110, 140]) {
      const qw = q(qwh, 'm3/h');
      const qv = (c.factors.flow * qw) as Flow;
      expectRelative(c.curve.head(qv), c.factors.headAt(qw) * pump.head(qw), 2e-3, `${qwh} m3/h`);
    }
    expect(c.curve.npshRange).toBeDefined();
  });
});

describe('temperatureRise: (P_shaft - P_hyd) / (rho c_p Q)', () => {
  it('refuses bad input: negative power, P_hyd > P_shaft, zero flow, zero c_p', () => {
    const ok = [
      q(10, 'kW'),
      q(2, 'kW'),
      q(998.2, 'kg/m3'),
      q(4184, 'J/(kg*K)'),
      q(5, 'm3/h'),
    ] as const;
    expectHeadflowError(
      () => temperatureRise(q(-1, 'W'), ok[1], ok[2], ok[3], ok[4]),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => temperatureRise(ok[1], ok[0], ok[2], ok[3], ok[4]),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => temperatureRise(ok[0], ok[1], ok[2], ok[3], q(0, 'm3/h')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => temperatureRise(ok[0], ok[1], ok[2], 0 as SpecificHeat, ok[4]),
      'INVALID_ARGUMENT',
    );
    expect(temperatureRise(ok[1], ok[1], ok[2], ok[3], ok[4])).toBe(0);
  });
  it('hand-worked energy balance (doc example)', () => {
    // Losses 10 kW - 2 kW = 8000 W. Mass flow 998.2 kg/m3 x 5/3600 m3/s = 1.386389 kg/s;
    // heat capacity flow 1.386389 kg/s x 4184 J/(kg K) = 5800.65 W/K; rise 8000 / 5800.65 =
    // 1.37916 K.
    const dt = temperatureRise(
      q(10, 'kW'),
      q(2, 'kW'),
      q(998.2, 'kg/m3'),
      q(4184, 'J/(kg*K)'),
      q(5, 'm3/h'),
    );
    expectRelative(dt, 1.37916, 1e-5);
  });
  it('equals g H (1/eta - 1) / c_p for a pump of efficiency eta (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 1, noNaN: true }),
        fc.double({ min: 1, max: 300, noNaN: true }),
        fc.double({ min: 0.05, max: 0.9, noNaN: true }),
        (flow, head, eta) => {
          const rho = 998.2 as Density;
          const cp = 4184 as SpecificHeat;
          const hyd = hydraulicPower(flow as Flow, q(head, 'm'), rho);
          const shaft = (hyd / eta) as Power;
          const dt = temperatureRise(shaft, hyd, rho, cp, flow as Flow);
          const expected = (9.80665 * head * (1 / eta - 1)) / 4184;
          return Math.abs(dt - expected) <= 1e-12 * expected + 1e-15;
        },
      ),
    );
  });
});

describe('minimumSubmergence: S = D (1 + 2.3 F_D) (ANSI/HI 9.8, from memory)', () => {
  it('refuses non-positive flow, diameter or g', () => {
    expectHeadflowError(
      () => minimumSubmergence({ flow: q(0, 'm3/s'), inletDiameter: q(0.6, 'm') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => minimumSubmergence({ flow: q(0.5, 'm3/s'), inletDiameter: q(-1, 'm') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        minimumSubmergence({ flow: q(0.5, 'm3/s'), inletDiameter: q(0.6, 'm'), g: q(0, 'm/s2') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => minimumSubmergence(undefined as never), 'INVALID_ARGUMENT');
  });
  it('hand-worked: 0.5 m3/s through a 0.6 m bell', () => {
    // V = 0.5 / (pi 0.6^2 / 4) = 1.768388 m/s; F = 1.768388 / sqrt(9.80665 x 0.6) = 0.729024;
    // S = 0.6 (1 + 2.3 x 0.729024) = 1.606053 m.
    const s = minimumSubmergence({ flow: q(0.5, 'm3/s'), inletDiameter: q(0.6, 'm') });
    expectRelative(s.inletVelocity, 1.768388, 1e-6);
    expectRelative(s.froudeNumber, 0.729024, 1e-6);
    expectRelative(to(s.submergence, 'm'), 1.606053, 1e-6);
  });
  it('S >= D, and S grows with the flow (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 20, noNaN: true }),
        fc.double({ min: 0.05, max: 5, noNaN: true }),
        (flow, d) => {
          const a = minimumSubmergence({ flow: flow as Flow, inletDiameter: q(d, 'm') });
          const b = minimumSubmergence({ flow: (flow * 1.1) as Flow, inletDiameter: q(d, 'm') });
          return a.submergence >= d && b.submergence > a.submergence;
        },
      ),
    );
  });
});

import { describe, expect, it } from 'vitest';
import { design, fastPump, report, slowPump } from '../../docs/examples/irrigation-lift';
import { type CandidateInput, type DesignInput, evaluateDesign } from '../../src/design';
import type { ReportCurves } from '../../src/design/index';
import { constantFluid, water } from '../../src/fluids';
import { pipeSize } from '../../src/pipes';
import {
  annualEnergy,
  motorForPump,
  npshAvailable,
  operatingPoint,
  pumpCurve,
  pumpsInParallel,
  pumpsInSeries,
  speedForFlow,
} from '../../src/pumps';
import { renderText } from '../../src/report/index';
import { systemCurve, systemScenarios } from '../../src/system';
import { type Flow, q, STANDARD_ATMOSPHERE, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const family = systemScenarios(design.system, design.cases ?? []);
const caseCurve = (i: number) => {
  const s = family[i];
  if (s === undefined) throw new Error('missing case');
  return s.curve;
};
const slow = () => report.candidates.find((c) => c.name === 'slow pump, drive');
const fast = () => report.candidates.find((c) => c.name === 'fast pump, fixed');

describe('end to end: the irrigation example against the lower-level API', () => {
  it('gives the duty head of each case as the system curve does', () => {
    report.duty.forEach((d, i) => {
      expectRelative(d.head, caseCurve(i).head(design.dutyFlow), 1e-14, d.case);
    });
    expect(report.duty.map((d) => d.case)).toEqual([
      'normal canal level',
      'dry season, low canal',
      'dry season, aged main',
    ]);
  });

  it('fixed-speed candidate: the operating point of operatingPoint()', () => {
    fast()?.cases.forEach((r, i) => {
      const op = operatingPoint(fastPump, caseCurve(i));
      expectRelative(r.flow ?? 0, op.flow, 1e-12, r.case);
      expectRelative(r.head ?? 0, op.head, 1e-12, r.case);
      expectRelative(r.efficiency ?? 0, op.efficiency ?? 0, 1e-12, r.case);
      expectRelative(
        r.shaftPower ?? 0,
        fastPump.shaftPower(op.flow, caseCurve(i).definition.fluid.density),
        1e-12,
      );
    });
  });

  it('speed-controlled candidate: the speed of speedForFlow() at the duty flow', () => {
    slow()?.cases.forEach((r, i) => {
      const s = speedForFlow(slowPump, caseCurve(i), design.dutyFlow);
      expectRelative(r.speed ?? 0, s.speed, 1e-12, r.case);
      expectRelative(r.flow ?? 0, design.dutyFlow, 1e-15);
      expectRelative(r.head ?? 0, caseCurve(i).head(design.dutyFlow), 1e-9);
    });
  });

  it('NPSH available from npshAvailable() with the suction run loss', () => {
    const curve = caseCurve(1);
    const fluid = curve.definition.fluid;
    const suctionLoss = curve.details(design.dutyFlow).runs[0]?.totalLoss ?? 0;
    const expected = npshAvailable({
      surfacePressure: STANDARD_ATMOSPHERE,
      vaporPressure: fluid.vaporPressure ?? q(0, 'Pa'),
      density: fluid.density,
      staticHeadAboveImpeller: q(-1.2 - 1.5, 'm'),
      suctionLoss: suctionLoss as never,
    });
    expectRelative(report.duty[1]?.npshAvailable ?? 0, expected, 1e-14);
    // by hand: (101325 - p_v) / (rho g) - 2.7 m - suction loss
    const byHand =
      (101325 - (fluid.vaporPressure ?? 0)) / (fluid.density * 9.80665) - 2.7 - suctionLoss;
    expectRelative(report.duty[1]?.npshAvailable ?? 0, byHand, 1e-13);
  });

  it('motors from motorForPump() and energy from annualEnergy()', () => {
    const density = caseCurve(0).definition.fluid.density;
    const m = motorForPump({
      pump: slowPump,
      density,
      dutyFlow: slowPump.flowRange.max,
      series: 'iec',
    });
    expect(slow()?.motor?.nameplate).toBe(m.nonOverloading.motor.nameplate);
    expectRelative(slow()?.maxShaftPower ?? 0, m.nonOverloading.shaftPower, 1e-12);
    const e = annualEnergy({
      pump: slowPump,
      system: caseCurve(0),
      density,
      motorEfficiency: 0.93,
      driveEfficiency: 0.97,
      control: 'speed',
      profile: design.profile ?? [],
      price: { perKWh: 0.16, currency: 'EUR' },
    });
    expectRelative(slow()?.energy?.kWh ?? 0, e.totalKWh, 1e-12);
    expectRelative(slow()?.energy?.cost?.amount ?? 0, e.totalKWh * 0.16, 1e-12);
  });

  it('ranks the passing candidate with less energy first, and carries the cautions', () => {
    expect(report.candidates.map((c) => [c.rank, c.name])).toEqual([
      [1, 'slow pump, drive'],
      [2, 'fast pump, fixed'],
    ]);
    expect(report.cautions.length).toBeGreaterThanOrEqual(5);
    expect(report.cautions.join(' ')).toContain('licensed engineer');
    expect(report.passed).toBe(true);
    expect(report.fluid.name).toBe('water');
    expectRelative(report.fluid.temperature, 291.15, 1e-12, 'temperature');
  });

  it('flags the fixed-speed pump outside its preferred region and short of NPSH margin in the dry season', () => {
    const ids = (fast()?.checks ?? []).map((k) => `${k.id}:${k.severity}:${k.case ?? ''}`);
    expect(ids).toContain('preferred-region:warning:normal canal level');
    expect(ids).toContain('npsh-margin:warning:dry season, low canal');
    expect(ids).toContain('dead-head:warning:');
    for (const k of fast()?.checks ?? []) expect(k.source.length).toBeGreaterThan(0);
  });

  it('samples every curve for the chart', () => {
    const curves = report.curves as ReportCurves;
    expect(curves.systems).toHaveLength(3);
    expect(curves.pumps.map((p) => p.name)).toContain('fast pump, fixed');
    expect(curves.points).toHaveLength(6);
    for (const c of [...curves.systems, ...curves.pumps, ...curves.efficiency]) {
      expect(c.flows.length).toBe(c.values.length);
      expect(c.flows.length).toBeGreaterThan(10);
      for (const v of c.values) expect(Number.isFinite(v)).toBe(true);
    }
  });
});

// A smaller system for the checks: an open tank to a tank 20 m up through 100 m of NPS 4.
const base = (extra: Partial<DesignInput> = {}): DesignInput => ({
  name: 'check bench',
  fluidName: 'water',
  system: {
    fluid: water().at(q(20, 'degC')),
    suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
    discharge: { elevation: q(20, 'm'), pressure: STANDARD_ATMOSPHERE },
    runs: [
      {
        name: 'suction',
        length: q(5, 'm'),
        pipe: pipeSize('5', '40'),
        material: 'commercial-steel',
      },
      {
        name: 'discharge',
        length: q(100, 'm'),
        pipe: pipeSize('4', '40'),
        material: 'commercial-steel',
      },
    ],
  },
  dutyFlow: q(60, 'm3/h'),
  pumpLocation: { elevation: q(0.5, 'm') },
  ...extra,
});

// pump H = 32 - 0.002 Q^2 (Q in m3/h), eta = 0.016 Q - 0.0001 Q^2 (BEP 80 m3/h, 64 %)
const quadratic = pumpCurve({
  speed: q(2900, 'rpm'),
  points: [0, 30, 60, 90, 120].map((f) => ({
    flow: q(f, 'm3/h'),
    head: q(32 - 0.002 * f * f, 'm'),
    efficiency: f === 0 ? 0 : 0.016 * f - 0.0001 * f * f,
    npshRequired: q(1.5 + 0.0003 * f * f, 'm'),
  })),
  fit: {
    head: { method: 'polynomial', degree: 2 },
    efficiency: { method: 'polynomial', degree: 2 },
  },
});
const candidate = (extra: Partial<CandidateInput> = {}): CandidateInput => ({
  name: 'Q',
  pump: quadratic,
  motorEfficiency: 0.9,
  ...extra,
});

describe('sets of identical pumps', () => {
  it('two in parallel run where pumpsInParallel() meets the system', () => {
    const input = base({
      candidates: [candidate({ count: 2, arrangement: 'parallel' })],
      dutyFlow: q(100, 'm3/h'),
    });
    const r = evaluateDesign(input).candidates[0]?.cases[0];
    const op = operatingPoint(pumpsInParallel([quadratic, quadratic]), systemCurve(input.system));
    expectRelative(r?.flow ?? 0, op.flow, 1e-9);
    expectRelative(r?.head ?? 0, op.head, 1e-9);
  });
  it('two in series run where pumpsInSeries() meets the system', () => {
    const system = {
      ...base().system,
      discharge: { elevation: q(45, 'm'), pressure: STANDARD_ATMOSPHERE },
    };
    const input = base({ system, candidates: [candidate({ count: 2, arrangement: 'series' })] });
    const r = evaluateDesign(input).candidates[0]?.cases[0];
    const op = operatingPoint(pumpsInSeries([quadratic, quadratic]), systemCurve(system));
    expectRelative(r?.flow ?? 0, op.flow, 1e-9);
    expectRelative(r?.head ?? 0, op.head, 1e-9);
    expectRelative(
      r?.shaftPower ?? 0,
      2 * quadratic.shaftPower((r?.flow ?? 0) as Flow, system.fluid.density),
      1e-12,
    );
  });
});

describe('checks', () => {
  it('no operating point when the pump cannot reach the static head (an error, ranked last)', () => {
    const system = {
      ...base().system,
      discharge: { elevation: q(40, 'm'), pressure: STANDARD_ATMOSPHERE },
    };
    const small = candidate({ name: 'small' });
    const big = candidate({ name: 'big', count: 2, arrangement: 'series' });
    const r = evaluateDesign(base({ system, candidates: [small, big] }));
    expect(r.candidates.map((c) => c.name)).toEqual(['big', 'small']);
    const failed = r.candidates[1];
    expect(failed?.passed).toBe(false);
    expect(failed?.cases[0]?.failure).toContain('cannot lift the liquid');
    // With no operating point in any case there is no duty to size a motor for.
    expect(failed?.dutyOnlyMotor).toBeUndefined();
    const text = renderText(r, { width: 200 });
    expect(text).toContain('Duty-only motor per pump: - (not sized: no operating point)');
    expect(text).not.toContain('No operating point: No operating point');
    // Said once under the candidate and once among the checks.
    expect(text.split('No operating point:').length - 1).toBe(2);
    expect(
      failed?.checks.some((k) => k.id === 'no-operating-point' && k.severity === 'error'),
    ).toBe(true);
    // The recommended candidate passes, so the design does, though 'small' fails.
    expect(r.passed).toBe(true);
    expect(r.verdict).toEqual({ candidates: 2, passing: 1, recommended: 'big', passed: true });
  });
  it('cavitation when the pump sits high above the tank', () => {
    const r = evaluateDesign(
      base({ pumpLocation: { elevation: q(8.5, 'm') }, candidates: [candidate()] }),
    );
    const k = r.candidates[0]?.checks.find((c) => c.id === 'npsh-margin');
    expect(k?.severity).toBe('error');
    expect(k?.message).toContain('Cavitation');
    expect(r.passed).toBe(false);
  });
  it('shut-off pressure above the design pressure of the piping', () => {
    const r = evaluateDesign(
      base({ limits: { designPressure: q(3, 'bar') }, candidates: [candidate()] }),
    );
    const k = r.candidates[0]?.checks.find((c) => c.id === 'shutoff-pressure');
    // 101 325 Pa + rho g (0 - 0.5 m) + rho g 32 m > 300 kPa, rho = 998.2067 kg/m3 (water at
    // 20 degC and 1 atm, IAPWS-IF97 region 1; tests/reference/iapws-if97.test.ts checks it)
    expectRelative(k?.values['maxPressure'] ?? 0, 101325 + 998.2067 * 9.80665 * 31.5, 1e-5);
    expect(k?.severity).toBe('error');
    const ok = evaluateDesign(
      base({ limits: { designPressure: q(10, 'bar') }, candidates: [candidate()] }),
    );
    expect(ok.candidates[0]?.checks.some((c) => c.id === 'shutoff-pressure')).toBe(false);
  });
  it('motor overload of a stated motor', () => {
    const r = evaluateDesign(base({ candidates: [candidate({ motorRating: q(2.2, 'kW') })] }));
    const k = r.candidates[0]?.checks.find(
      (c) => c.id === 'motor-overload' && c.severity === 'error',
    );
    expect(k?.message).toContain('Motor overload');
  });
  it('outside the allowable region is an error', () => {
    const pump = pumpCurve({
      speed: q(2900, 'rpm'),
      points: [0, 30, 60, 90, 120].map((f) => ({
        flow: q(f, 'm3/h'),
        head: q(32 - 0.002 * f * f, 'm'),
        efficiency: f === 0 ? 0 : 0.016 * f - 0.0001 * f * f,
      })),
      fit: {
        head: { method: 'polynomial', degree: 2 },
        efficiency: { method: 'polynomial', degree: 2 },
      },
      regions: { preferred: [0.9, 1.05], allowable: [0.8, 1.1] },
    });
    const r = evaluateDesign(base({ candidates: [candidate({ pump })] }));
    expect(
      r.candidates[0]?.checks.some((c) => c.id === 'allowable-region' && c.severity === 'error'),
    ).toBe(true);
  });
  it('near boiling at the suction, laminar flow and velocities outside the usual ranges', () => {
    const hot = water().at(q(95, 'degC')); // p_v 84.6 kPa, 83 % of the atmosphere
    const r = evaluateDesign(base({ system: { ...base().system, fluid: hot } }));
    expect(r.checks.some((c) => c.id === 'near-boiling')).toBe(true);
    const oil = constantFluid({
      name: 'oil',
      density: q(870, 'kg/m3'),
      dynamicViscosity: q(0.3, 'Pa*s'),
    }).at(q(30, 'degC'));
    const viscous = evaluateDesign(
      base({ system: { ...base().system, fluid: oil }, dutyFlow: q(10, 'm3/h') }),
    );
    expect(
      viscous.checks.some((c) => c.id === 'flow-regime' && c.message.includes('laminar')),
    ).toBe(true);
    expect(viscous.checks.some((c) => c.id === 'npsh-data')).toBe(true);
    const slowLine = evaluateDesign(base({ dutyFlow: q(10, 'm3/h') }));
    expect(
      slowLine.checks.filter((c) => c.id === 'velocity').map((c) => c.message.split(' ')[2]),
    ).toEqual(['suction', 'discharge']);
  });
  it('a duty profile the fixed pump cannot meet is an error of that candidate', () => {
    const r = evaluateDesign(
      base({ candidates: [candidate()], profile: [{ flow: q(110, 'm3/h'), hours: 100 }] }),
    );
    expect(r.candidates[0]?.checks.some((c) => c.id === 'energy' && c.severity === 'error')).toBe(
      true,
    );
  });
  it('with no candidates, gives the duty alone', () => {
    const r = evaluateDesign(base());
    expect(r.candidates).toEqual([]);
    expect(r.duty).toHaveLength(1);
    expect(r.duty[0]?.case).toBe('design case');
  });
});

describe('bad input', () => {
  it('refuses impossible designs with the path of the field', () => {
    expectHeadflowError(() => evaluateDesign(base({ dutyFlow: q(0, 'm3/h') })), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => evaluateDesign(base({ candidates: [candidate(), candidate()] })),
      'INVALID_ARGUMENT',
    );
    expect(
      expectHeadflowError(
        () => evaluateDesign(base({ candidates: [candidate({ count: 0 })] })),
        'INVALID_ARGUMENT',
      ).parameter,
    ).toBe('candidates[0].count');
    expectHeadflowError(
      () => evaluateDesign(base({ candidates: [candidate({ count: 2, arrangement: 'single' })] })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign(base({ candidates: [candidate({ control: 'magic' as never })] })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign(base({ candidates: [candidate({ arrangement: 'ring' as never })] })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign(base({ candidates: [candidate({ name: ' ' })] })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign(base({ candidates: [candidate({ motorEfficiency: 1.2 })] })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign(base({ pumpLocation: { elevation: q(0, 'm'), suctionRuns: 3 } })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign(base({ profile: [{ flow: q(10, 'm3/h'), hours: 9000 }] })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign(base({ profile: [{ flow: q(-1, 'm3/h'), hours: 10 }] })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign(base({ limits: { npshMarginRatio: 0.9 } })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign(base({ limits: { npshMinimumMargin: q(-1, 'm') } })),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        evaluateDesign(
          base({ limits: { suctionVelocity: { min: q(2, 'm/s'), max: q(1, 'm/s') } } }),
        ),
      'INVALID_ARGUMENT',
    );
    const noEfficiency = pumpCurve({
      speed: q(2900, 'rpm'),
      points: [0, 60, 120].map((f) => ({ flow: q(f, 'm3/h'), head: q(32 - 0.002 * f * f, 'm') })),
    });
    expectHeadflowError(
      () => evaluateDesign(base({ candidates: [candidate({ pump: noEfficiency })] })),
      'INVALID_ARGUMENT',
    );
  });
  it('refuses parallel groups in the suction line', () => {
    const system = {
      ...base().system,
      runs: [
        {
          kind: 'parallel' as const,
          branches: [
            [{ length: q(1, 'm'), insideDiameter: q(0.1, 'm'), roughness: q(0, 'm') }],
            [{ length: q(1, 'm'), insideDiameter: q(0.1, 'm'), roughness: q(0, 'm') }],
          ],
        },
      ],
    };
    expectHeadflowError(() => evaluateDesign(base({ system })), 'INVALID_ARGUMENT');
  });
});

describe('units of the report', () => {
  it('writes check messages in the report units', () => {
    const us = evaluateDesign({ ...design, units: 'us' });
    const fixed = us.candidates.find((c) => c.name === 'fast pump, fixed');
    const duty = fixed?.checks.find((k) => k.id === 'duty-flow');
    // 150 m3/h = 660.43 gal/min (US gallon 3.785411784 L)
    expect(duty?.message).toContain('above the duty 660.4 gal/min');
    expect(fixed?.checks.find((k) => k.id === 'dead-head')?.message).toContain('(246 ft)'); // 75 m
    const si = fast()?.checks.find((k) => k.id === 'duty-flow');
    expect(si?.message).toContain('above the duty 150 m3/h');
  });
  it('keeps SI numbers and records the unit system for printing', () => {
    expect(evaluateDesign(base({ units: 'us' })).units).toBe('us');
    expect(to(report.dutyFlow, 'm3/h')).toBeCloseTo(150, 12);
  });
});

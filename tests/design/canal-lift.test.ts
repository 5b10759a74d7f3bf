/**
 * End to end: the demo scenario file docs/examples/canal-lift.json, evaluated, against the
 * lower-level functions called one by one on the same parts, and against hand arithmetic.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateDesign, readScenario } from '../../src/design';
import { npshAvailable, operatingPoint, speedForFlow } from '../../src/pumps';
import { systemScenarios } from '../../src/system';
import { q, STANDARD_ATMOSPHERE, to } from '../../src/units';
import { expectRelative } from '../helpers/expect';

const text = readFileSync(new URL('../../docs/examples/canal-lift.json', import.meta.url), 'utf8');
const design = readScenario(text, { source: 'canal-lift.json' });
const report = evaluateDesign(design);
const family = systemScenarios(design.system, design.cases ?? []);

describe('canal-lift.json end to end', () => {
  it('reads the file as written: 40 L/s, 38 m of lift, water at 15 degC, three cases', () => {
    expectRelative(to(design.dutyFlow, 'L/s'), 40, 1e-15);
    expect(family.map((s) => s.name)).toEqual([
      'normal canal level',
      'low canal level, aged pipe',
      'warm water',
    ]);
    expect(family[0]?.curve.staticHead).toBe(38);
    expectRelative(family[1]?.curve.staticHead ?? 0, 39.2, 1e-14);
    expectRelative(to(design.system.fluid.temperature, 'degC'), 15, 1e-12);
  });
  it('duty heads are the system curves at 40 L/s', () => {
    report.duty.forEach((d, i) => {
      expectRelative(d.head, family[i]?.curve.head(design.dutyFlow) ?? 0, 1e-14, d.case);
    });
  });
  it('NPSH available: (p_atm - p_v)/(rho g) + (z_s - z_pump) - suction loss', () => {
    family.forEach((s, i) => {
      const fluid = s.curve.definition.fluid;
      const loss = s.curve.details(design.dutyFlow).runs[0]?.totalLoss ?? 0;
      const byHand =
        (101325 - (fluid.vaporPressure ?? 0)) / (fluid.density * 9.80665) +
        (s.curve.definition.suction.elevation - 1.5) -
        loss;
      expectRelative(report.duty[i]?.npshAvailable ?? 0, byHand, 1e-12, s.name);
      const byFunction = npshAvailable({
        surfacePressure: STANDARD_ATMOSPHERE,
        vaporPressure: fluid.vaporPressure ?? q(0, 'Pa'),
        density: fluid.density,
        staticHeadAboveImpeller: q(s.curve.definition.suction.elevation - 1.5, 'm'),
        suctionLoss: q(loss, 'm'),
      });
      expectRelative(report.duty[i]?.npshAvailable ?? 0, byFunction, 1e-14);
    });
  });
  it('pump A (fixed speed) runs where operatingPoint() puts it; pump B at the speedForFlow() speed', () => {
    const a = report.candidates.find((c) => c.name === 'pump A');
    const b = report.candidates.find((c) => c.name === 'pump B with drive');
    const pumpA = design.candidates?.[0]?.pump;
    const pumpB = design.candidates?.[1]?.pump;
    if (pumpA === undefined || pumpB === undefined) throw new Error('pumps missing');
    family.forEach((s, i) => {
      expectRelative(a?.cases[i]?.flow ?? 0, operatingPoint(pumpA, s.curve).flow, 1e-12, s.name);
      const speed = speedForFlow(pumpB, s.curve, design.dutyFlow, {
        maxSpeed: q(1850, 'rpm'),
      }).speed;
      expectRelative(b?.cases[i]?.speed ?? 0, speed, 1e-12, s.name);
    });
  });
  it('pump A falls short of the duty in the low, aged case and fails; pump B passes and ranks first', () => {
    const a = report.candidates.find((c) => c.name === 'pump A');
    expect(a?.passed).toBe(false);
    expect(a?.checks.some((k) => k.id === 'duty-flow' && k.severity === 'error')).toBe(true);
    expect(report.candidates[0]?.name).toBe('pump B with drive');
    expect(report.candidates[0]?.passed).toBe(true);
    // The recommended candidate passes: the design passes though pump A fails.
    expect(report.passed).toBe(true);
    expect(report.verdict).toEqual({
      candidates: 2,
      passing: 1,
      recommended: 'pump B with drive',
      passed: true,
    });
  });
});

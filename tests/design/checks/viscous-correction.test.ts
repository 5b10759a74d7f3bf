/**
 * Check `viscous-correction` on the invented canal-lift scenario with an invented oil. The
 * factors are those of ANSI/HI 9.6.7-2010 as `viscosityCorrectionFactors` gives them (checked
 * against the standard's worked example in tests/reference); here the whole job must apply
 * them: operating points and the motor on the corrected curve, a refusal outside the range.
 */
import { describe, expect, it } from 'vitest';
import { viscosityCorrectionFactors } from '../../../src/pumps';
import type { Flow, KinematicViscosity, Length, RotationalSpeed } from '../../../src/units';
import { evaluateFile, findings } from './helpers';

const oil = (cP: number) => (f: Record<string, unknown>) => {
  f['fluid'] = {
    constant: {
      name: 'demo oil',
      density: '880 kg/m3',
      viscosity: `${cP} cP`,
      vaporPressure: '1 kPa',
    },
  };
  f['cases'] = [];
};

describe('viscous-correction', () => {
  it('a water-like liquid leaves the curve alone and says nothing', () => {
    const report = evaluateFile((f) => {
      f['cases'] = [];
    });
    expect(findings(report, 'viscous-correction')).toHaveLength(0);
  });

  it('corrects a viscous liquid: the factors of the method, the motor on the corrected power', () => {
    const water = evaluateFile((f) => {
      oil(0.88)(f); // 1 cSt: water-like
    });
    const report = evaluateFile(oil(176)); // 200 cSt
    const k = findings(report, 'viscous-correction').find((x) => x.candidate === 'pump A');
    expect(k?.severity).toBe('info');
    const a = report.candidates.find((c) => c.name === 'pump A');
    const bep = a?.pump.bep;
    const factors = viscosityCorrectionFactors({
      flowAtBep: bep?.flow as Flow,
      headAtBep: bep?.head as Length,
      speed: a?.pump.speed as RotationalSpeed,
      kinematicViscosity: 200e-6 as KinematicViscosity,
    });
    expect(k?.values['b']).toBeCloseTo(factors.b, 9);
    expect(k?.values['flowFactor']).toBeCloseTo(factors.flow, 9);
    expect(k?.values['efficiencyFactor']).toBeCloseTo(factors.efficiency, 9);
    expect(factors.efficiency).toBeLessThan(1);
    expect(k?.message).toContain('corrected by ANSI/HI 9.6.7');
    const w = water.candidates.find((c) => c.name === 'pump A');
    // More power on the viscous liquid at the end of the curve: the motor is sized on it.
    expect(a?.maxShaftPower ?? 0).toBeGreaterThan(w?.maxShaftPower ?? Number.POSITIVE_INFINITY);
    expect(a?.cases[0]?.efficiency ?? 1).toBeLessThan(w?.cases[0]?.efficiency ?? 0);
  });

  it('refuses a liquid outside the range of the method', () => {
    const report = evaluateFile(oil(4400)); // 5000 cSt, above 3000 cSt
    const k = findings(report, 'viscous-correction').find((x) => x.candidate === 'pump A');
    expect(k?.severity).toBe('error');
    expect(k?.message).toContain('outside the range of the viscosity correction');
    expect(report.candidates.every((c) => !c.passed)).toBe(true);
  });
});

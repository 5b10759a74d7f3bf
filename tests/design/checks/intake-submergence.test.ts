/**
 * Check `intake-submergence` on the invented canal-lift scenario. Reference: the ANSI/HI 9.8
 * relation S = D (1 + 2.3 F_D), F_D = V / sqrt(g D), worked here by hand from the set's flow
 * (from memory; see `minimumSubmergence`).
 */
import { describe, expect, it } from 'vitest';
import { evaluateFile, findings } from './helpers';

const G = 9.80665;

describe('intake-submergence', () => {
  it('passes a deep inlet, with the submergence of the relation', () => {
    const report = evaluateFile((f) => {
      f['intake'] = { depth: '2.5 m', diameter: '300 mm' };
      f['cases'] = [];
    });
    const k = findings(report, 'intake-submergence').find((x) => x.candidate === 'pump A');
    expect(k?.severity).toBe('info');
    const flow = report.candidates.find((c) => c.name === 'pump A')?.cases[0]?.flow ?? 0;
    const d = 0.3;
    const v = flow / ((Math.PI * d * d) / 4);
    const s = d * (1 + 2.3 * (v / Math.sqrt(G * d)));
    expect(k?.values['minimum']).toBeCloseTo(s, 9);
    expect(k?.values['depth']).toBeCloseTo(2.5, 12);
  });

  it('warns when a case lowers the surface below the minimum submergence', () => {
    const report = evaluateFile((f) => {
      f['intake'] = { depth: '1.2 m', diameter: '300 mm' };
    });
    const k = findings(report, 'intake-submergence').find((x) => x.candidate === 'pump A');
    // The low canal level (-1.2 m) leaves the inlet at the surface.
    expect(k?.case).toBe('low canal level, aged pipe');
    expect(k?.values['depth']).toBeCloseTo(0, 9);
    expect(k?.severity).toBe('warning');
    expect(k?.message).toContain('vortices');
  });

  it('says it could not run without the inlet diameter', () => {
    const report = evaluateFile((f) => {
      f['intake'] = { depth: '2 m' };
    });
    const [k] = findings(report, 'intake-submergence');
    expect(k?.severity).toBe('info');
    expect(k?.message).toBe('Intake submergence could not be checked: it needs intake.diameter.');
  });
});

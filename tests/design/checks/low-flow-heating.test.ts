/**
 * Check `low-flow-heating` on the invented canal-lift scenario. The reference is the energy
 * balance worked here in its other form, dT = g H (1/eta - 1) / c_p, from the pump's own head
 * and efficiency at the minimum flow and water's c_p from IAPWS-IF97 (common practice: all
 * losses into the liquid).
 */
import { describe, expect, it } from 'vitest';
import { readScenario } from '../../../src/design/scenario-file';
import { water } from '../../../src/fluids';
import type { Flow, Temperature } from '../../../src/units';
import { canalLift, evaluateFile, findings } from './helpers';

const G = 9.80665;

describe('low-flow-heating', () => {
  it('passes at the stated minimum flow with the rise of a hand-worked energy balance', () => {
    const report = evaluateFile((f) => {
      f['lowFlow'] = { minimumFlow: '8 L/s' };
      f['cases'] = [];
    });
    const all = findings(report, 'low-flow-heating');
    expect(all).toHaveLength(2); // one per candidate
    const k = all.find((x) => x.candidate === 'pump A');
    expect(k?.severity).toBe('info');
    const file = canalLift();
    delete file['$schema'];
    file['cases'] = [];
    const design = readScenario(JSON.stringify(file));
    const pump = design.candidates?.[0]?.pump;
    const q = 0.008 as Flow;
    const head = pump?.head(q) ?? 0;
    const eta = pump?.efficiency(q) ?? 1;
    const cp = water().at((15 + 273.15) as Temperature).specificHeat ?? 0;
    const hand = (G * head * (1 / eta - 1)) / cp;
    expect(k?.values['rise']).toBeCloseTo(hand, 9);
    expect(k?.values['margin']).toBeGreaterThan(50); // water at 15 degC near 1 atm
    expect(k?.message).toContain('the minimum flow the design states');
  });

  it('warns above the stated limit', () => {
    const report = evaluateFile((f) => {
      f['lowFlow'] = { minimumFlow: '2 L/s', maxTemperatureRise: 0.1 };
    });
    const k = findings(report, 'low-flow-heating').find((x) => x.candidate === 'pump A');
    expect(k?.severity).toBe('warning');
    expect(k?.values['rise']).toBeGreaterThan(0.1);
    expect(k?.message).toContain('minimum-flow bypass');
  });

  it('defaults to the low end of the allowable region', () => {
    const report = evaluateFile((f) => {
      f['lowFlow'] = {};
      const [a] = f['candidates'] as Record<string, unknown>[];
      if (a !== undefined) a['allowableRegion'] = [0.3, 1.3];
    });
    const k = findings(report, 'low-flow-heating').find((x) => x.candidate === 'pump A');
    expect(k?.words['flowFrom']).toBe('region');
    const bep = report.candidates.find((c) => c.name === 'pump A')?.pump.bep?.flow ?? 0;
    expect(k?.values['flow']).toBeCloseTo(0.3 * bep, 9);
    expect(k?.message).toContain('the low end of its allowable region');
    // Without a region, a curve that starts at zero flow gives no lowest flow to check.
    const none = evaluateFile((f) => {
      f['lowFlow'] = {};
    });
    const n = findings(none, 'low-flow-heating').find((x) => x.candidate === 'pump A');
    expect(n?.message).toBe(
      'Low-flow heating could not be checked: it needs a minimum flow above zero (lowFlow.minimumFlow).',
    );
  });

  it('says it could not run without the specific heat', () => {
    const report = evaluateFile((f) => {
      f['fluid'] = {
        constant: {
          name: 'demo liquid',
          density: '1000 kg/m3',
          viscosity: '1 cP',
          vaporPressure: '2 kPa',
        },
      };
      f['cases'] = [];
      f['lowFlow'] = { minimumFlow: '8 L/s' };
    });
    const [k] = findings(report, 'low-flow-heating');
    expect(k?.severity).toBe('info');
    expect(k?.message).toBe(
      "Low-flow heating could not be checked: it needs the fluid's specific heat.",
    );
  });
});

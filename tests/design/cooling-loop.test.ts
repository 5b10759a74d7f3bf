import { describe, expect, it } from 'vitest';
import { design, loopPump, report } from '../../docs/examples/cooling-loop';
import { operatingPoint, pumpsInParallel, speedForFlow } from '../../src/pumps';
import { systemScenarios } from '../../src/system';
import { expectRelative } from '../helpers/expect';

const family = systemScenarios(design.system, design.cases ?? []);

describe('end to end: the cooling-loop example against the lower-level API', () => {
  it('a closed loop has no static head: the duty head is the loop loss alone', () => {
    family.forEach((s, i) => {
      expect(s.curve.staticHead).toBe(0);
      expectRelative(report.duty[i]?.head ?? 0, s.curve.head(design.dutyFlow), 1e-14);
      expectRelative(report.duty[i]?.head ?? 0, report.duty[i]?.lossHead ?? 0, 1e-14);
    });
  });
  it('the exchangers share the flow at equal loss', () => {
    const runs = report.duty[0]?.runs.filter((r) => r.group !== undefined) ?? [];
    expect(runs.map((r) => r.name)).toEqual(['exchanger A', 'exchanger B', 'exchanger C']);
    expectRelative(
      runs.reduce((s, r) => s + r.flow, 0),
      design.dutyFlow,
      1e-12,
    );
    const losses = runs.map((r) => r.totalLoss);
    expect(Math.max(...losses) - Math.min(...losses)).toBeLessThan(1e-9);
    // the valve with the largest Cv passes the most flow
    expect(runs[2]?.flow).toBeGreaterThan(runs[1]?.flow ?? 0);
    expect(runs[1]?.flow).toBeGreaterThan(runs[0]?.flow ?? 0);
  });
  it('two pumps in parallel run where pumpsInParallel() meets each case', () => {
    const pair = report.candidates.find((c) => c.name === 'two pumps, parallel');
    family.forEach((s, i) => {
      const op = operatingPoint(pumpsInParallel([loopPump, loopPump]), s.curve);
      expectRelative(pair?.cases[i]?.flow ?? 0, op.flow, 1e-9, s.name);
    });
  });
  it('the drive turns the single pump down to the duty flow', () => {
    const one = report.candidates.find((c) => c.name === 'one pump, drive');
    family.forEach((s, i) => {
      expectRelative(
        one?.cases[i]?.speed ?? 0,
        speedForFlow(loopPump, s.curve, design.dutyFlow).speed,
        1e-12,
      );
    });
  });
  it('hot water gives less NPSH available than cold (higher vapour pressure)', () => {
    expect(report.duty[1]?.npshAvailable).toBeLessThan(report.duty[0]?.npshAvailable ?? 0);
  });
  it('the shut-off pressure stays under the 6 bar(g) design pressure', () => {
    for (const c of report.candidates)
      expect(c.checks.some((k) => k.id === 'shutoff-pressure')).toBe(false);
  });
});

describe('the same design as a scenario file (docs/examples/cooling-loop.json)', () => {
  it('reads into a design whose report matches the code version to rounding', async () => {
    const { readFileSync } = await import('node:fs');
    const { readScenario, evaluateDesign } = await import('../../src/design');
    const text = readFileSync(
      new URL('../../docs/examples/cooling-loop.json', import.meta.url),
      'utf8',
    );
    const fromFile = evaluateDesign(readScenario(text, { source: 'cooling-loop.json' }));
    expect(fromFile.candidates.map((c) => c.name)).toEqual(report.candidates.map((c) => c.name));
    fromFile.duty.forEach((d, i) => {
      expectRelative(d.head, report.duty[i]?.head ?? 0, 1e-12, d.case);
      expectRelative(d.npshAvailable ?? 0, report.duty[i]?.npshAvailable ?? 0, 1e-12, d.case);
    });
    fromFile.candidates.forEach((c, i) => {
      c.cases.forEach((r, j) => {
        const other = report.candidates[i]?.cases[j];
        expectRelative(r.flow ?? 0, other?.flow ?? 0, 1e-12);
        expectRelative(r.shaftPower ?? 0, other?.shaftPower ?? 0, 1e-12);
      });
      expectRelative(c.energy?.kWh ?? 0, report.candidates[i]?.energy?.kWh ?? 0, 1e-12);
    });
  });
});

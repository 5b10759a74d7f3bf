/**
 * The design report carries each candidate's curve fit (method, largest residual, within the
 * catalogue tolerance or not) and warns when a fit the user chose misses the tolerance.
 * Pump data are those of the invented irrigation example (docs/examples/irrigation-lift.ts).
 */
import { describe, expect, it } from 'vitest';
import { design } from '../../docs/examples/irrigation-lift';
import { evaluateDesign } from '../../src/design';
import { pumpCurve } from '../../src/pumps';
import { type JsonEnvelope, renderJson, renderMarkdown, renderText } from '../../src/report';
import { q } from '../../src/units';

// flow m3/h, head m, efficiency (the fast pump of the irrigation example)
const ROWS = [
  [0, 75, 0],
  [40, 74, 0.55],
  [80, 70, 0.72],
  [120, 62, 0.78],
  [160, 50, 0.74],
  [200, 35, 0.62],
] as const;

function pump(fit?: Parameters<typeof pumpCurve>[0]['fit']) {
  return pumpCurve({
    speed: q(2960, 'rpm'),
    points: ROWS.map(([flow, head, efficiency]) => ({
      flow: q(flow, 'm3/h'),
      head: q(head, 'm'),
      efficiency,
    })),
    ...(fit === undefined ? {} : { fit }),
  });
}

const report = evaluateDesign({
  ...design,
  candidates: [
    { name: 'default fits', pump: pump(), motorEfficiency: 0.92 },
    {
      name: 'straight lines',
      pump: pump({
        head: { method: 'polynomial', degree: 1 },
        efficiency: { method: 'polynomial', degree: 1 },
      }),
      motorEfficiency: 0.92,
    },
  ],
});
const byName = (name: string) => report.candidates.find((c) => c.name === name);

describe('curve fits in the design report', () => {
  it('the default fits meet the tolerance and raise no curve-fit check', () => {
    const c = byName('default fits');
    expect(c?.curveFit.head.withinTolerance).toBe(true);
    expect(c?.curveFit.efficiency?.withinTolerance).toBe(true);
    expect(c?.curveFit.efficiency?.selection).toBe('default');
    expect(c?.checks.filter((k) => k.id === 'curve-fit')).toEqual([]);
  });

  it('a chosen fit that misses the tolerance gives a warning for each curve', () => {
    const c = byName('straight lines');
    const checks = c?.checks.filter((k) => k.id === 'curve-fit') ?? [];
    expect(checks.map((k) => k.severity)).toEqual(['warning', 'warning']);
    expect(checks[0]?.message).toContain('head fit (polynomial of degree 1)');
    expect(checks[0]?.values['maxRelativeResidual']).toBe(c?.curveFit.head.maxRelativeResidual);
    expect(checks[1]?.message).toContain('efficiency fit (polynomial of degree 1)');
    expect(checks[1]?.values['maxResidual']).toBeGreaterThan(0.005);
    // A warning, not an error: the candidate still passes when nothing else fails.
    expect(c?.checks.some((k) => k.id === 'curve-fit' && k.severity === 'error')).toBe(false);
  });

  it('text, Markdown and JSON give the fit and its largest residual', () => {
    const c = byName('straight lines');
    const pp = ((c?.curveFit.efficiency?.maxResidual ?? 0) * 100).toFixed(2);
    for (const doc of [renderText(report, { width: 400 }), renderMarkdown(report)]) {
      expect(doc).toContain('Head curve fit');
      expect(doc).toContain('monotone cubic through every point (default)');
      expect(doc).toContain(`largest residual ${pp} percentage points; OUTSIDE`);
    }
    const json = JSON.parse(renderJson(report)) as JsonEnvelope;
    const fit = json.report.candidates.find((k) => k.name === 'straight lines')?.curveFit;
    expect(fit?.head.method).toBe('polynomial');
    expect(fit?.head.degree).toBe(1);
    expect(fit?.head.selection).toBe('given');
    expect(fit?.head.withinTolerance).toBe(false);
    expect(fit?.head.maxResidual).toEqual({
      value: Number((c?.curveFit.head.maxResidual ?? 0).toPrecision(6)),
      unit: 'm',
    });
    expect(fit?.efficiency?.maxResidual).toBe(
      Number((c?.curveFit.efficiency?.maxResidual ?? 0).toPrecision(6)),
    );
  });
});

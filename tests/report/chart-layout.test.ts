/**
 * The chart's text never overlaps, leaves the drawing or is cut short. Each text element's
 * box is computed here from the SVG itself, independently of the renderer: an average glyph
 * width of 0.56 em and a box from 0.8 em above to 0.2 em below the baseline (wider than most
 * sans-serif faces, so a label that fits this box fits on screen), with the element's own or
 * inherited font size, its text-anchor, its dy and a translate/rotate(+-90) transform.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateDesign, readDesignFile } from '../../src/design/index';
import { chartSpecFromReport, renderChart, renderSchematic } from '../../src/report/index';
import { scenarioExampleFiles } from '../helpers/examples';
import { measure, problems } from '../helpers/svg-layout';
import { REPORT } from './fixture';

const DIR = join(__dirname, '../../docs/examples');

describe('the chart test itself', () => {
  it('finds an overlap, a box outside and a label cut short', () => {
    const svg =
      '<svg xmlns="http://www.w3.org/2000/svg" width="100" height="50" font-size="10">' +
      '<text x="10" y="20">abcdef</text><text x="12" y="22">xyz</text>' +
      '<text x="95" y="40">long</text><text x="10" y="45">a\u2026</text></svg>';
    const p = problems(svg);
    expect(p.some((s) => s.includes('overlaps'))).toBe(true);
    expect(p.some((s) => s.startsWith('outside the drawing: "long"'))).toBe(true);
    expect(p.some((s) => s.startsWith('cut short'))).toBe(true);
  });
  it('measures a rotated axis label as a tall box', () => {
    const svg =
      '<svg xmlns="http://www.w3.org/2000/svg" width="100" height="200" font-size="10">' +
      '<text transform="translate(20,100) rotate(-90)" text-anchor="middle">Head (m)</text></svg>';
    const box = measure(svg).texts[0]?.box;
    // 8 characters x 0.56 x 10 = 44.8 tall; 0.8 em to the left of x = 20, 0.2 em to the right.
    expect((box?.y1 ?? 0) - (box?.y0 ?? 0)).toBeCloseTo(44.8, 9);
    expect(box?.x0).toBeCloseTo(12, 9);
    expect(box?.x1).toBeCloseTo(22, 9);
  });
});

describe('no label overlaps, leaves the drawing or is cut short', () => {
  const files = scenarioExampleFiles();
  for (const file of files) {
    const report = evaluateDesign(readDesignFile(readFileSync(join(DIR, file), 'utf8')), {
      curves: true,
    });
    for (const units of ['si', 'us'] as const) {
      for (const width of [800, 600]) {
        it(`${file}, ${units}, ${width} px wide`, () => {
          const svg = renderChart(chartSpecFromReport(report, { units }), { width });
          expect(problems(svg)).toEqual([]);
          expect(measure(svg).texts.length).toBeGreaterThan(30);
          // Every operating point has its number on the plot.
          const numbers = measure(svg).texts.filter((t) => t.cls === 'point-label').length;
          expect(numbers).toBe(report.curves?.points.length);
        });
      }
    }
  }
  it('the examples written in TypeScript and the renderer fixture', async () => {
    for (const mod of ['cooling-loop', 'irrigation-lift']) {
      const { report } = (await import(`../../docs/examples/${mod}.ts`)) as {
        report: Parameters<typeof chartSpecFromReport>[0];
      };
      expect(problems(renderChart(chartSpecFromReport(report))), mod).toEqual([]);
    }
    expect(problems(renderChart(chartSpecFromReport(REPORT)))).toEqual([]);
  });
  it('long names wrap instead of being cut (property)', () => {
    const base = chartSpecFromReport(REPORT);
    fc.assert(
      fc.property(
        fc.array(fc.stringMatching(/^[a-z]{1,12}( [a-z]{1,12}){0,8}$/), {
          minLength: 4,
          maxLength: 4,
        }),
        fc.integer({ min: 420, max: 1000 }),
        (names, width) => {
          const [a = 'a', b = 'b', c = 'c', d = 'd'] = names;
          const spec = {
            ...base,
            title: `${a} ${b} ${c} ${d}`,
            pumpCurves: base.pumpCurves.map((s, i) => ({ ...s, name: i === 0 ? a : b })),
            systemCurves: base.systemCurves.map((s, i) => ({ ...s, name: i === 0 ? c : d })),
            operatingPoints: base.operatingPoints.map((p, i) => ({
              ...p,
              name: `${names[i % 4]} / ${c}`,
            })),
          };
          expect(problems(renderChart(spec, { width }))).toEqual([]);
        },
      ),
      { numRuns: 25 },
    );
  });
});

describe("the network schematic's labels do not overlap, leave the drawing or get cut short", () => {
  for (const file of scenarioExampleFiles()) {
    const design = readDesignFile(readFileSync(join(DIR, file), 'utf8'));
    if (!('network' in design)) continue;
    const report = evaluateDesign(design);
    for (const units of ['si', 'us'] as const) {
      for (const width of [900, 600]) {
        for (const d of report.duty) {
          it(`${file}, ${d.case}, ${units}, ${width} px wide`, () => {
            const svg = renderSchematic(report, { units, width, case: d.case });
            expect(problems(svg)).toEqual([]);
            // Every node and link is labelled: in the drawing, or by number in the key.
            const texts = measure(svg).texts.map((t) => t.text);
            for (const n of report.network?.nodes ?? []) {
              expect(
                texts.some((t) => t.includes(`${n.id}: `)),
                n.id,
              ).toBe(true);
            }
          });
        }
      }
    }
  }
});

describe('the schematic at a candidate that leaves nodes short', () => {
  const design = readDesignFile(readFileSync(join(DIR, 'booster-floors.json'), 'utf8'));
  const report = evaluateDesign(design);
  it('marks every node below its service minimum and keeps its labels clear', () => {
    const svg = renderSchematic(report, { candidate: 'booster C-32, fixed', units: 'us' });
    expect(problems(svg)).toEqual([]);
    const short = report.candidates
      .find((c) => c.name === 'booster C-32, fixed')
      ?.checks.filter((k) => k.id === 'service-pressure' && k.case === report.duty[0]?.case)
      .map((k) => k.words['node']);
    expect(short?.length).toBeGreaterThan(0);
    for (const id of short ?? []) {
      expect(svg).toMatch(new RegExp(`class="node outlet below-service"[^>]*><title>${id}<`));
      expect(svg).toContain(`${id}: `);
    }
    expect(svg).toContain('(below service minimum)');
  });
  it('refuses a line report, an unknown case or candidate, a bad width', () => {
    const line = evaluateDesign(readDesignFile(readFileSync(join(DIR, 'canal-lift.json'), 'utf8')));
    expect(() => renderSchematic(line)).toThrow(/network/);
    expect(() => renderSchematic(report, { case: 'flood' })).toThrow(/case/);
    expect(() => renderSchematic(report, { candidate: 'nobody' })).toThrow(/candidate/);
    expect(() => renderSchematic(report, { width: 100 })).toThrow(/width/);
  });
});

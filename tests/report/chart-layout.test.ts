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
import { XMLParser } from 'fast-xml-parser';
import { describe, expect, it } from 'vitest';
import { evaluateDesign, readDesignFile } from '../../src/design/index';
import { chartSpecFromReport, renderChart, renderSchematic } from '../../src/report/index';
import { scenarioExampleFiles } from '../helpers/examples';
import { REPORT } from './fixture';

interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}
interface TextItem {
  text: string;
  cls: string;
  box: Box;
}

type Node = Record<string, unknown>;

const parser = new XMLParser({
  preserveOrder: true,
  ignoreAttributes: false,
  attributeNamePrefix: '',
  processEntities: true,
  htmlEntities: true,
});

function attrsOf(node: Node): Record<string, string> {
  return (node[':@'] as Record<string, string> | undefined) ?? {};
}
function tagOf(node: Node): string | undefined {
  return Object.keys(node).find((k) => k !== ':@');
}
function textContent(children: unknown): string {
  if (!Array.isArray(children)) return '';
  return children
    .map((c: Node) => {
      const t = tagOf(c);
      if (t === '#text') return String(c['#text']);
      if (t === 'title') return '';
      return textContent(t === undefined ? [] : c[t]);
    })
    .join('');
}

/** Every text element's box, and the SVG size and plot areas. */
function measure(svg: string): {
  width: number;
  height: number;
  plots: Box[];
  texts: TextItem[];
} {
  const doc = parser.parse(svg) as Node[];
  const root = doc.find((n) => tagOf(n) === 'svg') as Node;
  const rootAttrs = attrsOf(root);
  const width = Number(rootAttrs['width']);
  const height = Number(rootAttrs['height']);
  const plots: Box[] = [];
  const texts: TextItem[] = [];
  const walk = (nodes: Node[], inherited: Record<string, string>): void => {
    for (const n of nodes) {
      const tag = tagOf(n);
      if (tag === undefined || tag === '#text') continue;
      const a = attrsOf(n);
      if (a['transform'] !== undefined && tag !== 'text') {
        // Groups with a transform hold swatches only; text there would need its offset.
        expect(textContent(n[tag]), `text inside a transformed <${tag}>`).toBe('');
      }
      const style = { ...inherited, ...a };
      if (tag === 'rect' && (a['class'] ?? '') === 'plot-area') {
        const x = Number(a['x']);
        const y = Number(a['y']);
        plots.push({ x0: x, y0: y, x1: x + Number(a['width']), y1: y + Number(a['height']) });
      }
      if (tag === 'text') {
        const content = textContent(n[tag]);
        const size = Number(style['font-size'] ?? 16);
        const w = Array.from(content).length * 0.56 * size;
        const anchor = style['text-anchor'] ?? 'start';
        const shift = anchor === 'middle' ? w / 2 : anchor === 'end' ? w : 0;
        const dy =
          a['dy'] === undefined
            ? 0
            : a['dy'].endsWith('em')
              ? Number.parseFloat(a['dy']) * size
              : Number(a['dy']);
        const lx = Number(a['x'] ?? 0) - shift;
        const ly = Number(a['y'] ?? 0) + dy;
        const local: Box = { x0: lx, y0: ly - 0.8 * size, x1: lx + w, y1: ly + 0.2 * size };
        let box = local;
        if (a['transform'] !== undefined) {
          const t = /translate\(([-\d.]+),\s*([-\d.]+)\)(?:\s*rotate\(([-\d.]+)\))?/.exec(
            a['transform'],
          );
          expect(t, a['transform']).not.toBeNull();
          const tx = Number(t?.[1]);
          const ty = Number(t?.[2]);
          const angle = Number(t?.[3] ?? 0);
          const corners = [
            [local.x0, local.y0],
            [local.x1, local.y0],
            [local.x0, local.y1],
            [local.x1, local.y1],
          ].map(([px = 0, py = 0]) => {
            if (angle === 90) return [tx - py, ty + px];
            if (angle === -90) return [tx + py, ty - px];
            expect(angle, 'only quarter turns are measured').toBe(0);
            return [tx + px, ty + py];
          });
          const xs = corners.map((c) => c[0] ?? 0);
          const ys = corners.map((c) => c[1] ?? 0);
          box = {
            x0: Math.min(...xs),
            y0: Math.min(...ys),
            x1: Math.max(...xs),
            y1: Math.max(...ys),
          };
        }
        texts.push({ text: content, cls: a['class'] ?? '', box });
        continue;
      }
      const children = n[tag];
      if (Array.isArray(children)) walk(children as Node[], style);
    }
  };
  walk(root['svg'] as Node[], rootAttrs);
  return { width, height, plots, texts };
}

const overlap = (a: Box, b: Box): boolean =>
  a.x0 < b.x1 - 1e-6 && b.x0 < a.x1 - 1e-6 && a.y0 < b.y1 - 1e-6 && b.y0 < a.y1 - 1e-6;
const within = (b: Box, o: Box): boolean =>
  b.x0 >= o.x0 - 1e-6 && b.x1 <= o.x1 + 1e-6 && b.y0 >= o.y0 - 1e-6 && b.y1 <= o.y1 + 1e-6;

/** The problems of one chart: overlaps, boxes outside, labels cut short. */
function problems(svg: string): string[] {
  const { width, height, plots, texts } = measure(svg);
  const found: string[] = [];
  const page: Box = { x0: 0, y0: 0, x1: width, y1: height };
  texts.forEach((t, i) => {
    if (t.text.includes('\u2026')) found.push(`cut short: "${t.text}"`);
    if (!within(t.box, page))
      found.push(`outside the drawing: "${t.text}" ${JSON.stringify(t.box)}`);
    if (t.cls === 'point-label' || t.cls === 'speed-label') {
      if (!plots.some((p) => within(t.box, p))) found.push(`outside the plot: "${t.text}"`);
    }
    for (let j = i + 1; j < texts.length; j++) {
      const u = texts[j];
      if (u !== undefined && overlap(t.box, u.box)) found.push(`"${t.text}" overlaps "${u.text}"`);
    }
  });
  return found;
}

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

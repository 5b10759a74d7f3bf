/**
 * The chart of an economic pipe size: bar lengths read back from the SVG are proportional to
 * the costs of the result, the economic size is highlighted, and no text overlaps, leaves the
 * drawing or is cut short (measured as in chart-layout.test.ts). The results are made by the
 * real `economicPipeSize` on the invented canal lift and pump catalogue of docs/examples.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { XMLParser } from 'fast-xml-parser';
import { describe, expect, it } from 'vitest';
import { readScenario } from '../../src/design/index';
import { pipeSize } from '../../src/pipes/index';
import { renderSizeChart } from '../../src/report/index';
import { economicPipeSize, readCatalogue } from '../../src/select/index';
import type { PipeSizeResult } from '../../src/select/types';
import { expectAbsolute, expectHeadflowError, expectRelative } from '../helpers/expect';
import { measure, problems } from '../helpers/svg-layout';

const DIR = join(__dirname, '../../docs/examples');
const design = readScenario(readFileSync(join(DIR, 'canal-lift.json'), 'utf8'));
const catalogue = readCatalogue(readFileSync(join(DIR, 'pump-catalogue.json'), 'utf8'), {
  source: 'pump-catalogue.json',
});
// Invented costs, as in docs/examples/select-canal-lift.ts.
const costs = { years: 20, discountRate: 0.05, energyEscalation: 0.02, maintenancePerYear: 300 };
const risingMain = {
  run: 'rising main',
  sizes: [
    { pipe: pipeSize('5', '40'), costPerLength: 95 },
    { pipe: pipeSize('6', '40'), costPerLength: 120 },
    { pipe: pipeSize('8', '40'), costPerLength: 175 },
  ],
};
const ONE_RUN = economicPipeSize(design, catalogue, { costs, runs: [risingMain] });
const TWO_RUNS = economicPipeSize(design, catalogue, {
  costs,
  runs: [
    {
      run: 'suction',
      sizes: [
        { pipe: pipeSize('8', '40'), costPerLength: 175 },
        { pipe: pipeSize('10', '40'), costPerLength: 240 },
      ],
    },
    risingMain,
  ],
});

const parser = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '' });

interface Bar {
  y: number;
  pipe: number;
  pump: number | undefined;
  pipeCost: number;
  pumpCost: number | undefined;
}

/** The bars of a chart, top to bottom: their lengths (px) and the costs they carry. */
function barsOf(svg: string): Bar[] {
  const rects = ([] as Record<string, string>[]).concat(
    (parser.parse(svg) as { svg: { rect: Record<string, string>[] } }).svg.rect,
  );
  const pipes = rects.filter((r) => r['class'] === 'pipe');
  const pumps = rects.filter((r) => r['class'] === 'pump');
  return pipes.map((p) => {
    const pump = pumps.find((q) => q['y'] === p['y']);
    return {
      y: Number(p['y']),
      pipe: Number(p['width']),
      pump: pump === undefined ? undefined : Number(pump['width']),
      pipeCost: Number(p['data-cost']),
      pumpCost: pump === undefined ? undefined : Number(pump['data-cost']),
    };
  });
}

/** The text of every size label (one per line of a wrapped label). */
const sizeTexts = (svg: string): string[] =>
  measure(svg)
    .texts.filter((t) => t.cls === 'size')
    .map((t) => t.text);

describe('renderSizeChart', () => {
  it('the real results have what the chart needs', () => {
    expect(ONE_RUN.table.length).toBe(3);
    expect(ONE_RUN.best).toBeDefined();
    expect(TWO_RUNS.table.length).toBe(6);
    for (const row of [...ONE_RUN.table, ...TWO_RUNS.table]) {
      expect(row.lifeCycleCost).toBeDefined();
    }
  });

  it('draws one bar per size, smallest first, lengths proportional to the costs', () => {
    const svg = renderSizeChart(ONE_RUN, { currency: 'EUR' });
    const bars = barsOf(svg);
    expect(bars.length).toBe(3);
    // Smallest size first: the rows sorted by pipe cost per metre are NPS 5, 6, 8.
    const rows = [...ONE_RUN.table].sort((a, b) => a.pipeCost - b.pipeCost);
    // px per currency unit, from the longest bar (the largest total).
    const longest = bars.reduce((a, b) => Math.max(a, b.pipe + (b.pump ?? 0)), 0);
    const scale = longest / Math.max(...rows.map((r) => r.lifeCycleCost ?? 0));
    bars.forEach((bar, i) => {
      const row = rows[i];
      if (row === undefined || row.lifeCycleCost === undefined) throw new Error('no row');
      expect(bar.pipeCost).toBe(row.pipeCost);
      expectRelative(bar.pumpCost ?? 0, row.lifeCycleCost - row.pipeCost, 1e-9);
      // Widths are written to 0.1 px (0.05 px each, 0.1 px for a stack, 0.1 px more for the
      // scale read from the longest bar): each within 0.25 px of its cost times one scale.
      expectAbsolute(bar.pipe, row.pipeCost * scale, 0.25, `pipe bar ${i}`);
      expectAbsolute(bar.pipe + (bar.pump ?? 0), row.lifeCycleCost * scale, 0.25, `total ${i}`);
    });
    expect(sizeTexts(svg)).toEqual(['NPS 5 (DN 125)', 'NPS 6 (DN 150)', 'NPS 8 (DN 200)']);
    expect(svg).toContain('Life-cycle cost, present value (EUR)');
  });

  it('highlights the economic size and no other', () => {
    const svg = renderSizeChart(ONE_RUN, { currency: 'EUR' });
    const best = ONE_RUN.best;
    expect(best?.sizes[0]?.nps).toBe('8');
    expect(svg.match(/class="economic"/g)?.length).toBe(1);
    expect(svg).toMatch(/font-weight="bold">NPS 8 \(DN 200\)</);
    expect(svg.match(/, economic size</g)?.length).toBe(1);
    const total = Math.round(best?.lifeCycleCost ?? 0);
    expect(svg).toContain(
      `${String(total).replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009')}, economic size`,
    );
    // The highlight band holds the economic bar.
    const band =
      /<rect class="economic" x="[\d.]+" y="([\d.]+)" width="[\d.]+" height="([\d.]+)"/.exec(svg);
    const y = Number(band?.[1]);
    const h = Number(band?.[2]);
    const last = barsOf(svg)[2];
    expect(last?.y).toBeGreaterThan(y);
    expect((last?.y ?? 0) + 16).toBeLessThan(y + h);
  });

  it('with several runs: one bar per combination, labelled with every size, sorted by total', () => {
    const svg = renderSizeChart(TWO_RUNS, { currency: 'EUR' });
    const bars = barsOf(svg);
    expect(bars.length).toBe(6);
    const totals = bars.map((b) => b.pipeCost + (b.pumpCost ?? 0));
    const expected = TWO_RUNS.table.map((r) => r.lifeCycleCost ?? 0).sort((a, b) => a - b);
    totals.forEach((t, i) => {
      expectRelative(t, expected[i] ?? 0, 1e-9);
    });
    const labels = sizeTexts(svg).join(' ');
    for (const row of TWO_RUNS.table) {
      for (const s of row.sizes) expect(labels).toContain(`${s.run} NPS ${s.nps}`);
    }
    // The economic combination is the first bar and the highlighted one.
    expect(svg.match(/class="economic"/g)?.length).toBe(1);
    expect(svg.indexOf('class="economic"')).toBeLessThan(svg.indexOf('class="pipe"'));
  });

  it('no text overlaps, leaves the drawing or is cut short, at any width', () => {
    for (const result of [ONE_RUN, TWO_RUNS]) {
      for (const width of [100, 240, 400, 800, 1600, 20_000]) {
        const long = 'A much longer title than the chart is wide, to be wrapped onto lines';
        for (const title of [undefined, long]) {
          const svg = renderSizeChart(result, { width, currency: 'EUR', ...(title && { title }) });
          expect(problems(svg), `width ${width}`).toEqual([]);
          const m = measure(svg);
          expect(m.width).toBeGreaterThanOrEqual(width);
          // Every label kept whole: the title's words and every size are all there.
          const all = m.texts.map((t) => t.text).join(' ');
          for (const word of (title ?? 'Life-cycle cost against pipe size').split(' ')) {
            expect(all).toContain(word);
          }
        }
      }
    }
  });

  it('shows a combination with no passing pump by its pipe cost', () => {
    const row = ONE_RUN.table[0];
    if (row === undefined) throw new Error('no row');
    const failing: PipeSizeResult = {
      ...ONE_RUN,
      table: [{ ...row, best: undefined, lifeCycleCost: undefined }, ...ONE_RUN.table.slice(1)],
    };
    const svg = renderSizeChart(failing);
    expect(svg).toContain('no pump passes');
    expect(barsOf(svg).filter((b) => b.pump === undefined).length).toBe(1);
    expect(svg).toContain('(currency of the prices)');
    expect(problems(svg)).toEqual([]);
  });

  it('refuses hostile input with a HeadflowError', () => {
    const row = ONE_RUN.table[0];
    const bad: unknown[] = [
      null,
      undefined,
      42,
      'table',
      [],
      {},
      { ...ONE_RUN, table: [] },
      { ...ONE_RUN, table: 'rows' },
      { ...ONE_RUN, table: [null] },
      { ...ONE_RUN, table: [{ ...row, pipeCost: Number.NaN }] },
      { ...ONE_RUN, table: [{ ...row, pipeCost: -1 }] },
      { ...ONE_RUN, table: [{ ...row, lifeCycleCost: Number.POSITIVE_INFINITY }] },
      { ...ONE_RUN, table: [{ ...row, lifeCycleCost: 1 }] },
      { ...ONE_RUN, table: [{ ...row, sizes: [] }] },
      { ...ONE_RUN, table: [{ ...row, sizes: [{ run: 'x', nps: 6 }] }] },
      { ...ONE_RUN, table: [{ ...row, pipeCost: 0, lifeCycleCost: undefined }] },
      // biome-ignore lint/suspicious/noSparseArray: a hole on purpose
      { ...ONE_RUN, table: [, row] },
    ];
    for (const input of bad) {
      expectHeadflowError(() => renderSizeChart(input as PipeSizeResult), 'INVALID_ARGUMENT');
    }
    for (const options of [
      42,
      'wide',
      { width: 99 },
      { width: 20_001 },
      { width: Number.NaN },
      { currency: 5 },
      { title: {} },
    ]) {
      expectHeadflowError(() => renderSizeChart(ONE_RUN, options as never), 'INVALID_ARGUMENT');
    }
    expect(renderSizeChart(ONE_RUN, null)).toBe(renderSizeChart(ONE_RUN));
  });

  it('escapes the names of runs', () => {
    const row = TWO_RUNS.table[0];
    if (row === undefined) throw new Error('no row');
    const odd: PipeSizeResult = {
      ...TWO_RUNS,
      table: [{ ...row, sizes: row.sizes.map((s) => ({ ...s, run: `<${s.run} & "x">` })) }],
    };
    const svg = renderSizeChart(odd);
    expect(svg).toContain('&lt;suction &amp; &quot;x&quot;&gt;');
    expect(problems(svg)).toEqual([]);
  });
});

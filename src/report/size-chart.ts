/**
 * The SVG chart of an economic pipe size: life-cycle cost against the pipe size, one bar per
 * combination of sizes, the installed cost of the pipe and the pump's life-cycle cost stacked,
 * the total written at the end of each bar, and the economic size highlighted.
 *
 * @module
 */
import { scaleLinear } from 'd3-scale';
import { HeadflowError } from '../errors';
import { guardArray, guardOptions, guardRange, guardRecord, guardString } from '../guards';
import { resolveNominalSize } from '../pipes/nominal-size';
import type { PipeSizeResult } from '../select/types';
import { type Box, EM_WIDTH, textWidth, wrapText } from './chart-text';
import { escapeXml, fmt } from './chart-xml';

/** Options of {@link renderSizeChart}. */
export interface SizeChartOptions {
  /** Width of the chart, px (100 to 20000, default 800); widened where its labels need room. */
  readonly width?: number;
  /** Currency of the costs, written in the axis label (default 'currency of the prices'). */
  readonly currency?: string | undefined;
  /** Title (default 'Life-cycle cost against pipe size'). */
  readonly title?: string;
}

/** One bar of the chart, checked and labelled. */
interface Bar {
  readonly label: string;
  readonly pipe: number;
  readonly total: number | undefined;
  readonly best: boolean;
  readonly inches: number;
}

const FONT = 12;
const TITLE = 16;
const LINE = 15;
const PAD = 12;
const PIPE_FILL = '#8c6d46';
const PUMP_FILL = '#4f7fb8';
const HIGHLIGHT = '#fff2b3';

/** A size as the trade writes it: 'NPS 6 (DN 150)', or the text given when it is not an NPS. */
function sizeLabel(nps: string): { text: string; inches: number } {
  let resolved: ReturnType<typeof resolveNominalSize>;
  try {
    resolved = resolveNominalSize(nps, 'nps');
  } catch {
    resolved = undefined;
  }
  if (resolved === undefined) return { text: nps, inches: Number.POSITIVE_INFINITY };
  if (Number.isNaN(resolved.inches)) return { text: `DN ${resolved.dn}`, inches: Number.NaN };
  const dn = resolved.dn === undefined || resolved.dn === 0 ? '' : ` (DN ${resolved.dn})`;
  return { text: `NPS ${resolved.nps}${dn}`, inches: resolved.inches };
}

/** A cost with a thin space between groups of three digits: 226 894. */
function money(value: number): string {
  const r = Math.round(value);
  const digits = String(Math.abs(r));
  const grouped = digits.replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009');
  return r < 0 ? `\u2212${grouped}` : grouped;
}

/** The sizes of a row as one string, to find the best row in the table (or undefined). */
function keyOf(row: Readonly<Record<string, unknown>>): string | undefined {
  const sizes = row['sizes'];
  if (!Array.isArray(sizes)) return undefined;
  const text = (v: unknown): string => (typeof v === 'string' ? JSON.stringify(v) : '?');
  return sizes
    .map((s: unknown) => {
      if (typeof s !== 'object' || s === null) return '?';
      const size = s as Record<string, unknown>;
      return `${text(size['run'])}:${text(size['nps'])}`;
    })
    .join(',');
}

/** Reads and checks the rows of a result, in the order they are drawn. */
function barsOf(result: unknown): { bars: Bar[]; several: boolean } {
  const r = guardRecord('result', result);
  const table = guardArray('result.table', r['table'], { min: 1 });
  const bestRow =
    r['best'] === undefined || r['best'] === null
      ? undefined
      : guardRecord('result.best', r['best']);
  const bestKey = bestRow === undefined ? undefined : keyOf(bestRow);
  const bars: Bar[] = [];
  let several = false;
  table.forEach((item, i) => {
    const at = `result.table[${i}]`;
    const row = guardRecord(at, item);
    const sizes = guardArray(`${at}.sizes`, row['sizes'], { min: 1, max: 1000 });
    if (sizes.length > 1) several = true;
    const parts: string[] = [];
    let inches = Number.POSITIVE_INFINITY;
    sizes.forEach((s, j) => {
      const size = guardRecord(`${at}.sizes[${j}]`, s);
      const run = guardString(`${at}.sizes[${j}].run`, size['run']);
      const label = sizeLabel(guardString(`${at}.sizes[${j}].nps`, size['nps']));
      inches = label.inches;
      parts.push(sizes.length > 1 ? `${run} ${label.text}` : label.text);
    });
    const pipe = guardRange(`${at}.pipeCost`, row['pipeCost'], { min: 0, max: 1e15 });
    const total =
      row['lifeCycleCost'] === undefined || row['lifeCycleCost'] === null
        ? undefined
        : guardRange(`${at}.lifeCycleCost`, row['lifeCycleCost'], { min: pipe, max: 1e15 });
    bars.push({
      label: parts.join(', '),
      pipe,
      total,
      best: item === bestRow || (bestKey !== undefined && keyOf(row) === bestKey),
      inches,
    });
  });
  return { bars, several };
}

/**
 * Renders the life-cycle cost of each combination of pipe sizes of an economic pipe size
 * (`economicPipeSize`) as one self-contained SVG: a horizontal bar per combination, the
 * installed cost of the pipe and the best pump's life-cycle cost stacked, the total written at
 * the end of the bar, and the economic size highlighted. With one run the bars go from the
 * smallest size to the largest; with several runs each bar is labelled with the size of every
 * run and the bars are sorted by total, least first. A combination with no passing pump shows
 * its pipe cost only, marked 'no pump passes'. Every label is kept whole (wrapped, never cut);
 * the chart is widened where its labels need more room than `width` gives.
 *
 * Costs are present values in the currency of the prices; the chart is an aid to a decision
 * that stays with a competent engineer under the local codes.
 *
 * @param result - The result of `economicPipeSize`, with at least one row.
 * @param options - Width (px), the currency's name for the axis label, and a title.
 * @returns The SVG document as a string.
 * @throws HeadflowError `INVALID_ARGUMENT` for a result with no rows or a malformed row
 *   (costs must be finite, >= 0, and a total no less than its pipe cost), or an option out of
 *   range.
 * @example
 * ```ts
 * const sizing = economicPipeSize(design, catalogue, { costs, runs });
 * const svg = renderSizeChart(sizing, { currency: 'EUR' });
 * svg.startsWith('<?xml'); // true; one bar per size, NPS 5 (DN 125) to NPS 8 (DN 200)
 * ```
 */
export function renderSizeChart(result: PipeSizeResult, options?: SizeChartOptions | null): string {
  const o = guardOptions<SizeChartOptions>('options', options);
  const asked =
    o.width === undefined
      ? 800
      : guardRange('options.width', o.width, { min: 100, max: 20_000, unit: 'px' });
  const currency =
    o.currency === undefined
      ? 'currency of the prices'
      : guardString('options.currency', o.currency);
  const title =
    o.title === undefined
      ? 'Life-cycle cost against pipe size'
      : guardString('options.title', o.title);
  const { bars, several } = barsOf(result);
  if (several) {
    bars.sort(
      (a, b) => (a.total ?? Number.POSITIVE_INFINITY) - (b.total ?? Number.POSITIVE_INFINITY),
    );
  } else {
    bars.sort((a, b) =>
      Number.isNaN(a.inches) || Number.isNaN(b.inches) ? 0 : a.inches - b.inches,
    );
  }
  const maxCost = Math.max(...bars.map((b) => b.total ?? b.pipe));
  if (!(maxCost > 0)) {
    throw new HeadflowError('INVALID_ARGUMENT', 'result.table has no cost above zero to draw.', {
      parameter: 'result.table',
      allowed: 'a row with a cost > 0',
    });
  }

  // --- room for the labels: the size column wraps at about 28 characters, the end labels
  // ("226 894, economic size") stand whole to the right of the longest bar.
  const colChars = several ? 28 : 20;
  const labelLines = bars.map((b) => wrapText(b.label, colChars));
  const colW = Math.max(...labelLines.flat().map((l) => textWidth(l, FONT)));
  const endText = (b: Bar): string =>
    b.total === undefined
      ? `${money(b.pipe)}, no pump passes`
      : `${money(b.total)}${b.best ? ', economic size' : ''}`;
  const endW = Math.max(...bars.map((b) => textWidth(endText(b), FONT)));
  const tickW = textWidth(money(maxCost * 2), FONT);
  const minPlot = 120;
  const width = Math.ceil(Math.max(asked, PAD + colW + 10 + minPlot + endW + 8 + PAD));
  const x0 = PAD + colW + 10;
  const x1 = width - PAD - Math.max(endW + 8, tickW / 2);

  // --- title and legend, wrapped to the width
  const parts: string[] = [];
  const titleLines = wrapText(title, (width - 2 * PAD) / (EM_WIDTH * TITLE));
  let y = PAD + 0.8 * TITLE;
  for (const line of titleLines) {
    parts.push(
      `<text x="${PAD}" y="${fmt(y)}" font-size="${TITLE}" font-weight="bold">${escapeXml(line)}</text>`,
    );
    y += 20;
  }
  const legend: { fill: string; text: string }[] = [
    { fill: PIPE_FILL, text: 'installed cost of the pipe' },
    { fill: PUMP_FILL, text: 'life-cycle cost of the best pump' },
    { fill: HIGHLIGHT, text: 'economic size (least total)' },
  ];
  let lx = PAD;
  y += 4;
  for (const item of legend) {
    const w = 18 + textWidth(item.text, FONT);
    if (lx > PAD && lx + w > width - PAD) {
      lx = PAD;
      y += LINE + 4;
    }
    parts.push(
      `<rect x="${fmt(lx)}" y="${fmt(y - 10)}" width="12" height="12" fill="${item.fill}" stroke="#555" stroke-width="0.5"/>`,
      `<text x="${fmt(lx + 18)}" y="${fmt(y)}" font-size="${FONT}">${escapeXml(item.text)}</text>`,
    );
    lx += w + 16;
  }
  const plotTop = y + 14;

  // --- the bars
  const x = scaleLinear().domain([0, maxCost]).nice().range([x0, x1]);
  const rows: string[] = [];
  let rowTop = plotTop;
  bars.forEach((b, i) => {
    const lines = labelLines[i] ?? [];
    const h = Math.max(30, lines.length * LINE + 12);
    const mid = rowTop + h / 2;
    if (b.best) {
      rows.push(
        `<rect class="economic" x="${fmt(PAD)}" y="${fmt(rowTop + 1)}" width="${fmt(width - 2 * PAD)}" height="${fmt(h - 2)}" fill="${HIGHLIGHT}"/>`,
      );
    }
    const firstBase = mid - ((lines.length - 1) * LINE) / 2 + 0.3 * FONT;
    lines.forEach((line, k) => {
      rows.push(
        `<text class="size" x="${fmt(PAD)}" y="${fmt(firstBase + k * LINE)}" font-size="${FONT}"${b.best ? ' font-weight="bold"' : ''}>${escapeXml(line)}</text>`,
      );
    });
    const barTop = mid - 8;
    const pipeEnd = x(b.pipe);
    rows.push(
      `<rect class="pipe" data-cost="${b.pipe}" x="${fmt(x0)}" y="${fmt(barTop)}" width="${fmt(pipeEnd - x0)}" height="16" fill="${PIPE_FILL}"/>`,
    );
    let end = pipeEnd;
    if (b.total !== undefined) {
      end = x(b.total);
      rows.push(
        `<rect class="pump" data-cost="${b.total - b.pipe}" x="${fmt(pipeEnd)}" y="${fmt(barTop)}" width="${fmt(end - pipeEnd)}" height="16" fill="${PUMP_FILL}"/>`,
        `<line class="total" x1="${fmt(end)}" x2="${fmt(end)}" y1="${fmt(barTop - 3)}" y2="${fmt(barTop + 19)}" stroke="#222" stroke-width="${b.best ? 2.5 : 1.5}"/>`,
      );
    }
    rows.push(
      `<text class="end" x="${fmt(end + 6)}" y="${fmt(mid + 0.3 * FONT)}" font-size="${FONT}"${b.best ? ' font-weight="bold"' : ''}>${escapeXml(endText(b))}</text>`,
    );
    rowTop += h;
  });
  const plotBottom = rowTop;

  // --- the cost axis: ticks spaced so that their labels never touch
  const count = Math.max(2, Math.floor((x1 - x0) / (tickW + 24)));
  const ticks = x.ticks(count);
  const axis: string[] = [
    `<line x1="${fmt(x0)}" x2="${fmt(x0)}" y1="${fmt(plotTop)}" y2="${fmt(plotBottom)}" stroke="#222"/>`,
    `<line x1="${fmt(x0)}" x2="${fmt(x1)}" y1="${fmt(plotBottom)}" y2="${fmt(plotBottom)}" stroke="#222"/>`,
  ];
  const grid: string[] = [];
  let lastRight = Number.NEGATIVE_INFINITY;
  for (const t of ticks) {
    const tx = x(t);
    const text = money(t);
    const w = textWidth(text, FONT);
    grid.push(
      `<line x1="${fmt(tx)}" x2="${fmt(tx)}" y1="${fmt(plotTop)}" y2="${fmt(plotBottom + 4)}" stroke="#ccc" stroke-width="0.5"/>`,
    );
    if (tx - w / 2 < lastRight + 6 || tx + w / 2 > width - PAD) continue;
    axis.push(
      `<text class="tick" x="${fmt(tx)}" y="${fmt(plotBottom + 18)}" font-size="${FONT}" text-anchor="middle">${escapeXml(text)}</text>`,
    );
    lastRight = tx + w / 2;
  }
  const axisTitle = `Life-cycle cost, present value (${currency})`;
  const axisLines = wrapText(axisTitle, (width - 2 * PAD) / (EM_WIDTH * FONT));
  let ay = plotBottom + 40;
  for (const line of axisLines) {
    axis.push(
      `<text class="axis" x="${fmt(PAD)}" y="${fmt(ay)}" font-size="${FONT}">${escapeXml(line)}</text>`,
    );
    ay += LINE;
  }
  const height = Math.ceil(ay - LINE + 0.2 * FONT + PAD);
  const area: Box = { x0: 0, y0: 0, x1: width, y1: height };
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" width="${fmt(area.x1)}" height="${fmt(area.y1)}" viewBox="0 0 ${fmt(area.x1)} ${fmt(area.y1)}" font-family="sans-serif" role="img">`,
    `<title>${escapeXml(title)}</title>`,
    `<rect width="${fmt(width)}" height="${fmt(height)}" fill="#fff"/>`,
    ...parts,
    ...grid,
    ...rows,
    ...axis,
    '</svg>',
    '',
  ].join('\n');
}

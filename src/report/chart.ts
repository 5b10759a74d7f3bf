/**
 * The pump-selection chart: pump, system, efficiency and NPSH curves, operating points and
 * preferred operating regions, drawn as one self-contained SVG document.
 *
 * @module
 */
import { type ScaleLinear, scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { guardOptions } from '../guards';
import { type Flow, type Length, to } from '../units/index';
import { placeLabels } from './chart-labels';
import type { ChartOptions, ChartPoint, ChartSeries, ChartSpec } from './chart-spec';
import { validateChart } from './chart-validate';
import { escapeXml, fmt, fmtValue, truncate } from './chart-xml';

/**
 * Colours of the candidates, in order: the Okabe-Ito palette (M. Okabe and K. Ito, 2008,
 * "Color Universal Design (CUD): how to make figures and presentations that are friendly to
 * colorblind people"; republished by B. Wong, 2011, "Points of view: Color blindness", Nature
 * Methods 8, 441), hex values from memory. Black is kept for system curves and NPSH available;
 * yellow comes last because it shows weakly on white.
 */
const PALETTE = ['#0072B2', '#D55E00', '#009E73', '#CC79A7', '#E69F00', '#56B4E9', '#F0E442'];

/** Dash patterns of the operating cases (system curves and NPSH available share them). */
const CASE_DASHES = ['8 4', '12 3 2 3', '4 3', '16 4 4 4', '2 2 8 2'];

const FONT = 12;
const CHAR_WIDTH = 0.6 * FONT; // a fair average for proportional sans-serif text
const LABEL_CHARS = 40;
const LABEL_CHAR = 0.6 * 11; // operating-point labels are 11 px
const LEGEND_ROW = 18;

const colour = (i: number): string => PALETTE[i % PALETTE.length] ?? '#000';

/**
 * The colour index of each series and band: by its `group` where it has one (all curves of a
 * candidate share the group's colour, groups numbered in order of first appearance), else by
 * its position in its own list.
 */
function colourIndex(
  spec: ChartSpec,
): (item: { readonly group?: string }, position: number) => number {
  const groups: string[] = [];
  const lists = [spec.pumpCurves, spec.efficiencyCurves, spec.npshRequired, spec.preferredRegions];
  for (const list of lists) {
    for (const item of list) {
      if (item.group !== undefined && !groups.includes(item.group)) groups.push(item.group);
    }
  }
  return (item, position) => (item.group === undefined ? position : groups.indexOf(item.group));
}
const dash = (i: number): string => CASE_DASHES[i % CASE_DASHES.length] ?? '';

/** One line of the legend. */
interface LegendEntry {
  readonly label: string;
  readonly title: string;
  readonly swatch: string;
}

type Scale = ScaleLinear<number, number>;

/** A linear scale over [lo, hi] (widened when empty), niced to about `count` ticks. */
function niceScale(lo: number, hi: number, range: [number, number], count: number): Scale {
  const top = hi > lo ? hi : lo + 1;
  return scaleLinear().domain([lo, top]).range(range).nice(count);
}

/** Min and max of a list, with the given start values. */
function extent(values: Iterable<number>, lo: number, hi: number): [number, number] {
  let a = lo;
  let b = hi;
  for (const v of values) {
    if (v < a) a = v;
    if (v > b) b = v;
  }
  return [a, b];
}

function tickCount(pixels: number, spacing: number): number {
  return Math.max(2, Math.round(pixels / spacing));
}

/**
 * Draws the pump curves of a selection against the system curves of its operating cases, as
 * one self-contained SVG 1.1 document.
 *
 * What it shows, top to bottom: the title; the head panel with the preferred operating
 * regions as translucent bands, pump curves (solid, one colour per candidate), system curves
 * (black, one dash pattern per case), operating points (circles with a label and a tooltip of
 * their flow and head) and, when given, efficiency curves (dotted) on a secondary axis in %
 * (0 to 100) on the right; when NPSH curves are given, a lower panel with NPSH required
 * (solid, candidate colours) and NPSH available (black, the case's dash pattern) on its own
 * axis; the flow axis; a legend. Axes are in `spec.units` (NPSH in the head unit); ticks and
 * tick labels come from d3 linear scales. The flow axis runs from 0 to the largest flow of any
 * series, point or band; the head axis from 0 (or the lowest head, if below 0) to the largest
 * head; both niced. Colours follow the list order of each kind (the first pump curve, the
 * first efficiency curve and the first band share a colour), from the colour-blind-safe
 * Okabe-Ito palette.
 *
 * Every drawn item can be found by its class and `data-name`: `path.pump-curve`,
 * `path.system-curve`, `path.efficiency-curve`, `path.npsh-required`, `path.npsh-available`,
 * `circle.operating-point`, `rect.preferred-region`. All text is escaped; characters XML cannot
 * carry become U+FFFD. Coordinates have at most one decimal. The output depends only on the
 * input (no ids, dates or random numbers), so the same spec gives the same string. Names
 * longer than 40 characters are shortened in labels and the legend (the full name stays in
 * `data-name` and in a tooltip). Text widths are estimated, not measured.
 *
 * @param spec - the curves, points and bands, in coherent SI (flow m3/s, head and NPSH m,
 *   efficiency a fraction 0..1), and the display units
 * @param options - `width` and `height` in px (defaults 800 x 600)
 * @returns the SVG document, starting with an XML declaration
 * @throws HeadflowError `INVALID_ARGUMENT` naming the path of the value (for example
 *   `pumpCurves[1].points[3].value`) for a non-finite number, a negative flow,
 *   an efficiency outside 0..1, a band with `maxFlow < minFlow`, a series with fewer than 2
 *   points, a spec without any curve, or a width or height outside 100 to 20000 px; `UNKNOWN_UNIT` or
 *   `WRONG_DIMENSION` for `units.flow` / `units.head`.
 * @example
 * ```ts
 * const svg = renderChart({
 *   title: 'Orchard booster',
 *   units: { flow: 'L/s', head: 'm' },
 *   pumpCurves: [{ name: 'candidate A', points: [{ flow: 0, value: 40 }, { flow: 0.03, value: 22 }] }],
 *   systemCurves: [{ name: 'high tank', points: [{ flow: 0, value: 12 }, { flow: 0.03, value: 30 }] }],
 *   operatingPoints: [{ name: 'A / high tank', flow: 0.0233, head: 26 }],
 *   preferredRegions: [{ name: 'candidate A', minFlow: 0.015, maxFlow: 0.027 }],
 *   efficiencyCurves: [],
 *   npshRequired: [],
 * });
 * svg.startsWith('<?xml'); // true; axes "Flow (L/s)" 0 to 30 and "Head (m)" 0 to 40
 * ```
 */
export function renderChart(spec: ChartSpec, options?: ChartOptions | null): string {
  const o = guardOptions<ChartOptions>('options', options) as ChartOptions;
  validateChart(spec, o);
  const width = o.width ?? 800;
  const height = o.height ?? 600;
  const fu = spec.units.flow;
  const hu = spec.units.head;
  const flowOf = (si: number): number => to(si as Flow, fu);
  const headOf = (si: number): number => to(si as Length, hu);
  const npshA = spec.npshAvailable ?? [];
  const hasEff = spec.efficiencyCurves.length > 0;
  const hasNpsh = spec.npshRequired.length > 0 || npshA.length > 0;

  // --- legend (built first: its height shapes the layout)
  const legend: LegendEntry[] = [];
  const lineSwatch = (stroke: string, dasharray: string, w = 2): string =>
    `<path d="M0,0H24" stroke="${stroke}" stroke-width="${w}"${dasharray ? ` stroke-dasharray="${dasharray}"` : ''}/>`;
  const add = (name: string, kind: string, swatch: string): void => {
    const full = kind ? `${name} (${kind})` : name;
    legend.push({ label: truncate(full, LABEL_CHARS), title: full, swatch });
  };
  const hue = colourIndex(spec);
  for (const [i, s] of spec.pumpCurves.entries())
    add(s.name, '', lineSwatch(colour(hue(s, i)), ''));
  for (const [i, s] of spec.systemCurves.entries()) {
    add(s.name, 'system', lineSwatch('#000', dash(i), 1.5));
  }
  for (const [i, s] of spec.efficiencyCurves.entries()) {
    add(s.name, 'efficiency', lineSwatch(colour(hue(s, i)), '1 3'));
  }
  for (const [i, s] of spec.npshRequired.entries()) {
    add(s.name, 'NPSH required', lineSwatch(colour(hue(s, i)), ''));
  }
  for (const [i, s] of npshA.entries()) {
    add(s.name, 'NPSH available', lineSwatch('#555', dash(i), 1.5));
  }
  for (const [i, b] of spec.preferredRegions.entries()) {
    const c = colour(hue(b, i));
    const swatch = `<rect x="2" y="-6" width="20" height="12" fill="${c}" fill-opacity="0.13" stroke="${c}" stroke-opacity="0.6" stroke-dasharray="3 3"/>`;
    add(b.name, 'preferred region', swatch);
  }
  if (spec.operatingPoints.length > 0) {
    legend.push({
      label: 'Operating point',
      title: 'Operating point',
      swatch: '<circle cx="12" cy="0" r="4" fill="#fff" stroke="#000" stroke-width="1.5"/>',
    });
  }
  const pad = 12;
  const longest = legend.reduce((n, e) => Math.max(n, Array.from(e.label).length), 0);
  const legendCol = Math.min(width - 2 * pad, 36 + CHAR_WIDTH * longest);
  const legendCols = Math.max(1, Math.floor((width - 2 * pad) / Math.max(1, legendCol)));
  const legendRows = Math.ceil(legend.length / legendCols);
  const legendHeight = legendRows * LEGEND_ROW + 8;

  // --- layout
  const left = 70;
  const right = width - (hasEff ? 64 : 24);
  const top = 44;
  const xAxisHeight = 44;
  const gap = hasNpsh ? 20 : 0;
  const plotHeight = Math.max(40, height - top - xAxisHeight - legendHeight - pad - gap);
  const mainHeight = hasNpsh ? Math.round(plotHeight * 0.7) : plotHeight;
  const mainBottom = top + mainHeight;
  const npshTop = mainBottom + gap;
  const npshBottom = npshTop + (plotHeight - mainHeight);
  const axisBottom = hasNpsh ? npshBottom : mainBottom;

  // --- scales, in the user's units
  const allSeries: readonly ChartSeries[] = [
    ...spec.pumpCurves,
    ...spec.systemCurves,
    ...spec.efficiencyCurves,
    ...spec.npshRequired,
    ...npshA,
  ];
  const flows = [
    ...allSeries.flatMap((s) => s.points.map((p) => p.flow)),
    ...spec.operatingPoints.map((m) => m.flow),
    ...spec.preferredRegions.map((b) => b.maxFlow),
  ];
  const heads = [
    ...[...spec.pumpCurves, ...spec.systemCurves].flatMap((s) => s.points.map((p) => p.value)),
    ...spec.operatingPoints.map((m) => m.head),
  ];
  const npshValues = [...spec.npshRequired, ...npshA].flatMap((s) => s.points.map((p) => p.value));
  const xTicks = tickCount(right - left, 80);
  const x = niceScale(0, flowOf(extent(flows, 0, 0)[1]), [left, right], xTicks);
  const [hLo, hHi] = extent(heads, 0, 0);
  const yTicks = tickCount(mainHeight, 50);
  const y = niceScale(headOf(hLo), headOf(hHi), [mainBottom, top], yTicks);
  const effTicks = 5;
  const yEff = scaleLinear().domain([0, 100]).range([mainBottom, top]);
  const [nLo, nHi] = extent(npshValues, 0, 0);
  const npshTicks = tickCount(npshBottom - npshTop, 40);
  const yNpsh = niceScale(headOf(nLo), headOf(nHi), [npshBottom, npshTop], npshTicks);

  const out: string[] = [];
  const push = (s: string): void => {
    out.push(s);
  };

  // --- document
  push('<?xml version="1.0" encoding="UTF-8"?>');
  push(
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${fmt(width)}" height="${fmt(height)}" viewBox="0 0 ${fmt(width)} ${fmt(height)}" font-family="system-ui, -apple-system, 'Segoe UI', Helvetica, Arial, sans-serif" font-size="${FONT}" role="img" aria-labelledby="chart-title">`,
  );
  push(`<title id="chart-title">${escapeXml(spec.title)}</title>`);
  push(
    `<desc>Pump and system curves against flow in ${escapeXml(fu)}; head in ${escapeXml(hu)}.</desc>`,
  );
  push(`<rect width="${fmt(width)}" height="${fmt(height)}" fill="#fff"/>`);
  push(
    `<text class="chart-title" x="${fmt(width / 2)}" y="26" text-anchor="middle" font-size="16" font-weight="bold">${escapeXml(truncate(spec.title, 90))}</text>`,
  );

  // --- grid and axes
  const xTickValues = x.ticks(xTicks);
  const xFormat = x.tickFormat(xTicks);
  const verticalGrid = (y0: number, y1: number): string =>
    xTickValues.map((t) => `M${fmt(x(t))},${fmt(y0)}V${fmt(y1)}`).join('');
  const horizontalGrid = (scale: Scale, count: number): string =>
    scale
      .ticks(count)
      .map((t) => `M${fmt(left)},${fmt(scale(t))}H${fmt(right)}`)
      .join('');
  const leftAxis = (scale: Scale, count: number, label: string, cls: string): void => {
    const [r0, r1] = scale.range() as [number, number];
    const format = scale.tickFormat(count);
    push(`<g class="axis ${cls}" text-anchor="end">`);
    push(`<path d="M${fmt(left)},${fmt(r0)}V${fmt(r1)}" stroke="#000"/>`);
    for (const t of scale.ticks(count)) {
      const py = fmt(scale(t));
      push(
        `<path d="M${fmt(left - 5)},${py}H${fmt(left)}" stroke="#000"/><text x="${fmt(left - 8)}" y="${py}" dy="0.32em">${escapeXml(format(t))}</text>`,
      );
    }
    const cy = fmt((r0 + r1) / 2);
    push(
      `<text class="axis-label" transform="translate(18,${cy}) rotate(-90)" text-anchor="middle">${escapeXml(label)}</text>`,
    );
    push('</g>');
  };

  push('<g class="grid" fill="none" stroke="#e3e3e3" stroke-width="1">');
  push(`<path d="${verticalGrid(top, mainBottom)}${horizontalGrid(y, yTicks)}"/>`);
  if (hasNpsh) {
    push(`<path d="${verticalGrid(npshTop, npshBottom)}${horizontalGrid(yNpsh, npshTicks)}"/>`);
  }
  push('</g>');

  // --- preferred regions
  if (spec.preferredRegions.length > 0) {
    push(
      '<g class="preferred-regions" fill-opacity="0.13" stroke-opacity="0.6" stroke-dasharray="3 3">',
    );
    spec.preferredRegions.forEach((b, i) => {
      const x0 = x(flowOf(b.minFlow));
      const x1 = x(flowOf(b.maxFlow));
      push(
        `<rect class="preferred-region" data-name="${escapeXml(b.name)}" x="${fmt(x0)}" y="${fmt(top)}" width="${fmt(x1 - x0)}" height="${fmt(mainHeight)}" fill="${colour(hue(b, i))}" stroke="${colour(hue(b, i))}"><title>${escapeXml(`${b.name}: preferred region ${fmtValue(flowOf(b.minFlow))} to ${fmtValue(flowOf(b.maxFlow))} ${fu}`)}</title></rect>`,
      );
    });
    push('</g>');
  }

  leftAxis(y, yTicks, `Head (${hu})`, 'axis-head');
  if (hasEff) {
    const format = yEff.tickFormat(effTicks);
    push('<g class="axis axis-efficiency" text-anchor="start">');
    push(`<path d="M${fmt(right)},${fmt(mainBottom)}V${fmt(top)}" stroke="#000"/>`);
    for (const t of yEff.ticks(effTicks)) {
      const py = fmt(yEff(t));
      push(
        `<path d="M${fmt(right)},${py}H${fmt(right + 5)}" stroke="#000"/><text x="${fmt(right + 8)}" y="${py}" dy="0.32em">${escapeXml(format(t))}</text>`,
      );
    }
    push(
      `<text class="axis-label" transform="translate(${fmt(width - 14)},${fmt((top + mainBottom) / 2)}) rotate(90)" text-anchor="middle">Efficiency (%)</text>`,
    );
    push('</g>');
  }
  if (hasNpsh) leftAxis(yNpsh, npshTicks, `NPSH (${hu})`, 'axis-npsh');

  push('<g class="axis axis-flow" text-anchor="middle">');
  push(`<path d="M${fmt(left)},${fmt(axisBottom)}H${fmt(right)}" stroke="#000"/>`);
  if (hasNpsh) push(`<path d="M${fmt(left)},${fmt(mainBottom)}H${fmt(right)}" stroke="#000"/>`);
  for (const t of xTickValues) {
    const px = fmt(x(t));
    push(
      `<path d="M${px},${fmt(axisBottom)}v5" stroke="#000"/><text x="${px}" y="${fmt(axisBottom + 18)}">${escapeXml(xFormat(t))}</text>`,
    );
  }
  push(
    `<text class="axis-label" x="${fmt((left + right) / 2)}" y="${fmt(axisBottom + 38)}">${escapeXml(`Flow (${fu})`)}</text>`,
  );
  push('</g>');

  // --- curves
  const path = (scale: Scale, convert: (v: number) => number) =>
    line<ChartPoint>()
      .x((p) => x(flowOf(p.flow)))
      .y((p) => scale(convert(p.value)))
      .digits(1);
  const sorted = (s: ChartSeries): ChartPoint[] => [...s.points].sort((a, b) => a.flow - b.flow);
  const drawSeries = (
    list: readonly ChartSeries[],
    cls: string,
    gen: ReturnType<typeof path>,
    style: (s: ChartSeries, i: number) => string,
    group: string,
  ): void => {
    if (list.length === 0) return;
    push(`<g class="${cls}s" fill="none" ${group}>`);
    list.forEach((s, i) => {
      push(
        `<path class="${cls}" data-name="${escapeXml(s.name)}" d="${gen(sorted(s)) ?? ''}" ${style(s, i)}/>`,
      );
    });
    push('</g>');
  };
  const headPath = path(y, headOf);
  drawSeries(
    spec.systemCurves,
    'system-curve',
    headPath,
    (_, i) => `stroke-dasharray="${dash(i)}"`,
    'stroke="#000" stroke-width="1.5"',
  );
  drawSeries(
    spec.pumpCurves,
    'pump-curve',
    headPath,
    (c, i) => `stroke="${colour(hue(c, i))}"`,
    'stroke-width="2.2"',
  );
  drawSeries(
    spec.efficiencyCurves,
    'efficiency-curve',
    path(yEff, (v) => v * 100),
    (c, i) => `stroke="${colour(hue(c, i))}"`,
    'stroke-width="2" stroke-dasharray="1 3" stroke-linecap="round"',
  );
  const npshPath = path(yNpsh, headOf);
  drawSeries(
    spec.npshRequired,
    'npsh-required',
    npshPath,
    (c, i) => `stroke="${colour(hue(c, i))}"`,
    'stroke-width="2"',
  );
  drawSeries(
    npshA,
    'npsh-available',
    npshPath,
    (_, i) => `stroke-dasharray="${dash(i)}"`,
    'stroke="#555" stroke-width="1.5"',
  );

  // --- operating points: markers first, then labels placed clear of them
  if (spec.operatingPoints.length > 0) {
    const pts = spec.operatingPoints.map((m) => {
      const qf = flowOf(m.flow);
      const hh = headOf(m.head);
      const label = truncate(m.name, LABEL_CHARS);
      return { m, qf, hh, label, x: x(qf), y: y(hh), width: LABEL_CHAR * Array.from(label).length };
    });
    const places = placeLabels(pts, [left, top, right, mainBottom]);
    push('<g class="operating-points">');
    for (const p of pts) {
      push(
        `<circle class="operating-point" data-name="${escapeXml(p.m.name)}" cx="${fmt(p.x)}" cy="${fmt(p.y)}" r="4.5" fill="#fff" stroke="#000" stroke-width="1.5"><title>${escapeXml(`${p.m.name}: ${fmtValue(p.qf)} ${fu}, ${fmtValue(p.hh)} ${hu}`)}</title></circle>`,
      );
    }
    push('</g>');
    push(
      '<g class="operating-point-labels" font-size="11" paint-order="stroke" stroke="#fff" stroke-width="3" stroke-linejoin="round">',
    );
    pts.forEach((p, i) => {
      const at = places[i] ?? { x: p.x, y: p.y, anchor: 'start' };
      push(
        `<text x="${fmt(at.x)}" y="${fmt(at.y)}"${at.anchor === 'end' ? ' text-anchor="end"' : ''}>${escapeXml(p.label)}</text>`,
      );
    });
    push('</g>');
  }

  // --- legend
  const legendTop = axisBottom + xAxisHeight + 8;
  push('<g class="legend">');
  legend.forEach((e, i) => {
    const col = Math.floor(i / legendRows);
    const row = i % legendRows;
    const lx = pad + col * legendCol;
    const ly = legendTop + row * LEGEND_ROW + LEGEND_ROW / 2;
    push(
      `<g class="legend-item" transform="translate(${fmt(lx)},${fmt(ly)})"><title>${escapeXml(e.title)}</title>${e.swatch}<text x="30" dy="0.32em">${escapeXml(e.label)}</text></g>`,
    );
  });
  push('</g>');
  push('</svg>');
  return `${out.join('\n')}\n`;
}

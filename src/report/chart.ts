/**
 * The pump-selection chart: pump, system, efficiency and NPSH curves, operating points, duty
 * points and preferred operating regions, drawn as one self-contained SVG document that a
 * person can read: no label covers another or leaves the drawing.
 *
 * @module
 */
import { type ScaleLinear, scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { symbol } from '../design/say';
import { guardOptions } from '../guards';
import { type Flow, type Length, type RotationalSpeed, to } from '../units/index';
import type { ChartMarker, ChartOptions, ChartPoint, ChartSeries, ChartSpec } from './chart-spec';
import { type Box, inside, overlaps, placeNear, textBox, textWidth, wrapText } from './chart-text';
import { validateChart } from './chart-validate';
import { escapeXml, fmt, fmtValue } from './chart-xml';

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
/** Dash patterns of a candidate's curves below its highest speed (the highest is solid). */
const SPEED_DASHES = ['7 3', '3 3', '10 3 2 3', '2 4'];

const FONT = 12;
const SMALL = 11;
const TITLE = 16;
const ROW = 16;
const LANE = 6;

const colour = (i: number): string => PALETTE[i % PALETTE.length] ?? '#000';
const caseDash = (i: number): string => CASE_DASHES[i % CASE_DASHES.length] ?? '';
const speedDash = (i: number): string => SPEED_DASHES[i % SPEED_DASHES.length] ?? '';

type Scale = ScaleLinear<number, number>;

/** A linear scale over [lo, hi] (widened when empty), niced to about `count` ticks. */
function niceScale(lo: number, hi: number, range: [number, number], count: number): Scale {
  const top = hi > lo ? hi : lo + 1;
  return scaleLinear().domain([lo, top]).range(range).nice(count);
}

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

/** The colour groups in order of first appearance (candidates), and each item's colour. */
function groupsOf(spec: ChartSpec): {
  readonly names: readonly string[];
  readonly hue: (item: { readonly group?: string }, position: number) => number;
} {
  const names: string[] = [];
  const lists = [spec.pumpCurves, spec.efficiencyCurves, spec.npshRequired, spec.preferredRegions];
  for (const list of lists) {
    for (const item of list) {
      if (item.group !== undefined && !names.includes(item.group)) names.push(item.group);
    }
  }
  return {
    names,
    hue: (item, position) =>
      item.group === undefined ? names.length + position : names.indexOf(item.group),
  };
}

/** One entry of the legend: a swatch (SVG drawn in a 24 x 12 box) and its words. */
interface Entry {
  readonly swatch: string;
  readonly text: string;
  readonly bold?: boolean;
  readonly title?: string;
}

const lineSwatch = (stroke: string, dasharray: string, w = 2): string =>
  `<path d="M0,0H24" stroke="${stroke}" stroke-width="${w}" fill="none"${dasharray ? ` stroke-dasharray="${dasharray}"` : ''}/>`;
const crossPath = (x: number, y: number, r: number): string =>
  `M${fmt(x - r)},${fmt(y - r)}L${fmt(x + r)},${fmt(y + r)}M${fmt(x - r)},${fmt(y + r)}L${fmt(x + r)},${fmt(y - r)}`;

/** The speed of a pump curve in words: `1692 rpm`. */
function rpm(speed: number): string {
  return `${Math.round(to(speed as RotationalSpeed, 'rpm'))} rpm`;
}

/**
 * Draws the pump curves of a selection against the system curves of its operating cases, as
 * one self-contained SVG 1.1 document, laid out so that no label covers another, leaves the
 * drawing or is cut short.
 *
 * What it shows, top to bottom: the title (wrapped, never shortened); the head panel with
 * pump curves (one colour per candidate: its highest speed solid and named, each lower speed
 * it runs at dashed and labelled with its speed), system curves (black, one dash pattern per
 * case), the duty point of each case (a cross), the operating points (numbered circles in the
 * candidate's colour, keyed to a table under the legend) and, when given, efficiency curves
 * (dotted) on a secondary axis in % on the right; the preferred operating region of each
 * candidate as a bar of its colour in a lane of its own along the top of the panel, with
 * dashed limits (bands never overlap, so they stay readable); when NPSH curves are given, a
 * lower panel with NPSH required (candidate colours) and NPSH available (grey, the case's
 * dash pattern); the flow axis; the legend grouped by candidate and by operating case; the
 * key of the numbered operating points and the duty points. Axes are in `spec.units` (NPSH in
 * the head unit; `m³/h` and `°C`-style symbols). Ticks come from d3 linear scales.
 *
 * Text sizes are estimated from character counts (0.56 em a character, 0.8 em above and
 * 0.2 em below the baseline), every label inside the plot takes the first free spot, and the
 * drawing grows taller than `height` when its legend and key need the room. Every drawn item
 * can be found by its class and `data-name`: `path.pump-curve`, `path.system-curve`,
 * `path.efficiency-curve`, `path.npsh-required`, `path.npsh-available`,
 * `circle.operating-point`, `path.duty-point`, `rect.preferred-region`; the plot areas are
 * `rect.plot-area`. All text is escaped; characters XML cannot carry become U+FFFD. The
 * output depends only on the input.
 *
 * @param spec - the curves, points and bands, in coherent SI (flow m3/s, head and NPSH m,
 *   efficiency a fraction 0..1), and the display units
 * @param options - `width` (default 800) and `height` (default 600; the least height) in px
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
  const minHeight = o.height ?? 600;
  const fu = spec.units.flow;
  const hu = spec.units.head;
  const fuText = symbol(fu, 'unicode');
  const flowOf = (si: number): number => to(si as Flow, fu);
  const headOf = (si: number): number => to(si as Length, hu);
  const npshA = spec.npshAvailable ?? [];
  const duties = spec.dutyPoints ?? [];
  const hasEff = spec.efficiencyCurves.length > 0;
  const hasNpsh = spec.npshRequired.length > 0 || npshA.length > 0;
  const { names: groups, hue } = groupsOf(spec);
  const pad = 12;

  // --- title, wrapped to the width
  const titleLines = wrapText(spec.title, (width - 2 * pad) / (0.56 * TITLE));
  const titleBottom = 26 + (titleLines.length - 1) * 20;

  // --- the style of each pump curve: solid at the highest speed, dashed below it
  const pumpStyle = new Map<ChartSeries, { dash: string; width: number; label: string }>();
  const slower = new Map<string, number>();
  for (const s of spec.pumpCurves) {
    const key = s.group ?? s.name;
    const isTop = s.maxSpeed !== false;
    const k = isTop ? 0 : (slower.get(key) ?? 0);
    if (!isTop) slower.set(key, k + 1);
    const speedText = s.speed === undefined ? undefined : rpm(s.speed);
    const label =
      speedText === undefined
        ? s.name
        : isTop && s.maxSpeed === true
          ? `${speedText}, highest speed`
          : speedText;
    pumpStyle.set(s, { dash: isTop ? '' : speedDash(k), width: isTop ? 2.4 : 1.6, label });
  }

  // --- legend: grouped by candidate (each group, then each curve without a group) and case
  const candidateEntries: Entry[] = [];
  const groupHeading = (name: string, c: string): void => {
    candidateEntries.push({
      swatch: `<rect x="6" y="-6" width="12" height="12" fill="${c}"/>`,
      text: name,
      bold: true,
    });
  };
  const pumpEntry = (s: ChartSeries, c: string): void => {
    const st = pumpStyle.get(s);
    candidateEntries.push({
      swatch: lineSwatch(c, st?.dash ?? '', st?.width ?? 2),
      text: `head at ${st?.label ?? s.name}`,
      title: s.name,
    });
  };
  const bandSwatch = (c: string): string =>
    `<rect x="0" y="-3" width="24" height="${LANE - 1}" fill="${c}"/>`;
  groups.forEach((g, k) => {
    const c = colour(k);
    groupHeading(g, c);
    for (const s of spec.pumpCurves) if (s.group === g) pumpEntry(s, c);
    if (spec.efficiencyCurves.some((s) => s.group === g)) {
      candidateEntries.push({ swatch: lineSwatch(c, '1 3'), text: 'efficiency (right axis)' });
    }
    if (spec.npshRequired.some((s) => s.group === g)) {
      candidateEntries.push({ swatch: lineSwatch(c, '', 2), text: 'NPSH required (lower panel)' });
    }
    if (spec.preferredRegions.some((b) => b.group === g)) {
      candidateEntries.push({
        swatch: bandSwatch(c),
        text: 'preferred operating region (bar along the top)',
      });
    }
  });
  // Curves without a group keep the colour of their position in their own list.
  spec.pumpCurves.forEach((s, i) => {
    if (s.group === undefined) pumpEntry(s, colour(hue(s, i)));
  });
  spec.efficiencyCurves.forEach((s, i) => {
    if (s.group !== undefined) return;
    candidateEntries.push({
      swatch: lineSwatch(colour(hue(s, i)), '1 3'),
      text: `${s.name}: efficiency`,
    });
  });
  spec.npshRequired.forEach((s, i) => {
    if (s.group !== undefined) return;
    candidateEntries.push({
      swatch: lineSwatch(colour(hue(s, i)), ''),
      text: `${s.name}: NPSH required`,
    });
  });
  spec.preferredRegions.forEach((b, i) => {
    if (b.group !== undefined) return;
    candidateEntries.push({
      swatch: bandSwatch(colour(hue(b, i))),
      text: `${b.name}: preferred operating region`,
    });
  });
  const caseEntries: Entry[] = [];
  spec.systemCurves.forEach((s, i) => {
    caseEntries.push({
      swatch: lineSwatch('#000', caseDash(i), 1.5),
      text: `${s.name}: system curve`,
    });
  });
  npshA.forEach((s, i) => {
    caseEntries.push({
      swatch: lineSwatch('#666', caseDash(i), 1.5),
      text: `${s.name}: NPSH available`,
    });
  });
  if (duties.length > 0) {
    caseEntries.push({
      swatch: `<path d="${crossPath(12, 0, 4)}" stroke="#000" stroke-width="1.8"/>`,
      text: 'duty point of each case',
    });
  }

  const twoColumns = width >= 560 && candidateEntries.length > 0 && caseEntries.length > 0;
  const colGap = 16;
  const colWidth = twoColumns ? (width - 2 * pad - colGap) / 2 : width - 2 * pad;
  const entryChars = (colWidth - 30) / (0.56 * SMALL);
  const laidOut = (entries: readonly Entry[], heading: string) => {
    const rows: { entry: Entry; lines: string[] }[] = entries.map((e) => ({
      entry: e,
      lines: wrapText(e.text, entryChars),
    }));
    // Heading baseline at 12, first entry at 28, each entry lines x 14 + 4.
    const height =
      rows.length === 0 ? 0 : 12 + ROW + rows.reduce((h, r) => h + r.lines.length * 14 + 4, 0);
    return { heading, rows, height };
  };
  const columns = [
    laidOut(candidateEntries, 'Candidates'),
    laidOut(caseEntries, 'Operating cases'),
  ].filter((c) => c.rows.length > 0);
  const legendHeight =
    columns.length === 0
      ? 0
      : (twoColumns
          ? Math.max(...columns.map((c) => c.height))
          : columns.reduce((h, c) => h + c.height + 6, 0)) + 10;

  // --- key of the operating points and duty points
  const keyChars = (width - 2 * pad - 34) / (0.56 * SMALL);
  const keyRows: { mark: string; lines: string[]; marker?: ChartMarker; group?: number }[] = [];
  spec.operatingPoints.forEach((m, i) => {
    const text = `${m.name}: ${fmtValue(flowOf(m.flow))} ${fuText} at ${fmtValue(headOf(m.head))} ${hu}`;
    keyRows.push({ mark: String(i + 1), lines: wrapText(text, keyChars), marker: m });
  });
  for (const d of duties) {
    const text = `${d.name}: duty ${fmtValue(flowOf(d.flow))} ${fuText} at ${fmtValue(headOf(d.head))} ${hu}`;
    keyRows.push({ mark: 'x', lines: wrapText(text, keyChars) });
  }
  const keyHeight =
    keyRows.length === 0 ? 0 : 12 + ROW + keyRows.reduce((h, r) => h + r.lines.length * 14 + 2, 0);

  // --- layout
  const left = 70;
  const right = width - (hasEff ? 64 : 24);
  const top = titleBottom + 22;
  const xAxisHeight = 46;
  const gap = hasNpsh ? 22 : 0;
  const plotHeight = Math.max(
    360,
    minHeight - top - xAxisHeight - legendHeight - keyHeight - pad - gap,
  );
  const mainHeight = hasNpsh ? Math.round(plotHeight * 0.7) : plotHeight;
  const mainBottom = top + mainHeight;
  const npshTop = mainBottom + gap;
  const npshBottom = npshTop + (plotHeight - mainHeight);
  const axisBottom = hasNpsh ? npshBottom : mainBottom;
  const legendTop = axisBottom + xAxisHeight;
  const keyTop = legendTop + legendHeight;
  const height = Math.max(minHeight, keyTop + keyHeight + pad);

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
    ...duties.map((m) => m.flow),
    ...spec.preferredRegions.map((b) => b.maxFlow),
  ];
  const heads = [
    ...[...spec.pumpCurves, ...spec.systemCurves].flatMap((s) => s.points.map((p) => p.value)),
    ...spec.operatingPoints.map((m) => m.head),
    ...duties.map((m) => m.head),
  ];
  const npshValues = [...spec.npshRequired, ...npshA].flatMap((s) => s.points.map((p) => p.value));
  const xTicks = tickCount(right - left, 90);
  const x = niceScale(0, flowOf(extent(flows, 0, 0)[1]), [left, right], xTicks);
  const [hLo, hHi] = extent(heads, 0, 0);
  // Room along the top for the preferred-region lanes.
  const lanes = spec.preferredRegions.length;
  const laneRoom = lanes === 0 ? 0 : lanes * LANE + 6;
  const yTicks = tickCount(mainHeight, 50);
  const y = niceScale(headOf(hLo), headOf(hHi), [mainBottom, top + laneRoom], yTicks);
  const yEff = scaleLinear()
    .domain([0, 100])
    .range([mainBottom, top + laneRoom]);
  const [nLo, nHi] = extent(npshValues, 0, 0);
  const npshTicks = tickCount(npshBottom - npshTop, 40);
  const yNpsh = niceScale(headOf(nLo), headOf(nHi), [npshBottom, npshTop], npshTicks);

  const out: string[] = [];
  const push = (s: string): void => {
    out.push(s);
  };
  const text = (
    content: string,
    tx: number,
    ty: number,
    size: number,
    attrs = '',
    cls = '',
  ): string =>
    `<text${cls ? ` class="${cls}"` : ''} x="${fmt(tx)}" y="${fmt(ty)}" font-size="${size}"${attrs}>${escapeXml(content)}</text>`;

  // --- document
  push('<?xml version="1.0" encoding="UTF-8"?>');
  push(
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${fmt(width)}" height="${fmt(height)}" viewBox="0 0 ${fmt(width)} ${fmt(height)}" font-family="system-ui, -apple-system, 'Segoe UI', Helvetica, Arial, sans-serif" font-size="${FONT}" role="img" aria-labelledby="chart-title">`,
  );
  push(`<title id="chart-title">${escapeXml(spec.title)}</title>`);
  push(
    `<desc>Pump and system curves against flow in ${escapeXml(fuText)}; head in ${escapeXml(hu)}.</desc>`,
  );
  push(`<rect width="${fmt(width)}" height="${fmt(height)}" fill="#fff"/>`);
  titleLines.forEach((l, i) => {
    push(
      text(
        l,
        width / 2,
        26 + 20 * i,
        TITLE,
        ' text-anchor="middle" font-weight="bold"',
        'chart-title',
      ),
    );
  });
  push(
    `<rect class="plot-area" x="${fmt(left)}" y="${fmt(top)}" width="${fmt(right - left)}" height="${fmt(mainHeight)}" fill="none"/>`,
  );
  if (hasNpsh) {
    push(
      `<rect class="plot-area" x="${fmt(left)}" y="${fmt(npshTop)}" width="${fmt(right - left)}" height="${fmt(npshBottom - npshTop)}" fill="none"/>`,
    );
  }

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
  push('<g class="grid" fill="none" stroke="#e3e3e3" stroke-width="1">');
  push(`<path d="${verticalGrid(top, mainBottom)}${horizontalGrid(y, yTicks)}"/>`);
  if (hasNpsh) {
    push(`<path d="${verticalGrid(npshTop, npshBottom)}${horizontalGrid(yNpsh, npshTicks)}"/>`);
  }
  push('</g>');
  const leftAxis = (scale: Scale, count: number, label: string, cls: string): void => {
    const [r0, r1] = scale.range() as [number, number];
    const format = scale.tickFormat(count);
    push(`<g class="axis ${cls}" text-anchor="end">`);
    push(`<path d="M${fmt(left)},${fmt(r0)}V${fmt(r1)}" stroke="#000"/>`);
    for (const t of scale.ticks(count)) {
      const py = scale(t);
      push(`<path d="M${fmt(left - 5)},${fmt(py)}H${fmt(left)}" stroke="#000"/>`);
      push(text(format(t), left - 8, py, FONT, ' dy="0.32em"'));
    }
    push(
      `<text class="axis-label" transform="translate(20,${fmt((r0 + r1) / 2)}) rotate(-90)" text-anchor="middle" font-size="${FONT}">${escapeXml(label)}</text>`,
    );
    push('</g>');
  };
  leftAxis(y, yTicks, `Head (${hu})`, 'axis-head');
  if (hasEff) {
    const format = yEff.tickFormat(5);
    push('<g class="axis axis-efficiency" text-anchor="start">');
    push(`<path d="M${fmt(right)},${fmt(mainBottom)}V${fmt(top + laneRoom)}" stroke="#000"/>`);
    for (const t of yEff.ticks(5)) {
      const py = yEff(t);
      push(`<path d="M${fmt(right)},${fmt(py)}H${fmt(right + 5)}" stroke="#000"/>`);
      push(text(format(t), right + 8, py, FONT, ' dy="0.32em"'));
    }
    push(
      `<text class="axis-label" transform="translate(${fmt(width - 16)},${fmt((top + mainBottom) / 2)}) rotate(90)" text-anchor="middle" font-size="${FONT}">Efficiency (%)</text>`,
    );
    push('</g>');
  }
  if (hasNpsh) leftAxis(yNpsh, npshTicks, `NPSH (${hu})`, 'axis-npsh');
  push('<g class="axis axis-flow" text-anchor="middle">');
  push(`<path d="M${fmt(left)},${fmt(axisBottom)}H${fmt(right)}" stroke="#000"/>`);
  if (hasNpsh) push(`<path d="M${fmt(left)},${fmt(mainBottom)}H${fmt(right)}" stroke="#000"/>`);
  for (const t of xTickValues) {
    push(`<path d="M${fmt(x(t))},${fmt(axisBottom)}v5" stroke="#000"/>`);
    push(text(xFormat(t), x(t), axisBottom + 19, FONT));
  }
  push(text(`Flow (${fuText})`, (left + right) / 2, axisBottom + 39, FONT, '', 'axis-label'));
  push('</g>');

  // --- preferred regions: one lane each along the top, with dashed limits
  if (lanes > 0) {
    push('<g class="preferred-regions">');
    spec.preferredRegions.forEach((b, i) => {
      const c = colour(hue(b, i));
      const x0 = x(flowOf(b.minFlow));
      const x1 = x(flowOf(b.maxFlow));
      const ly = top + 3 + i * LANE;
      push(
        `<rect class="preferred-region" data-name="${escapeXml(b.name)}" x="${fmt(x0)}" y="${fmt(ly)}" width="${fmt(Math.max(1, x1 - x0))}" height="${LANE - 1}" fill="${c}"><title>${escapeXml(`${b.name}: preferred region ${fmtValue(flowOf(b.minFlow))} to ${fmtValue(flowOf(b.maxFlow))} ${fuText}`)}</title></rect>`,
      );
      push(
        `<path d="M${fmt(x0)},${fmt(ly)}V${fmt(mainBottom)}M${fmt(x1)},${fmt(ly)}V${fmt(mainBottom)}" stroke="${c}" stroke-opacity="0.55" stroke-dasharray="3 4" fill="none"/>`,
      );
    });
    push('</g>');
  }

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
    (_, i) => `stroke-dasharray="${caseDash(i)}"`,
    'stroke="#000" stroke-width="1.5"',
  );
  drawSeries(
    spec.pumpCurves,
    'pump-curve',
    headPath,
    (c, i) => {
      const st = pumpStyle.get(c);
      return `stroke="${colour(hue(c, i))}" stroke-width="${st?.width ?? 2}"${st?.dash ? ` stroke-dasharray="${st.dash}"` : ''}`;
    },
    '',
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
    (_, i) => `stroke-dasharray="${caseDash(i)}"`,
    'stroke="#666" stroke-width="1.5"',
  );

  // --- markers, then labels in the free spots of the head panel
  const area: Box = { x0: left + 2, y0: top + laneRoom, x1: right - 2, y1: mainBottom - 2 };
  const taken: Box[] = [];
  const pts = spec.operatingPoints.map((m) => ({
    m,
    px: x(flowOf(m.flow)),
    py: y(headOf(m.head)),
  }));
  for (const p of pts) taken.push({ x0: p.px - 6, y0: p.py - 6, x1: p.px + 6, y1: p.py + 6 });
  const dutyAt = duties.map((d) => ({ d, px: x(flowOf(d.flow)), py: y(headOf(d.head)) }));
  for (const p of dutyAt) taken.push({ x0: p.px - 6, y0: p.py - 6, x1: p.px + 6, y1: p.py + 6 });
  if (dutyAt.length > 0) {
    push('<g class="duty-points" stroke="#000" stroke-width="1.8" fill="none">');
    for (const p of dutyAt) {
      push(
        `<path class="duty-point" data-name="${escapeXml(p.d.name)}" d="${crossPath(p.px, p.py, 4.5)}"><title>${escapeXml(`${p.d.name}: duty ${fmtValue(flowOf(p.d.flow))} ${fuText}, ${fmtValue(headOf(p.d.head))} ${hu}`)}</title></path>`,
      );
    }
    push('</g>');
  }
  if (pts.length > 0) {
    push('<g class="operating-points">');
    pts.forEach((p, i) => {
      const c = p.m.group === undefined ? '#000' : colour(Math.max(0, groups.indexOf(p.m.group)));
      push(
        `<circle class="operating-point" data-name="${escapeXml(p.m.name)}" data-key="${i + 1}" cx="${fmt(p.px)}" cy="${fmt(p.py)}" r="4.5" fill="#fff" stroke="${c}" stroke-width="2"><title>${escapeXml(`${i + 1}. ${p.m.name}: ${fmtValue(flowOf(p.m.flow))} ${fuText}, ${fmtValue(headOf(p.m.head))} ${hu}`)}</title></circle>`,
      );
    });
    push('</g>');
  }
  const labels: string[] = [];
  const leaders: string[] = [];
  pts.forEach((p, i) => {
    const place = placeNear(String(i + 1), SMALL, p.px, p.py, area, taken);
    if (place === undefined) return;
    taken.push(place.box);
    labels.push(text(String(i + 1), place.x, place.y, SMALL, ' font-weight="bold"', 'point-label'));
    if (place.leader) {
      const bx = Math.min(Math.max(p.px, place.box.x0), place.box.x1);
      const by = Math.min(Math.max(p.py, place.box.y0), place.box.y1);
      leaders.push(`M${fmt(p.px)},${fmt(p.py)}L${fmt(bx)},${fmt(by)}`);
    }
  });
  // Speed labels on the pump curves, where a free spot on the curve can be found.
  for (const s of spec.pumpCurves) {
    if (s.speed === undefined) continue;
    const st = pumpStyle.get(s);
    const label = st?.label ?? rpm(s.speed);
    const ps = sorted(s);
    const w = textWidth(label, SMALL);
    for (const f of [1, 0.85, 0.7, 0.55, 0.4, 0.25]) {
      const pt = ps[Math.round(f * (ps.length - 1))];
      if (pt === undefined) continue;
      const px = x(flowOf(pt.flow));
      const py = y(headOf(pt.value));
      const tries = [
        { tx: px + 4, ty: py - 5 },
        { tx: px - 4 - w, ty: py - 5 },
        { tx: px + 4, ty: py + 13 },
        { tx: px - 4 - w, ty: py + 13 },
      ];
      const free = tries.find((t) => {
        const box = textBox(label, t.tx, t.ty, SMALL);
        return inside(box, area) && !taken.some((b) => overlaps(b, box));
      });
      if (free !== undefined) {
        taken.push(textBox(label, free.tx, free.ty, SMALL));
        labels.push(
          text(
            label,
            free.tx,
            free.ty,
            SMALL,
            ` fill="${colour(hue(s, spec.pumpCurves.indexOf(s)))}"`,
            'speed-label',
          ),
        );
        break;
      }
    }
  }
  if (leaders.length > 0) {
    push(
      `<path class="leaders" d="${leaders.join('')}" stroke="#555" stroke-width="0.8" fill="none"/>`,
    );
  }
  if (labels.length > 0) {
    push(
      '<g class="plot-labels" paint-order="stroke" stroke="#fff" stroke-width="3" stroke-linejoin="round">',
    );
    for (const l of labels) push(l);
    push('</g>');
  }

  // --- legend
  if (columns.length > 0) {
    push('<g class="legend">');
    let colX = pad;
    let colY = legendTop;
    for (const col of columns) {
      let ly = colY + 12;
      push(text(col.heading, colX, ly, SMALL, ' font-weight="bold"', 'legend-heading'));
      ly += ROW - 12 + 12;
      for (const r of col.rows) {
        push(
          `<g class="legend-item" transform="translate(${fmt(colX)},${fmt(ly - 4)})">${r.entry.title ? `<title>${escapeXml(r.entry.title)}</title>` : ''}${r.entry.swatch}</g>`,
        );
        r.lines.forEach((l, k) => {
          push(
            text(
              l,
              colX + 30,
              ly + k * 14,
              SMALL,
              r.entry.bold ? ' font-weight="bold"' : '',
              'legend-text',
            ),
          );
        });
        ly += r.lines.length * 14 + 4;
      }
      if (twoColumns) colX += colWidth + colGap;
      else colY += col.height + 6;
    }
    push('</g>');
  }

  // --- key of the numbered points and the duty points
  if (keyRows.length > 0) {
    push('<g class="key">');
    let ky = keyTop + 12;
    push(
      text(
        'Operating points and duty points',
        pad,
        ky,
        SMALL,
        ' font-weight="bold"',
        'key-heading',
      ),
    );
    ky += ROW;
    for (const r of keyRows) {
      if (r.mark === 'x') {
        push(
          `<path d="${crossPath(pad + 8, ky - 4, 4)}" stroke="#000" stroke-width="1.8" fill="none"/>`,
        );
      } else {
        push(text(r.mark, pad, ky, SMALL, ' font-weight="bold"', 'key-number'));
      }
      r.lines.forEach((l, k) => {
        push(text(l, pad + 30, ky + k * 14, SMALL, '', 'key-text'));
      });
      ky += r.lines.length * 14 + 2;
    }
    push('</g>');
  }
  push('</svg>');
  return `${out.join('\n')}\n`;
}

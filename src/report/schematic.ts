/**
 * The schematic of a network report: nodes at the coordinates the input gives (`x`, `y`, y up)
 * or, when any is missing, laid out in layers by their distance in links from the pump's
 * suction side (breadth-first from the surface that feeds the pump, else from the pump's
 * suction node); links drawn straight and labelled with their flow and velocity, nodes with
 * their gauge pressure, the pump link drawn heavy with a pump symbol, and every node below its
 * service pressure marked. Labels never overlap: each takes the first free spot near its
 * mark, and a label with no free spot gets a number keyed in a list under the drawing.
 *
 * @module
 */
import type { DesignReport, NetworkLayout, NetworkTables, UnitSystem } from '../design/core';
import { type Say, sayIn } from '../design/say';
import { argumentError } from '../errors';
import { guardInteger, guardOneOf, guardOptions, guardString } from '../guards';
import type { Pressure } from '../units/index';
import { type Box, DESCENT, placeNear, textBox, textWidth } from './chart-text';
import { escapeXml, fmt } from './chart-xml';
import { chosenUnits, formatIn } from './format-values';
import { checkReportShape } from './report-shape';

/** Options of {@link renderSchematic}. */
export interface SchematicOptions {
  /** Units of the labels; default the report's own. */
  readonly units?: UnitSystem;
  /** The operating case to show (its name); default the first. */
  readonly case?: string;
  /**
   * Draw the network at this candidate's operating point (its name) instead of at the duty;
   * nodes below their service minimum there are marked.
   */
  readonly candidate?: string;
  /** Width of the drawing (px), 600 to 3000; default 900. */
  readonly width?: number;
}

const FONT = 11;
const MARGIN = 40;
const LAYER_ROW = 110;
const NODE_R = 5;

interface Placed {
  readonly id: string;
  readonly x: number;
  readonly y: number;
}

/** Node positions in the layout's own units, y down: given, or layered from the pump's suction. */
function positions(layout: NetworkLayout): Map<string, { x: number; y: number }> {
  const out = new Map<string, { x: number; y: number }>();
  if (layout.nodes.every((n) => n.x !== undefined && n.y !== undefined)) {
    for (const n of layout.nodes) out.set(n.id, { x: n.x ?? 0, y: -(n.y ?? 0) });
    return out;
  }
  const next = new Map<string, string[]>();
  for (const l of layout.links) {
    next.set(l.from, [...(next.get(l.from) ?? []), l.to]);
    next.set(l.to, [...(next.get(l.to) ?? []), l.from]);
  }
  const pump = layout.links.find((l) => l.id === layout.pumpLink);
  const suction = pump?.from ?? layout.nodes[0]?.id ?? '';
  const surface = (next.get(suction) ?? []).find(
    (id) => layout.nodes.find((n) => n.id === id)?.kind === 'surface',
  );
  const depth = new Map<string, number>();
  const order: string[] = [];
  const visit = (start: string, d0: number) => {
    depth.set(start, d0);
    order.push(start);
    for (let i = order.length - 1; i < order.length; i++) {
      const id = order[i] as string;
      for (const m of next.get(id) ?? []) {
        if (!depth.has(m)) {
          depth.set(m, (depth.get(id) ?? 0) + 1);
          order.push(m);
        }
      }
    }
  };
  visit(surface ?? suction, 0);
  let last = Math.max(0, ...depth.values());
  for (const n of layout.nodes) {
    if (!depth.has(n.id)) visit(n.id, ++last);
  }
  const rows = new Map<number, number>();
  for (const id of order) {
    const d = depth.get(id) ?? 0;
    const r = rows.get(d) ?? 0;
    rows.set(d, r + 1);
    out.set(id, { x: d, y: r });
  }
  return out;
}

/** The node's label: its id and gauge pressure. */
function nodeLabel(id: string, tables: NetworkTables | undefined, atm: number, s: Say): string {
  const n = tables?.nodes.find((k) => k.id === id);
  if (n === undefined) return id;
  const gauge = n.pressure - atm;
  const g = Math.abs(gauge) <= 1e-9 * atm ? 0 : gauge;
  const unit = s.system === 'us' ? 'psig' : `${s.units.pressure} gauge`;
  return `${id}: ${formatIn(g as Pressure, s.units.pressure)} ${unit}`;
}

/** The link's label: its flow and velocity (the pump: its flow and head). */
function linkLabel(
  id: string,
  tables: NetworkTables | undefined,
  pumpLink: string,
  s: Say,
): string {
  const l = tables?.links.find((k) => k.id === id);
  if (l === undefined) return id;
  const flow = `${formatIn(l.flow, s.units.flow)} ${s.sym(s.units.flow)}`;
  if (id === pumpLink) return `pump: ${flow}, ${s.head(-l.headLoss)}`;
  if (l.state === 'closed' || l.state === 'shut') return `${id}: ${l.state}`;
  return l.velocity === undefined ? flow : `${flow}, ${s.velocity(Math.abs(l.velocity))}`;
}

/**
 * Draws the schematic of a network report (see the module's description) as one SVG
 * document, in the report's unit system.
 *
 * @param report - a report from `evaluateDesign` on a network (`report.network` present)
 * @param options - `units`, `case` (name), `candidate` (name), `width` (px)
 * @returns the SVG text
 * @throws HeadflowError `INVALID_ARGUMENT` for a report of a line (no network), an unknown
 *   case or candidate, units other than `'si'` and `'us'`, or a width outside 600 to 3000.
 * @example
 * ```ts
 * const report = evaluateDesign(readDesignFile(text));
 * const svg = renderSchematic(report, { units: 'si' }); // '<svg xmlns=...'
 * ```
 */
export function renderSchematic(
  report: DesignReport,
  options: SchematicOptions | null = {},
): string {
  checkReportShape(report);
  const r = report;
  const o = guardOptions<SchematicOptions>('options', options);
  const layout = r.network;
  if (layout === undefined) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'report.network',
      undefined,
      undefined,
      'a report of a network (a schematic draws nodes and links)',
    );
  }
  const units =
    o.units === undefined
      ? chosenUnits(r, undefined)
      : guardOneOf('options.units', o.units, ['si', 'us'] as const);
  const width = o.width === undefined ? 900 : guardInteger('options.width', o.width, 600, 3000);
  let duty = r.duty[0];
  if (o.case !== undefined) {
    const name = guardString('options.case', o.case);
    duty = r.duty.find((d) => d.case === name);
    if (duty === undefined) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'options.case',
        name,
        undefined,
        `one of the report's cases: ${r.duty.map((d) => d.case).join(', ')}`,
      );
    }
  }
  const s = sayIn(units, 'unicode');
  let tables = duty?.network?.tables;
  let subject = 'duty';
  if (o.candidate !== undefined) {
    const name = guardString('options.candidate', o.candidate);
    const c = r.candidates.find((k) => k.name === name);
    if (c === undefined) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'options.candidate',
        name,
        undefined,
        `one of the report's candidates: ${r.candidates.map((k) => k.name).join(', ')}`,
      );
    }
    tables = c.cases.find((k) => k.case === duty?.case)?.network;
    subject = `operating point of ${name}`;
  }
  const raw = positions(layout);
  const xs = [...raw.values()].map((p) => p.x);
  const ys = [...raw.values()].map((p) => p.y);
  const [x0, x1] = [Math.min(...xs), Math.max(...xs)];
  const [y0, y1] = [Math.min(...ys), Math.max(...ys)];
  const inner = width - 2 * MARGIN - 120;
  const given = layout.nodes.every((n) => n.x !== undefined && n.y !== undefined);
  const scale = x1 > x0 ? inner / (x1 - x0) : 1;
  const yScale = given ? scale : LAYER_ROW;
  const plotHeight = Math.max(LAYER_ROW, (y1 - y0) * yScale);
  const top = MARGIN + 30;
  const left = MARGIN + 60;
  const placed: Placed[] = layout.nodes.map((n) => {
    const p = raw.get(n.id) ?? { x: 0, y: 0 };
    return {
      id: n.id,
      x: left + (x1 > x0 ? (p.x - x0) * scale : inner / 2),
      y: top + (y1 > y0 ? (p.y - y0) * yScale : plotHeight / 2),
    };
  });
  const at = new Map(placed.map((p) => [p.id, p]));
  const height0 = top + plotHeight + MARGIN + 30;
  const area: Box = { x0: 2, y0: 22, x1: width - 2, y1: height0 - 2 };
  const taken: Box[] = placed.map((p) => ({
    x0: p.x - NODE_R - 2,
    y0: p.y - NODE_R - 2,
    x1: p.x + NODE_R + 2,
    y1: p.y + NODE_R + 2,
  }));
  const short = new Set(
    (tables?.nodes ?? []).filter((n) => n.shortfall !== undefined).map((n) => n.id),
  );
  const title = `Network at the ${subject}: ${duty?.case ?? ''}${tables === undefined ? ' (no operating point)' : ''}`;
  const note = 'Pressures gauge. Heavy line: the pump. Red: below service minimum.';
  const noteWidth = textWidth(note, FONT);
  taken.push(textBox(note, width - MARGIN - noteWidth, height0 - 8, FONT));
  const parts: string[] = [];
  const labels: string[] = [];
  const keyed: string[] = [];
  const label = (text: string, mx: number, my: number, cls: string) => {
    const spot = placeNear(text, FONT, mx, my, area, taken);
    if (spot !== undefined) {
      taken.push(spot.box);
      labels.push(
        `<text class="${cls}" x="${fmt(spot.x)}" y="${fmt(spot.y)}">${escapeXml(text)}</text>`,
      );
      return;
    }
    const n = `${keyed.length + 1}`;
    keyed.push(`${n}: ${text}`);
    const mark = placeNear(n, FONT, mx, my, area, taken);
    if (mark !== undefined) {
      taken.push(mark.box);
      labels.push(
        `<text class="${cls} key-mark" x="${fmt(mark.x)}" y="${fmt(mark.y)}">${escapeXml(n)}</text>`,
      );
    }
  };
  for (const l of layout.links) {
    const a = at.get(l.from);
    const b = at.get(l.to);
    if (a === undefined || b === undefined) continue;
    const pump = l.id === layout.pumpLink;
    const state = tables?.links.find((k) => k.id === l.id)?.state;
    const cls = pump
      ? 'link pump'
      : state === 'closed' || state === 'shut'
        ? 'link off'
        : `link ${l.kind}`;
    parts.push(
      `<line class="${cls}" x1="${fmt(a.x)}" y1="${fmt(a.y)}" x2="${fmt(b.x)}" y2="${fmt(b.y)}"><title>${escapeXml(l.id)}</title></line>`,
    );
    const mx = (a.x + b.x) / 2;
    const my = (a.y + b.y) / 2;
    if (pump) {
      parts.push(
        `<circle class="pump-symbol" cx="${fmt(mx)}" cy="${fmt(my)}" r="9"><title>${escapeXml(l.id)} (pump)</title></circle>`,
      );
      taken.push({ x0: mx - 11, y0: my - 11, x1: mx + 11, y1: my + 11 });
    } else if (l.kind === 'valve') {
      parts.push(
        `<rect class="valve-symbol" x="${fmt(mx - 5)}" y="${fmt(my - 5)}" width="10" height="10"><title>${escapeXml(l.id)}</title></rect>`,
      );
      taken.push({ x0: mx - 7, y0: my - 7, x1: mx + 7, y1: my + 7 });
    }
  }
  for (const l of layout.links) {
    const a = at.get(l.from);
    const b = at.get(l.to);
    if (a === undefined || b === undefined) continue;
    label(
      linkLabel(l.id, tables, layout.pumpLink, s),
      (a.x + b.x) / 2,
      (a.y + b.y) / 2,
      l.id === layout.pumpLink ? 'link-label pump-label' : 'link-label',
    );
  }
  for (const n of layout.nodes) {
    const p = at.get(n.id);
    if (p === undefined) continue;
    const cls = `node ${n.kind}${short.has(n.id) ? ' below-service' : ''}`;
    parts.push(
      n.kind === 'surface'
        ? `<rect class="${cls}" x="${fmt(p.x - NODE_R - 1)}" y="${fmt(p.y - NODE_R - 1)}" width="${fmt(2 * NODE_R + 2)}" height="${fmt(2 * NODE_R + 2)}"><title>${escapeXml(n.id)}</title></rect>`
        : `<circle class="${cls}" cx="${fmt(p.x)}" cy="${fmt(p.y)}" r="${NODE_R}"><title>${escapeXml(n.id)}</title></circle>`,
    );
    label(
      `${nodeLabel(n.id, tables, r.atmosphere, s)}${short.has(n.id) ? ' (below service minimum)' : ''}`,
      p.x,
      p.y,
      short.has(n.id) ? 'node-label below-service' : 'node-label',
    );
  }
  const keyTop = height0 + 4;
  const keyLines = keyed.map(
    (k, i) =>
      `<text class="key" x="${MARGIN}" y="${fmt(keyTop + (i + 1) * (FONT + 5) - DESCENT * FONT)}">${escapeXml(k)}</text>`,
  );
  const keyWidth = Math.max(0, ...keyed.map((k) => textWidth(k, FONT)));
  const totalWidth = Math.max(width, MARGIN + keyWidth + 4);
  const height = keyTop + keyed.length * (FONT + 5) + 10;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" class="schematic" width="${fmt(totalWidth)}" height="${fmt(height)}" viewBox="0 0 ${fmt(totalWidth)} ${fmt(height)}" font-family="sans-serif" font-size="${FONT}">`,
    '<style>',
    '.schematic .link{stroke:#4a5a6a;stroke-width:2}.schematic .link.pump{stroke:#1f5fa8;stroke-width:5}.schematic .link.off{stroke:#a0a0a0;stroke-dasharray:4 3}',
    '.schematic .link.valve{stroke:#7a4a9a}.schematic .pump-symbol{fill:#ffffff;stroke:#1f5fa8;stroke-width:3}.schematic .valve-symbol{fill:#7a4a9a}',
    '.schematic .node{fill:#2b2b2b}.schematic .node.surface{fill:#2f7fbf}.schematic .node.below-service{fill:#c0392b}',
    '.schematic .node-label{fill:#1a1a1a}.schematic .link-label{fill:#3a4a5a}.schematic .pump-label{fill:#1f5fa8;font-weight:bold}',
    '.schematic .below-service{fill:#c0392b;font-weight:bold}.schematic .title{font-size:13px;font-weight:bold}.schematic .key{fill:#1a1a1a}',
    '</style>',
    `<text class="title" x="${MARGIN}" y="16" font-size="13">${escapeXml(title)}</text>`,
    `<text class="note" x="${fmt(width - MARGIN)}" y="${fmt(height0 - 8)}" text-anchor="end">${escapeXml(note)}</text>`,
    ...parts,
    ...labels,
    ...keyLines,
    '</svg>',
    '',
  ].join('\n');
}

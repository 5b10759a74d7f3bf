/**
 * The design report as plain text for a terminal: fixed-width tables drawn with ASCII
 * characters only, no colours, every line within a chosen width.
 *
 * @module
 */
import type { DesignReport, UnitSystem } from '../design/core';
import { guardBoolean, guardInteger, guardOptions } from '../guards';
import { type Block, type Column, reportBlocks } from './format-document';
import { chosenUnits, oneLine } from './format-values';

/** Options of {@link renderText}. */
export interface TextOptions {
  /** Units to print in; default the report's own (`report.units`). */
  readonly units?: UnitSystem;
  /** Longest line, in characters: an integer from 40 to 10000 (default 100). */
  readonly width?: number;
  /**
   * The short form (verdict, duty, candidates, ranking, checks, cautions) instead of the full
   * calculation sheet; default false.
   */
  readonly summary?: boolean;
}

/** Default line width. */
const DEFAULT_WIDTH = 100;
/** Narrowest width accepted. */
const MIN_WIDTH = 40;
/** Widest width accepted (no terminal or log line is wider). */
const MAX_WIDTH = 10_000;
/** Spaces between table columns. */
const GAP = '  ';

/** Splits text into lines of at most `width` characters at spaces; a longer word is cut. */
function wrap(text: string, width: number): string[] {
  // A width that is not a whole number >= 1 (NaN from a column of missing cells) would never
  // consume the word below: the loop must always advance, so the room is at least 1.
  const room = Number.isFinite(width) && width >= 1 ? Math.floor(width) : 1;
  const lines: string[] = [];
  let line = '';
  for (const whole of oneLine(text).split(' ')) {
    let word = whole;
    while (word !== '') {
      const sep = line === '' ? '' : ' ';
      if (line.length + sep.length + word.length <= room) {
        line += sep + word;
        word = '';
      } else if (line !== '') {
        lines.push(line);
        line = '';
      } else {
        lines.push(word.slice(0, room));
        word = word.slice(room);
      }
    }
  }
  if (line !== '' || lines.length === 0) lines.push(line);
  return lines;
}

/**
 * Text after a label, continued under the text's start; a label wider than half the line
 * gets lines of its own and the text follows indented by four spaces.
 */
function hanging(label: string, text: string, width: number): string[] {
  if (label.length > width / 2) {
    return [...wrap(label, width), ...wrap(text, width - 4).map((l) => `    ${l}`)];
  }
  const indent = ' '.repeat(label.length);
  return wrap(text, width - label.length).map((l, i) => (i === 0 ? label : indent) + l);
}

/** The lines of one cell: its text wrapped to the column width (headers keep their breaks). */
function cellLines(text: string, width: number, isHeader: boolean): string[] {
  const parts = isHeader ? text.split('\n') : [text];
  return parts.flatMap((p) => wrap(p, width));
}

function naturalWidth(text: string, isHeader: boolean): number {
  const parts = isHeader ? text.split('\n') : [oneLine(text)];
  return Math.max(1, ...parts.map((p) => p.trim().length));
}

function pad(text: string, width: number, align: Column['align']): string {
  return align === 'right' ? text.padStart(width) : text.padEnd(width);
}

/** Draws one table whose column widths fit (cells wrap within their column). */
function drawTable(
  columns: readonly Column[],
  rows: readonly (readonly string[])[],
  widths: readonly number[],
): string[] {
  const out: string[] = [];
  const emit = (cells: readonly string[], isHeader: boolean): void => {
    const wrapped = cells.map((c, j) => cellLines(c, widths[j] ?? 1, isHeader));
    const height = Math.max(...wrapped.map((w) => w.length));
    for (let i = 0; i < height; i++) {
      const line = wrapped.map((w, j) => {
        // Headers sit on the rule (bottom-aligned); data cells start at the top.
        const k = isHeader ? i - (height - w.length) : i;
        return pad(w[k] ?? '', widths[j] ?? 1, columns[j]?.align ?? 'left');
      });
      out.push(line.join(GAP).trimEnd());
    }
  };
  emit(
    columns.map((c) => c.header),
    true,
  );
  out.push(widths.map((w) => '-'.repeat(w)).join(GAP));
  for (const row of rows) emit(row, false);
  return out;
}

/**
 * Lays a table out within `width`: as one table when it fits; otherwise its columns are split
 * into parts that fit, each part repeating the first column, one under the other.
 */
function layoutTable(
  columns: readonly Column[],
  rows: readonly (readonly string[])[],
  width: number,
): string[] {
  const natural = columns.map((c, j) =>
    Math.max(naturalWidth(c.header, true), ...rows.map((r) => naturalWidth(r[j] ?? '', false))),
  );
  const total = natural.reduce((a, b) => a + b, 0) + GAP.length * (natural.length - 1);
  if (total <= width) return drawTable(columns, rows, natural);
  // The first column (the row's name) is repeated in every part; keep it to a third.
  const keyWidth = Math.min(natural[0] ?? 1, Math.max(8, Math.floor(width / 3)));
  const room = width - keyWidth - GAP.length;
  const parts: number[][] = [];
  let part: number[] = [];
  let used = 0;
  for (let j = 1; j < columns.length; j++) {
    const w = Math.min(natural[j] ?? 1, room);
    const need = part.length === 0 ? w : used + GAP.length + w;
    if (part.length > 0 && need > room) {
      parts.push(part);
      part = [j];
      used = w;
    } else {
      part.push(j);
      used = need;
    }
  }
  parts.push(part);
  const out: string[] = [];
  for (const [p, indices] of parts.entries()) {
    if (p > 0) out.push('');
    const pick = [0, ...indices];
    out.push(
      ...drawTable(
        pick.map((j) => columns[j] ?? { header: '', align: 'left' }),
        rows.map((r) => pick.map((j) => r[j] ?? '')),
        pick.map((j) => (j === 0 ? keyWidth : Math.min(natural[j] ?? 1, room))),
      ),
    );
  }
  return out;
}

function blockLines(block: Block, width: number): string[] {
  switch (block.kind) {
    case 'title': {
      const lines = wrap(block.text, width);
      const rule = '='.repeat(Math.min(width, Math.max(...lines.map((l) => l.length))));
      return [...lines, rule];
    }
    case 'heading': {
      const lines = wrap(block.text, width);
      const rule = '-'.repeat(Math.min(width, Math.max(...lines.map((l) => l.length))));
      return [...lines, rule];
    }
    case 'subheading':
      return wrap(block.text, width);
    case 'paragraph':
      return wrap(block.text, width);
    case 'fields':
      return block.rows.flatMap(([label, value]) => hanging(`${oneLine(label)}: `, value, width));
    case 'list':
      return block.items.flatMap((item) => hanging('- ', item, width));
    case 'table':
      return layoutTable(block.columns, block.rows, width);
  }
}

/**
 * Writes a design report as plain text for a terminal or a log: title, result, fluid and duty
 * flow; a table of the duty in each operating case (static head, losses, total head, NPSH
 * available); for each candidate a table of its operating cases (speed, flow, head,
 * efficiency, shaft power, % of BEP flow, operating region, NPSHa, NPSHr and their ratio), its
 * motors with their load and its yearly energy and cost; the ranking; every check grouped by
 * severity with its source; and the cautions, always.
 *
 * Numbers are printed in the display units of {@link displayUnits} to four significant
 * digits (speeds in whole rpm, efficiency and % of BEP to 0.1, NPSH ratio to 0.01). A value
 * that is missing (no efficiency or NPSH data, a case without an operating point) prints as
 * `-`; a case without an operating point also gets a line with the reason. Tables use ASCII
 * only; a table wider than `width` is split into parts that repeat the first column. Names
 * are printed on one line (line breaks become spaces). Every line ends without trailing
 * spaces and has at most `width` characters.
 *
 * @param report - a report from `evaluateDesign`
 * @param options - `units` (`'si'` or `'us'`, default `report.units`) and `width`
 * @returns the text, lines separated by `\n`, ending with a newline
 * @throws HeadflowError `INVALID_ARGUMENT` for a width that is not an integer from 40 to
 *   10000, units other than `'si'` and `'us'`, or a report whose parts have the wrong shape
 *   (a list with a hole, a name that is not a string).
 * @example
 * ```ts
 * // report = evaluateDesign(design) of docs/examples/cooling-loop.ts
 * const text = renderText(report, { units: 'us', width: 80 });
 * text.split('\n')[0]; // 'Pump selection report: process cooling loop'
 * ```
 */
export function renderText(report: DesignReport, options?: TextOptions | null): string {
  const o = guardOptions<TextOptions>('options', options);
  const system = chosenUnits(report, o.units as UnitSystem | undefined);
  const width =
    o.width === undefined
      ? DEFAULT_WIDTH
      : guardInteger('options.width', o.width, MIN_WIDTH, MAX_WIDTH);
  const summary = o.summary === undefined ? false : guardBoolean('options.summary', o.summary);
  const blocks = reportBlocks(report, system, { style: 'ascii', summary }).map((b) =>
    blockLines(b, width)
      .map((l) => l.trimEnd())
      .join('\n'),
  );
  return `${blocks.join('\n\n')}\n`;
}

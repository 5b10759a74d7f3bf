/**
 * The design report as Markdown (CommonMark with GitHub-style tables), for review documents,
 * wikis and pull requests.
 *
 * @module
 */
import type { DesignReport, UnitSystem } from '../design/core';
import { guardBoolean, guardOptions } from '../guards';
import { type Block, type Column, reportBlocks } from './format-document';
import { chosenUnits } from './format-values';

/** Options of {@link renderMarkdown}. */
export interface MarkdownOptions {
  /** Units to print in; default the report's own (`report.units`). */
  readonly units?: UnitSystem;
  /** The short form instead of the full calculation sheet; default false. */
  readonly summary?: boolean;
}

/**
 * Text safe inside a Markdown line: a backslash before every character that Markdown could
 * read as markup (`\ ` * _ [ ] < > | # ~`), `&` as `&amp;`, line breaks as `breakAs`.
 */
function escapeInline(text: string, breakAs: string): string {
  return String(text)
    .replace(/[\\`*_[\]<>|#~]/g, (c) => `\\${c}`)
    .replace(/&/g, '&amp;')
    .replace(/\r\n|\r|\n/g, breakAs)
    .replace(/\t/g, ' ')
    .trim();
}

/** A table cell: line breaks become `<br>` (the only HTML written), every `|` is escaped. */
const cell = (text: string): string => escapeInline(text, '<br>');
/** Running text: line breaks become spaces. */
const inline = (text: string): string => escapeInline(text, ' ');

function table(columns: readonly Column[], rows: readonly (readonly string[])[]): string[] {
  const header = columns.map((c) => cell(c.header.replace(/\/\n/g, '/').replace(/\n/g, ' ')));
  const rule = columns.map((c) => (c.align === 'right' ? '---:' : '---'));
  const line = (cells: readonly string[]): string => `| ${cells.join(' | ')} |`;
  return [
    line(header),
    line(rule),
    ...rows.map((r) => line(columns.map((_, j) => cell(r[j] ?? '')))),
  ];
}

function blockLines(block: Block): string[] {
  switch (block.kind) {
    case 'title':
      return [`# ${inline(block.text)}`];
    case 'heading':
      return [`## ${inline(block.text)}`];
    case 'subheading':
      return [`### ${inline(block.text)}`];
    case 'paragraph':
      return [inline(block.text)];
    case 'fields':
      return block.rows.map(([label, value]) => `- **${inline(label)}:** ${inline(value)}`);
    case 'list':
      return block.items.map((item) => `- ${inline(item)}`);
    case 'table':
      return table(block.columns, block.rows);
  }
}

/**
 * Writes a design report as Markdown: the same sections, numbers and words as
 * {@link renderText} (title, result, fluid, duty flow; duty per operating case; each
 * candidate's operating cases, motors, yearly energy and cost; ranking; every check grouped
 * by severity with its source; the cautions, always), with `#` headings, bullet lists and
 * pipe tables (numeric columns right-aligned).
 *
 * Names and messages are escaped: Markdown punctuation gets a backslash (so a `|` in a case
 * name cannot split a table cell), `&` becomes `&amp;`, a line break inside a table cell
 * becomes `<br>` and elsewhere a space. Every table row has as many cells as its header.
 * Missing values print as `-`.
 *
 * @param report - a report from `evaluateDesign`
 * @param options - `units` (`'si'` or `'us'`, default `report.units`)
 * @returns the Markdown, ending with a newline
 * @throws HeadflowError `INVALID_ARGUMENT` for units other than `'si'` and `'us'`.
 * @example
 * ```ts
 * // report = evaluateDesign(design) of docs/examples/cooling-loop.ts
 * const md = renderMarkdown(report, { units: 'si' });
 * md.split('\n')[0]; // '# Pump selection report: process cooling loop'
 * ```
 */
export function renderMarkdown(report: DesignReport, options?: MarkdownOptions | null): string {
  const o = guardOptions<MarkdownOptions>('options', options);
  const system = chosenUnits(report, o.units as UnitSystem | undefined);
  const summary = o.summary === undefined ? false : guardBoolean('options.summary', o.summary);
  const chunks = reportBlocks(report, system, { style: 'unicode', summary }).map((b) =>
    blockLines(b).join('\n'),
  );
  return `${chunks.join('\n\n')}\n`;
}

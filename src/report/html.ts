/**
 * The design report as one self-contained HTML page: the calculation sheet with the chart
 * inline, styled for the screen and for print on A4 or Letter.
 *
 * @module
 */
import type { DesignReport, UnitSystem } from '../design/core';
import { guardBoolean, guardOptions } from '../guards';
import { renderChart } from './chart';
import { chartSpecFromReport } from './chart-from-report';
import { type Block, type Column, reportBlocks } from './format-document';
import { chosenUnits } from './format-values';
import { renderSchematic } from './schematic';

/** Options of {@link renderHtml}. */
export interface HtmlOptions {
  /** Units to print in; default the report's own (`report.units`). */
  readonly units?: UnitSystem;
  /** The short form instead of the full calculation sheet; default false. */
  readonly summary?: boolean;
  /** Include the chart (default: true when the report has its curves). */
  readonly chart?: boolean;
}

/** Text safe in HTML: `& < > " '` escaped; characters HTML cannot carry become U+FFFD. */
function esc(text: string): string {
  return (
    String(text)
      // biome-ignore lint/suspicious/noControlCharactersInRegex: control characters are what it removes
      .replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/g, '\ufffd')
      .replace(/[\ud800-\udfff]/g, (c, i: number, all: string) => {
        const code = c.charCodeAt(0);
        const next = all.charCodeAt(i + 1);
        const prev = all.charCodeAt(i - 1);
        if (code < 0xdc00 && next >= 0xdc00 && next <= 0xdfff) return c;
        if (code >= 0xdc00 && prev >= 0xd800 && prev < 0xdc00) return c;
        return '\ufffd';
      })
      .replace(/&/g, '&amp;')
      .replace(/</g, '&lt;')
      .replace(/>/g, '&gt;')
      .replace(/"/g, '&quot;')
      .replace(/'/g, '&#39;')
  );
}

const CSS = `
:root { color-scheme: light; }
* { box-sizing: border-box; }
body { font: 13px/1.45 system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif; color: #111; margin: 0; background: #fff; }
main { max-width: 60rem; margin: 0 auto; padding: 1.5rem; }
h1 { font-size: 1.5rem; margin: 0 0 .75rem; border-bottom: 2px solid #111; padding-bottom: .25rem; }
h2 { font-size: 1.15rem; margin: 1.5rem 0 .5rem; border-bottom: 1px solid #888; padding-bottom: .15rem; break-after: avoid; }
h3 { font-size: 1rem; margin: 1rem 0 .35rem; break-after: avoid; }
p { margin: .35rem 0; }
dl.fields { display: grid; grid-template-columns: max-content 1fr; gap: .15rem 1rem; margin: .5rem 0; }
dl.fields dt { font-weight: 600; }
dl.fields dd { margin: 0; overflow-wrap: anywhere; }
.table { overflow-x: auto; max-width: 100%; }
table { border-collapse: collapse; margin: .35rem 0 .75rem; font-variant-numeric: tabular-nums; max-width: 100%; }
th, td { padding: .15rem .45rem; border-bottom: 1px solid #ddd; vertical-align: top; overflow-wrap: anywhere; }
th { border-bottom: 1px solid #555; font-weight: 600; vertical-align: bottom; }
.r { text-align: right; }
.l { text-align: left; }
ul { margin: .35rem 0; padding-left: 1.2rem; }
li { margin: .15rem 0; overflow-wrap: anywhere; }
.verdict { font-size: 1.05rem; padding: .5rem .75rem; border-left: 6px solid #0072B2; background: #f2f7fb; margin: .5rem 0 1rem; }
.verdict.fail { border-left-color: #D55E00; background: #fcf2ec; }
figure.chart { margin: 1rem 0; }
figure.chart svg { width: 100%; height: auto; max-height: 24cm; display: block; }
figcaption { font-size: .85rem; color: #444; }
section.candidate { margin-top: 1rem; }
@media print {
  @page { margin: 14mm 12mm; }
  body { font-size: 9.5pt; }
  main { max-width: none; padding: 0; }
  .table { overflow: visible; }
  table { font-size: 8.5pt; }
  th, td { padding: .1rem .3rem; }
  section.candidate { break-before: page; }
  section.after-candidates { break-before: page; }
  figure.chart { break-inside: avoid; }
  figure.chart svg { max-height: 22cm; }
  tr, li, dl.fields { break-inside: avoid; }
}
`;

function tableHtml(columns: readonly Column[], rows: readonly (readonly string[])[]): string {
  const cls = (c: Column | undefined) => (c?.align === 'right' ? 'r' : 'l');
  const head = columns
    .map((c) => `<th class="${cls(c)}">${c.header.split('\n').map(esc).join('<br>')}</th>`)
    .join('');
  const body = rows
    .map(
      (r) =>
        `<tr>${columns.map((c, j) => `<td class="${cls(c)}">${esc(r[j] ?? '')}</td>`).join('')}</tr>`,
    )
    .join('\n');
  return `<div class="table"><table><thead><tr>${head}</tr></thead><tbody>\n${body}\n</tbody></table></div>`;
}

function blockHtml(block: Block): string {
  switch (block.kind) {
    case 'title':
      return `<h1>${esc(block.text)}</h1>`;
    case 'heading':
      return `<h2>${esc(block.text)}</h2>`;
    case 'subheading':
      return `<h3>${esc(block.text)}</h3>`;
    case 'paragraph':
      return `<p>${esc(block.text)}</p>`;
    case 'fields':
      return `<dl class="fields">${block.rows.map(([k, v]) => `<dt>${esc(k)}</dt><dd>${esc(v)}</dd>`).join('')}</dl>`;
    case 'list':
      return `<ul>${block.items.map((i) => `<li>${esc(i)}</li>`).join('')}</ul>`;
    case 'table':
      return tableHtml(block.columns, block.rows);
  }
}

/**
 * Writes a design report as one self-contained HTML5 page: the same calculation sheet as
 * {@link renderText} (the verdict first, the inputs restated, the duty by case with each
 * run's loss and the NPSH available by term, each candidate, the ranking, the checks and the
 * cautions), with the chart drawn inline as SVG when the report carries its curves. No
 * scripts, no external requests (styles and chart are in the file). Symbols are written as
 * `m³/h` and `°C`. Print styles fit A4 and Letter: each candidate starts a new page; tables,
 * list items and the chart are kept whole where they fit.
 *
 * Sections can be found by class: `section.summary`, `section.candidate` (with
 * `data-name`), `section.after-candidates`, `figure.chart`, `p.verdict`.
 *
 * @param report - a report from `evaluateDesign` (with `{ curves: true }` for the chart)
 * @param options - `units` (default `report.units`), `summary`, `chart`
 * @returns the HTML document, starting with `<!doctype html>`
 * @throws HeadflowError `INVALID_ARGUMENT` for units other than `'si'` and `'us'` or a
 *   non-boolean `summary` or `chart`; `chart: true` for a report without its curves.
 * @example
 * ```ts
 * // report = evaluateDesign(design, { curves: true })
 * const html = renderHtml(report, { units: 'us' });
 * html.startsWith('<!doctype html>'); // true
 * ```
 */
export function renderHtml(report: DesignReport, options: HtmlOptions | null = {}): string {
  const o = guardOptions<HtmlOptions>('options', options) as HtmlOptions;
  const system = chosenUnits(report, o.units);
  const summary = o.summary === undefined ? false : guardBoolean('options.summary', o.summary);
  const wantChart =
    o.chart === undefined ? report.curves !== undefined : guardBoolean('options.chart', o.chart);
  const blocks = reportBlocks(report, system, { style: 'unicode', summary });
  const parts: string[] = [];
  let section: 'summary' | 'candidate' | 'after-candidates' = 'summary';
  parts.push('<section class="summary">');
  let seenCandidate = false;
  blocks.forEach((b, i) => {
    if (b.kind === 'heading' && b.candidate === true) {
      parts.push('</section>');
      parts.push(`<section class="candidate" data-name="${esc(b.text)}">`);
      section = 'candidate';
      seenCandidate = true;
    } else if (b.kind === 'heading' && seenCandidate && section === 'candidate') {
      parts.push('</section>');
      parts.push('<section class="after-candidates">');
      section = 'after-candidates';
    }
    if (i === 1 && b.kind === 'fields') {
      const verdict = b.rows[0]?.[1] ?? '';
      parts.push(`<p class="verdict${report.passed ? '' : ' fail'}">${esc(verdict)}</p>`);
      parts.push(blockHtml({ kind: 'fields', rows: b.rows.slice(1) }));
      if (wantChart) {
        const svg = renderChart(chartSpecFromReport(report, { units: system })).replace(
          /^<\?xml[^>]*>\s*/,
          '',
        );
        parts.push(
          `<figure class="chart">${svg}<figcaption>Pump and system curves, operating points (numbered, see the key under the chart) and duty points of each case.</figcaption></figure>`,
        );
      }
      if (report.network !== undefined) {
        parts.push(
          `<figure class="chart schematic">${renderSchematic(report, { units: system })}<figcaption>The network at the duty of the first case: gauge pressure at each node, flow and velocity in each link.</figcaption></figure>`,
        );
      }
      return;
    }
    parts.push(blockHtml(b));
  });
  parts.push('</section>');
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${esc(`Pump selection report: ${report.name}`)}</title>
<style>${CSS}</style>
</head>
<body>
<main>
${parts.join('\n')}
</main>
</body>
</html>
`;
}

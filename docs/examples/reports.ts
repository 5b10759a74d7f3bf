// example: docs/examples/reports.ts
import { evaluateDesign } from 'headflow/design';
import {
  chartSpecFromReport,
  type JsonEnvelope,
  renderChart,
  renderHtml,
  renderJson,
  renderMarkdown,
  renderText,
} from 'headflow/report';
import { design } from './cooling-loop'; // the DesignInput of docs/examples/cooling-loop.ts

const report = evaluateDesign(design, { curves: true });

// Plain text for a terminal: 80 characters wide, US customary units.
const text = renderText(report, { units: 'us', width: 80 });
console.log(text.split('\n')[0]); // Pump selection report: process cooling loop

// Markdown for a review document: the same content with pipe tables.
const markdown = renderMarkdown(report);
console.log(markdown.split('\n')[0]); // # Pump selection report: process cooling loop

// JSON for other programs: every quantity as { value, unit } in the chosen units.
const json = JSON.parse(renderJson(report, { units: 'si' })) as JsonEnvelope;
console.log(json.format); // headflow-report/2
console.log(json.report.dutyFlow); // { value: 105, unit: 'm3/h' }

// The chart of the same curves and operating points, as one SVG document.
const svg = renderChart(chartSpecFromReport(report, { units: 'si' }));
console.log(svg.includes('</svg>')); // true

// One self-contained HTML page: the sheet and the chart, ready to print on A4 or Letter.
const html = renderHtml(report, { units: 'us' });
console.log(html.startsWith('<!doctype html>')); // true

/**
 * `npm run demo`: evaluates the invented canal-lift scenario (docs/examples/canal-lift.json),
 * prints its calculation sheet and writes the HTML report to .demo/canal-lift.html and the
 * chart to .demo/canal-lift.svg.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  chartSpecFromReport,
  evaluateDesign,
  readScenario,
  renderChart,
  renderHtml,
  renderText,
} from 'headflow';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..', '..');
const file = join(here, 'canal-lift.json');

const design = readScenario(readFileSync(file, 'utf8'), { source: relative(root, file) });
const report = evaluateDesign(design, { curves: true });
console.log(renderText(report));

const out = join(root, '.demo');
mkdirSync(out, { recursive: true });
const chart = join(out, 'canal-lift.svg');
writeFileSync(chart, renderChart(chartSpecFromReport(report)));
const html = join(out, 'canal-lift.html');
writeFileSync(html, renderHtml(report));
console.log(`HTML report written to ${relative(root, html)}, chart to ${relative(root, chart)}.`);
console.log('The same from the command line, after npm run build:');
console.log(
  '  node dist/cli/main.js docs/examples/canal-lift.json --format html -o .demo/canal-lift.html --chart .demo/canal-lift.svg',
);

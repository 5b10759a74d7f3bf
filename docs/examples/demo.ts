/**
 * `npm run demo`: evaluates the invented canal-lift scenario (docs/examples/canal-lift.json),
 * prints its report and writes its chart to .demo/canal-lift.svg.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  chartSpecFromReport,
  evaluateDesign,
  readScenario,
  renderChart,
  renderText,
} from 'headflow';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..', '..');
const file = join(here, 'canal-lift.json');

const design = readScenario(readFileSync(file, 'utf8'), { source: relative(root, file) });
const report = evaluateDesign(design);
console.log(renderText(report));

const out = join(root, '.demo');
mkdirSync(out, { recursive: true });
const chart = join(out, 'canal-lift.svg');
writeFileSync(chart, renderChart(chartSpecFromReport(report)));
console.log(`Chart written to ${relative(root, chart)} (open it in a browser).`);
console.log('The same from the command line, after npm run build:');
console.log('  node dist/cli/main.js docs/examples/canal-lift.json --chart .demo/canal-lift.svg');

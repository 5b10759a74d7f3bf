/**
 * The time limits of docs/input-policy.md, measured: the slowest single call of every
 * exported function over valid inputs drawn by its fuzz entry (tests/fuzz/entries/; each
 * input timed as the fastest of three calls, so that a garbage-collection pause is not
 * charged to it), and of
 * the whole-job functions on the examples and on a scenario three times the size of the
 * largest example. Prints a table; asserts nothing (times depend on the machine).
 *
 * `npm run limits` (or `npx tsx bench/limits.ts`).
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import {
  chartSpecFromReport,
  evaluateDesign,
  readScenario,
  renderChart,
  renderJson,
  renderMarkdown,
  renderText,
} from '../src/index';
import { basicEntries } from '../tests/fuzz/entries/basics';
import { documentEntries } from '../tests/fuzz/entries/documents';
import { machineEntries } from '../tests/fuzz/entries/machines';

const LIMIT_MS = 50;
const WHOLE_JOB_LIMIT_MS = 500;
const WHOLE_JOB = new Set([
  'evaluateDesign',
  'readScenario',
  'renderText',
  'renderMarkdown',
  'renderJson',
  'renderChart',
  'reportToPlain',
  'chartSpecFromReport',
]);

/**
 * The time of one call of `call`, as the fastest of `times` repeats: a garbage-collection
 * pause that happens to fall inside one call is the machine's, not the input's.
 */
function slowest(call: () => unknown, times = 3): number {
  let best = Number.POSITIVE_INFINITY;
  for (let i = 0; i < times; i++) {
    const t = performance.now();
    try {
      call();
    } catch {
      // refused input is timed too
    }
    best = Math.min(best, performance.now() - t);
  }
  return best;
}

const rows: [string, number, number][] = [];
for (const e of [...basicEntries, ...machineEntries, ...documentEntries]) {
  const samples = fc.sample(e.valid, { numRuns: 300, seed: 20261201 });
  const call = e.call as (...a: unknown[]) => unknown;
  for (const args of samples.slice(0, 20)) slowest(() => call(...args)); // warm up
  let worst = 0;
  for (const args of samples)
    worst = Math.max(
      worst,
      slowest(() => call(...args)),
    );
  rows.push([e.name, worst, WHOLE_JOB.has(e.name) ? WHOLE_JOB_LIMIT_MS : LIMIT_MS]);
}

// Three times the largest example: the cooling loop with three times its cases and candidates.
const text = readFileSync(new URL('../docs/examples/cooling-loop.json', import.meta.url), 'utf8');
const big = JSON.parse(text) as Record<string, unknown[]>;
for (const key of ['cases', 'candidates'] as const) {
  const list = big[key] as { name: string }[];
  big[key] = [1, 2, 3].flatMap((k) => list.map((x) => ({ ...x, name: `${x.name} ${k}` })));
}
const bigText = JSON.stringify(big);
const design = readScenario(bigText);
const report = evaluateDesign(design);
const spec = chartSpecFromReport(report);
for (const [name, call] of [
  ['readScenario (3x cooling loop)', () => readScenario(bigText)],
  ['evaluateDesign (3x cooling loop)', () => evaluateDesign(design)],
  ['renderText (3x cooling loop)', () => renderText(report)],
  ['renderMarkdown (3x cooling loop)', () => renderMarkdown(report)],
  ['renderJson (3x cooling loop)', () => renderJson(report)],
  ['renderChart (3x cooling loop)', () => renderChart(spec)],
] as const) {
  slowest(call, 3);
  let worst = 0;
  for (let i = 0; i < 5; i++) worst = Math.max(worst, slowest(call));
  rows.push([name, worst, WHOLE_JOB_LIMIT_MS]);
}

console.log(`# slowest single call, ms (Node ${process.version}, ${new Date().toISOString()})`);
let over = 0;
for (const [name, ms, limit] of rows.sort((a, b) => b[1] - a[1])) {
  const flag = ms > limit ? '  OVER' : '';
  if (flag) over++;
  console.log(`${name.padEnd(36)} ${ms.toFixed(2).padStart(9)}  (limit ${limit})${flag}`);
}
console.log(over === 0 ? 'every call within its limit' : `${over} over their limit`);

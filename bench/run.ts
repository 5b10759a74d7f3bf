/**
 * Runs every bench/*.bench.ts (or those whose file name contains an argument):
 * `npm run bench` or `npm run bench -- friction`.
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { type BenchSuite, runSuite } from './harness';

const here = dirname(fileURLToPath(import.meta.url));
const filters = process.argv.slice(2);
const files = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => filters.length === 0 || filters.some((x) => f.includes(x)))
  .sort();

console.log(
  `# headflow benchmarks, ${new Date().toISOString()}, Node ${process.version}, ${process.arch}`,
);
console.log('Ratios compare cases timed in the same run; absolute rates depend on the machine.');
for (const file of files) {
  const mod = (await import(join(here, file))) as { suites: readonly BenchSuite[] };
  for (const suite of mod.suites) await runSuite(suite);
}

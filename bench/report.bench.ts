/**
 * The report's costs: `evaluateDesign` with and without the chart's sampled curves (they are
 * sampled only when asked for), and how long `headflow/report` takes to load against
 * `headflow/design` (which carries the scenario-file reader and its schema library) and
 * `headflow/units`, each in a fresh Node process from the built package (run `npm run build`
 * first; without dist/ the load times are skipped).
 */
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { type DesignInput, evaluateDesign, readScenario } from '../src/design/index';
import type { BenchSuite } from './harness';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const base = readScenario(
  readFileSync(join(root, 'docs/examples/canal-lift.json'), 'utf8'),
) as DesignInput;

/** The canal lift's two candidates repeated to `n` candidates (3 operating cases each). */
function many(n: number): DesignInput {
  const given = base.candidates ?? [];
  const candidates = Array.from({ length: n }, (_, i) => {
    const c = given[i % given.length];
    if (c === undefined) throw new Error('the example has no candidates');
    return { ...c, name: `${c.name} #${i + 1}` };
  });
  return { ...base, candidates };
}

const design = many(1000);

/** Median load time (ms) of a built module in fresh Node processes. */
function loadTime(module: string, runs = 7): number {
  const file = join(root, 'dist', module, 'index.js');
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const out = execFileSync(
      process.execPath,
      [
        '--input-type=module',
        '-e',
        `const t = performance.now(); await import(${JSON.stringify(file)}); console.log(performance.now() - t);`,
      ],
      { encoding: 'utf8' },
    );
    times.push(Number(out.trim()));
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)] ?? Number.NaN;
}

/** Whether the scenario reader (its format tag) can be reached from a built entry's imports. */
function reachesReader(module: string): boolean {
  const seen = new Set<string>();
  const walk = (f: string): void => {
    if (seen.has(f)) return;
    seen.add(f);
    for (const m of readFileSync(f, 'utf8').matchAll(
      /(?:from|import)\s*["'](\.\.?\/[^"']+)["']/g,
    )) {
      walk(join(dirname(f), m[1] ?? ''));
    }
  };
  walk(join(root, 'dist', module, 'index.js'));
  return [...seen].some((f) => readFileSync(f, 'utf8').includes('headflow-scenario/1'));
}

export const suites: readonly BenchSuite[] = [
  {
    title: 'evaluateDesign, 1000 candidates x 3 cases: with the chart curves against without',
    baseline: 'without curves (default)',
    callsPerRun: 1,
    cases: [
      {
        name: 'without curves (default)',
        run: () => evaluateDesign(design).candidates.length,
      },
      {
        name: 'with curves ({ curves: true })',
        run: () => evaluateDesign(design, { curves: true }).curves?.pumps.length ?? 0,
      },
    ],
    notes: () => {
      if (!existsSync(join(root, 'dist', 'report', 'index.js'))) {
        return ['Load times skipped: run `npm run build` first.'];
      }
      const units = loadTime('units');
      const report = loadTime('report');
      const designModule = loadTime('design');
      return [
        'Load time of the built modules in a fresh Node process (median of 7), as ratios:',
        `headflow/report / headflow/design = ${(report / designModule).toPrecision(3)}; ` +
          `headflow/report / headflow/units = ${(report / units).toPrecision(3)}; ` +
          `headflow/design / headflow/units = ${(designModule / units).toPrecision(3)}.`,
        `The scenario reader is reachable from headflow/report: ${reachesReader('report') ? 'yes' : 'no'}; from headflow/design: ${reachesReader('design') ? 'yes' : 'no'}.`,
      ];
    },
  },
];

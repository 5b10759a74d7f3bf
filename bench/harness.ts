/**
 * A small benchmark harness over tinybench. Each suite times its cases in the same run and
 * reports every case as a ratio to the suite's baseline case, so the figures compare
 * alternatives on one machine at one moment instead of quoting absolute speeds.
 */
import { Bench } from 'tinybench';

/** One timed alternative. `run` makes `callsPerRun` calls and returns a number to consume. */
export interface BenchCase {
  readonly name: string;
  readonly run: () => number;
}

/** A group of alternatives timed together, one of which is the baseline. */
export interface BenchSuite {
  readonly title: string;
  /** Name of the case the others are compared with. */
  readonly baseline: string;
  /** How many calls of the measured function one `run` makes (to report per-call figures). */
  readonly callsPerRun: number;
  readonly cases: readonly BenchCase[];
  /** Extra lines printed after the table (iteration counts, accuracy): machine-independent. */
  readonly notes?: () => readonly string[];
}

let sink = 0;

/** Runs one suite and prints a table: case, calls per second, ratio to the baseline. */
export async function runSuite(suite: BenchSuite, timeMs = 400): Promise<void> {
  const bench = new Bench({ time: timeMs, warmup: true, warmupTime: 100 });
  for (const c of suite.cases) {
    bench.add(c.name, () => {
      sink += c.run();
    });
  }
  await bench.run();
  const perCall = new Map<string, number>();
  for (const task of bench.tasks) {
    const r = task.result;
    if (r.state !== 'completed')
      throw new Error(`bench case ${task.name} did not complete: ${r.state}`);
    perCall.set(task.name, (1000 / r.latency.mean) * suite.callsPerRun);
  }
  const base = perCall.get(suite.baseline);
  if (base === undefined)
    throw new Error(`baseline ${suite.baseline} is not a case of ${suite.title}`);
  console.log(`\n## ${suite.title}\n`);
  console.log(`| case | calls/s | ratio to ${suite.baseline} |`);
  console.log('| --- | ---: | ---: |');
  for (const c of suite.cases) {
    const v = perCall.get(c.name) ?? Number.NaN;
    console.log(`| ${c.name} | ${v.toExponential(3)} | ${(v / base).toPrecision(3)} |`);
  }
  for (const line of suite.notes?.() ?? []) console.log(`\n${line}`);
  if (!Number.isFinite(sink)) console.log('(sink is not finite)');
}

/** Draws `n` inputs once, before timing, with a fixed-seed generator (mulberry32). */
export function draw(n: number, seed: number, make: (u: () => number) => number): Float64Array {
  let a = seed >>> 0;
  const u = (): number => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = make(u);
  return out;
}

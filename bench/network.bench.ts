/**
 * Network solver benchmarks: a looped grid with one fixed-level surface at a corner, solved
 * from a cold start (no flows carried over), against the bare colebrook calls the same number
 * of link evaluations would make; the growth of the solve time with the network's size; and a
 * parallel group against the same runs in series in a system curve.
 */
import { water } from '../src/fluids';
import { colebrook } from '../src/friction';
import {
  type NetworkDefinition,
  type NetworkLink,
  type NetworkNode,
  prepareNetwork,
  solveNetwork,
} from '../src/network';
import { type PipeRunInput, systemCurve } from '../src/system';
import { type Flow, q, STANDARD_ATMOSPHERE } from '../src/units';
import type { BenchSuite } from './harness';

const fluid = water().at(q(15, 'degC'));

/** A k x k grid of junctions (2k(k-1) pipes), a reservoir at one corner, a demand everywhere else. */
function grid(k: number): NetworkDefinition {
  const nodes: NetworkNode[] = [];
  const links: NetworkLink[] = [];
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) {
      const id = `n${i}_${j}`;
      if (i === 0 && j === 0) nodes.push({ id, elevation: q(60, 'm'), surface: {} });
      else
        nodes.push({ id, elevation: q(((i * 3 + j * 5) % 11) * 0.5, 'm'), demand: q(0.05, 'L/s') });
    }
  }
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) {
      const run = (n: number): PipeRunInput => ({
        length: q(80 + ((n * 37) % 60), 'm'),
        insideDiameter: q(i + j < k / 4 ? 300 : 150, 'mm'),
        roughness: q(0.05, 'mm'),
      });
      if (j + 1 < k)
        links.push({
          id: `h${i}_${j}`,
          from: `n${i}_${j}`,
          to: `n${i}_${j + 1}`,
          run: run(links.length),
        });
      if (i + 1 < k)
        links.push({
          id: `v${i}_${j}`,
          from: `n${i}_${j}`,
          to: `n${i + 1}_${j}`,
          run: run(links.length),
        });
    }
  }
  return { fluid, nodes, links };
}

const GRID = 100;
const def = grid(GRID);
const prepared = prepareNetwork(def);
const first = prepared.solve();
const LINKS = def.links.length;
const ITERATIONS = first.iterations;
// The same number of bare colebrook calls as link evaluations: links x iterations, with Re
// and eps/D spread like the grid's.
const calls = LINKS * ITERATIONS;
const re = new Float64Array(calls);
const rr = new Float64Array(calls);
for (let i = 0; i < calls; i++) {
  re[i] = 5e3 + ((i * 7919) % 200_000);
  rr[i] = 0.05 / (i % 2 === 0 ? 300 : 150);
}

function timeOnce(f: () => unknown): number {
  const t = performance.now();
  f();
  return performance.now() - t;
}

function growth(): string[] {
  const sizes = [23, 71, 224]; // about 1,000, 10,000 and 100,000 links
  const rows: string[] = [];
  const times: number[] = [];
  const counts: number[] = [];
  for (const k of sizes) {
    const d = grid(k);
    solveNetwork(d); // warm the code for this size
    // The fastest of several runs (more for the small sizes, where noise weighs most).
    const runs = d.links.length < 5000 ? 20 : d.links.length < 50_000 ? 5 : 2;
    let t = Number.POSITIVE_INFINITY;
    for (let r = 0; r < runs; r++)
      t = Math.min(
        t,
        timeOnce(() => solveNetwork(d)),
      );
    const s = solveNetwork(d);
    times.push(t);
    counts.push(d.links.length);
    rows.push(`${d.links.length} links: ${s.iterations} iterations, ${t.toFixed(0)} ms`);
  }
  const n0 = counts[0] ?? 1;
  const n2 = counts[2] ?? 1;
  const exponent = Math.log((times[2] ?? 1) / (times[0] ?? 1)) / Math.log(n2 / n0);
  return [
    `Growth of the whole solve (topology, ordering, solve) with size, grids: ${rows.join('; ')}; exponent ${exponent.toFixed(2)} (time ~ links^exponent).`,
  ];
}

// A parallel group against the same runs in series.
const branch = (i: number): PipeRunInput => ({
  length: q(30 + 10 * i, 'm'),
  insideDiameter: q(80 + 10 * i, 'mm'),
  roughness: q(0.045, 'mm'),
});
const BRANCHES = 10;
const system = (runs: SystemRuns) =>
  systemCurve({
    fluid,
    suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
    discharge: { elevation: q(10, 'm'), pressure: STANDARD_ATMOSPHERE },
    runs,
  });
type SystemRuns = Parameters<typeof systemCurve>[0]['runs'];
const parallel = system([
  { kind: 'parallel', branches: Array.from({ length: BRANCHES }, (_, i) => [branch(i)]) },
]);
const series = system(Array.from({ length: BRANCHES }, (_, i) => branch(i)));
const FLOWS = 200;
const flows = Array.from({ length: FLOWS }, (_, i) => (0.001 + 0.0005 * i) as Flow);

export const suites: readonly BenchSuite[] = [
  {
    title: `network: ${GRID} x ${GRID} grid (${LINKS} links) from a cold start against ${LINKS} x ${ITERATIONS} bare colebrook calls`,
    baseline: 'solveNetwork (whole: topology, ordering, solve)',
    callsPerRun: 1,
    cases: [
      {
        name: 'solveNetwork (whole: topology, ordering, solve)',
        run: () => solveNetwork(def).iterations,
      },
      { name: 'prepared.solve() (ordering reused)', run: () => prepared.solve().iterations },
      {
        name: 'links x iterations bare colebrook calls',
        run: () => {
          let s = 0;
          for (let i = 0; i < calls; i++) s += colebrook(re[i] ?? 1, rr[i] ?? 0);
          return s;
        },
      },
    ],
    notes: () => [
      `Iterations from a cold start: ${ITERATIONS}; final head residual ${first.headResidual.toExponential(2)} m, flow residual ${first.flowResidual.toExponential(2)} of the largest flow; Cholesky factor entries ${prepared.factorEntries}.`,
      'The ratio of the colebrook row is the solve time as a multiple of (links x iterations) bare colebrook calls.',
      ...growth(),
    ],
  },
  {
    title: `network: one head evaluation of a ${BRANCHES}-branch parallel group against the same runs in series (systemCurve)`,
    baseline: 'series',
    callsPerRun: FLOWS,
    cases: [
      {
        name: 'series',
        run: () => {
          let s = 0;
          for (const f of flows) s += series.head(f);
          return s;
        },
      },
      {
        name: 'parallel group',
        run: () => {
          let s = 0;
          for (const f of flows) s += parallel.head(f);
          return s;
        },
      },
    ],
  },
];

import { fittingK, fittingSet, threeK } from '../src/losses';
import { q } from '../src/units';
import { type BenchSuite, draw } from './harness';

const N = 1000;
const res = draw(N, 7, (u) => 10 ** (2 + 5 * u()));
const d = q(102.3, 'mm');
const items = [
  { id: 'elbow-90-standard', count: 6 },
  { id: 'gate-valve-open', count: 2 },
  { id: 'swing-check-valve', count: 1 },
  { id: 'tee-through-run', count: 3 },
  { id: 'exit', count: 1 },
] as const;
const set = fittingSet(items, d);
const out = new Float64Array(N);

export const suites: readonly BenchSuite[] = [
  {
    title: 'losses: K of a run with 13 fittings at one Re, against the bare expression',
    baseline: 'bare a/Re + b',
    callsPerRun: N,
    cases: [
      {
        name: 'bare a/Re + b',
        run: () => {
          let s = 0;
          const a = set.laminar;
          const b = set.turbulent;
          for (let i = 0; i < N; i++) s += a / (res[i] ?? 1) + b;
          return s;
        },
      },
      {
        name: 'fittingSet.k(re)',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += set.k(res[i] ?? 1);
          return s;
        },
      },
      {
        name: 'fittingSet.kInto (array form)',
        run: () => {
          set.kInto(res, out);
          return out[N - 1] ?? 0;
        },
      },
      {
        name: 'sum of fittingK per line',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) {
            const re = res[i] ?? 1;
            for (const it of items) s += it.count * fittingK(it.id, re, d);
          }
          return s;
        },
      },
      {
        name: 'threeK (one fitting)',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += threeK(800, 0.14, 4, res[i] ?? 1, d);
          return s;
        },
      },
    ],
  },
];

/**
 * The cost of a selection per (pump, way, case), as a ratio to evaluating the same ways as
 * candidates with evaluateDesign, and to one evaluateDesign candidate-case alone; and how the
 * cost per (pump, way, case) grows with the catalogue's size. The design is the invented canal
 * lift (3 cases, Darcy-Weisbach with fittings); the catalogues are invented parabolic pumps
 * around its duty, each with a trim range and a drive (so up to 3 ways).
 *
 * The table times a 20-pump catalogue with tinybench; the notes time 10-, 100- and 1000-pump
 * catalogues with a plain clock (a 1000-pump selection takes seconds, too long for tinybench's
 * 64 iterations), each repeated to the same total work, best of 3 runs.
 */
import { readFileSync } from 'node:fs';
import { type DesignInput, evaluateDesign, readScenario } from '../src/design/index';
import type { CataloguePoint } from '../src/pumps/index';
import { type CataloguePump, type PumpCatalogue, selectPumps } from '../src/select/index';
import { q } from '../src/units/index';
import { type BenchSuite, draw } from './harness';

const design: DesignInput = readScenario(
  readFileSync(new URL('../docs/examples/canal-lift.json', import.meta.url), 'utf8'),
);
const CASES = 3;

/** An invented catalogue of n parabolic pumps around the canal-lift duty (40 L/s, 52-60 m). */
function catalogueOf(n: number, seed: number): PumpCatalogue {
  const shutoff = draw(n, seed, (u) => 66 + 34 * u()); // m
  const best = draw(n, seed + 1, (u) => 30 + 60 * u()); // L/s
  const pumps: CataloguePump[] = [];
  for (let i = 0; i < n; i++) {
    const a = shutoff[i] ?? 80;
    const qb = best[i] ?? 50;
    const points: CataloguePoint[] = [0, 0.5, 0.8, 1, 1.2, 1.4].map((f) => ({
      flow: q(qb * f, 'L/s'),
      head: q(a * (1 - 0.18 * f * f), 'm'),
      efficiency: f === 0 ? 0 : 0.78 * (2 * f - f * f),
      npshRequired: q(3 * (0.55 + 0.45 * f * f), 'm'),
    }));
    pumps.push({
      name: `bench ${i + 1}`,
      speed: q(2900, 'rpm'),
      impellerDiameter: q(250, 'mm'),
      minImpellerDiameter: q(200, 'mm'),
      points,
      drive: { minSpeed: q(1200, 'rpm'), maxSpeed: q(3000, 'rpm'), efficiency: 0.97 },
      price: 4000 + 10 * i,
    });
  }
  return { name: `bench ${n}`, currency: 'EUR', motorEfficiency: 0.92, pumps };
}

function units(catalogue: PumpCatalogue): { ways: number; units: number } {
  const ways = selectPumps(design, catalogue).ranked.length;
  return { ways, units: ways * CASES };
}

const small = catalogueOf(20, 3);
const smallWays = selectPumps(design, small).ranked;
const smallCandidates = smallWays.map((e) => e.candidate);
const smallUnits = smallWays.length * CASES;
const first = smallCandidates[0];
if (first === undefined) throw new Error('the bench catalogue meets the duty in no way');
const one = [first];

/** Seconds per call of f, best of `runs` runs of `repeat` calls. */
function seconds(f: () => unknown, repeat: number, runs = 3): number {
  let best = Number.POSITIVE_INFINITY;
  for (let r = 0; r < runs; r++) {
    const t0 = performance.now();
    for (let i = 0; i < repeat; i++) f();
    best = Math.min(best, (performance.now() - t0) / 1000 / repeat);
  }
  return best;
}

function notes(): string[] {
  const lines: string[] = [];
  // One evaluateDesign candidate-case: a design with one candidate in 3 cases, per case.
  const single = seconds(() => evaluateDesign({ ...design, candidates: one }), 200) / CASES;
  const perUnit: { n: number; select: number; batch: number; ways: number }[] = [];
  for (const n of [10, 100, 1000]) {
    const catalogue = catalogueOf(n, 17);
    const { ways, units: u } = units(catalogue);
    const candidates = selectPumps(design, catalogue).ranked.map((e) => e.candidate);
    const repeat = Math.max(1, Math.round(1000 / n));
    const select = seconds(() => selectPumps(design, catalogue), repeat) / u;
    const batch = seconds(() => evaluateDesign({ ...design, candidates }), repeat) / u;
    perUnit.push({ n, select, batch, ways });
  }
  lines.push(
    '| pumps | ways | selectPumps per (pump, way, case) / one evaluateDesign candidate-case | / evaluateDesign of the same ways, per candidate-case | growth per (pump, way, case), relative to 10 pumps |',
    '| ---: | ---: | ---: | ---: | ---: |',
  );
  const base = perUnit[0]?.select ?? 1;
  for (const r of perUnit) {
    lines.push(
      `| ${r.n} | ${r.ways} | ${(r.select / single).toFixed(2)} | ${(r.select / r.batch).toFixed(2)} | ${(r.select / base).toFixed(2)} |`,
    );
  }
  lines.push(
    'Cost ratios (greater is slower): the goal is <= 2 against one evaluateDesign candidate-case, and a flat growth column (linear in the catalogue size).',
  );
  return [lines.join('\n')];
}

export const suites: readonly BenchSuite[] = [
  {
    title: `select: 20 invented pumps, ${smallWays.length} ways x ${CASES} cases (per (pump, way, case))`,
    baseline: 'evaluateDesign, the same ways as candidates',
    callsPerRun: smallUnits,
    cases: [
      {
        name: 'evaluateDesign, the same ways as candidates',
        run: () => evaluateDesign({ ...design, candidates: smallCandidates }).candidates.length,
      },
      {
        name: 'selectPumps',
        run: () => selectPumps(design, small).ranked.length,
      },
    ],
    notes,
  },
];

/**
 * Operating-point solves per second on a realistic system (static head plus Darcy-Weisbach
 * friction with a Swamee-Jain friction factor and fitting losses, evaluated at each call),
 * against the bare system-curve evaluations a solve is made of. The pump is an invented
 * catalogue of 7 points. Notes report function evaluations per solve (median and worst).
 */

import type { CataloguePoint, SystemCurveLike } from '../src/pumps/index';
import { operatingPoint, pumpCurve, pumpsInParallel } from '../src/pumps/index';
import { type Flow, type Length, q } from '../src/units';
import { type BenchSuite, draw } from './harness';

const N = 200;
const statics = draw(N, 7, (u) => 5 + 20 * u()); // static head 5 .. 25 m

function system(staticHead: number): SystemCurveLike {
  const d = 0.1023; // m, a 4-inch schedule 40 bore
  const length = 180; // m
  const roughness = 4.6e-5; // m
  const nu = 1.0e-6; // m2/s
  const kMinor = 8.5;
  const area = (Math.PI * d * d) / 4;
  return {
    staticHead: staticHead as Length,
    head(flow: Flow): Length {
      const v = flow / area;
      if (v === 0) return staticHead as Length;
      const re = (v * d) / nu;
      const f = 0.25 / Math.log10(roughness / (3.7 * d) + 5.74 / re ** 0.9) ** 2;
      return (staticHead + ((f * length) / d + kMinor) * ((v * v) / (2 * 9.80665))) as Length;
    },
  };
}

const systems = Array.from(statics, system);
const points: CataloguePoint[] = [0, 20, 40, 60, 80, 100, 120].map((x) => ({
  flow: q(x, 'm3/h'),
  head: q(36 - 0.0011 * x * x - 0.004 * x, 'm'),
  efficiency: x === 0 ? 0 : 0.0175 * x - 0.0001 * x * x,
}));
const monotone = pumpCurve({ speed: q(2900, 'rpm'), points });
const quadratic = pumpCurve({
  speed: q(2900, 'rpm'),
  points,
  fit: { head: { method: 'polynomial', degree: 2 } },
});
const pair = pumpsInParallel([monotone, monotone]);
const flows = draw(N, 11, (u) => (u() * 120) / 3600);

function evaluations(pump: typeof monotone | typeof pair): number[] {
  return systems.map((s) => operatingPoint(pump, s).evaluations).sort((a, b) => a - b);
}

function summary(name: string, e: number[]): string {
  return `${name}: ${e[Math.floor(e.length / 2)]} evaluations per solve (median), ${e[e.length - 1]} (worst), over ${e.length} systems with static head 5-25 m`;
}

export const suites: readonly BenchSuite[] = [
  {
    title: 'pumps: operating point on a Darcy-Weisbach system, per solve',
    baseline: 'system head, 12 calls (about one solve)',
    callsPerRun: N,
    cases: [
      {
        name: 'system head, 12 calls (about one solve)',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) {
            const sys = systems[i] as SystemCurveLike;
            for (let k = 0; k < 12; k++) s += sys.head(((flows[(i + k) % N] ?? 0) + 1e-4) as Flow);
          }
          return s;
        },
      },
      {
        name: 'operatingPoint, monotone-cubic pump',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++)
            s += operatingPoint(monotone, systems[i] as SystemCurveLike).flow;
          return s;
        },
      },
      {
        name: 'operatingPoint, quadratic-fit pump',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++)
            s += operatingPoint(quadratic, systems[i] as SystemCurveLike).flow;
          return s;
        },
      },
      {
        name: 'operatingPoint, two pumps in parallel',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += operatingPoint(pair, systems[i] as SystemCurveLike).flow;
          return s;
        },
      },
    ],
    notes: () => [
      summary('monotone-cubic pump', evaluations(monotone)),
      summary('quadratic-fit pump', evaluations(quadratic)),
      summary(
        'two in parallel (outer solve; each evaluation inverts both pumps)',
        evaluations(pair),
      ),
    ],
  },
  {
    title: 'pumps: curve evaluation against a bare quadratic',
    baseline: 'bare quadratic',
    callsPerRun: N,
    cases: [
      {
        name: 'bare quadratic',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) {
            const x = (flows[i] ?? 0) * 3600;
            s += 36 - 0.0011 * x * x - 0.004 * x;
          }
          return s;
        },
      },
      {
        name: 'head(), monotone cubic',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += monotone.head((flows[i] ?? 0) as Flow);
          return s;
        },
      },
      {
        name: 'head(), quadratic fit',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += quadratic.head((flows[i] ?? 0) as Flow);
          return s;
        },
      },
    ],
  },
];

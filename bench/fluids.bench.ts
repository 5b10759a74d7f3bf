import {
  water,
  waterDensity,
  waterDensityInto,
  waterSaturationPressure,
  waterSpeedOfSound,
  waterViscosity,
} from '../src/fluids';
import { STANDARD_ATMOSPHERE, type Temperature } from '../src/units';
import { type BenchSuite, draw } from './harness';

const N = 1000;
// Liquid states at 1 atm: 5 degC to 95 degC, drawn once before timing.
const temps = draw(N, 7, (u) => 278.15 + 90 * u());
const out = new Float64Array(N);
const P = STANDARD_ATMOSPHERE;

export const suites: readonly BenchSuite[] = [
  {
    title: 'fluids: one water state (density + viscosity + vapour pressure) against Math.log',
    baseline: 'Math.log x 10 (baseline)',
    callsPerRun: N,
    cases: [
      {
        name: 'Math.log x 10 (baseline)',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) {
            const t = temps[i] ?? 0;
            for (let k = 1; k <= 10; k++) s += Math.log(t + k);
          }
          return s;
        },
      },
      {
        name: 'density + viscosity + vapour pressure',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) {
            const t = (temps[i] ?? 0) as Temperature;
            s += waterDensity(t, P) + waterViscosity(t, P) + waterSaturationPressure(t);
          }
          return s;
        },
      },
      {
        name: 'water().at(t) (object result)',
        run: () => {
          const w = water();
          let s = 0;
          for (let i = 0; i < N; i++) {
            const st = w.at((temps[i] ?? 0) as Temperature);
            s += st.density + st.dynamicViscosity + (st.vaporPressure ?? 0);
          }
          return s;
        },
      },
      {
        name: 'waterDensity only',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += waterDensity((temps[i] ?? 0) as Temperature, P);
          return s;
        },
      },
      {
        name: 'waterSpeedOfSound only (IF97 derivatives)',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += waterSpeedOfSound((temps[i] ?? 0) as Temperature, P);
          return s;
        },
      },
      {
        name: 'waterDensityInto (array form)',
        run: () => {
          waterDensityInto(temps, P, out);
          return out[N - 1] ?? 0;
        },
      },
    ],
    notes: () => [
      'One "Math.log x 10" call is ten Math.log evaluations; a ratio of 0.5 means one water state costs about twenty logarithms.',
      'water().at(t) also computes the bulk modulus and c_p, in the same pass over the 34 IF97 terms as the density.',
    ],
  },
];

import { water } from '../src/fluids';
import { frictionFactor } from '../src/friction';
import { type PipeRunInput, systemCurve } from '../src/system';
import { q, STANDARD_ATMOSPHERE } from '../src/units';
import { type BenchSuite, draw } from './harness';

const FLOWS = 100_000;
const RUNS = 20;
const fluid = water().at(q(20, 'degC'));
const diametersMm = [154.1, 128.2, 102.3, 77.9, 52.5];
const runs: PipeRunInput[] = Array.from({ length: RUNS }, (_, i) => ({
  name: `run ${i + 1}`,
  length: q(10 + 7 * i, 'm'),
  insideDiameter: q(diametersMm[i % diametersMm.length] ?? 100, 'mm'),
  roughness: q(0.045, 'mm'),
  fittings: [
    { id: 'elbow-90-standard', count: 2 },
    { id: 'gate-valve-open', count: 1 },
  ],
}));
const curve = systemCurve({
  fluid,
  suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
  discharge: { elevation: q(25, 'm'), pressure: STANDARD_ATMOSPHERE },
  runs,
});
const flows = draw(FLOWS, 7, (u) => 0.001 + 0.03 * u());
const out = new Float64Array(FLOWS);

// The bare friction-factor calls the system makes: one per run per flow, same Re and eps/D.
const re = new Float64Array(FLOWS * RUNS);
const rr = new Float64Array(RUNS);
for (let j = 0; j < RUNS; j++) {
  const d = (diametersMm[j % diametersMm.length] ?? 100) / 1000;
  rr[j] = 0.045e-3 / d;
  for (let i = 0; i < FLOWS; i++) {
    const v = (flows[i] ?? 0) / ((Math.PI * d * d) / 4);
    re[i * RUNS + j] = (v * d) / fluid.kinematicViscosity;
  }
}

export const suites: readonly BenchSuite[] = [
  {
    title: `system: a ${RUNS}-run system over ${FLOWS} flows against the bare friction-factor calls it makes`,
    baseline: 'bare frictionFactor calls',
    callsPerRun: FLOWS,
    cases: [
      {
        name: 'bare frictionFactor calls',
        run: () => {
          let s = 0;
          for (let i = 0; i < FLOWS; i++) {
            for (let j = 0; j < RUNS; j++) s += frictionFactor(re[i * RUNS + j] ?? 1, rr[j] ?? 0);
          }
          return s;
        },
      },
      {
        name: 'curve.headInto(flows, out)',
        run: () => {
          curve.headInto(flows, out);
          return out[FLOWS - 1] ?? 0;
        },
      },
    ],
  },
];

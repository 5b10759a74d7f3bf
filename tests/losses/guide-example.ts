// example: tests/losses/guide-example.ts
import {
  cvFromK,
  fittingK,
  fittingSet,
  kFromCv,
  ratedLoss,
  suddenExpansionK,
} from 'headflow/losses';
import { q, to } from 'headflow/units';

const d = q(102.3, 'mm'); // 4 in schedule 40 bore
const re = 2.0e5;

// One fitting: a standard threaded elbow by the 3-K method (Darby Table 7-3).
console.log(fittingK('elbow-90-standard', re, d).toFixed(3)); // 0.513

// A whole run, precomputed once, evaluated at any Re without allocating.
const run = fittingSet(
  [
    { id: 'entrance-sharp' },
    { id: 'elbow-90-long-radius', count: 4 },
    { id: 'gate-valve-open', count: 2 },
    { id: 'swing-check-valve' },
    { id: 'exit' },
  ],
  d,
);
console.log(run.k(re).toFixed(3)); // 4.531

// A control valve given by its Cv, referred to the same pipe.
console.log(kFromCv(120, d).toFixed(3)); // 16.268
console.log(cvFromK(16.268, d).toFixed(1)); // 120.0

// A reducer opening from 50 mm to the 4 in line (referred to the 50 mm pipe).
console.log(suddenExpansionK(q(50, 'mm'), d).toFixed(3)); // 0.579

// A strainer rated at 0.2 bar at 50 m3/h, at 40 m3/h.
const strainer = ratedLoss({ pressureDrop: q(0.2, 'bar'), flow: q(50, 'm3/h') });
console.log(to(strainer.pressureDrop(q(40, 'm3/h')), 'bar').toFixed(3)); // 0.128

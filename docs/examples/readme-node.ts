// example: docs/examples/readme-node.ts
import {
  evaluateDesign,
  formatQuantity,
  pipeSize,
  pumpCurve,
  q,
  STANDARD_ATMOSPHERE,
  water,
} from 'headflow';

// An invented booster: a tank to a roof tank 24 m up, 90 m of NPS 3 schedule 40 steel.
const pump = pumpCurve({
  speed: q(2900, 'rpm'),
  points: [
    { flow: q(0, 'm3/h'), head: q(40, 'm'), efficiency: 0 },
    { flow: q(20, 'm3/h'), head: q(38, 'm'), efficiency: 0.55, npshRequired: q(1.8, 'm') },
    { flow: q(40, 'm3/h'), head: q(33, 'm'), efficiency: 0.7, npshRequired: q(2.4, 'm') },
    { flow: q(60, 'm3/h'), head: q(24, 'm'), efficiency: 0.66, npshRequired: q(3.6, 'm') },
  ],
});

const report = evaluateDesign({
  name: 'roof tank booster',
  fluidName: 'water',
  system: {
    fluid: water().at(q(20, 'degC')),
    suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
    discharge: { elevation: q(24, 'm'), pressure: STANDARD_ATMOSPHERE },
    runs: [
      {
        name: 'line',
        length: q(90, 'm'),
        pipe: pipeSize('3', '40'),
        material: 'commercial-steel',
        fittings: [
          { id: 'elbow-90-flanged', count: 6 },
          { id: 'swing-check-valve' },
          { id: 'exit' },
        ],
      },
    ],
  },
  dutyFlow: q(36, 'm3/h'),
  pumpLocation: { elevation: q(0.5, 'm'), suctionRuns: 0 },
  candidates: [{ name: 'booster', pump, motorEfficiency: 0.9 }],
});

const duty = report.duty[0];
const point = report.candidates[0]?.cases[0];
console.log(`duty head ${formatQuantity(duty?.head ?? q(0, 'm'), 'm')} at 36 m3/h`); // duty head 30.18 m at 36 m3/h
console.log(`runs at ${formatQuantity(point?.flow ?? q(0, 'm3/h'), 'm3/h')}`); // runs at 41.96 m3/h
console.log(`motor ${report.candidates[0]?.motor?.nameplate} kW, passed: ${report.passed}`); // motor 7.5 kW, passed: true

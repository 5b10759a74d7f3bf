// example: docs/examples/cooling-loop.ts
// An invented closed cooling loop: three heat exchangers in parallel, each with its own
// balancing valve, a cold and a hot-water case. Pump and exchanger data are invented.
import {
  type DesignInput,
  evaluateDesign,
  gaugeToAbsolute,
  pipeSize,
  pumpCurve,
  q,
  ratedLoss,
  water,
} from 'headflow';

export const loopPump = pumpCurve({
  speed: q(1450, 'rpm'),
  points: [
    { flow: q(0, 'm3/h'), head: q(24, 'm'), efficiency: 0 },
    { flow: q(40, 'm3/h'), head: q(23.2, 'm'), efficiency: 0.58, npshRequired: q(1.6, 'm') },
    { flow: q(80, 'm3/h'), head: q(21, 'm'), efficiency: 0.74, npshRequired: q(2.0, 'm') },
    { flow: q(120, 'm3/h'), head: q(17.2, 'm'), efficiency: 0.77, npshRequired: q(2.8, 'm') },
    { flow: q(160, 'm3/h'), head: q(11.8, 'm'), efficiency: 0.66, npshRequired: q(4.1, 'm') },
  ],
});

const exchanger = (name: string, cv: number) => ({
  name,
  length: q(12, 'm'),
  pipe: pipeSize('3', '40'),
  material: 'commercial-steel' as const,
  fittings: [
    { id: 'elbow-90-standard', count: 4 },
    { id: 'gate-valve-open', count: 2 },
  ],
  valves: [{ name: 'balancing valve', cv }],
  components: [ratedLoss({ pressureDrop: q(35, 'kPa'), flow: q(35, 'm3/h') })],
});

// The loop is filled and held at 1.5 bar gauge at the expansion tank beside the pump suction.
const tank = { elevation: q(0, 'm'), pressure: gaugeToAbsolute(q(1.5, 'bar')) };

export const design: DesignInput = {
  name: 'process cooling loop',
  fluidName: 'water',
  system: {
    fluid: water().at(q(30, 'degC'), tank.pressure),
    suction: tank,
    discharge: tank,
    runs: [
      {
        name: 'supply main',
        length: q(60, 'm'),
        pipe: pipeSize('5', '40'),
        material: 'commercial-steel',
        agedRoughness: q(0.3, 'mm'),
        fittings: [{ id: 'elbow-90-long-radius', count: 8 }, { id: 'swing-check-valve' }],
      },
      {
        kind: 'parallel',
        name: 'exchangers',
        branches: [
          [exchanger('exchanger A', 120)],
          [exchanger('exchanger B', 160)],
          [exchanger('exchanger C', 200)],
        ],
      },
      {
        name: 'return main',
        length: q(60, 'm'),
        pipe: pipeSize('5', '40'),
        material: 'commercial-steel',
        agedRoughness: q(0.3, 'mm'),
        fittings: [{ id: 'elbow-90-long-radius', count: 8 }, { id: 'gate-valve-open' }],
      },
    ],
  },
  cases: [
    { name: 'cold loop' },
    { name: 'hot water, 80 degC', fluid: water().at(q(80, 'degC'), tank.pressure) },
  ],
  dutyFlow: q(105, 'm3/h'),
  pumpLocation: { elevation: q(0, 'm'), suctionRuns: 0 },
  candidates: [
    {
      name: 'one pump, drive',
      pump: loopPump,
      control: 'speed',
      motorEfficiency: 0.91,
      driveEfficiency: 0.97,
    },
    {
      name: 'two pumps, parallel',
      pump: loopPump,
      count: 2,
      arrangement: 'parallel',
      motorEfficiency: 0.9,
    },
  ],
  limits: { designPressure: gaugeToAbsolute(q(6, 'bar')) },
  energyPrice: { perKWh: 0.14, currency: 'EUR' },
};

export const report = evaluateDesign(design, { curves: true });

for (const c of report.candidates) {
  const kWh = c.energy?.kWh ?? 0;
  console.log(
    `${c.rank}. ${c.name}: ${c.passed ? 'passes' : 'fails'}, ${Math.round(kWh)} kWh/year`,
  );
}

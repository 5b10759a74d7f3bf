// example: docs/examples/irrigation-lift.ts
// An invented irrigation lift: a canal to a hillside tank, two candidate pumps, a dry-season
// low canal level and an aged-pipe case. Pump data are invented for the example.
import {
  type DesignInput,
  evaluateDesign,
  type PumpCurve,
  pipeSize,
  pumpCurve,
  q,
  STANDARD_ATMOSPHERE,
  water,
} from 'headflow';

function catalogue(
  rpm: number,
  rows: readonly (readonly [number, number, number, number | undefined])[],
): PumpCurve {
  return pumpCurve({
    speed: q(rpm, 'rpm'),
    points: rows.map(([flow, head, efficiency, npsh]) => ({
      flow: q(flow, 'm3/h'),
      head: q(head, 'm'),
      efficiency,
      ...(npsh === undefined ? {} : { npshRequired: q(npsh, 'm') }),
    })),
  });
}

// flow m3/h, head m, efficiency, NPSH required m
export const slowPump = catalogue(1480, [
  [0, 62, 0, undefined],
  [50, 61, 0.52, 2.0],
  [100, 58, 0.71, 2.4],
  [150, 52.5, 0.79, 3.1],
  [200, 44, 0.78, 4.2],
  [250, 33, 0.68, 5.8],
]);
export const fastPump = catalogue(2960, [
  [0, 75, 0, undefined],
  [40, 74, 0.55, 2.8],
  [80, 70, 0.72, 3.6],
  [120, 62, 0.78, 4.9],
  [160, 50, 0.74, 6.8],
  [200, 35, 0.62, 9.4],
]);

export const design: DesignInput = {
  name: 'canal to hillside tank',
  fluidName: 'water',
  system: {
    fluid: water().at(q(18, 'degC')),
    suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
    discharge: { elevation: q(42, 'm'), pressure: STANDARD_ATMOSPHERE },
    runs: [
      {
        name: 'suction',
        length: q(8, 'm'),
        pipe: pipeSize('8', '40'),
        material: 'commercial-steel',
        agedRoughness: q(0.6, 'mm'),
        fittings: [{ id: 'entrance-sharp' }, { id: 'elbow-90-long-radius' }],
      },
      {
        name: 'rising main',
        length: q(650, 'm'),
        pipe: pipeSize('8', '40'),
        material: 'commercial-steel',
        agedRoughness: q(0.6, 'mm'),
        fittings: [
          { id: 'swing-check-valve' },
          { id: 'gate-valve-open' },
          { id: 'elbow-90-long-radius', count: 6 },
          { id: 'exit' },
        ],
      },
    ],
  },
  cases: [
    { name: 'normal canal level' },
    { name: 'dry season, low canal', suction: { elevation: q(-1.2, 'm') } },
    { name: 'dry season, aged main', suction: { elevation: q(-1.2, 'm') }, aged: true },
  ],
  dutyFlow: q(150, 'm3/h'),
  pumpLocation: { elevation: q(1.5, 'm'), suctionRuns: 1 },
  candidates: [
    {
      name: 'slow pump, drive',
      pump: slowPump,
      control: 'speed',
      motorEfficiency: 0.93,
      driveEfficiency: 0.97,
    },
    { name: 'fast pump, fixed', pump: fastPump, control: 'fixed', motorEfficiency: 0.92 },
  ],
  profile: [
    { flow: q(150, 'm3/h'), hours: 1400 },
    { flow: q(110, 'm3/h'), hours: 1800 },
  ],
  energyPrice: { perKWh: 0.16, currency: 'EUR' },
};

export const report = evaluateDesign(design, { curves: true });

for (const c of report.candidates) {
  const kWh = c.energy?.kWh ?? 0;
  console.log(
    `${c.rank}. ${c.name}: ${c.passed ? 'passes' : 'fails'}, ${Math.round(kWh)} kWh/year`,
  );
}

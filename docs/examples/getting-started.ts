// example: docs/examples/getting-started.ts
// Step by step, for an invented transfer from a sump to a process tank.
import {
  annualEnergy,
  dutyFor,
  formatQuantity,
  motorForPump,
  npshAvailable,
  operatingPoint,
  pipeSize,
  pumpCurve,
  q,
  STANDARD_ATMOSPHERE,
  systemCurve,
  to,
  water,
} from 'headflow';

// 1. The liquid at its operating state (IAPWS-IF97 and IAPWS 2008).
const fluid = water().at(q(25, 'degC'));

// 2. The system between the two liquid surfaces.
const system = systemCurve({
  fluid,
  suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
  discharge: { elevation: q(18, 'm'), pressure: STANDARD_ATMOSPHERE },
  runs: [
    {
      name: 'suction',
      length: q(4, 'm'),
      pipe: pipeSize('4', '40'),
      material: 'commercial-steel',
      fittings: [{ id: 'entrance-sharp' }, { id: 'elbow-90-long-radius' }],
    },
    {
      name: 'discharge',
      length: q(120, 'm'),
      pipe: pipeSize('3', '40'),
      material: 'commercial-steel',
      fittings: [
        { id: 'elbow-90-standard', count: 5 },
        { id: 'swing-check-valve' },
        { id: 'exit' },
      ],
    },
  ],
});

// 3. The duty: the head the pump must add at the required flow.
const duty = dutyFor(system, q(30, 'm3/h'));
console.log(`duty: ${formatQuantity(duty.head, 'm')} at 30 m3/h`); // duty: 23.67 m at 30 m3/h

// 4. A candidate pump from its catalogue points (invented), and where it runs.
const pump = pumpCurve({
  speed: q(2900, 'rpm'),
  points: [
    { flow: q(0, 'm3/h'), head: q(34, 'm'), efficiency: 0 },
    { flow: q(15, 'm3/h'), head: q(32.5, 'm'), efficiency: 0.52, npshRequired: q(1.5, 'm') },
    { flow: q(30, 'm3/h'), head: q(28, 'm'), efficiency: 0.68, npshRequired: q(2.1, 'm') },
    { flow: q(45, 'm3/h'), head: q(20, 'm'), efficiency: 0.64, npshRequired: q(3.3, 'm') },
  ],
});
const op = operatingPoint(pump, system, { density: fluid.density });
console.log(`runs at ${formatQuantity(op.flow, 'm3/h')}, ${formatQuantity(op.head, 'm')}`); // runs at 35.11 m3/h, 25.67 m
console.log(`${Math.round(op.percentOfBep ?? 0)} % of BEP flow`); // 107 % of BEP flow

// 5. Cavitation: NPSH available at the pump, 1.2 m above the sump surface.
const suctionLoss = system.details(op.flow).runs[0]?.totalLoss ?? q(0, 'm');
const npsha = npshAvailable({
  surfacePressure: STANDARD_ATMOSPHERE,
  vaporPressure: fluid.vaporPressure ?? q(0, 'Pa'),
  density: fluid.density,
  staticHeadAboveImpeller: q(-1.2, 'm'),
  suctionLoss,
});
console.log(
  `NPSHa ${formatQuantity(npsha, 'm')}, NPSHr ${formatQuantity(op.npshRequired ?? q(0, 'm'), 'm')}`,
); // NPSHa 8.729 m, NPSHr 2.442 m

// 6. The motor that never overloads, and a year's energy at 6000 h (throttled to 30 m3/h).
const motor = motorForPump({ pump, density: fluid.density, dutyFlow: op.flow, series: 'iec' });
console.log(`motor ${motor.nonOverloading.motor.nameplate} kW`); // motor 4 kW
const year = annualEnergy({
  pump,
  system,
  density: fluid.density,
  motorEfficiency: 0.88,
  control: 'throttle',
  profile: [{ flow: q(30, 'm3/h'), hours: 6000 }],
});
console.log(`${Math.round(year.totalKWh)} kWh a year`); // 22876 kWh a year
export const energyKWh = year.totalKWh;
export const flowM3h = to(op.flow, 'm3/h');

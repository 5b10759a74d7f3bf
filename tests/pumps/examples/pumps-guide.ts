// example: tests/pumps/examples/pumps-guide.ts
import {
  annualEnergy,
  motorForPump,
  npshAvailable,
  npshMargin,
  operatingPoint,
  pumpCurve,
  type SystemCurveLike,
  speedForFlow,
} from 'headflow/pumps';
import { type Flow, type Length, q, to } from 'headflow/units';

// An invented catalogue: a pump at 1750 rpm with a 250 mm impeller.
const pump = pumpCurve({
  speed: q(1750, 'rpm'),
  impellerDiameter: q(250, 'mm'),
  points: [
    { flow: q(0, 'm3/h'), head: q(40, 'm'), efficiency: 0 },
    { flow: q(50, 'm3/h'), head: q(37.5, 'm'), efficiency: 0.5625, npshRequired: q(1.5, 'm') },
    { flow: q(100, 'm3/h'), head: q(30, 'm'), efficiency: 0.75, npshRequired: q(3, 'm') },
    { flow: q(150, 'm3/h'), head: q(17.5, 'm'), efficiency: 0.5625, npshRequired: q(5.5, 'm') },
  ],
  fit: {
    head: { method: 'polynomial', degree: 2 },
    efficiency: { method: 'polynomial', degree: 2 },
  },
});

// Any object with head(flow) and staticHead is a system; headflow/system builds real ones.
const system: SystemCurveLike = {
  staticHead: q(10, 'm'),
  head: (flow: Flow): Length => q(10 + 0.002 * to(flow, 'm3/h') ** 2, 'm'),
};

const op = operatingPoint(pump, system, { density: q(998.2, 'kg/m3') });
console.log(to(op.flow, 'm3/h').toFixed(1), to(op.head, 'm').toFixed(1)); // 100.0 30.0
console.log((op.percentOfBep ?? 0).toFixed(0), op.inPreferredRegion); // 100 true

const npsha = npshAvailable({
  surfacePressure: q(101.325, 'kPa'),
  vaporPressure: q(2.339, 'kPa'),
  density: q(998.2, 'kg/m3'),
  staticHeadAboveImpeller: q(-3, 'm'),
  suctionLoss: q(1.2, 'm'),
});
console.log(npshMargin({ available: npsha, required: op.npshRequired ?? q(0, 'm') }).ok); // true

const slow = speedForFlow(pump, system, q(80, 'm3/h'));
console.log(to(slow.speed, 'rpm').toFixed(0)); // 1495

const motor = motorForPump({ pump, density: q(998.2, 'kg/m3'), dutyFlow: op.flow, series: 'iec' });
console.log(motor.duty.motor.nameplate, motor.nonOverloading.motor.nameplate); // 11 15

const year = annualEnergy({
  pump,
  system,
  density: q(998.2, 'kg/m3'),
  motorEfficiency: 0.93,
  driveEfficiency: 0.97,
  control: 'speed',
  profile: [
    { flow: q(100, 'm3/h'), hours: 2000 },
    { flow: q(70, 'm3/h'), hours: 4000 },
  ],
  price: { perKWh: 0.15, currency: 'EUR' },
});
console.log(Math.round(year.totalKWh), year.cost?.currency);

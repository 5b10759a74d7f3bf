// example: docs/examples/guide-checks-1.ts
import {
  closureSurgeHead,
  constantFluid,
  correctForViscosity,
  material,
  minimumSubmergence,
  pipeSize,
  pumpCurve,
  q,
  temperatureRise,
  to,
  water,
  waveSpeed,
} from 'headflow';

// A demo line: 1200 m of 6 in schedule 40 steel, welded and buried (anchored throughout),
// carrying water at 15 degC at 1.8 m/s. All numbers are invented for this guide.
const state = water().at(q(15, 'degC'), q(4, 'bar')); // 4 bar absolute
const pipe = pipeSize('6', '40');
const steel = material('commercial-steel');
const a = waveSpeed({
  bulkModulus: state.bulkModulus ?? q(2.2e9, 'Pa'),
  density: state.density,
  insideDiameter: pipe.insideDiameter,
  wallThickness: pipe.wallThickness,
  elasticModulus: steel.elasticModulus,
  anchoring: 'anchored-throughout',
  poissonRatio: steel.poissonRatio,
});
console.log(`wave speed ${to(a, 'm/s').toFixed(0)} m/s`); // wave speed 1337 m/s

// Pump trip that stops the flow within 3 s (screening estimate, not a transient analysis).
const surge = closureSurgeHead({
  waveSpeed: a,
  length: q(1200, 'm'),
  velocityChange: q(1.8, 'm/s'),
  closureTime: q(3, 's'),
});
console.log(
  `surge ${to(surge.head, 'm').toFixed(0)} m (${surge.method}, 2L/a = ${to(surge.roundTripTime, 's').toFixed(2)} s)`,
); // surge 147 m (michaud, 2L/a = 1.80 s)

// Heat at low flow: 9 kW on the shaft, 1.5 kW into the water, at 4 m3/h.
const rise = temperatureRise(
  q(9, 'kW'),
  q(1.5, 'kW'),
  state.density,
  state.specificHeat ?? q(4186, 'J/(kg*K)'),
  q(4, 'm3/h'),
);
console.log(`temperature rise ${rise.toFixed(2)} K`); // temperature rise 1.61 K

// Intake: 250 L/s through a 500 mm bell.
const sub = minimumSubmergence({ flow: q(250, 'L/s'), inletDiameter: q(500, 'mm') });
console.log(`minimum submergence ${to(sub.submergence, 'm').toFixed(2)} m`); // minimum submergence 1.16 m

// A demo pump's water curve corrected for a 200 cSt oil.
const pump = pumpCurve({
  speed: q(1450, 'rpm'),
  points: [
    { flow: q(0, 'm3/h'), head: q(48, 'm'), efficiency: 0 },
    { flow: q(50, 'm3/h'), head: q(46, 'm'), efficiency: 0.55 },
    { flow: q(100, 'm3/h'), head: q(40, 'm'), efficiency: 0.76 },
    { flow: q(150, 'm3/h'), head: q(29, 'm'), efficiency: 0.68 },
  ],
});
const oil = constantFluid({
  name: 'demo oil',
  density: q(880, 'kg/m3'),
  dynamicViscosity: q(176, 'cP'),
});
const corrected = correctForViscosity(pump, oil.at(q(40, 'degC')));
const duty = q(80, 'm3/h');
console.log(
  `B = ${corrected.factors.b.toFixed(2)}, shaft power at 80 m3/h: ` +
    `${to(pump.shaftPower(duty, q(880, 'kg/m3')), 'kW').toFixed(1)} kW on the water curve, ` +
    `${to(corrected.curve.shaftPower(duty, q(880, 'kg/m3')), 'kW').toFixed(1)} kW corrected`,
); // B = 8.15, shaft power at 80 m3/h: 11.5 kW on the water curve, 15.7 kW corrected

// example: docs/examples/units-tour.ts
import { formatQuantity, gaugeToAbsolute, headFromPressure, parseQuantity, q, to } from 'headflow';

// A duty given in US units, read in SI.
const flow = q(1200, 'gal/min');
const lift = parseQuantity('350 ft', 'length');
console.log(formatQuantity(flow, 'm3/h')); // 272.5 m3/h
console.log(formatQuantity(lift, 'm')); // 106.7 m

// A gauge reading becomes absolute only with a stated atmosphere.
const vessel = gaugeToAbsolute(q(45, 'psi'), q(101.325, 'kPa'));
console.log(formatQuantity(vessel, 'kPa', 5)); // 411.59 kPa

// Pressure as head of a fluid column: 1 psi of water at 62.4 lb/ft3.
export const feetPerPsi = to(headFromPressure(q(1, 'psi'), q(62.4, 'lb/ft3')), 'ft');
console.log(feetPerPsi.toFixed(3)); // 2.308

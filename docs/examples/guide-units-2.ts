// example: docs/examples/guide-units-2.ts
import {
  aliasesOf,
  atmosphereAt,
  formatQuantity,
  gaugeToAbsolute,
  parsePressure,
  parseQuantity,
  q,
} from 'headflow';

// The spellings engineers write read as the catalogue's units.
const flow = parseQuantity('1,200 gpm', 'flow');
console.log(formatQuantity(flow, 'm3/h')); // 272.5 m3/h
console.log(aliasesOf('rotationalSpeed')); // [ { alias: 'RPM', unit: 'rpm' } ]

// A gauge reading says so in its unit, and becomes absolute with a stated atmosphere:
// here the standard atmosphere at a site 1500 m above sea level.
const site = atmosphereAt(q(1500, 'm'));
console.log(formatQuantity(site, 'kPa', 5)); // 84.556 kPa
const reading = parsePressure('15 psig');
console.log(reading.reference); // gauge
export const vessel = gaugeToAbsolute(reading.value, site);
console.log(formatQuantity(vessel, 'kPa', 5)); // 187.98 kPa

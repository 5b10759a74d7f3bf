/**
 * `npm run demo`: a short tour of what headflow does today. It grows with the library.
 * The booster duty below is invented for the demo.
 */
import { formatQuantity, type Power, pressureFromHead, q, STANDARD_GRAVITY } from 'headflow';

console.log('headflow demo: units for a pump duty (an invented orchard booster)\n');

const flow = q(1200, 'gal/min');
const head = q(350, 'ft');
const density = q(998.2, 'kg/m3'); // water near 20 degC, for the demo only
console.log(
  `duty flow        ${formatQuantity(flow, 'gal/min')} = ${formatQuantity(flow, 'm3/h')} = ${formatQuantity(flow, 'L/s')}`,
);
console.log(`duty head        ${formatQuantity(head, 'ft')} = ${formatQuantity(head, 'm')}`);

const rise = pressureFromHead(head, density);
console.log(`pressure rise    ${formatQuantity(rise, 'psi')} = ${formatQuantity(rise, 'bar')}`);

// Hydraulic power rho g Q H (the pumps module will carry this; here by hand).
const hydraulic = (density * STANDARD_GRAVITY * flow * head) as Power;
console.log(
  `hydraulic power  ${formatQuantity(hydraulic, 'kW')} = ${formatQuantity(hydraulic, 'hp')}`,
);

console.log(
  '\nResults support, and do not replace, licensed engineering judgement and local codes.',
);

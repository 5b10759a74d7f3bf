// example: docs/examples/network-two-tanks.ts
// An invented branched network: one pump lifts from a sump and fills two tanks at different
// levels through a shared main; each tank's inlet has a check valve.
import {
  formatQuantity,
  type NetworkDefinition,
  pumpCurve,
  q,
  solveNetwork,
  water,
} from 'headflow';

const pump = pumpCurve({
  speed: q(2900, 'rpm'),
  points: [
    { flow: q(0, 'm3/h'), head: q(48, 'm'), efficiency: 0 },
    { flow: q(20, 'm3/h'), head: q(46, 'm'), efficiency: 0.55 },
    { flow: q(40, 'm3/h'), head: q(41, 'm'), efficiency: 0.72 },
    { flow: q(60, 'm3/h'), head: q(33, 'm'), efficiency: 0.74 },
    { flow: q(80, 'm3/h'), head: q(22, 'm'), efficiency: 0.62 },
  ],
});

const steel = (length: number, mm: number) => ({
  length: q(length, 'm'),
  insideDiameter: q(mm, 'mm'),
  material: 'commercial-steel' as const,
});

export const network: NetworkDefinition = {
  name: 'sump to upper and lower tanks',
  fluid: water().at(q(15, 'degC')),
  nodes: [
    { id: 'sump', elevation: q(0, 'm'), surface: {} },
    { id: 'pump in', elevation: q(0, 'm') },
    { id: 'pump out', elevation: q(0, 'm') },
    { id: 'tee', elevation: q(8, 'm') },
    { id: 'lower tank', elevation: q(14, 'm'), surface: {} },
    { id: 'upper tank', elevation: q(22, 'm'), surface: {} },
  ],
  links: [
    { id: 'suction', from: 'sump', to: 'pump in', run: steel(4, 102.3) },
    { id: 'pump', from: 'pump in', to: 'pump out', pump },
    { id: 'main', from: 'pump out', to: 'tee', run: steel(120, 102.3) },
    { id: 'to lower', from: 'tee', to: 'lower tank', checkValve: true, run: steel(60, 77.9) },
    { id: 'to upper', from: 'tee', to: 'upper tank', checkValve: true, run: steel(90, 77.9) },
  ],
};

export const result = solveNetwork(network);
for (const id of ['pump', 'to lower', 'to upper']) {
  const link = result.links[id];
  if (link) console.log(`${id}: ${formatQuantity(link.flow, 'm3/h', 3)} (${link.state})`);
}
const pumpLink = result.links['pump'];
if (pumpLink?.pumpHead !== undefined) {
  console.log(`pump head: ${formatQuantity(pumpLink.pumpHead, 'm', 3)}`);
}
console.log(
  `${result.iterations} iterations, head residual ${result.headResidual.toExponential(1)} m`,
);

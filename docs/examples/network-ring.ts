// example: docs/examples/network-ring.ts
// An invented looped network: a hillside reservoir feeds a ring main through a
// pressure-reducing valve; sprinkler-like outlets and users draw from the ring. Two cases: the
// design demands, and a night case with low demands and the ring's east side closed.
import {
  formatQuantity,
  type NetworkDefinition,
  outletCoefficient,
  prepareNetwork,
  q,
  STANDARD_ATMOSPHERE,
  water,
} from 'headflow';

const pe = (length: number, mm: number) => ({
  length: q(length, 'm'),
  insideDiameter: q(mm, 'mm'),
  friction: { hazenWilliamsC: 140 },
});

export const ring: NetworkDefinition = {
  name: 'hillside ring main',
  fluid: water().at(q(12, 'degC')),
  nodes: [
    { id: 'reservoir', elevation: q(95, 'm'), surface: {} },
    { id: 'valve in', elevation: q(30, 'm') },
    { id: 'valve out', elevation: q(30, 'm') },
    { id: 'north', elevation: q(28, 'm'), demand: q(6, 'L/s') },
    { id: 'east', elevation: q(25, 'm'), demand: q(4, 'L/s') },
    { id: 'south', elevation: q(22, 'm'), demand: q(5, 'L/s') },
    { id: 'west', elevation: q(26, 'm') },
    {
      id: 'yard outlet',
      elevation: q(26, 'm'),
      outlet: { coefficient: outletCoefficient(q(120, 'L/min'), q(1, 'bar')) },
    },
  ],
  links: [
    { id: 'trunk', from: 'reservoir', to: 'valve in', run: pe(900, 200) },
    {
      id: 'reducing valve',
      from: 'valve in',
      to: 'valve out',
      valve: {
        kind: 'pressure-reducing',
        setting: q(STANDARD_ATMOSPHERE + 4.5e5, 'Pa'),
        diameter: q(150, 'mm'),
        openK: 4,
      },
    },
    { id: 'feed', from: 'valve out', to: 'north', run: pe(150, 150) },
    { id: 'north-east', from: 'north', to: 'east', run: pe(400, 125) },
    { id: 'east-south', from: 'east', to: 'south', run: pe(350, 100) },
    { id: 'south-west', from: 'south', to: 'west', run: pe(300, 100) },
    { id: 'west-north', from: 'west', to: 'north', run: pe(450, 125) },
    { id: 'yard', from: 'west', to: 'yard outlet', run: pe(40, 50) },
  ],
};

const prepared = prepareNetwork(ring);
const design = prepared.solve();
const night = prepared.solve({
  name: 'night, east side closed',
  demands: { north: q(1, 'L/s'), east: q(0.5, 'L/s'), south: q(0.8, 'L/s') },
  status: { 'north-east': 'closed' },
});
for (const [label, s] of [
  ['design', design],
  ['night', night],
] as const) {
  const valve = s.links['reducing valve'];
  const south = s.nodes['south'];
  const outlet = s.nodes['yard outlet'];
  if (valve && south && outlet) {
    console.log(
      `${label}: valve ${valve.state}, ${formatQuantity(valve.flow, 'L/s', 3)}; ` +
        `south ${formatQuantity((south.pressure - STANDARD_ATMOSPHERE) as typeof south.pressure, 'bar', 3)} gauge; ` +
        `yard outlet ${formatQuantity(outlet.outflow, 'L/min', 3)}`,
    );
  }
}
export const cases = { design, night };

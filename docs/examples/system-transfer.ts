// example: docs/examples/system-transfer.ts
// An invented transfer line: a sump to a roof tank, with a low-level and an aged-pipe case.
import {
  dutyFor,
  formatQuantity,
  pipeSize,
  q,
  STANDARD_ATMOSPHERE,
  type SystemDefinition,
  systemScenarios,
  water,
} from 'headflow';

const design: SystemDefinition = {
  name: 'sump to roof tank',
  fluid: water().at(q(15, 'degC')),
  suction: { elevation: q(-2, 'm'), pressure: STANDARD_ATMOSPHERE },
  discharge: { elevation: q(24, 'm'), pressure: STANDARD_ATMOSPHERE },
  runs: [
    {
      name: 'suction',
      length: q(6, 'm'),
      pipe: pipeSize('4', '40'),
      material: 'commercial-steel',
      agedRoughness: q(0.5, 'mm'),
      fittings: [
        { id: 'entrance-sharp' },
        { id: 'elbow-90-long-radius' },
        { id: 'gate-valve-open' },
      ],
    },
    {
      name: 'discharge',
      length: q(85, 'm'),
      pipe: pipeSize('3', '40'),
      material: 'commercial-steel',
      agedRoughness: q(0.5, 'mm'),
      fittings: [
        { id: 'swing-check-valve' },
        { id: 'gate-valve-open' },
        { id: 'elbow-90-standard', count: 6 },
        { id: 'exit' },
      ],
    },
  ],
};

const cases = systemScenarios(design, [
  { name: 'normal level, new pipe' },
  { name: 'low level, aged pipe', suction: { elevation: q(-3.5, 'm') }, aged: true },
]);

for (const { name, curve } of cases) {
  const duty = dutyFor(curve, q(12, 'L/s'));
  console.log(`${name}: ${formatQuantity(duty.head, 'm')} at 12 L/s`);
}
export const heads = cases.map((c) => dutyFor(c.curve, q(12, 'L/s')).head);

// example: docs/examples/guide-scenario-1.ts
import { readFileSync } from 'node:fs';
import { evaluateDesign, readScenario } from 'headflow/design';

const design = readScenario(readFileSync('docs/examples/orchard-tank.json', 'utf8'), {
  source: 'orchard-tank.json',
});
export const report = evaluateDesign(design);

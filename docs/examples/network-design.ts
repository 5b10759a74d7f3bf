// example: docs/examples/network-design.ts
// The invented booster of docs/examples/booster-floors.json, run from code: read the file,
// evaluate every candidate in the whole network, print each case's duty and the pressure at
// the top floor's fixtures, and draw the schematic.
import { readFileSync } from 'node:fs';
import { evaluateDesign, formatQuantity, q, readDesignFile } from 'headflow';
import { renderSchematic } from 'headflow/report';

const file = new URL('./booster-floors.json', import.meta.url);
const design = readDesignFile(readFileSync(file, 'utf8'), { source: 'booster-floors.json' });
export const report = evaluateDesign(design, { curves: true });

for (const d of report.duty) {
  const network = d.network;
  const top = network?.tables.nodes.find((n) => n.id === 'fixtures 6');
  if (network === undefined || top === undefined) continue;
  const gauge = q(top.pressure - report.atmosphere, 'Pa');
  console.log(
    `${d.case}: ${formatQuantity(d.head, 'm', 4)} at ${formatQuantity(network.dutyFlow, 'm3/h', 4)}, top floor ${formatQuantity(gauge, 'kPa', 4)} gauge`,
  );
}
console.log(`recommended: ${report.verdict.recommended}, passed: ${report.passed}`);
export const svg = renderSchematic(report, { units: 'si' });

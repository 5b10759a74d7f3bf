// example: docs/examples/select-canal-lift.ts
// Ranks the invented pump catalogue for the invented canal lift, by life-cycle cost over
// 20 years, then sizes the rising main with it. Prices and pipe costs are invented.
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import {
  economicPipeSize,
  formatQuantity,
  pipeSize,
  readCatalogue,
  readScenario,
  renderSizeChart,
  selectPumps,
} from 'headflow';

const design = readScenario(readFileSync('docs/examples/canal-lift.json', 'utf8'));
const catalogue = readCatalogue(readFileSync('docs/examples/pump-catalogue.json', 'utf8'), {
  source: 'pump-catalogue.json',
});
const costs = { years: 20, discountRate: 0.05, energyEscalation: 0.02, maintenancePerYear: 300 };

const { ranked } = selectPumps(design, catalogue, { costs });
for (const way of ranked.slice(0, 3)) {
  const setting =
    way.trimDiameter !== undefined
      ? formatQuantity(way.trimDiameter, 'mm', 4)
      : way.speed !== undefined
        ? formatQuantity(way.speed, 'rpm', 4)
        : '-';
  console.log(
    `${way.rank}. ${way.label}: ${setting}, ${Math.round(way.lifeCycleCost?.total ?? 0)} EUR`,
  );
}
// 1. 65-200/2900, variable speed: 2952 rpm, 176589 EUR
// 2. 80-200/2900, variable speed: 2812 rpm, 185932 EUR
// 3. 100-400/1450, trimmed to 401.9 mm: 401.9 mm, 224311 EUR

// The rising main, 5 to 8 inch, with an installed cost per metre of each size.
const sizing = economicPipeSize(design, catalogue, {
  costs,
  runs: [
    {
      run: 'rising main',
      sizes: [
        { pipe: pipeSize('5', '40'), costPerLength: 95 },
        { pipe: pipeSize('6', '40'), costPerLength: 120 },
        { pipe: pipeSize('8', '40'), costPerLength: 175 },
      ],
    },
  ],
});
for (const row of sizing.table) {
  console.log(
    `NPS ${row.sizes[0]?.nps}: pipe ${Math.round(row.pipeCost)} EUR, ` +
      `life-cycle ${Math.round(row.lifeCycleCost ?? 0)} EUR with ${row.best?.label}`,
  );
}
console.log(`economic size: NPS ${sizing.best?.sizes[0]?.nps} (${sizing.search})`);
// NPS 5: pipe 39900 EUR, life-cycle 391398 EUR with 80-250/2900, full impeller
// NPS 6: pipe 50400 EUR, life-cycle 226989 EUR with 65-200/2900, variable speed
// NPS 8: pipe 73500 EUR, life-cycle 226894 EUR with 65-200/2900, variable speed
// economic size: NPS 8 (exhaustive)

// The same table as a chart: pipe cost and pump life-cycle cost stacked for each size.
mkdirSync('.demo', { recursive: true });
writeFileSync(
  '.demo/canal-lift-sizes.svg',
  renderSizeChart(sizing, { currency: catalogue.currency }),
);

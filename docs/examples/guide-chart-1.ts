// example: docs/examples/guide-chart-1.ts
import { mkdirSync, writeFileSync } from 'node:fs';
import { type ChartSpec, renderChart } from 'headflow/report';

const spec: ChartSpec = {
  title: 'Orchard booster',
  units: { flow: 'gal/min', head: 'ft' },
  pumpCurves: [
    {
      name: 'candidate A',
      points: [
        { flow: 0, value: 40 },
        { flow: 0.015, value: 35 },
        { flow: 0.03, value: 22 },
      ],
    },
  ],
  systemCurves: [
    {
      name: 'high tank',
      points: [
        { flow: 0, value: 12 },
        { flow: 0.03, value: 30 },
      ],
    },
  ],
  operatingPoints: [{ name: 'A / high tank', flow: 0.0245, head: 26.7 }],
  preferredRegions: [{ name: 'candidate A', minFlow: 0.012, maxFlow: 0.026 }],
  efficiencyCurves: [],
  npshRequired: [],
};

mkdirSync('.demo', { recursive: true });
writeFileSync('.demo/booster.svg', renderChart(spec, { width: 720, height: 480 }));

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readScenario } from '../../src/design/index';
import { pipeSize } from '../../src/pipes/index';
import {
  economicPipeSize,
  type PumpCatalogue,
  readCatalogue,
  selectPumps,
} from '../../src/select/index';
import type { PipeRunInput } from '../../src/system/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const design = readScenario(readFileSync('docs/examples/canal-lift.json', 'utf8'));
const full = readCatalogue(readFileSync('docs/examples/pump-catalogue.json', 'utf8'));
const catalogue: PumpCatalogue = {
  ...full,
  pumps: full.pumps.filter((p) =>
    ['65-200/2900', '80-200/2900', '100-400/1450', '80-250/2900'].includes(p.name),
  ),
};
// Installed cost per metre (invented, rising with size).
const runs = [
  {
    run: 'suction',
    sizes: [
      { pipe: pipeSize('6', '40'), costPerLength: 140 },
      { pipe: pipeSize('8', '40'), costPerLength: 190 },
    ],
  },
  {
    run: 'rising main',
    sizes: [
      { pipe: pipeSize('5', '40'), costPerLength: 95 },
      { pipe: pipeSize('6', '40'), costPerLength: 120 },
      { pipe: pipeSize('8', '40'), costPerLength: 175 },
    ],
  },
];
const costs = { years: 20, discountRate: 0.05, energyEscalation: 0.02 };

describe('economicPipeSize', () => {
  it('refuses runs that are not in the line, and bad sizes', () => {
    expectHeadflowError(
      () =>
        economicPipeSize(design, catalogue, {
          runs: [{ run: 'nowhere', sizes: runs[0]?.sizes ?? [] }],
        }),
      'UNKNOWN_NAME',
    );
    expectHeadflowError(
      () =>
        economicPipeSize(design, catalogue, {
          runs: [{ run: 'suction', sizes: [{ pipe: pipeSize('6', '40'), costPerLength: -1 }] }],
        }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => economicPipeSize(design, catalogue, { runs: [] }),
      'INVALID_ARGUMENT',
    );
  });

  it('finds the least life-cycle cost of an enumeration done here, by both searches', () => {
    // Independent enumeration: every combination, the pipe's installed cost plus the least
    // life-cycle cost of a passing selection on that system.
    let best = Number.POSITIVE_INFINITY;
    let bestSizes = '';
    const lengths = new Map<string, number>();
    for (const el of design.system.runs) {
      const r = el as PipeRunInput;
      lengths.set(r.name ?? '', r.length);
    }
    for (const s of runs[0]?.sizes ?? []) {
      for (const m of runs[1]?.sizes ?? []) {
        const line = design.system.runs.map((el) => {
          const r = el as PipeRunInput;
          if (r.name === 'suction') return { ...r, pipe: s.pipe };
          if (r.name === 'rising main') return { ...r, pipe: m.pipe };
          return r;
        });
        const sel = selectPumps(
          { ...design, system: { ...design.system, runs: line } },
          catalogue,
          {
            costs,
          },
        );
        const pump = Math.min(
          ...sel.ranked
            .filter((e) => e.passed)
            .map((e) => e.lifeCycleCost?.total ?? Number.POSITIVE_INFINITY),
        );
        const pipe =
          s.costPerLength * (lengths.get('suction') ?? 0) +
          m.costPerLength * (lengths.get('rising main') ?? 0);
        if (pipe + pump < best) {
          best = pipe + pump;
          bestSizes = `${s.pipe.nps}/${m.pipe.nps}`;
        }
      }
    }
    const exhaustive = economicPipeSize(design, catalogue, { runs, costs });
    expect(exhaustive.search).toBe('exhaustive');
    expect(exhaustive.evaluations).toBe(6);
    expect(exhaustive.table).toHaveLength(6);
    expectRelative(exhaustive.best?.lifeCycleCost ?? 0, best, 1e-12);
    expect(exhaustive.best?.sizes.map((s) => s.nps).join('/')).toBe(bestSizes);
    const descent = economicPipeSize(design, catalogue, { runs, costs, maxCombinations: 1 });
    expect(descent.search).toBe('coordinate descent');
    expect(descent.evaluations).toBeLessThanOrEqual(6);
    expectRelative(descent.best?.lifeCycleCost ?? 0, best, 1e-12);
    // The table: life-cycle cost against size, pipe cost rising with size.
    const row = exhaustive.table.find((r) => r.sizes.map((s) => s.nps).join('/') === '8/8');
    const small = exhaustive.table.find((r) => r.sizes.map((s) => s.nps).join('/') === '6/5');
    expect(row?.pipeCost ?? 0).toBeGreaterThan(small?.pipeCost ?? 0);
  });
});

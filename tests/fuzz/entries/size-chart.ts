/** Fuzz entry of the chart of an economic pipe size. See tests/fuzz/harness.ts. */
import fc from 'fast-check';
import { expect } from 'vitest';
import * as api from '../../../src/index';
import { type FuzzEntry, logUniform, optionsOf, uniform } from '../harness';

/** Nominal sizes as a run's candidate sizes carry them (trade notation, or one not in the table). */
const nps = fc.constantFrom('1/2', '1-1/4', '2', '3', '5', '6', '8', '10', '24', '36', 'DN150');
const runName = fc.string({ maxLength: 40 });

/** A combination of sizes: costs > 0, the total no less than the pipe cost, or no total. */
const row = (runs: readonly string[]) =>
  fc
    .record({
      sizes: fc.tuple(...runs.map((run) => nps.map((n) => ({ run, nps: n, schedule: '40' })))),
      pipeCost: logUniform(1, 1e9),
      pumpCost: fc.option(logUniform(1e-3, 1e9), { nil: undefined }),
    })
    .map(({ sizes, pipeCost, pumpCost }) => ({
      sizes,
      pipeCost,
      best: undefined,
      lifeCycleCost: pumpCost === undefined ? undefined : pipeCost + pumpCost,
    }));

/** A result of `economicPipeSize`: one to three runs, one to eight combinations. */
const result = fc
  .array(runName, { minLength: 1, maxLength: 3 })
  .chain((runs) => fc.array(row(runs), { minLength: 1, maxLength: 8 }))
  .chain((table) =>
    fc.record({
      best: fc.option(fc.constantFrom(...table), { nil: undefined }),
      table: fc.constant(table),
      search: fc.constantFrom('exhaustive' as const, 'coordinate descent' as const),
      evaluations: fc.constant(table.length),
    }),
  );

export const sizeChartEntries: readonly FuzzEntry[] = [
  {
    name: 'renderSizeChart',
    valid: fc.tuple(
      result,
      optionsOf(
        fc.record(
          { width: uniform(100, 20_000), currency: fc.string(), title: fc.string() },
          { requiredKeys: [] },
        ),
      ),
    ),
    call: api.renderSizeChart,
    check: (svg) => {
      expect(typeof svg).toBe('string');
      // No attribute (coordinates, sizes, costs) holds NaN or Infinity; names may be any text.
      expect(svg as string).not.toMatch(/="[^"]*\b(NaN|Infinity)\b[^"]*"/);
    },
  },
];

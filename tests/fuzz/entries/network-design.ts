/**
 * Fuzz entries of the whole job on a network: the file reader of either form, the test of
 * which form a design is, the evaluation of a network design, its report's renderers and the
 * schematic. See tests/fuzz/harness.ts. A network design takes about 0.1 s to evaluate, so
 * those rows run fewer calls (`runs`); the rows of the same names for lines run the full count.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import type { DesignReport } from '../../../src/index';
import * as api from '../../../src/index';
import { type FuzzEntry, optionsOf } from '../harness';

const FILES = ['booster-floors', 'ring-main'].map(
  (name) =>
    JSON.parse(
      readFileSync(new URL(`../../../docs/examples/${name}.json`, import.meta.url), 'utf8'),
    ) as Record<string, unknown>,
);

/** A network file: an example with its node elevations shifted by up to a metre (whole mm). */
const file = fc
  .tuple(fc.integer({ min: 0, max: 1 }), fc.integer({ min: -1000, max: 1000 }))
  .map(([i, mm]) => {
    const shift = mm / 1000;
    const f = structuredClone(FILES[i] as Record<string, unknown>);
    for (const node of f['nodes'] as { elevation: string }[]) {
      const [value, ...unit] = node.elevation.split(' ');
      node.elevation = `${Number(value) + shift} ${unit.join(' ')}`;
    }
    return f;
  });

const REPORTS: readonly DesignReport[] = FILES.map((f) =>
  api.evaluateDesign(api.readDesignFile(f)),
);
const report = fc.constantFrom(...REPORTS);
const unitSystem = fc.constantFrom('si', 'us');
const noNanText = (out: unknown): void => {
  if (/\bNaN\b|Infinity/.test(String(out))) throw new Error('a rendering shows NaN or Infinity');
};

export const networkDesignEntries: readonly FuzzEntry[] = [
  {
    name: 'readDesignFile',
    valid: fc
      .tuple(file, fc.boolean(), optionsOf(fc.record({ source: fc.constant('net.json') })))
      .map(([f, asText, o]) => [asText ? JSON.stringify(f) : f, o]),
    call: api.readDesignFile,
    runs: 300,
  },
  {
    name: 'isNetworkDesign',
    valid: file.map((f) => [api.readDesignFile(f)]),
    call: api.isNetworkDesign,
  },
  {
    name: 'evaluateDesign',
    valid: file.map((f) => [api.readDesignFile(f)]),
    call: api.evaluateDesign,
    // Known limit, left open: with pressure-dependent outlets the solver can stop at its
    // iteration cap on a valid layout (the booster with its floors shifted by a few hundred
    // mm); it says so with NO_SOLUTION and the last residuals, never a hang or a NaN.
    validMayThrow: ['NO_SOLUTION'],
    runs: 40,
  },
  {
    name: 'renderText',
    valid: fc.tuple(report, optionsOf(fc.record({ units: unitSystem }, { requiredKeys: [] }))),
    call: api.renderText,
    check: noNanText,
    runs: 300,
  },
  {
    name: 'renderSchematic',
    valid: report.chain((r) =>
      fc.tuple(
        fc.constant(r),
        optionsOf(
          fc.record(
            {
              units: unitSystem,
              width: fc.integer({ min: 600, max: 3000 }),
              case: fc.constantFrom(...r.duty.map((d) => d.case)),
              candidate: fc.constantFrom(...r.candidates.map((c) => c.name)),
            },
            { requiredKeys: [] },
          ),
        ),
      ),
    ),
    call: api.renderSchematic,
    check: noNanText,
    runs: 300,
  },
];

/**
 * Every exported function has a fuzz entry. The list of exports is read from the package's
 * root barrel and from every subpath barrel (.config/modules.ts), so a new export, or a new
 * module, fails this test until a row for it is added to a table in tests/fuzz/entries/.
 */
import { describe, expect, it } from 'vitest';
import { publicModules } from '../../.config/modules';
import * as root from '../../src/index';
import { basicEntries } from './entries/basics';
import { documentEntries } from './entries/documents';
import { machineEntries } from './entries/machines';
import { networkEntries } from './entries/network';
import { networkDesignEntries } from './entries/network-design';
import { selectionEntries } from './entries/selection';
import { sizeChartEntries } from './entries/size-chart';
import { FUZZ_RUNS } from './harness';

const ENTRIES = [
  ...basicEntries,
  ...machineEntries,
  ...documentEntries,
  ...networkEntries,
  ...networkDesignEntries,
  ...selectionEntries,
  ...sizeChartEntries,
];

function functionsOf(module: Record<string, unknown>): Map<string, unknown> {
  return new Map(Object.entries(module).filter(([, v]) => typeof v === 'function'));
}

describe('fuzz coverage', () => {
  it('has an entry for every function exported by the root barrel', () => {
    const covered = new Set(ENTRIES.map((e) => e.name));
    const missing = [...functionsOf(root).keys()].filter((name) => !covered.has(name));
    expect(missing, 'exports without a fuzz entry (add one to tests/fuzz/entries/)').toEqual([]);
  });

  it('has no entry for a name that is not exported', () => {
    const exported = functionsOf(root);
    expect(ENTRIES.map((e) => e.name).filter((n) => !exported.has(n))).toEqual([]);
  });

  it('covers the subpath barrels too: each re-exports the root function of the same name', async () => {
    const rootFns = functionsOf(root);
    for (const m of publicModules) {
      const sub = (await import(`../../src/${m}/index.ts`)) as Record<string, unknown>;
      for (const [name, fn] of functionsOf(sub)) {
        // The same function object: the root entry fuzzes it. A subpath-only function
        // would have to be added to the root barrel (and so to the tables).
        expect(rootFns.get(name), `${m}.${name}`).toBe(fn);
      }
    }
  });

  it('runs at least 1000 calls of each kind per function', () => {
    expect(FUZZ_RUNS).toBeGreaterThanOrEqual(1000);
    expect(ENTRIES.length).toBeGreaterThanOrEqual(98);
  });
});

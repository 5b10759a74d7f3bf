import { describe, it } from 'vitest';
import { machineEntries } from './entries/machines';
import { fuzzTimeout, runEntry } from './harness';

describe('fuzz: systems and pumps', () => {
  for (const entry of machineEntries) it(entry.name, () => runEntry(entry), fuzzTimeout(120_000));
});

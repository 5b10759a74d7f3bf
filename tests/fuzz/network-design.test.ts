import { describe, it } from 'vitest';
import { networkDesignEntries } from './entries/network-design';
import { fuzzTimeout, runEntry } from './harness';

describe('fuzz: the whole job on a network', () => {
  for (const entry of networkDesignEntries) {
    it(entry.name, () => runEntry(entry), fuzzTimeout(120_000));
  }
});

import { describe, it } from 'vitest';
import { networkEntries } from './entries/network';
import { fuzzTimeout, runEntry } from './harness';

describe('fuzz: networks', () => {
  for (const entry of networkEntries) it(entry.name, () => runEntry(entry), fuzzTimeout(60_000));
});

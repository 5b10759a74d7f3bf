import { describe, it } from 'vitest';
import { selectionEntries } from './entries/selection';
import { fuzzTimeout, runEntry } from './harness';

describe('fuzz: pump selection', () => {
  for (const entry of selectionEntries) it(entry.name, () => runEntry(entry), fuzzTimeout(60_000));
});

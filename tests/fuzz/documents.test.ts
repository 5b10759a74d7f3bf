import { describe, it } from 'vitest';
import { documentEntries } from './entries/documents';
import { fuzzTimeout, runEntry } from './harness';

describe('fuzz: design, scenario files and reports', () => {
  for (const entry of documentEntries) it(entry.name, () => runEntry(entry), fuzzTimeout(300_000));
});

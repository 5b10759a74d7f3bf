import { describe, it } from 'vitest';
import { documentEntries } from './entries/documents';
import { runEntry } from './harness';

describe('fuzz: design, scenario files and reports', () => {
  for (const entry of documentEntries) it(entry.name, () => runEntry(entry), 300_000);
});

import { describe, it } from 'vitest';
import { machineEntries } from './entries/machines';
import { runEntry } from './harness';

describe('fuzz: systems and pumps', () => {
  for (const entry of machineEntries) it(entry.name, () => runEntry(entry), 120_000);
});

import { describe, it } from 'vitest';
import { basicEntries } from './entries/basics';
import { runEntry } from './harness';

describe('fuzz: units, fluids, pipes, friction, losses', () => {
  for (const entry of basicEntries) it(entry.name, () => runEntry(entry), 60_000);
});

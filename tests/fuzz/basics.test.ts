import { describe, it } from 'vitest';
import { basicEntries } from './entries/basics';
import { fuzzTimeout, runEntry } from './harness';

describe('fuzz: units, fluids, pipes, friction, losses', () => {
  for (const entry of basicEntries) it(entry.name, () => runEntry(entry), fuzzTimeout(60_000));
});

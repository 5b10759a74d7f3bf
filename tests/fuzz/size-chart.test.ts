import { describe, it } from 'vitest';
import { sizeChartEntries } from './entries/size-chart';
import { fuzzTimeout, runEntry } from './harness';

describe('fuzz: the chart of an economic pipe size', () => {
  for (const entry of sizeChartEntries) it(entry.name, () => runEntry(entry), fuzzTimeout(120_000));
});

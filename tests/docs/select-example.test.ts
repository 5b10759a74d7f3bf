import { describe, expect, it, vi } from 'vitest';

describe('selection example (docs/examples/select-canal-lift.ts)', () => {
  it('prints the three leading ways and the life-cycle cost against the rising main size', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    await import('../../docs/examples/select-canal-lift');
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    expect(lines).toEqual([
      '1. 65-200/2900, variable speed: 2956 rpm, 177218 EUR',
      '2. 80-200/2900, variable speed: 2817 rpm, 186763 EUR',
      '3. 100-400/1450, trimmed to 402.5 mm: 402.5 mm, 225149 EUR',
      'NPS 5: pipe 39900 EUR, life-cycle 391398 EUR with 80-250/2900, full impeller',
      'NPS 6: pipe 50400 EUR, life-cycle 227618 EUR with 65-200/2900, variable speed',
      'NPS 8: pipe 73500 EUR, life-cycle 227089 EUR with 65-200/2900, variable speed',
      'economic size: NPS 8 (exhaustive)',
    ]);
  });
});

import { describe, expect, it, vi } from 'vitest';

describe('selection example (docs/examples/select-canal-lift.ts)', () => {
  it('prints the three leading ways and the life-cycle cost against the rising main size', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    await import('../../docs/examples/select-canal-lift');
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    expect(lines).toEqual([
      '1. 65-200/2900, variable speed: 2952 rpm, 176589 EUR',
      '2. 80-200/2900, variable speed: 2812 rpm, 185932 EUR',
      '3. 100-400/1450, trimmed to 401.9 mm: 401.9 mm, 224311 EUR',
      'NPS 5: pipe 39900 EUR, life-cycle 391398 EUR with 80-250/2900, full impeller',
      'NPS 6: pipe 50400 EUR, life-cycle 226989 EUR with 65-200/2900, variable speed',
      'NPS 8: pipe 73500 EUR, life-cycle 226894 EUR with 65-200/2900, variable speed',
      'economic size: NPS 8 (exhaustive)',
    ]);
  });
});

import { readFileSync } from 'node:fs';
import { describe, expect, it, vi } from 'vitest';

describe('docs/pumps.md sample', () => {
  it('runs and prints what its comments say', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    await import('./examples/pumps-guide');
    const lines = log.mock.calls.map((c) => c.map(String).join(' '));
    log.mockRestore();
    expect(lines.slice(0, 5)).toEqual(['100.0 30.0', '100 true', 'true', '1495', '11 15']);
    expect(lines[5]).toMatch(/^\d+ EUR$/);
  });
  it('is the block in docs/pumps.md', () => {
    const page = readFileSync(new URL('../../docs/pumps.md', import.meta.url), 'utf8');
    const code = readFileSync(new URL('./examples/pumps-guide.ts', import.meta.url), 'utf8');
    expect(page).toContain(code);
  });
});

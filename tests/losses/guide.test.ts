import { readFileSync } from 'node:fs';
import { describe, expect, it, vi } from 'vitest';

describe('docs/losses.md sample runs and prints what its comments say', () => {
  it('guide example', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    await import('./guide-example');
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    const source = readFileSync(new URL('./guide-example.ts', import.meta.url), 'utf8');
    const promised = [...source.matchAll(/console\.log\(.*\); \/\/ (\S+)/g)].map((m) => m[1]);
    expect(lines).toEqual(promised);
    expect(lines).toEqual(['0.513', '4.531', '16.268', '120.0', '0.579', '0.128']);
  });
});

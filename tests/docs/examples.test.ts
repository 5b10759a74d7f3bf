/**
 * The docs cannot drift from the API: every code block in README.md and docs/*.md that starts
 * with `// example: <path>` must equal that file, which the typecheck covers and this test runs.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it, vi } from 'vitest';

const root = new URL('../../', import.meta.url);
const read = (path: string): string => readFileSync(new URL(path, root), 'utf8');

function exampleBlocks(markdown: string): { path: string; code: string }[] {
  const blocks: { path: string; code: string }[] = [];
  const fence = /```ts\n(\/\/ example: (\S+)\n[\s\S]*?)```/g;
  for (let m = fence.exec(markdown); m !== null; m = fence.exec(markdown)) {
    blocks.push({ path: m[2] ?? '', code: m[1] ?? '' });
  }
  return blocks;
}

const pages = [
  'README.md',
  ...readdirSync(new URL('docs/', root))
    .filter((f) => f.endsWith('.md'))
    .map((f) => `docs/${f}`),
];

describe('code samples in the docs are the checked example files', () => {
  for (const page of pages) {
    for (const block of exampleBlocks(read(page))) {
      it(`${page}: ${block.path}`, () => {
        expect(block.code).toBe(read(block.path));
      });
    }
  }
  it('the README has at least one checked sample', () => {
    expect(exampleBlocks(read('README.md')).length).toBeGreaterThan(0);
  });
});

describe('examples run and print what their comments say', () => {
  it('units tour', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    const mod = (await import('../../docs/examples/units-tour')) as { feetPerPsi: number };
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    expect(lines).toEqual(['272.5 m3/h', '106.7 m', '411.59 kPa', '2.308']);
    // 144 in2/ft2 / 62.4 lb/ft3 = 2.3077 ft of water per psi (common practice: "2.31 ft/psi").
    expect(mod.feetPerPsi).toBeCloseTo(2.3077, 4);
  });
  it('demo', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    await import('../../docs/examples/demo');
    const text = log.mock.calls.map((c) => String(c[0])).join('\n');
    log.mockRestore();
    expect(text).toContain('272.5 m3/h');
    expect(text).toContain('licensed engineering judgement');
  });
});

describe('docs/units.md lists the whole catalogue', () => {
  it('has a row for every unit symbol', async () => {
    const { UNITS } = await import('../../src/units');
    const page = read('docs/units.md');
    for (const symbol of Object.keys(UNITS)) expect(page).toContain(`| \`${symbol}\` |`);
  });
});

describe('system example', () => {
  it('prints the duty of each operating case, and the aged low-level case needs more head', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    const mod = (await import('../../docs/examples/system-transfer')) as { heads: number[] };
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    expect(lines).toEqual([
      'normal level, new pipe: 35.09 m at 12 L/s',
      'low level, aged pipe: 41.51 m at 12 L/s',
    ]);
    expect(read('docs/system.md')).toContain(lines.join('\n'));
    expect(mod.heads[1]).toBeGreaterThan(mod.heads[0] ?? Number.POSITIVE_INFINITY);
  });
});

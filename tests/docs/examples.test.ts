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
  it('units guide: aliases, a gauge reading and the atmosphere at a site', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    const mod = (await import('../../docs/examples/guide-units-2')) as { vessel: number };
    const lines = log.mock.calls.map((c) => c[0]);
    log.mockRestore();
    expect(lines).toEqual([
      '272.5 m3/h',
      [{ alias: 'RPM', unit: 'rpm' }],
      '84.556 kPa',
      'gauge',
      '187.98 kPa',
    ]);
    // 15 psi = 103.421 kPa (NIST SP 811); 84.556 kPa at 1500 m (U.S. Standard Atmosphere 1976).
    expect(mod.vessel).toBeCloseTo(103421.36 + 84556.0, 0);
  });
  it('demo: evaluates the canal-lift scenario, prints the report and writes the chart', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    await import('../../docs/examples/demo');
    const text = log.mock.calls.map((c) => String(c[0])).join('\n');
    log.mockRestore();
    expect(text).toMatch(/^Pump selection report: Canal lift to hillside tank/);
    expect(text).toContain('licensed engineer');
    expect(text).toContain(
      'HTML report written to .demo/canal-lift.html, chart to .demo/canal-lift.svg',
    );
    const svg = read('.demo/canal-lift.svg');
    expect(svg.startsWith('<?xml') || svg.startsWith('<svg')).toBe(true);
    expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
    expect(read('.demo/canal-lift.html').startsWith('<!doctype html>')).toBe(true);
    // The README quotes the sheet's first lines: they must be what the demo prints.
    const head = text.split('\n').slice(0, 10).join('\n');
    expect(read('README.md')).toContain(head);
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

describe('README samples', () => {
  it('the Node sample runs and prints what its comments say', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    await import('../../docs/examples/readme-node');
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    expect(lines).toEqual([
      'duty head 30.18 m at 36 m3/h',
      'runs at 41.96 m3/h',
      'motor 7.5 kW, passed: true',
    ]);
  });
  it('the README and the demo put no threaded fitting on steel lines of NPS 3 and above', async () => {
    // Common practice: threaded steel joints are for small bore (about NPS 2 and below);
    // larger steel lines are flanged or welded, so their elbows are `elbow-90-flanged`.
    const { fitting } = await import('../../src/losses');
    const threaded = (id: string) => fitting(id).description.includes('threaded');
    const demo = JSON.parse(read('docs/examples/canal-lift.json')) as {
      line: { run?: { pipe?: { standard: string; size: string }; fittings?: { id: string }[] } }[];
    };
    let steelRuns = 0;
    for (const { run } of demo.line) {
      if (run?.pipe?.standard !== 'steel' || Number(run.pipe.size) < 3) continue;
      steelRuns++;
      for (const f of run.fittings ?? []) expect(threaded(f.id), f.id).toBe(false);
    }
    expect(steelRuns).toBeGreaterThan(0);
    const sample = read('docs/examples/readme-node.ts');
    expect(sample).toContain("pipeSize('3', '40')");
    for (const [, id] of sample.matchAll(/id: '([\w-]+)'/g)) {
      expect(threaded(id ?? ''), id).toBe(false);
    }
  });
  it('the Deno sample is the file Deno runs (tests/deno/readme.deno.ts), after its import', () => {
    const block =
      /```ts\n(import \{[^}]*\} from 'npm:headflow';\n[\s\S]*?)```/.exec(read('README.md'))?.[1] ??
      '';
    const body = (code: string): string => code.slice(code.indexOf('\nconst '));
    expect(block).not.toBe('');
    expect(body(block)).toBe(body(read('tests/deno/readme.deno.ts')));
  });
});

/** The `// comment` after each console.log call of an example, in order. */
function printedComments(path: string): string[] {
  const out: string[] = [];
  const text = read(path);
  const call = /console\.log\([\s\S]*?\);[ \t]*\/\/ (.+)$/gm;
  for (let m = call.exec(text); m !== null; m = call.exec(text)) out.push(m[1] ?? '');
  return out;
}

describe('getting started', () => {
  it('prints what the comments beside its console.log calls say', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    await import('../../docs/examples/getting-started');
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    const expected = printedComments('docs/examples/getting-started.ts');
    expect(expected).toHaveLength(6);
    expect(lines).toEqual(expected);
  });
});

describe('network design example', () => {
  it('reads the booster file, evaluates it and prints each duty with the top floor at its minimum', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    const mod = (await import('../../docs/examples/network-design')) as { svg: string };
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    expect(lines).toEqual([
      'break tank full: 45.1 m at 27.34 m3/h, top floor 200 kPa gauge',
      'break tank low: 45.9 m at 27.34 m3/h, top floor 200 kPa gauge',
      'recommended: booster B-40, drive, passed: true',
    ]);
    expect(read('docs/network.md')).toContain(lines.join('\n'));
    expect(mod.svg.trimEnd().endsWith('</svg>')).toBe(true);
  });
});

describe('every example file', () => {
  const files = readdirSync(new URL('docs/examples/', root)).filter((f) => f.endsWith('.ts'));
  const quoted = pages.map(read).join('\n');
  it.each(files)('%s is quoted or named by a page and runs', async (file) => {
    if (file !== 'demo.ts') expect(quoted).toContain(`docs/examples/${file}`);
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    try {
      await import(`../../docs/examples/${file.replace(/\.ts$/, '')}`);
    } finally {
      log.mockRestore();
    }
  });
});

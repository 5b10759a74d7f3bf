import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { type CliIo, EXIT, HELP, runCli } from '../../src/cli/run';

const SCENARIO = readFileSync(
  new URL('../../docs/examples/canal-lift.json', import.meta.url),
  'utf8',
);
const CATALOGUE = readFileSync(
  new URL('../../docs/examples/pump-catalogue.json', import.meta.url),
  'utf8',
);

function memoryIo(files: Record<string, string>) {
  let out = '';
  let err = '';
  const map = new Map(Object.entries(files));
  const io: CliIo = {
    stdout: (t) => {
      out += t;
    },
    stderr: (t) => {
      err += t;
    },
    readFile: async (path) => {
      const text = map.get(path);
      if (text === undefined) throw Object.assign(new Error('ENOENT'), { code: 'ENOENT' });
      return text;
    },
    writeFile: async (path, text) => {
      map.set(path, text);
    },
  };
  return { io, out: () => out, err: () => err, files: map };
}

const files = { 'lift.json': SCENARIO, 'pumps.json': CATALOGUE };

describe('headflow select', () => {
  it('ranks the invented catalogue for the canal lift (exit 0: the leading way passes)', async () => {
    const m = memoryIo(files);
    const code = await runCli(['select', 'lift.json', '--catalogue', 'pumps.json'], m.io);
    expect(m.err()).toBe('');
    expect(code).toBe(EXIT.passed);
    expect(m.out()).toContain(
      'Pump selection: Canal lift to hillside tank from Invented end-suction pumps',
    );
    expect(m.out()).toContain('Ranked by life-cycle cost (EUR');
    expect(m.out()).toMatch(/\n1 +\S.*yes/);
    expect(m.out()).toContain('Why the failing ways fail');
    expect(m.out()).toContain('Cautions:');
  });

  it('writes Markdown, JSON and the chart of the leading ways', async () => {
    const m = memoryIo(files);
    const code = await runCli(
      [
        'select',
        'lift.json',
        '-c',
        'pumps.json',
        '-f',
        'json',
        '-u',
        'us',
        '--chart',
        'c.svg',
        '-o',
        'r.json',
      ],
      m.io,
    );
    expect(code).toBe(EXIT.passed);
    const doc = JSON.parse(m.files.get('r.json') ?? '{}');
    expect(doc.format).toBe('headflow-selection/1');
    expect(doc.dutyFlow.unit).toBe('gal/min');
    expect(doc.ranked[0].passed).toBe(true);
    expect(m.files.get('c.svg')).toContain('</svg>');
    const md = memoryIo(files);
    await runCli(['select', 'lift.json', '-c', 'pumps.json', '-f', 'markdown'], md.io);
    expect(md.out()).toContain('# Pump selection: Canal lift to hillside tank');
    expect(md.out()).toContain('| rank | pump and way |');
  });

  it('exits 1 when no way passes, 2 for bad input', async () => {
    const small = JSON.parse(CATALOGUE);
    small.pumps = small.pumps.filter((p: { name: string }) => p.name === '50-250/2900');
    const m = memoryIo({ ...files, 'small.json': JSON.stringify(small) });
    expect(await runCli(['select', 'lift.json', '-c', 'small.json'], m.io)).toBe(EXIT.checkFailed);
    expect(m.err()).toContain('no pump of the catalogue passes');
    const none = memoryIo(files);
    expect(await runCli(['select', 'lift.json'], none.io)).toBe(EXIT.invalidInput);
    expect(none.err()).toContain('--catalogue');
    const wrong = memoryIo(files);
    expect(await runCli(['lift.json', '--catalogue', 'pumps.json'], wrong.io)).toBe(
      EXIT.invalidInput,
    );
    const bad = memoryIo({ ...files, 'bad.json': '{"format": "headflow-pump-catalogue/1"}' });
    expect(await runCli(['select', 'lift.json', '-c', 'bad.json'], bad.io)).toBe(EXIT.invalidInput);
    expect(bad.err()).toContain('pumps: this field is required');
    const html = memoryIo(files);
    expect(await runCli(['select', 'lift.json', '-c', 'pumps.json', '-f', 'html'], html.io)).toBe(
      EXIT.invalidInput,
    );
    expect(html.err()).toContain('--format html is for evaluate');
  });

  it('keeps evaluate and the bare form alike', async () => {
    const a = memoryIo(files);
    const b = memoryIo(files);
    const ca = await runCli(['evaluate', 'lift.json'], a.io);
    const cb = await runCli(['lift.json'], b.io);
    expect(ca).toBe(cb);
    expect(a.out()).toBe(b.out());
    expect(HELP).toContain('headflow select <scenario.json> --catalogue <pumps.json>');
  });
});

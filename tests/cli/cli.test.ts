import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { libraryEngine } from '../../src/cli/engine';
import { type CliIo, EXIT, HELP, runCli } from '../../src/cli/run';
import { HeadflowError } from '../../src/errors';

const EXAMPLE = readFileSync(
  new URL('../../docs/examples/canal-lift.json', import.meta.url),
  'utf8',
);

interface Captured {
  readonly io: CliIo;
  readonly out: () => string;
  readonly err: () => string;
  readonly files: Map<string, string>;
}

/** An in-memory io: files in a map, streams captured. */
function memoryIo(files: Record<string, string> = {}): Captured {
  let out = '';
  let err = '';
  const map = new Map(Object.entries(files));
  return {
    files: map,
    out: () => out,
    err: () => err,
    io: {
      stdout: (t) => {
        out += t;
      },
      stderr: (t) => {
        err += t;
      },
      readFile: async (path) => {
        const text = map.get(path);
        if (text === undefined) {
          throw Object.assign(new Error(`ENOENT: no such file, open '${path}'`), {
            code: 'ENOENT',
          });
        }
        return text;
      },
      writeFile: async (path, text) => {
        if (path.startsWith('/read-only/')) {
          throw Object.assign(new Error('EACCES'), { code: 'EACCES' });
        }
        map.set(path, text);
      },
    },
  };
}

/** The example with only pump B (drive), which passes every check. */
function passingFile(): string {
  const f = JSON.parse(EXAMPLE);
  f.candidates = [f.candidates[1]];
  return JSON.stringify(f);
}

/** The example with only pump A, which falls short of the duty in the low-level aged case. */
function failingFile(): string {
  const f = JSON.parse(EXAMPLE);
  f.candidates = [f.candidates[0]];
  return JSON.stringify(f);
}

function expectNoStack(text: string): void {
  expect(text).not.toMatch(/\n\s+at /);
}

describe('headflow --help and --version', () => {
  it('prints the usage, the options and the exit codes', async () => {
    const c = memoryIo();
    expect(await runCli(['--help'], c.io)).toBe(EXIT.passed);
    expect(c.out()).toBe(HELP);
    for (const word of [
      'Usage: headflow <scenario.json>',
      '--format',
      '--units',
      '--chart',
      '--output',
    ]) {
      expect(c.out()).toContain(word);
    }
    expect(c.out()).toMatch(/Exit codes:\n {2}0 .*\n[\s\S]* {2}1 [\s\S]* {2}2 [\s\S]* {2}3 /);
    expect(c.err()).toBe('');
    const short = memoryIo();
    expect(await runCli(['-h'], short.io)).toBe(0);
    expect(short.out()).toBe(HELP);
  });

  it('prints the version it is given', async () => {
    const c = memoryIo();
    expect(await runCli(['--version'], c.io, { version: '1.2.3' })).toBe(0);
    expect(c.out()).toBe('headflow 1.2.3\n');
    const unknown = memoryIo();
    await runCli(['-v'], unknown.io);
    expect(unknown.out()).toBe('headflow unknown\n');
  });
});

describe('headflow <file>: a design that passes', () => {
  it('prints the text report and exits 0', async () => {
    const c = memoryIo({ 'lift.json': passingFile() });
    expect(await runCli(['lift.json'], c.io)).toBe(EXIT.passed);
    expect(c.out()).toMatch(/^Pump selection report: Canal lift to hillside tank\n/);
    expect(c.out()).toContain('Cautions');
    expect(c.err()).toBe('');
  });

  it('writes Markdown, JSON and the units asked for', async () => {
    const md = memoryIo({ 'lift.json': passingFile() });
    expect(await runCli(['lift.json', '--format', 'markdown'], md.io)).toBe(0);
    expect(md.out()).toMatch(/^# Pump selection report: Canal lift to hillside tank/);
    const json = memoryIo({ 'lift.json': passingFile() });
    expect(await runCli(['lift.json', '-f', 'json', '-u', 'us'], json.io)).toBe(0);
    const envelope = JSON.parse(json.out());
    expect(envelope.format).toBe('headflow-report/2');
    expect(envelope.units.flow).toBe('gal/min');
    expect(envelope.report.passed).toBe(true);
  });

  it('writes the report and the chart to files', async () => {
    const c = memoryIo({ 'lift.json': passingFile() });
    const code = await runCli(
      ['lift.json', '--output', 'lift.md', '--format=markdown', '--chart', 'lift.svg'],
      c.io,
    );
    expect(code).toBe(0);
    expect(c.out()).toBe('');
    expect(c.files.get('lift.md')).toMatch(/^# Pump selection report/);
    const svg = c.files.get('lift.svg') ?? '';
    expect(svg).toContain('<svg');
    expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
  });
});

describe('headflow <file>: a design that fails a check', () => {
  it('the example exits 0: pump A falls short in one case, but the recommended pump B passes', async () => {
    const c = memoryIo({ 'lift.json': EXAMPLE });
    expect(await runCli(['lift.json'], c.io)).toBe(EXIT.passed);
    expect(c.err()).toBe('');
    expect(c.out()).toMatch(/^Pump selection report: Canal lift to hillside tank\n/);
  });

  it('prints the report, says so on standard error and exits 1', async () => {
    const c = memoryIo({ 'lift.json': failingFile() });
    expect(await runCli(['lift.json'], c.io)).toBe(EXIT.checkFailed);
    expect(c.out()).toContain('Pump selection report');
    // The text renderer wraps long messages, so read the words across line breaks.
    expect(c.out().replace(/\s+/g, ' ')).toContain('short of the duty');
    expect(c.err()).toBe('headflow: no candidate passes every check (1 error; see the report).\n');
  });

  it('counts several failed checks', async () => {
    const report = libraryEngine.evaluate(libraryEngine.readScenario(failingFile(), 'x'));
    const failing = {
      ...libraryEngine,
      evaluate: () => ({
        ...report,
        checks: [
          ...report.checks,
          { ...report.candidates[0]?.checks[0], severity: 'error' as const },
        ],
      }),
    } as typeof libraryEngine;
    const c = memoryIo({ 'lift.json': failingFile() });
    expect(await runCli(['lift.json'], c.io, { engine: failing })).toBe(1);
    expect(c.err()).toMatch(/\(\d+ errors; see the report\)/);
  });
});

describe('headflow: input that cannot be used exits 2 with one message and no stack', () => {
  it('a scenario file with problems names each path', async () => {
    const f = JSON.parse(EXAMPLE);
    f.line[1].run.length = '420 psi';
    f.candidates[0].points[1].head = 'high';
    const c = memoryIo({ 'lift.json': JSON.stringify(f) });
    expect(await runCli(['lift.json'], c.io)).toBe(EXIT.invalidInput);
    expect(c.out()).toBe('');
    expect(c.err()).toContain('headflow: scenario file lift.json has 2 problems:');
    expect(c.err()).toContain('line[1].run.length: expected a length >= 0');
    expect(c.err()).toContain('candidates[0].points[1].head');
    expectNoStack(c.err());
  });

  it('text that is not JSON gives the line and column', async () => {
    const c = memoryIo({ 'lift.json': '{\n  "format": "headflow-scenario/1"\n  "name": "x"\n}' });
    expect(await runCli(['lift.json'], c.io)).toBe(2);
    expect(c.err()).toMatch(/scenario file lift\.json is not valid JSON \(line 3, column \d+\)/);
    expectNoStack(c.err());
  });

  it('a file that is not there', async () => {
    const c = memoryIo();
    expect(await runCli(['missing.json'], c.io)).toBe(2);
    expect(c.err()).toBe(
      "headflow: cannot read missing.json: there is no such file or folder.\nRun 'headflow --help' for usage.\n",
    );
  });

  it('a file that cannot be written', async () => {
    const c = memoryIo({ 'lift.json': EXAMPLE });
    expect(await runCli(['lift.json', '-o', '/read-only/report.txt'], c.io)).toBe(2);
    expect(c.err()).toContain('cannot write /read-only/report.txt: permission denied.');
  });

  it('bad arguments', async () => {
    const cases: [string[], string][] = [
      [[], 'no scenario file was given'],
      [['a.json', 'b.json'], 'one scenario file at a time; 2 were given (a.json, b.json)'],
      [
        ['a.json', '--format', 'pdf'],
        '--format must be one of text, markdown, json, html; it was "pdf"',
      ],
      [['a.json', '--units', 'metric'], '--units must be one of si, us; it was "metric"'],
      [['a.json', '--bogus'], 'unknown option --bogus.'],
      [['a.json', '--unit', 'us'], 'unknown option --unit (did you mean --units?).'],
      [['a.json', '--fromat', 'json'], 'unknown option --fromat (did you mean --format?).'],
      [['a.json', '-x'], 'unknown option -x.'],
      [['a.json', '--format'], "Option '-f, --format <value>' argument missing"],
      [['a.json', '-o', 'x.svg', '--chart', 'x.svg'], '--output and --chart name the same file'],
    ];
    for (const [argv, said] of cases) {
      const c = memoryIo({ 'a.json': EXAMPLE });
      expect(await runCli(argv, c.io), argv.join(' ')).toBe(EXIT.invalidInput);
      expect(c.err(), argv.join(' ')).toContain(said);
      expect(c.err()).toContain("Run 'headflow --help' for usage.");
      // Not node's advice about positionals after '--', which does not fit a mistyped option.
      expect(c.err()).not.toContain('positional argument');
      expect(c.out()).toBe('');
    }
  });

  it('a design the library refuses while evaluating it', async () => {
    const refusing = {
      ...libraryEngine,
      evaluate: () => {
        throw new HeadflowError('NO_SOLUTION', 'the pump cannot reach the static head.');
      },
    };
    const c = memoryIo({ 'lift.json': EXAMPLE });
    expect(await runCli(['lift.json'], c.io, { engine: refusing })).toBe(2);
    expect(c.err()).toBe('headflow: the pump cannot reach the static head.\n');
  });
});

describe('headflow: an internal error exits 3', () => {
  it('says it is a fault of headflow and keeps the detail', async () => {
    const broken = {
      ...libraryEngine,
      render: () => {
        throw new TypeError('cannot read properties of undefined');
      },
    };
    const c = memoryIo({ 'lift.json': EXAMPLE });
    expect(await runCli(['lift.json'], c.io, { engine: broken })).toBe(EXIT.internalError);
    expect(c.err()).toContain('headflow: internal error; this is a fault in headflow');
    expect(c.err()).toContain('TypeError: cannot read properties of undefined');
    const odd = {
      ...libraryEngine,
      evaluate: () => {
        throw 'not an Error';
      },
    };
    const c2 = memoryIo({ 'lift.json': EXAMPLE });
    expect(await runCli(['lift.json'], c2.io, { engine: odd })).toBe(3);
    expect(c2.err()).toContain('not an Error');
  });
});

describe('a network scenario on the command line', () => {
  const BOOSTER = readFileSync(
    new URL('../../docs/examples/booster-floors.json', import.meta.url),
    'utf8',
  );
  it('evaluates it, prints the node tables and writes the schematic', async () => {
    const c = memoryIo({ 'b.json': BOOSTER });
    const code = await runCli(['b.json', '--schematic', 'b.svg'], c.io);
    expect(code).toBe(EXIT.passed);
    expect(c.out()).toContain('Network at the duty: break tank full');
    expect(c.files.get('b.svg')).toContain('class="schematic"');
  });
  it('refuses --schematic for a line, select on a network, and the same file twice', async () => {
    const line = memoryIo({ 'l.json': EXAMPLE });
    expect(await runCli(['l.json', '--schematic', 'x.svg'], line.io)).toBe(EXIT.invalidInput);
    expect(line.err()).toContain('--schematic draws a network');
    const net = memoryIo({ 'b.json': BOOSTER, 'p.json': '{}' });
    expect(await runCli(['select', 'b.json', '--catalogue', 'p.json'], net.io)).toBe(
      EXIT.invalidInput,
    );
    expect(net.err()).toContain('describes a network');
    const same = memoryIo({ 'b.json': BOOSTER });
    expect(await runCli(['b.json', '--chart', 'a.svg', '--schematic', 'a.svg'], same.io)).toBe(
      EXIT.invalidInput,
    );
  });
});

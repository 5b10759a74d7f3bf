/**
 * The `headflow` command: reads a scenario file, evaluates the design and prints the report
 * (text, Markdown or JSON), optionally writing the SVG chart. {@link runCli} does the work
 * and returns the exit code, so that tests call it directly; `main.ts` connects it to the
 * process.
 *
 * @module
 */
import { parseArgs } from 'node:util';
import type { UnitSystem } from '../design/index';
import { HeadflowError } from '../errors';
import { type Engine, libraryEngine, type ReportFormat } from './engine';

/** Exit codes of the command. */
export const EXIT = {
  /** The report was written and the recommended candidate passes every check (`report.passed`). */
  passed: 0,
  /** The report was written and no candidate passes (or a check of the system itself failed). */
  checkFailed: 1,
  /** The input could not be used: bad arguments, a file that cannot be read or is not a design. */
  invalidInput: 2,
  /** Something went wrong inside headflow (a fault to report, not a fault of the input). */
  internalError: 3,
} as const;

/** What the command reads and writes; the process's streams and files in `main.ts`. */
export interface CliIo {
  /** Writes to standard output. */
  stdout(text: string): void;
  /** Writes to standard error. */
  stderr(text: string): void;
  /** Reads a file as UTF-8 text. */
  readFile(path: string): Promise<string>;
  /** Writes UTF-8 text to a file, replacing it. */
  writeFile(path: string, text: string): Promise<void>;
}

/** Options of {@link runCli} besides the arguments and the io. */
export interface CliOptions {
  /** Version printed by `--version`. */
  readonly version?: string;
  /** The library functions to call (tests replace parts of it). */
  readonly engine?: Engine;
}

const FORMATS: readonly ReportFormat[] = ['text', 'markdown', 'json', 'html'];
const UNIT_SYSTEMS: readonly UnitSystem[] = ['si', 'us'];

/** The text of `headflow --help`. */
export const HELP = `Usage: headflow <scenario.json> [options]
       headflow evaluate <scenario.json> [options]
       headflow select <scenario.json> --catalogue <pumps.json> [options]

evaluate (also the bare form): reads a scenario file (a design described in JSON, format
headflow-scenario/1), evaluates every operating case and candidate pump, and prints the report.
select: ranks every pump of a catalogue (format headflow-pump-catalogue/1) for the scenario's
duty, each with its full impeller throttled, trimmed, or on a drive, by life-cycle cost when
the catalogue has prices (else by energy); the scenario's own candidates are not used.

Options:
  -f, --format <text|markdown|json|html>
                                     report format (default: text, the full calculation
                                     sheet; html: one self-contained page with the chart)
  -u, --units <si|us>                units of everything the report shows (default: the
                                     file's "units", else si)
  -s, --summary                      the short form: verdict, duty, candidates, checks
  -o, --output <file>                write the report to a file instead of standard output
      --chart <file.svg>             also write the SVG chart of the curves (select: the
                                     three leading passing ways)
      --schematic <file.svg>         also write the schematic SVG of a network (nodes with
                                     their pressure, links with flow and velocity)
  -c, --catalogue <file.json>        the pump catalogue (select only)
  -h, --help                         print this help
  -v, --version                      print the version

Exit codes:
  0  the report was written and the recommended (first-ranked) candidate passes every
     check; other candidates may fail (with no candidates: the system's checks pass); select: the leading way passes every check
  1  the report was written and no candidate passes every check (or a check of the
     system itself failed); select: no way passes
  2  the input could not be used (arguments, or a file that is missing or not a design)
  3  an internal error (please report it)

The format of scenario files: docs/scenario-format.md; a JSON Schema for editors:
docs/scenario.schema.json. Catalogues: docs/select.md and docs/pump-catalogue.schema.json.

Examples:
  headflow canal-lift.json --format markdown --units us --chart canal-lift.svg -o canal-lift.md
  headflow select canal-lift.json --catalogue pump-catalogue.json

The report supports, and does not replace, licensed engineering judgement and local codes.
`;

/** A fault of the input (arguments or files): exit 2 with its message. */
class InputError extends Error {}

/** The subcommands; the bare form is `evaluate`. */
const COMMANDS = ['evaluate', 'select'] as const;

interface Parsed {
  readonly command: (typeof COMMANDS)[number];
  readonly catalogue: string | undefined;
  readonly help: boolean;
  readonly version: boolean;
  readonly file: string | undefined;
  readonly format: ReportFormat;
  readonly units: UnitSystem | undefined;
  readonly output: string | undefined;
  readonly chart: string | undefined;
  readonly schematic: string | undefined;
  readonly summary: boolean;
}

function pick<T extends string>(
  value: string | undefined,
  allowed: readonly T[],
  option: string,
): T | undefined {
  if (value === undefined) return undefined;
  if ((allowed as readonly string[]).includes(value)) return value as T;
  throw new InputError(
    `--${option} must be one of ${allowed.join(', ')}; it was ${JSON.stringify(value)}.`,
  );
}

/** The long options of the command, for "did you mean". */
const LONG_OPTIONS = [
  'format',
  'units',
  'summary',
  'output',
  'chart',
  'schematic',
  'help',
  'version',
] as const;

/** Edit distance between two short words (insertions, deletions, substitutions). */
function distance(a: string, b: string): number {
  let row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const next = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      next.push(Math.min((row[j] ?? 0) + 1, (next[j - 1] ?? 0) + 1, (row[j - 1] ?? 0) + cost));
    }
    row = next;
  }
  return row[b.length] ?? 0;
}

/** The message for arguments that parseArgs refused: the option named, and what was meant. */
function argumentProblem(e: unknown): string {
  const said = e instanceof Error ? e.message : String(e);
  const code = (e as { code?: unknown } | null)?.code;
  if (code === 'ERR_PARSE_ARGS_UNKNOWN_OPTION') {
    const option = /'([^']+)'/.exec(said)?.[1] ?? 'given';
    const word = option.replace(/^-+/, '').split('=')[0] ?? '';
    const near = LONG_OPTIONS.filter(
      (o) => word.length > 1 && (o.startsWith(word) || distance(word, o) <= 2),
    );
    const meant =
      near.length === 0 ? '' : ` (did you mean ${near.map((o) => `--${o}`).join(' or ')}?)`;
    return `unknown option ${option}${meant}.`;
  }
  return said.endsWith('.') ? said : `${said}.`;
}

function parse(argv: readonly string[]): Parsed {
  let values: Record<string, string | boolean | undefined>;
  let positionals: string[];
  try {
    ({ values, positionals } = parseArgs({
      args: [...argv],
      options: {
        format: { type: 'string', short: 'f' },
        units: { type: 'string', short: 'u' },
        output: { type: 'string', short: 'o' },
        chart: { type: 'string' },
        schematic: { type: 'string' },
        catalogue: { type: 'string', short: 'c' },
        summary: { type: 'boolean', short: 's' },
        help: { type: 'boolean', short: 'h' },
        version: { type: 'boolean', short: 'v' },
      },
      allowPositionals: true,
      strict: true,
    }));
  } catch (e) {
    // node:util parseArgs throws a TypeError with an ERR_PARSE_ARGS_* code for bad arguments.
    throw new InputError(argumentProblem(e));
  }
  const text = (key: string): string | undefined => {
    const value = values[key];
    return typeof value === 'string' ? value : undefined;
  };
  const help = values['help'] === true;
  const version = values['version'] === true;
  const first = positionals[0];
  const command = first === 'select' ? 'select' : 'evaluate';
  if (first !== undefined && (COMMANDS as readonly string[]).includes(first)) positionals.shift();
  const catalogue = text('catalogue');
  if (!help && !version && command === 'select' && catalogue === undefined) {
    throw new InputError('select needs a pump catalogue: --catalogue <file.json>.');
  }
  if (command === 'evaluate' && catalogue !== undefined) {
    throw new InputError(
      '--catalogue belongs to select: headflow select <scenario> --catalogue <file>.',
    );
  }
  if (!help && !version) {
    if (positionals.length === 0) throw new InputError('no scenario file was given.');
    if (positionals.length > 1) {
      throw new InputError(
        `one scenario file at a time; ${positionals.length} were given (${positionals.join(', ')}).`,
      );
    }
  }
  const format = pick(text('format'), FORMATS, 'format') ?? 'text';
  if (command === 'select' && format === 'html') {
    throw new InputError('select writes text, markdown or json; --format html is for evaluate.');
  }
  const output = text('output');
  const chart = text('chart');
  if (output !== undefined && output === chart) {
    throw new InputError('--output and --chart name the same file.');
  }
  const schematic = text('schematic');
  if (schematic !== undefined && (schematic === output || schematic === chart)) {
    throw new InputError(
      `--schematic names the same file as --${schematic === output ? 'output' : 'chart'}.`,
    );
  }
  if (schematic !== undefined && command === 'select') {
    throw new InputError('--schematic belongs to evaluate (a network scenario).');
  }
  return {
    command,
    catalogue,
    help,
    version,
    file: positionals[0],
    format,
    units: pick(text('units'), UNIT_SYSTEMS, 'units'),
    output,
    chart,
    schematic,
    summary: values['summary'] === true,
  };
}

/** Why a file could not be read or written, from Node's error code. */
function fileProblem(e: unknown, verb: string, path: string): InputError {
  const code = (e as { code?: unknown } | null)?.code;
  const why =
    code === 'ENOENT'
      ? 'there is no such file or folder'
      : code === 'EISDIR'
        ? 'it is a folder'
        : code === 'EACCES' || code === 'EPERM'
          ? 'permission denied'
          : e instanceof Error
            ? e.message
            : String(e);
  return new InputError(`cannot ${verb} ${path}: ${why}.`);
}

async function readText(io: CliIo, path: string): Promise<string> {
  try {
    return await io.readFile(path);
  } catch (e) {
    throw fileProblem(e, 'read', path);
  }
}

async function writeText(io: CliIo, path: string, text: string): Promise<void> {
  try {
    await io.writeFile(path, text);
  } catch (e) {
    throw fileProblem(e, 'write', path);
  }
}

/** Counts the error checks of a report (system and candidates). */
function errorCount(report: ReturnType<Engine['evaluate']>): number {
  const all = [...report.checks, ...report.candidates.flatMap((c) => c.checks)];
  return all.filter((c) => c.severity === 'error').length;
}

/**
 * Runs the command with its arguments (without `node` and the script) and returns the exit
 * code: 0 when the recommended candidate passes every check, 1 when none does (the report is
 * still written), 2 for
 * input that cannot be used (arguments, unreadable or invalid scenario file, a design the
 * library refuses), 3 for an internal error. User errors print one message on standard error,
 * without a stack trace.
 *
 * @example
 * ```ts
 * const code = await runCli(['lift.json', '--format', 'markdown'], {
 *   stdout: (t) => process.stdout.write(t),
 *   stderr: (t) => process.stderr.write(t),
 *   readFile: (p) => readFile(p, 'utf8'),
 *   writeFile: (p, t) => writeFile(p, t, 'utf8'),
 * });
 * ```
 */
export async function runCli(
  argv: readonly string[],
  io: CliIo,
  options: CliOptions = {},
): Promise<number> {
  const engine = options.engine ?? libraryEngine;
  try {
    const args = parse(argv);
    if (args.help) {
      io.stdout(HELP);
      return EXIT.passed;
    }
    if (args.version) {
      io.stdout(`headflow ${options.version ?? 'unknown'}\n`);
      return EXIT.passed;
    }
    const file = args.file as string;
    const design = engine.readScenario(await readText(io, file), file);
    if (args.command === 'select') {
      if ('network' in design) {
        throw new InputError(
          `${file} describes a network; select ranks catalogue pumps for the line form. Give the network's candidates in the file and run evaluate.`,
        );
      }
      const path = args.catalogue as string;
      const catalogue = engine.readCatalogue(await readText(io, path), path);
      const selection = engine.select(design, catalogue);
      const rendered = engine.renderSelection(
        selection,
        args.format === 'html' ? 'text' : args.format,
        args.units,
      );
      if (args.output === undefined) io.stdout(rendered);
      else await writeText(io, args.output, rendered);
      if (args.chart !== undefined) {
        await writeText(io, args.chart, engine.selectionChart(design, selection, args.units));
      }
      if (selection.ranked[0]?.passed === true) return EXIT.passed;
      io.stderr('headflow: no pump of the catalogue passes every check (see the report).\n');
      return EXIT.checkFailed;
    }
    if (args.schematic !== undefined && !('network' in design)) {
      throw new InputError(`--schematic draws a network; ${file} describes a line.`);
    }
    const report = engine.evaluate(design, args.chart !== undefined || args.format === 'html');
    const rendered = engine.render(report, args.format, args.units, args.summary);
    if (args.output === undefined) io.stdout(rendered);
    else await writeText(io, args.output, rendered);
    if (args.chart !== undefined) await writeText(io, args.chart, engine.chart(report, args.units));
    if (args.schematic !== undefined) {
      await writeText(io, args.schematic, engine.schematic(report, args.units));
    }
    if (report.passed) return EXIT.passed;
    const n = errorCount(report);
    io.stderr(
      `headflow: no candidate passes every check (${n === 1 ? '1 error' : `${n} errors`}; see the report).\n`,
    );
    return EXIT.checkFailed;
  } catch (e) {
    if (e instanceof InputError) {
      io.stderr(`headflow: ${e.message}\nRun 'headflow --help' for usage.\n`);
      return EXIT.invalidInput;
    }
    if (e instanceof HeadflowError) {
      io.stderr(`headflow: ${e.message}\n`);
      return EXIT.invalidInput;
    }
    const detail = e instanceof Error ? (e.stack ?? e.message) : String(e);
    io.stderr(
      `headflow: internal error; this is a fault in headflow, not in your input. Please report it with the scenario file.\n${detail}\n`,
    );
    return EXIT.internalError;
  }
}

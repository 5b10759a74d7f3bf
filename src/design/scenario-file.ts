/**
 * The scenario file: a JSON description of a whole design (fluid, the two ends of the system,
 * the line of pipe runs, operating cases, duty, candidate pumps, duty profile, energy price
 * and check limits), every quantity written with its unit. {@link readScenario} reads one
 * into a {@link DesignInput}. The valibot schema behind it stays inside the package: valibot is
 * bundled into the build, and the published declarations name none of its types.
 *
 * @module
 */
import * as v from 'valibot';
import { HeadflowError } from '../errors';
import { guardArray, guardOptions, guardString } from '../guards';
import { assembleDesign } from './scenario-build';
import { ScenarioFileError, type ScenarioIssue, scenarioIssues } from './scenario-issues';
import { SCENARIO_FORMAT, scenarioObject } from './scenario-schema';
import type { DesignInput, NetworkDesignInput } from './types';

export { SCENARIO_FORMAT };

/**
 * The valibot schema of a scenario file (format `headflow-scenario/1`). Parsing a file with it
 * gives the {@link DesignInput}; its issues carry the path of each problem in the file.
 * {@link readScenario} turns the issues into one {@link ScenarioFileError}. Internal: the
 * package's public face is `readScenario` (its declarations must import nothing outside the
 * package); docs/tools/scenario-schema.ts writes the JSON Schema from it.
 *
 * @internal
 */
export const scenarioSchema = v.pipe(
  scenarioObject,
  v.rawTransform<v.InferOutput<typeof scenarioObject>, DesignInput | NetworkDesignInput>(
    (ctx) => assembleDesign(ctx, ctx.dataset.value) ?? ctx.NEVER,
  ),
);

/** Longest scenario text {@link readScenario} accepts: 10 million characters. */
export const MAX_SCENARIO_LENGTH = 10_000_000;

/** Longest list a scenario file may hold (points, runs, fittings, cases ...). */
const MAX_LIST = 100_000;
/** Most values in one scenario file, and deepest nesting. */
const MAX_VALUES = 1_000_000;
const MAX_DEPTH = 64;

/**
 * Refuses, before any other work, a parsed file too large or too deep to be a scenario: a list
 * of a million items would otherwise be checked item by item (seconds), and a hole in a list
 * (possible only in a value built in code) is named here.
 */
function checkSize(value: unknown): void {
  const stack: [unknown, string, number][] = [[value, '(file)', 0]];
  let count = 0;
  while (stack.length > 0) {
    const [x, path, depth] = stack.pop() as [unknown, string, number];
    if (++count > MAX_VALUES || depth > MAX_DEPTH) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `the scenario file is too large or too deeply nested at ${path}.`,
        { parameter: path, allowed: `at most ${MAX_VALUES} values, ${MAX_DEPTH} levels deep` },
      );
    }
    if (typeof x !== 'object' || x === null) continue;
    if (Array.isArray(x)) {
      guardArray(path, x, { max: MAX_LIST });
      for (let i = 0; i < x.length; i++) stack.push([x[i], `${path}[${i}]`, depth + 1]);
    } else {
      for (const k of Object.keys(x))
        stack.push([(x as Record<string, unknown>)[k], `${path}.${k}`, depth + 1]);
    }
  }
}

/** Options of {@link readScenario}. */
export interface ReadScenarioOptions {
  /** Name of the file (or other source) for messages, for example `'pump-station.json'`. */
  readonly source?: string;
}

/** Line and column (1-based) of a character offset in a text. */
function lineAndColumn(text: string, offset: number): string {
  const before = text.slice(0, offset);
  const line = before.split('\n').length;
  const column = offset - before.lastIndexOf('\n');
  return `line ${line}, column ${column}`;
}

function parseJson(text: string, source: string | undefined): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    const said = e instanceof Error ? e.message : String(e);
    const position = /position (\d+)/.exec(said);
    const where =
      position === null || position[1] === undefined
        ? ''
        : ` (${lineAndColumn(text, Number(position[1]))})`;
    const name = source === undefined ? 'the scenario file' : `scenario file ${source}`;
    throw new HeadflowError('INVALID_ARGUMENT', `${name} is not valid JSON${where}: ${said}`, {
      parameter: 'json',
      allowed: 'a JSON text',
    });
  }
}

/**
 * Reads a scenario file into a design input for `evaluateDesign`.
 *
 * Every quantity in the file is text with its unit (`"350 ft"`, `"40 L/s"`, `"45 psi"`,
 * `"20 degC"`) and comes out in SI. Pressures named `pressure` are absolute; those named
 * `gaugePressure` are gauge and are made absolute with the file's `atmosphere` (default the
 * standard atmosphere, 101 325 Pa); an end with neither is open to the atmosphere. Unknown
 * fields are errors. The format is described field by field in docs/scenario-format.md.
 *
 * @param json - the file's text, or its already-parsed value
 * @param options - `source`: the file's name, for messages
 * @returns the design input
 * @throws HeadflowError `INVALID_ARGUMENT` for text that is not JSON (with the parser's line
 *   and column). {@link ScenarioFileError} (a HeadflowError) for a file that does not describe
 *   a design: its message lists every problem with its path in the file (for example
 *   `line[2].run.length`), what was expected and what was found; its `issues` hold them one
 *   by one, and its `code` is the first problem's: `INVALID_ARGUMENT` for a wrong shape, type
 *   or value, `UNKNOWN_UNIT` or `WRONG_DIMENSION` where a unit is at fault, `UNKNOWN_NAME` for
 *   an unknown fitting, material or schedule, `OUT_OF_RANGE` for a pipe size a standard does
 *   not list or a fluid outside its data (water boiling at the suction).
 * @example
 * ```ts
 * const design = readScenario(readFileSync('lift.json', 'utf8'), { source: 'lift.json' });
 * to(design.dutyFlow, 'L/s'); // 40, when the file says "duty": { "flow": "40 L/s" }
 * ```
 */
export function readScenario(json: unknown, options?: ReadScenarioOptions | null): DesignInput {
  const design = readDesignFile(json, options);
  if ('network' in design) {
    const source = guardOptions<ReadScenarioOptions>('options', options).source;
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `${typeof source === 'string' ? source : 'the scenario'} describes a network (nodes and links): read it with readDesignFile(), which returns a NetworkDesignInput for the network form.`,
      { parameter: 'nodes', allowed: 'a line-form scenario (suction, discharge, line)' },
    );
  }
  return design;
}

/**
 * Reads a scenario file of either form: the line form (`suction`, `discharge`, `line`) into a
 * {@link DesignInput}, the network form (`nodes`, `links`) into a {@link NetworkDesignInput};
 * `evaluateDesign` takes both. Errors as {@link readScenario}.
 *
 * @example
 * ```ts
 * const design = readDesignFile(readFileSync('booster.json', 'utf8'), { source: 'booster.json' });
 * const report = evaluateDesign(design);
 * ```
 */
export function readDesignFile(
  json: unknown,
  options?: ReadScenarioOptions | null,
): DesignInput | NetworkDesignInput {
  const o = guardOptions<ReadScenarioOptions>('options', options);
  const source = o.source === undefined ? undefined : guardString('options.source', o.source, 1000);
  if (typeof json === 'string') guardString('json', json, MAX_SCENARIO_LENGTH);
  const value = typeof json === 'string' ? parseJson(json, source) : json;
  checkSize(value);
  const result = v.safeParse(scenarioSchema, value);
  if (result.success) return result.output;
  const issues = scenarioIssues(result.issues);
  if (issues === undefined) {
    throw new HeadflowError('INVALID_ARGUMENT', 'the scenario file could not be read.');
  }
  const [first, ...rest] = issues.map((issue, i) =>
    asWritten(issue, writtenAt(value, result.issues[i]?.path)),
  );
  throw new ScenarioFileError([first as ScenarioIssue, ...rest], source);
}

/** The file's own text at a path of an issue, when it is a string (`"200 ft"`). */
function writtenAt(
  value: unknown,
  path: readonly { readonly key: unknown }[] | undefined,
): string | undefined {
  let at: unknown = value;
  for (const item of path ?? []) {
    if (typeof at !== 'object' || at === null) return undefined;
    at = (at as Record<string | number, unknown>)[item.key as string | number];
  }
  return typeof at === 'string' ? at : undefined;
}

/**
 * An issue that echoes the value as the file wrote it: a library's `found 60.96 m` (the value
 * after conversion to SI) becomes `found "200 ft"`; a message that does not quote the file's
 * text gets it added.
 */
function asWritten(issue: ScenarioIssue, written: string | undefined): ScenarioIssue {
  if (written === undefined) return issue;
  const quoted = JSON.stringify(written);
  if (issue.message.includes(quoted)) return issue;
  const converted = /found -?\d[\d.e+-]* [^\s,;)]+?(?=[\s,;)]|\.(?:\s|$)|$)/;
  const message = converted.test(issue.message)
    ? issue.message.replace(converted, `found ${quoted}`)
    : `${issue.message.replace(/\s+$/, '')} (the file gives ${quoted})`;
  return { ...issue, message };
}

export { ScenarioFileError, type ScenarioIssue } from './scenario-issues';

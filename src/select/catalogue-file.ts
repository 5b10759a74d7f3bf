/**
 * The pump catalogue file: a JSON list of pumps with their curves, impeller range, speeds,
 * drive and price, every quantity written with its unit. {@link readCatalogue} reads one into
 * a {@link PumpCatalogue}; problems are reported with their path in the file, as scenario files
 * are.
 *
 * @module
 */
import * as v from 'valibot';
import { HeadflowError, type HeadflowErrorCode } from '../errors';
import { guardOptions, guardString } from '../guards';
import { type Dimension, isUnit, parseQuantity, type Quantity, UNITS } from '../units/index';
import { checkCatalogue } from './catalogue';
import type { PumpCatalogue } from './types';

/** The format name and version a catalogue file must declare. */
export const CATALOGUE_FORMAT = 'headflow-pump-catalogue/1';

/** One problem in a catalogue file. */
export interface CatalogueIssue {
  /** Where it is, for example `pumps[2].points[1].head` (`(file)` for the whole file). */
  readonly path: string;
  /** What was expected and what was found, in plain words. */
  readonly message: string;
  /** The error code this problem alone would have. */
  readonly code: HeadflowErrorCode;
}

/** Problems listed in the message (all are kept in `issues`). */
const MAX_LISTED = 50;

/**
 * A catalogue file that cannot be read: every problem found, each with its path. Its `code`
 * is the first problem's code and its `parameter` the first problem's path.
 */
export class CatalogueFileError extends HeadflowError {
  /** Every problem found, in file order. */
  readonly issues: readonly CatalogueIssue[];

  /**
   * Constructs with any arguments without throwing: issues that are not `{ path, message,
   * code }` records are left out, and a source that is not a string is not named.
   */
  constructor(issues: readonly [CatalogueIssue, ...CatalogueIssue[]], source?: string) {
    const list = Array.isArray(issues) ? issues.filter(isCatalogueIssue) : [];
    const first = list[0];
    const where =
      typeof source === 'string' ? `pump catalogue ${source.slice(0, 200)}` : 'the pump catalogue';
    const count = list.length === 1 ? 'a problem' : `${list.length} problems`;
    const shown = list.slice(0, MAX_LISTED).map((i) => `\n  - ${i.path}: ${i.message}`);
    const more = list.length > MAX_LISTED ? `\n  ... and ${list.length - MAX_LISTED} more` : '';
    super(first?.code ?? 'INVALID_ARGUMENT', `${where} has ${count}:${shown.join('')}${more}`, {
      ...(first === undefined ? {} : { parameter: first.path }),
      allowed: 'see the catalogue format (docs/select.md)',
    });
    this.issues = list;
  }
}

function isCatalogueIssue(x: unknown): x is CatalogueIssue {
  if (typeof x !== 'object' || x === null) return false;
  const i = x as Record<string, unknown>;
  return (
    typeof i['path'] === 'string' &&
    typeof i['message'] === 'string' &&
    typeof i['code'] === 'string'
  );
}

/** Codes of the issues raised here (others are INVALID_ARGUMENT). */
const CODES = new WeakMap<object, HeadflowErrorCode>();

function found(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (typeof value === 'string')
    return JSON.stringify(value.length > 60 ? `${value.slice(0, 60)}...` : value);
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'an object';
  return `a ${typeof value}`;
}

function expecting(what: string): (issue: v.BaseIssue<unknown>) => string {
  return (issue) => `expected ${what}, found ${found(issue.input)}`;
}

type Context = Parameters<Parameters<typeof v.rawTransform<unknown, unknown>>[0]>[0];

function report(ctx: Context, code: HeadflowErrorCode, message: string): void {
  ctx.addIssue({ message });
  const issues = (ctx.dataset as unknown as { readonly issues?: readonly object[] }).issues;
  const last = issues?.[issues.length - 1];
  if (last !== undefined) CODES.set(last, code);
}

const QUANTITY_PATTERN = '^\\s*[+-]?(\\d[\\d,]*(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?\\s*\\S+';
const WORDS: Partial<Record<Dimension, readonly [string, string]>> = {
  length: ['a length', '250 mm'],
  flow: ['a flow', '40 L/s'],
  rotationalSpeed: ['a speed', '2900 rpm'],
  power: ['a power', '15 kW'],
};

/** A quantity of `dimension` written with its unit, > 0 (or >= 0 with `zero`), read into SI. */
function quantity<D extends Dimension>(dimension: D, zero = false, meaning?: string) {
  const [name, example] = WORDS[dimension] ?? [`a ${dimension}`, `1 ${dimension}`];
  const wanted = `${name} ${zero ? '>= 0' : '> 0'} with its unit, such as "${example}"`;
  return v.pipe(
    v.unknown(),
    v.metadata({
      type: 'string',
      pattern: QUANTITY_PATTERN,
      description: `${meaning === undefined ? '' : `${meaning}; `}${name}${zero ? ' >= 0' : ' > 0'}: a number and a unit symbol`,
      examples: [example],
    }),
    v.rawTransform<unknown, Quantity<D>>((ctx) => {
      const input = ctx.dataset.value;
      if (typeof input !== 'string') {
        const hint =
          typeof input === 'number' ? ' (write a quantity as text: a number and its unit)' : '';
        report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}${hint}`);
        return ctx.NEVER;
      }
      try {
        const value = parseQuantity(input, dimension);
        if (zero ? value < 0 : value <= 0) {
          report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}`);
          return ctx.NEVER;
        }
        return value as Quantity<D>;
      } catch (e) {
        if (!(e instanceof HeadflowError)) throw e;
        const which =
          e.code === 'WRONG_DIMENSION' && isUnit(e.unit)
            ? `, which is ${WORDS[UNITS[e.unit].dimension]?.[0] ?? `a ${UNITS[e.unit].dimension}`}`
            : e.code === 'UNKNOWN_UNIT'
              ? `: ${found(e.value)} is not a known unit`
              : '';
        report(ctx, e.code, `expected ${wanted}, found ${found(input)}${which}`);
        return ctx.NEVER;
      }
    }),
  );
}

const PERCENT = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*%\s*$/;

/** A fraction in (0, 1] (or [0, 1] with `allowZero`): `0.72` or `"72 %"`. */
function fraction(allowZero = false) {
  const wanted = `a fraction ${allowZero ? '0 to 1' : 'above 0 and at most 1'} (0.72) or a percentage ("72 %")`;
  return v.pipe(
    v.unknown(),
    v.metadata({
      anyOf: [
        { type: 'number', ...(allowZero ? { minimum: 0 } : { exclusiveMinimum: 0 }), maximum: 1 },
        { type: 'string', pattern: PERCENT.source },
      ],
      description: wanted,
    }),
    v.rawTransform<unknown, number>((ctx) => {
      const input = ctx.dataset.value;
      let value: number | undefined;
      if (typeof input === 'number') value = input;
      else if (typeof input === 'string') {
        const m = PERCENT.exec(input);
        if (m !== null) value = Number(m[1]) / 100;
      }
      if (
        value === undefined ||
        !Number.isFinite(value) ||
        value > 1 ||
        value < 0 ||
        (value === 0 && !allowZero)
      ) {
        report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}`);
        return ctx.NEVER;
      }
      return value;
    }),
  );
}

/** A price: a finite number >= 0. */
function price(what: string) {
  const wanted = `${what} (a number >= 0)`;
  return v.pipe(
    v.unknown(),
    v.metadata({ type: 'number', minimum: 0, description: wanted }),
    v.rawTransform<unknown, number>((ctx) => {
      const input = ctx.dataset.value;
      if (typeof input !== 'number' || !Number.isFinite(input) || input < 0) {
        report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}`);
        return ctx.NEVER;
      }
      return input;
    }),
  );
}

function text(what: string) {
  return v.pipe(
    v.string(expecting(`${what} (text)`)),
    v.minLength(1, expecting(`${what} (not empty)`)),
    v.maxLength(200, expecting(`${what} (at most 200 characters)`)),
    v.description(what),
  );
}

const opt = v.exactOptional;

/** A JSON object with exactly these fields (unknown fields are errors). */
function obj<const E extends v.ObjectEntries>(entries: E, what: string) {
  const keys = Object.keys(entries).join(', ');
  const schema = v.strictObject(entries, (issue) => {
    if (issue.expected === 'never') return `unknown field; the fields here are: ${keys}`;
    if (issue.input === undefined && issue.expected?.startsWith('"')) {
      return 'this field is required';
    }
    return `expected ${what} with the fields ${keys}, found ${found(issue.input)}`;
  });
  // valibot takes a list for an object (its items as fields); a JSON list is not an object.
  const inner = schema['~run'];
  (schema as { '~run': typeof inner })['~run'] = (dataset, config) => {
    if (Array.isArray(dataset.value)) {
      v._addIssue(schema as Parameters<typeof v._addIssue>[0], 'type', dataset, config);
      return dataset as unknown as ReturnType<typeof inner>;
    }
    return inner.call(schema, dataset, config);
  };
  return v.pipe(schema, v.description(what));
}

function list<S extends v.GenericSchema>(item: S, what: string, min: number, max: number) {
  return v.pipe(
    v.array(item, expecting(`a list of ${what}`)),
    v.minLength(
      min,
      (issue) => `expected at least ${min} ${what}, found ${String(issue.received)}`,
    ),
    v.maxLength(max, (issue) => `expected at most ${max} ${what}, found ${String(issue.received)}`),
  );
}

const point = obj(
  {
    flow: quantity('flow', true),
    head: quantity('length'),
    efficiency: fraction(true),
    npshRequired: opt(quantity('length')),
  },
  'a catalogue point',
);

const points = list(point, 'catalogue points (flows increasing)', 3, 1000);

const pumpSchema = obj(
  {
    name: text('pump name, unique in the catalogue'),
    speed: quantity('rotationalSpeed', false, 'speed of the catalogue curves'),
    impellerDiameter: quantity('length', false, 'the full impeller diameter, of `points`'),
    points,
    minImpellerDiameter: opt(quantity('length', false, 'smallest impeller it may be trimmed to')),
    curves: opt(
      list(
        obj(
          { impellerDiameter: quantity('length'), points },
          'catalogue points at a smaller impeller',
        ),
        'curves at smaller impellers',
        0,
        100,
      ),
    ),
    motorSpeeds: opt(list(quantity('rotationalSpeed'), 'fixed motor speeds', 1, 20)),
    drive: opt(
      obj(
        {
          minSpeed: quantity('rotationalSpeed'),
          maxSpeed: quantity('rotationalSpeed'),
          efficiency: opt(fraction()),
          price: opt(price('price of the drive')),
        },
        'a variable-speed drive',
      ),
    ),
    motorEfficiency: opt(fraction()),
    motorSeries: opt(
      v.pipe(
        v.picklist(['iec', 'nema'] as const, expecting('motor rating series: "iec" or "nema"')),
        v.description('motor rating series: "iec" or "nema"'),
      ),
    ),
    price: opt(price('price of the pump set')),
  },
  'a catalogue pump',
);

/**
 * The valibot schema of a catalogue file (format `headflow-pump-catalogue/1`).
 * @internal
 */
export const catalogueSchema = obj(
  {
    $schema: opt(v.string(expecting('the address of the JSON Schema (text)'))),
    format: v.pipe(
      v.literal(
        CATALOGUE_FORMAT,
        expecting(`"${CATALOGUE_FORMAT}" (the format this version reads)`),
      ),
      v.description('format name and version'),
    ),
    name: opt(text('catalogue name')),
    description: opt(v.string(expecting('a description (text)'))),
    currency: opt(text('currency of the prices')),
    motorEfficiency: opt(fraction()),
    pumps: list(pumpSchema, 'pumps', 1, 100_000),
  },
  'a pump catalogue',
);

/** Writes a valibot path as `pumps[2].points[1].head`. */
function pathText(path: readonly v.IssuePathItem[] | undefined): string {
  if (path === undefined || path.length === 0) return '(file)';
  let out = '';
  for (const item of path) {
    const key = item.key;
    if (typeof key === 'number') out += `[${key}]`;
    else if (typeof key === 'string' && /^[A-Za-z_$][\w$]*$/.test(key)) {
      out += out === '' ? key : `.${key}`;
    } else out += `[${JSON.stringify(String(key))}]`;
  }
  return out;
}

/** Options of {@link readCatalogue}. */
export interface ReadCatalogueOptions {
  /** Name of the file (or other source) for messages. */
  readonly source?: string;
}

/** Longest catalogue text read (characters). */
const MAX_TEXT = 50_000_000;

/**
 * Reads a pump catalogue file into a {@link PumpCatalogue} for `selectPumps`.
 *
 * Every quantity is text with its unit (`"2900 rpm"`, `"250 mm"`, `"40 L/s"`, `"52 m"`);
 * efficiencies are fractions or percentages (`0.78`, `"78 %"`); prices are plain numbers in
 * the catalogue's `currency`. Unknown fields are errors. After the shape, every pump is
 * checked as `selectPumps` checks it (its curves are built), and a problem there is reported
 * at the pump's path too. The format is described in docs/select.md; its JSON Schema is
 * docs/pump-catalogue.schema.json.
 *
 * @param text - the file's text, or its parsed value
 * @param options - `source`: the file's name, for messages
 * @throws HeadflowError `INVALID_ARGUMENT` for text that is not JSON; {@link CatalogueFileError}
 *   (a HeadflowError) listing every problem with its path (`pumps[2].points[1].head`), what was
 *   expected and what was found.
 * @example
 * ```ts
 * const catalogue = readCatalogue(readFileSync('pumps.json', 'utf8'), { source: 'pumps.json' });
 * catalogue.pumps.length; // 20 for docs/examples/pump-catalogue.json
 * ```
 */
export function readCatalogue(text: unknown, options?: ReadCatalogueOptions | null): PumpCatalogue {
  const o = guardOptions<ReadCatalogueOptions>('options', options);
  const source = o.source === undefined ? undefined : guardString('options.source', o.source);
  let value = text;
  if (typeof text === 'string') {
    guardString('text', text, MAX_TEXT);
    try {
      value = JSON.parse(text);
    } catch (e) {
      const said = e instanceof Error ? e.message : String(e);
      const name = source === undefined ? 'the pump catalogue' : `pump catalogue ${source}`;
      throw new HeadflowError('INVALID_ARGUMENT', `${name} is not valid JSON: ${said}`, {
        parameter: 'text',
        allowed: 'a JSON text',
      });
    }
  }
  const result = v.safeParse(catalogueSchema, value);
  if (!result.success) {
    const issues = result.issues.map((issue) => ({
      path: pathText(issue.path),
      message: issue.message,
      code: CODES.get(issue) ?? 'INVALID_ARGUMENT',
    }));
    const [first, ...rest] = issues;
    if (first === undefined)
      throw new HeadflowError('INVALID_ARGUMENT', 'the pump catalogue could not be read.');
    throw new CatalogueFileError([first, ...rest], source);
  }
  const { $schema: _s, format: _f, description: _d, ...catalogue } = result.output;
  const out = catalogue as unknown as PumpCatalogue;
  try {
    checkCatalogue(out, 'catalogue');
  } catch (e) {
    if (!(e instanceof HeadflowError)) throw e;
    const path = (e.parameter ?? '').replace(/^catalogue\.?/, '') || '(file)';
    const message = e.message.startsWith('catalogue.')
      ? e.message.slice('catalogue.'.length)
      : e.message;
    throw new CatalogueFileError([{ path, message, code: e.code }], source);
  }
  return out;
}

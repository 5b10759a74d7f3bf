/**
 * The leaf values of a scenario file: quantities written with their unit (`"350 ft"`),
 * fractions that may be percentages (`0.72` or `"72 %"`), whole numbers, names and choices.
 * Each is a valibot schema whose issues name what was expected and what was found.
 *
 * @module
 */
import * as v from 'valibot';
import { HeadflowError } from '../errors';
import { MAX_NAME_LENGTH } from '../guards';
import {
  type Dimension,
  isUnit,
  type PressureReference,
  parsePressure,
  parseQuantity,
  type Quantity,
  UNITS,
  unitsOf,
} from '../units/index';
import { expecting, found, report } from './scenario-issues';

/** A number followed by a unit, as `parseQuantity` reads it (for editors; the reader decides). */
export const QUANTITY_PATTERN = '^\\s*[+-]?(\\d[\\d,]*(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?\\s*\\S+';

/** Plain name and an example of each dimension used in scenario files. */
const WORDS: Partial<Record<Dimension, readonly [string, string]>> = {
  length: ['a length', '350 ft'],
  flow: ['a flow', '1200 gal/min'],
  pressure: ['a pressure', '45 psi'],
  temperature: ['a temperature', '20 degC'],
  density: ['a density', '998 kg/m3'],
  dynamicViscosity: ['a dynamic viscosity', '1.0 cP'],
  kinematicViscosity: ['a kinematic viscosity', '1.0 cSt'],
  rotationalSpeed: ['a speed', '1750 rpm'],
  power: ['a power', '15 kW'],
  velocity: ['a velocity', '2 m/s'],
  acceleration: ['an acceleration', '9.81 m/s2'],
  time: ['a time', '5 s'],
  specificHeat: ['a specific heat', '4.18 kJ/(kg*K)'],
};

function words(dimension: Dimension): readonly [string, string] {
  return WORDS[dimension] ?? [`a ${dimension}`, `1 ${dimension}`];
}

/** What a quantity must satisfy besides its dimension. */
export type Bound = 'any' | 'nonNegative' | 'positive';

const BOUND_WORDS: Record<Bound, string> = {
  any: '',
  nonNegative: ' >= 0',
  positive: ' > 0',
};

/**
 * Physical ranges of the quantities a scenario file may hold, in SI: the largest magnitude, and
 * the smallest magnitude of a value that is not zero. They are wide (no pump station lies
 * outside them) and exist to refuse what no file could mean: a motor efficiency of 1e-300 %, a
 * flow of 1e-300 m3/h, a length of 1e300 ft, which would carry Infinity into a report.
 */
export const PHYSICAL_RANGE: Partial<
  Record<Dimension, { readonly smallest: number; readonly largest: number }>
> = {
  length: { smallest: 1e-9, largest: 1e6 },
  flow: { smallest: 1e-9, largest: 1e3 },
  pressure: { smallest: 1e-3, largest: 1e9 },
  temperature: { smallest: 1e-3, largest: 5000 },
  density: { smallest: 1e-3, largest: 1e5 },
  dynamicViscosity: { smallest: 1e-7, largest: 1e5 },
  kinematicViscosity: { smallest: 1e-10, largest: 1e2 },
  rotationalSpeed: { smallest: 1e-3, largest: 1e5 },
  power: { smallest: 1e-3, largest: 1e10 },
  velocity: { smallest: 1e-6, largest: 1e3 },
  acceleration: { smallest: 1e-3, largest: 1e3 },
};

/** The physical range of a dimension in words, for messages: `"1e-9 to 1e6 m"`. */
function rangeWords(dimension: Dimension): string {
  const r = PHYSICAL_RANGE[dimension];
  const unit = Object.keys(UNITS).find(
    (u) => UNITS[u as keyof typeof UNITS].dimension === dimension,
  );
  return r === undefined ? '' : `0 or ${r.smallest} to ${r.largest} ${unit ?? ''} in size`.trim();
}

function physical(value: number, dimension: Dimension): boolean {
  const r = PHYSICAL_RANGE[dimension];
  const size = Math.abs(value);
  return r === undefined || size === 0 || (size >= r.smallest && size <= r.largest);
}

/** Smallest fraction other than 0 that a file may give (0.1 %). */
export const SMALLEST_FRACTION = 1e-3;

function within(value: number, bound: Bound): boolean {
  if (bound === 'nonNegative') return value >= 0;
  if (bound === 'positive') return value > 0;
  return true;
}

/** Why `text` is not a quantity of `dimension`, from the error `parseQuantity` threw. */
function why(e: HeadflowError, dimension: Dimension): string {
  if (e.code === 'WRONG_DIMENSION' && isUnit(e.unit)) {
    return `, which is ${words(UNITS[e.unit].dimension)[0]}`;
  }
  if (e.code === 'UNKNOWN_UNIT') {
    const known = unitsOf(dimension).join(', ');
    const near = /(is ambiguous: did you mean [^?]+\?|Did you mean [^?]+\?)/.exec(e.message)?.[1];
    const said = near?.startsWith('is ambiguous')
      ? near.replace(/\?$/, '')
      : `is not a known unit${near === undefined ? '' : `; ${near.charAt(0).toLowerCase()}${near.slice(1, -1)}`}`;
    return `: ${found(e.value)} ${said} (units of ${words(dimension)[0].replace(/^an? /, '')}: ${known})`;
  }
  if (e.code === 'OUT_OF_RANGE') return ': below absolute zero';
  if (e.message.includes('is a gauge pressure unit')) {
    return ': a gauge reading has no place here (this is an absolute pressure or a pressure difference); write it without the gauge mark, in psia, bara, kPa or psi';
  }
  const hint = /\)\.\s+(.+?)\.?$/.exec(e.message)?.[1];
  return hint === undefined ? '' : `: ${hint.charAt(0).toLowerCase()}${hint.slice(1)}`;
}

/** The raw-transform context, as far as the readers here use it. */
type Context = Parameters<Parameters<typeof v.rawTransform<unknown, unknown>>[0]>[0];

/**
 * Parses the value as a quantity of one of `dimensions`; reports a missing unit, an unknown
 * unit, a wrong dimension or a value out of bounds, with the code `parseQuantity` gives.
 */
function readQuantity(
  ctx: Context,
  dimensions: readonly [Dimension, ...Dimension[]],
  bound: Bound,
): { readonly value: number; readonly dimension: Dimension } | undefined {
  const input = ctx.dataset.value;
  const wanted = `${dimensions.map((d) => words(d)[0]).join(' or ')}${BOUND_WORDS[bound]} with its unit, such as ${dimensions.map((d) => `"${words(d)[1]}"`).join(' or ')}`;
  if (typeof input !== 'string') {
    const hint =
      typeof input === 'number' ? ' (write a quantity as text: a number and its unit)' : '';
    report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}${hint}`);
    return undefined;
  }
  let first: HeadflowError | undefined;
  for (const dimension of dimensions) {
    try {
      const value = parseQuantity(input, dimension);
      if (!within(value, bound)) {
        report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}`);
        return undefined;
      }
      if (!physical(value, dimension)) {
        report(
          ctx,
          'OUT_OF_RANGE',
          `expected ${wanted} within the physical range ${rangeWords(dimension)}, found ${found(input)}`,
        );
        return undefined;
      }
      return { value, dimension };
    } catch (e) {
      if (!(e instanceof HeadflowError)) throw e;
      first ??= e;
    }
  }
  const error = first as HeadflowError;
  report(ctx, error.code, `expected ${wanted}, found ${found(input)}${why(error, dimensions[0])}`);
  return undefined;
}

/** JSON Schema words for a quantity field (editors only; the reader parses the text). */
function quantityMetadata(
  dimensions: readonly [Dimension, ...Dimension[]],
  bound: Bound,
  meaning?: string,
) {
  const names = dimensions.map((d) => words(d)[0]).join(' or ');
  const lead = meaning === undefined ? '' : `${meaning}; `;
  return v.metadata({
    type: 'string',
    pattern: QUANTITY_PATTERN,
    description: `${lead}${names}${BOUND_WORDS[bound]}: a number and a unit symbol`,
    examples: dimensions.map((d) => words(d)[1]),
  });
}

/**
 * A quantity of `dimension` written as text with its unit (`"350 ft"`), read into SI.
 * Wrong unit or dimension is an issue at the field's path with the code `parseQuantity` gives
 * (`UNKNOWN_UNIT`, `WRONG_DIMENSION`, `INVALID_ARGUMENT`, `OUT_OF_RANGE` below absolute zero).
 */
export function quantity<D extends Dimension>(
  dimension: D,
  bound: Bound = 'any',
  meaning?: string,
) {
  return v.pipe(
    v.unknown(),
    quantityMetadata([dimension], bound, meaning),
    v.rawTransform<unknown, Quantity<D>>((ctx) => {
      const r = readQuantity(ctx, [dimension], bound);
      return r === undefined ? ctx.NEVER : (r.value as Quantity<D>);
    }),
  );
}

/** A pressure as the file gives it: the number as written (Pa), gauge or absolute. */
export interface FilePressure {
  /** The value as written, in Pa: gauge or absolute as `reference` says. */
  readonly value: number;
  readonly reference: PressureReference;
  /** True when the unit carried a gauge or absolute mark (`psig`, `bar(a)`). */
  readonly marked: boolean;
  /** The text as written, for messages. */
  readonly text: string;
}

/**
 * A pressure written as text, gauge or absolute: a unit with a mark (`"15 psig"`,
 * `"2 bara"`, `"200 kPa(g)"`) says which; a unit without one is read as `unmarked`. Made
 * absolute when the design is assembled, with the file's atmosphere.
 */
export function pressure(unmarked: PressureReference, meaning: string) {
  const other = unmarked === 'absolute' ? 'gauge' : 'absolute';
  const lead = `${meaning}; a unit without a mark is ${unmarked}, a marked one (psig, barg, kPa(g) or psia, bara, kPa(a)) may be ${other}`;
  return v.pipe(
    v.unknown(),
    quantityMetadata(['pressure'], 'any', lead),
    v.rawTransform<unknown, FilePressure>((ctx) => {
      const input = ctx.dataset.value;
      const wanted = `a pressure with its unit, such as "45 psi" (${unmarked}), "45 psig" or "3 bara"`;
      if (typeof input !== 'string') {
        const hint =
          typeof input === 'number' ? ' (write a quantity as text: a number and its unit)' : '';
        report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}${hint}`);
        return ctx.NEVER;
      }
      try {
        const r = parsePressure(input, { unmarked });
        return { value: r.value, reference: r.reference, marked: r.marked, text: input };
      } catch (e) {
        if (!(e instanceof HeadflowError)) throw e;
        const said = e.message.includes('perfect vacuum')
          ? ': an absolute pressure is >= 0'
          : why(e, 'pressure');
        report(ctx, e.code, `expected ${wanted}, found ${found(input)}${said}`);
        return ctx.NEVER;
      }
    }),
  );
}

/** A viscosity, dynamic (`"30 cP"`) or kinematic (`"34 cSt"`), read into SI with its kind. */
export function viscosity() {
  const dims: readonly [Dimension, ...Dimension[]] = ['dynamicViscosity', 'kinematicViscosity'];
  return v.pipe(
    v.unknown(),
    quantityMetadata(dims, 'positive'),
    v.rawTransform<
      unknown,
      { readonly value: number; readonly kind: 'dynamicViscosity' | 'kinematicViscosity' }
    >((ctx) => {
      const r = readQuantity(ctx, dims, 'positive');
      if (r === undefined) return ctx.NEVER;
      return {
        value: r.value,
        kind: r.dimension === 'kinematicViscosity' ? 'kinematicViscosity' : 'dynamicViscosity',
      };
    }),
  );
}

const PERCENT = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*%\s*$/;

/**
 * A fraction in (0, 1] (or [0, 1] with `allowZero`): a number (`0.72`) or a percentage
 * (`"72 %"`).
 */
export function fraction(allowZero = false) {
  const range = allowZero ? '0 to 1' : 'above 0 and at most 1';
  const wanted = `a fraction ${range} (0.72) or a percentage ("72 %")`;
  return v.pipe(
    v.unknown(),
    v.metadata({
      anyOf: [
        { type: 'number', ...(allowZero ? { minimum: 0 } : { exclusiveMinimum: 0 }), maximum: 1 },
        { type: 'string', pattern: PERCENT.source },
      ],
      description: `${wanted}`,
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
        (value === 0 && !allowZero) ||
        (value > 0 && value < SMALLEST_FRACTION)
      ) {
        report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}`);
        return ctx.NEVER;
      }
      return value;
    }),
  );
}

/** Largest plain number a file may give where no other bound is stated (1e12). */
export const LARGEST_PLAIN_NUMBER = 1e12;

/**
 * A plain number within [min, max] (finite, at most {@link LARGEST_PLAIN_NUMBER}); with
 * `smallest`, a value other than 0 must be at least that large.
 */
export function plainNumber(
  what: string,
  min: number,
  max = Number.POSITIVE_INFINITY,
  open = false,
  smallest = 0,
) {
  const range =
    (max === Number.POSITIVE_INFINITY ? `${open ? '>' : '>='} ${min}` : `from ${min} to ${max}`) +
    (smallest > 0 ? `, and 0 or at least ${smallest}` : '') +
    (max === Number.POSITIVE_INFINITY ? `, at most ${LARGEST_PLAIN_NUMBER}` : '');
  const wanted = `${what} (a number ${range})`;
  return v.pipe(
    v.unknown(),
    v.metadata({
      type: 'number',
      ...(open ? { exclusiveMinimum: min } : { minimum: min }),
      ...(max === Number.POSITIVE_INFINITY ? {} : { maximum: max }),
      description: wanted,
    }),
    v.rawTransform<unknown, number>((ctx) => {
      const input = ctx.dataset.value;
      if (
        typeof input !== 'number' ||
        !Number.isFinite(input) ||
        input > max ||
        input > LARGEST_PLAIN_NUMBER ||
        (input !== 0 && Math.abs(input) < smallest) ||
        (open ? input <= min : input < min)
      ) {
        report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}`);
        return ctx.NEVER;
      }
      return input;
    }),
  );
}

/** A whole number >= min. */
export function wholeNumber(what: string, min: number) {
  const wanted = `${what} (a whole number >= ${min})`;
  return v.pipe(
    v.unknown(),
    v.metadata({ type: 'integer', minimum: min, description: wanted }),
    v.rawTransform<unknown, number>((ctx) => {
      const input = ctx.dataset.value;
      if (typeof input !== 'number' || !Number.isSafeInteger(input) || input < min) {
        report(ctx, 'INVALID_ARGUMENT', `expected ${wanted}, found ${found(input)}`);
        return ctx.NEVER;
      }
      return input;
    }),
  );
}

/**
 * A name: a string that is not empty or blank, of at most {@link MAX_NAME_LENGTH} characters
 * (a blank name is refused here because the evaluator refuses it).
 */
export function text(what: string) {
  return v.pipe(
    v.string(expecting(`${what} (text)`)),
    v.minLength(1, expecting(`${what} (not empty)`)),
    v.check((s) => s.trim() !== '', expecting(`${what} (not blank)`)),
    v.maxLength(MAX_NAME_LENGTH, expecting(`${what} (at most ${MAX_NAME_LENGTH} characters)`)),
    v.description(what),
  );
}

/** One of a fixed set of words. */
export function choice<const T extends readonly string[]>(what: string, options: T) {
  const listed = options.map((o) => JSON.stringify(o)).join(', ');
  return v.pipe(
    v.picklist(options, expecting(`${what}: one of ${listed}`)),
    v.description(`${what}: one of ${listed}`),
  );
}

/** true or false. */
export function flag(what: string) {
  return v.pipe(v.boolean(expecting(`${what} (true or false)`)), v.description(what));
}

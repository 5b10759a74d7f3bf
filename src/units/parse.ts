import { argumentError, HeadflowError } from '../errors';
import { guardOneOf, guardOptions, guardString } from '../guards';
import { markedPressure, type PressureReference } from './aliases';
import { UNITS, type UnitOf, type UnitSymbol } from './catalogue';
import { DIMENSIONS, isUnit, q, resolveUnit, to } from './convert';
import type { Dimension, Pressure, Quantity } from './quantity';

/** Longest text `parseQuantity` and `parsePressure` read. */
const MAX_TEXT_LENGTH = 200;

/** A number: optional sign, digits with optional comma thousands groups, fraction, exponent. */
const NUMBER = /^\s*([+-]?(?:\d{1,3}(?:,\d{3})+|\d+)(?:\.\d*)?|[+-]?\.\d+)(?:[eE]([+-]?\d+))?/;

/** Spellings accepted besides the catalogue's ASCII symbols, folded before look-up. */
const FOLDS: readonly (readonly [RegExp, string])[] = [
  [/°C$/, 'degC'],
  [/°F$/, 'degF'],
  [/°R$/, 'degR'],
  [/²/g, '2'],
  [/³/g, '3'],
  [/\^/g, ''],
  [/[·⋅]/g, '*'],
];

/** Folds the accepted alternative spellings (`m³/h`, `m^3/h`, `°C`, `Pa·s`) to catalogue symbols. */
function foldUnit(text: string): string {
  let s = text.trim();
  if (isUnit(s)) return s;
  for (const [pattern, replacement] of FOLDS) s = s.replace(pattern, replacement);
  return s;
}

/** A quantity's text split into its number and its unit (as written, folded). */
interface Split {
  readonly value: number;
  readonly unit: string;
}

/** Splits `"1,200 gal/min"` into 1200 and `gal/min`; `INVALID_ARGUMENT` when it cannot. */
function split(text: unknown): Split {
  if (typeof text !== 'string' || text.trim() === '') {
    throw argumentError(
      'INVALID_ARGUMENT',
      'text',
      text,
      undefined,
      'a number and a unit, such as "350 ft"',
    );
  }
  guardString('text', text, MAX_TEXT_LENGTH);
  const match = NUMBER.exec(text);
  if (!match) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'text',
      text,
      undefined,
      'a number and a unit, such as "350 ft"',
      'It does not start with a number.',
    );
  }
  const mantissa = (match[1] ?? '').replace(/,/g, '');
  const exponent = match[2] === undefined ? '' : `e${match[2]}`;
  const value = Number(mantissa + exponent);
  const rest = text.slice(match[0].length);
  if (rest.trim() === '') {
    throw argumentError(
      'INVALID_ARGUMENT',
      'text',
      text,
      undefined,
      'a number and a unit, such as "350 ft"',
      'The unit is missing.',
    );
  }
  return { value, unit: foldUnit(rest) };
}

function wrongDimension(text: string, symbol: string, found: Dimension, wanted: Dimension) {
  return new HeadflowError(
    'WRONG_DIMENSION',
    `${JSON.stringify(text)} is a ${found}, but a ${wanted} is expected.`,
    { parameter: 'text', value: text, unit: symbol, allowed: `a unit of ${wanted}` },
  );
}

function finite(text: string, value: number): void {
  if (!Number.isFinite(value)) {
    throw argumentError('INVALID_ARGUMENT', 'text', text, undefined, 'a finite number');
  }
}

/**
 * Reads a quantity written as text: a number, optional spaces, and a unit symbol. Commas
 * group thousands (`"1,200 gal/min"`); exponents are allowed (`"2.5e-3 Pa*s"`); `°C`, `°F`,
 * superscript or caret powers (`m³/h`, `m^3/h`) and `·` for `*` are accepted, and so are the
 * aliases engineers write (`"1200 gpm"`, `"350 feet"`, `"60 deg F"`: see `aliasesOf`).
 * Pressures are absolute: `"30 psia"` and `"2 bar(a)"` read as absolute, while a gauge mark
 * (`"15 psig"`, `"1 barg"`, `"200 kPa(g)"`) is refused, because a gauge reading needs an
 * atmosphere: read it with {@link parsePressure}.
 *
 * @param text - for example `"350 ft"`, `"45 psi"`, `"60 degF"`
 * @param dimension - the dimension the caller expects; omit to accept any
 * @returns the quantity in coherent SI
 * @throws HeadflowError `INVALID_ARGUMENT` for an empty, overlong (over 200 characters) or
 *   malformed string, a missing unit or a gauge-marked pressure unit; `UNKNOWN_UNIT` for a
 *   unit not in the catalogue (with "did you mean" for a near or ambiguous spelling such as
 *   `"KPA"` or `"deg"`); `WRONG_DIMENSION` when the unit is not of `dimension`;
 *   `OUT_OF_RANGE` for a temperature below absolute zero.
 * @example
 * ```ts
 * parseQuantity('1,200 gal/min', 'flow'); // 0.07570823568 (m3/s)
 * parseQuantity('1200 gpm', 'flow'); // 0.07570823568 (m3/s), the same
 * parseQuantity('45 psi', 'length'); // throws WRONG_DIMENSION
 * parseQuantity('3 deg'); // throws UNKNOWN_UNIT: ... did you mean degC, degF, degR or K?
 * ```
 */
export function parseQuantity<D extends Dimension>(text: string, dimension: D): Quantity<D>;
export function parseQuantity(text: string): Quantity<Dimension>;
export function parseQuantity(text: string, dimension?: Dimension): Quantity<Dimension> {
  if (dimension !== undefined) guardOneOf('dimension', dimension, DIMENSIONS);
  const { value, unit } = split(text);
  const marked = markedPressure(unit);
  if (marked !== undefined && dimension !== undefined && dimension !== 'pressure') {
    throw wrongDimension(text, unit, 'pressure', dimension);
  }
  const symbol = resolveUnit(unit, 'unit');
  const def = UNITS[symbol];
  if (dimension !== undefined && def.dimension !== dimension) {
    throw wrongDimension(text, symbol, def.dimension, dimension);
  }
  finite(text, value);
  return q(value, symbol);
}

/** A pressure read from text with its reference (see {@link parsePressure}). */
export interface PressureReading {
  /** The number as written, in Pa: absolute or gauge as `reference` says. */
  readonly value: Pressure;
  /** Whether `value` is absolute or gauge. */
  readonly reference: PressureReference;
  /** True when the unit carried the mark (`psig`, `bar(a)`); false when `unmarked` decided. */
  readonly marked: boolean;
  /** The catalogue symbol of the unit, without its mark (`psi` for `"15 psig"`). */
  readonly unit: UnitSymbol;
}

/** Options of {@link parsePressure}. */
export interface ParsePressureOptions {
  /** How to read a unit without a gauge or absolute mark (`"45 psi"`); default `'absolute'`. */
  readonly unmarked?: PressureReference;
}

/**
 * Reads a pressure written as text together with its reference: gauge or absolute. Gauge
 * marks are `g` or `(g)` after `psi`, `bar`, `mbar`, `kPa` or `MPa` (`"15 psig"`, `"1 barg"`,
 * `"200 kPa(g)"`), absolute marks `a` or `(a)` (`"30 psia"`, `"2 bara"`, `"101 kPa(a)"`); a
 * unit without a mark is read as `options.unmarked` says. Nothing is converted: a gauge value
 * becomes absolute only with a stated atmosphere,
 * `gaugeToAbsolute(reading.value, atmosphere)` (see also `atmosphereAt`).
 *
 * @param text - for example `"15 psig"`, `"2 bara"`, `"45 psi"`
 * @param options - `unmarked`: `'absolute'` (default) or `'gauge'`
 * @returns the value as written in Pa, its reference, whether it was marked, and the unit
 * @throws HeadflowError as {@link parseQuantity} (`INVALID_ARGUMENT`, `UNKNOWN_UNIT`,
 *   `WRONG_DIMENSION` for a unit that is not a pressure), and `INVALID_ARGUMENT` for an
 *   absolute pressure below zero or for options that are not an object or an `unmarked` that
 *   is neither `'absolute'` nor `'gauge'`.
 * @example
 * ```ts
 * parsePressure('15 psig'); // { value: 103421.35..., reference: 'gauge', marked: true, unit: 'psi' }
 * parsePressure('45 psi', { unmarked: 'gauge' }).reference; // 'gauge'
 * gaugeToAbsolute(parsePressure('1 barg').value, q(95, 'kPa')); // 195000 (Pa)
 * ```
 */
export function parsePressure(
  text: string,
  options?: ParsePressureOptions | null,
): PressureReading {
  const o = guardOptions<ParsePressureOptions>('options', options);
  const unmarked =
    o.unmarked === undefined
      ? 'absolute'
      : guardOneOf('options.unmarked', o.unmarked, ['absolute', 'gauge'] as const);
  const { value, unit } = split(text);
  const marked = markedPressure(unit);
  const symbol = marked?.symbol ?? resolveUnit(unit, 'unit');
  const def = UNITS[symbol];
  if (def.dimension !== 'pressure') throw wrongDimension(text, symbol, def.dimension, 'pressure');
  finite(text, value);
  const reference = marked?.reference ?? unmarked;
  const pressure = value * def.factor;
  if (reference === 'absolute' && pressure < 0) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'text',
      text,
      undefined,
      'an absolute pressure >= 0 (no pressure below a perfect vacuum)',
    );
  }
  return {
    value: pressure as Pressure,
    reference,
    marked: marked !== undefined,
    unit: symbol,
  };
}

/**
 * Writes a quantity as text in a unit: the number to `significantDigits` significant digits,
 * a space, and the unit symbol. The result reads back with {@link parseQuantity}.
 *
 * @param quantity - a quantity in coherent SI
 * @param unit - a unit of the quantity's dimension
 * @param significantDigits - 1 to 17 (default 4)
 * @throws HeadflowError `INVALID_ARGUMENT` for digits outside 1..17 or a non-finite quantity,
 *   `UNKNOWN_UNIT` for a symbol not in the catalogue.
 * @example
 * ```ts
 * formatQuantity(q(1200, 'gal/min'), 'm3/h'); // '272.5 m3/h'
 * formatQuantity(q(20, 'degC'), 'degF', 3); // '68 degF'
 * ```
 */
export function formatQuantity<D extends Dimension>(
  quantity: Quantity<D>,
  unit: UnitOf<D>,
  significantDigits = 4,
): string {
  if (!Number.isInteger(significantDigits) || significantDigits < 1 || significantDigits > 17) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'significantDigits',
      significantDigits,
      undefined,
      'an integer from 1 to 17',
    );
  }
  const value = to(quantity, unit);
  const rounded = Number(value.toPrecision(significantDigits));
  return `${String(rounded === 0 ? 0 : rounded)} ${unit}`;
}

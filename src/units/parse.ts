import { argumentError, HeadflowError } from '../errors';
import { guardOneOf, guardString } from '../guards';
import type { UnitOf } from './catalogue';
import { DIMENSIONS, isUnit, q, to, unitDefinition } from './convert';
import type { Dimension, Quantity } from './quantity';

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

/**
 * Reads a quantity written as text: a number, optional spaces, and a unit symbol. Commas
 * group thousands (`"1,200 gal/min"`); exponents are allowed (`"2.5e-3 Pa*s"`); `°C`, `°F`,
 * superscript or caret powers (`m³/h`, `m^3/h`) and `·` for `*` are accepted.
 *
 * @param text - for example `"350 ft"`, `"45 psi"`, `"60 degF"`
 * @param dimension - the dimension the caller expects; omit to accept any
 * @returns the quantity in coherent SI
 * @throws HeadflowError `INVALID_ARGUMENT` for an empty or malformed string, a string over
 *   200 characters, a missing unit or an unknown `dimension`, `UNKNOWN_UNIT` for a unit not in the catalogue, `WRONG_DIMENSION` when the unit is not of
 *   `dimension`, `OUT_OF_RANGE` for a temperature below absolute zero.
 * @example
 * ```ts
 * parseQuantity('1,200 gal/min', 'flow'); // 0.07570823568 (m3/s)
 * parseQuantity('45 psi', 'length'); // throws WRONG_DIMENSION
 * ```
 */
export function parseQuantity<D extends Dimension>(text: string, dimension: D): Quantity<D>;
export function parseQuantity(text: string): Quantity<Dimension>;
export function parseQuantity(text: string, dimension?: Dimension): Quantity<Dimension> {
  if (dimension !== undefined) guardOneOf('dimension', dimension, DIMENSIONS);
  if (typeof text === 'string') guardString('text', text);
  if (typeof text !== 'string' || text.trim() === '') {
    throw argumentError(
      'INVALID_ARGUMENT',
      'text',
      text,
      undefined,
      'a number and a unit, such as "350 ft"',
    );
  }
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
  const symbol = foldUnit(rest);
  const def = unitDefinition(symbol, 'unit');
  if (dimension !== undefined && def.dimension !== dimension) {
    throw new HeadflowError(
      'WRONG_DIMENSION',
      `${JSON.stringify(text)} is a ${def.dimension}, but a ${dimension} is expected.`,
      { parameter: 'text', value: text, unit: symbol, allowed: `a unit of ${dimension}` },
    );
  }
  if (!Number.isFinite(value)) {
    throw argumentError('INVALID_ARGUMENT', 'text', text, undefined, 'a finite number');
  }
  return q(value, symbol as Parameters<typeof q>[1]);
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

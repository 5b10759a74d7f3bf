import { argumentError, checkFinite, HeadflowError } from '../errors';
import { guardResult, guardString, kindOf } from '../guards';
import { aliasesOfDimension, aliasTarget, markedPressure, refusedUnit } from './aliases';
import {
  type DimensionOf,
  UNITS,
  type UnitDefinition,
  type UnitOf,
  type UnitSymbol,
} from './catalogue';
import type { Dimension, Quantity } from './quantity';

const hasOwn = Object.prototype.hasOwnProperty;

/** True when `symbol` is a unit in the catalogue (exact spelling). */
export function isUnit(symbol: unknown): symbol is UnitSymbol {
  return typeof symbol === 'string' && hasOwn.call(UNITS, symbol);
}

/**
 * The catalogue row of a unit, or `UNKNOWN_UNIT` naming the parameter.
 * @internal
 */
export function unitDefinition(symbol: unknown, parameter = 'unit'): UnitDefinition {
  if (!isUnit(symbol)) throw unknownUnit(symbol, parameter);
  return UNITS[symbol];
}

/** The `UNKNOWN_UNIT` error for a symbol, with "did you mean" where a unit is near. */
function unknownUnit(symbol: unknown, parameter: string): HeadflowError {
  const text = typeof symbol === 'string' ? symbol.slice(0, 60) : undefined;
  const alias = text === undefined ? undefined : aliasTarget(text.trim());
  const said =
    text === undefined
      ? 'is not a known unit.'
      : alias !== undefined
        ? `is not a unit symbol: it is an alias of ${alias}, read from text only; write ${alias} here.`
        : refusedUnit(text);
  return new HeadflowError(
    'UNKNOWN_UNIT',
    `${parameter} ${text === undefined ? kindOf(symbol) : JSON.stringify(text)} ${said} ` +
      'Units are ASCII symbols such as m, ft, gal/min, m3/h, psi, kPa, degC (see unitsOf() and aliasesOf()).',
    { parameter, value: symbol, allowed: 'a unit symbol from the catalogue' },
  );
}

/**
 * The catalogue symbol that a unit written in text stands for: a symbol, an alias
 * (`gpm`, `feet`, `deg F`), or an absolute-marked pressure unit (`psia`, `bar(a)`, since
 * `Pressure` is absolute). Gauge-marked units (`psig`) are refused here: they need an
 * atmosphere (see `parsePressure`). @internal
 */
export function resolveUnit(text: string, parameter = 'unit'): UnitSymbol {
  const s = text.trim();
  if (isUnit(s)) return s;
  const alias = aliasTarget(s);
  if (alias !== undefined) return alias;
  const marked = markedPressure(s);
  if (marked?.reference === 'absolute') return marked.symbol;
  if (marked?.reference === 'gauge') {
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `${parameter} ${JSON.stringify(s)} is a gauge pressure unit: a gauge reading needs the atmosphere it is referred to. ` +
        'Read it with parsePressure(text) and make it absolute with gaugeToAbsolute(value, atmosphere).',
      { parameter, value: s, allowed: 'an absolute or unmarked pressure unit' },
    );
  }
  throw unknownUnit(s, parameter);
}

/** Converts a value in a unit to SI, refusing impossible temperatures. */
function toSI(value: number, def: UnitDefinition, symbol: string): number {
  const result = (value + def.offset) * def.factor;
  if (def.dimension === 'temperature' && result < 0) {
    throw argumentError('OUT_OF_RANGE', 'value', value, symbol, 'at or above absolute zero (0 K)');
  }
  return guardResult('value in SI', result, 'OUT_OF_RANGE');
}

/**
 * Makes a quantity from a value and its unit: the result is the value in coherent SI, typed
 * by the unit's dimension.
 *
 * Conversion: `SI = (value + offset) x factor`, with the exact factors of NIST SP 811
 * (see {@link UNITS}). Temperatures are absolute: `q(20, 'degC')` is 293.15 K.
 *
 * @param value - a finite number in `unit`
 * @param unit - a symbol from the catalogue, for example `'ft'`, `'gal/min'`, `'psi'`
 * @returns the value in coherent SI, typed `Quantity<dimension of unit>`
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN or an infinite value, `UNKNOWN_UNIT` for a
 *   symbol not in the catalogue, `OUT_OF_RANGE` for a temperature below absolute zero.
 * @example
 * ```ts
 * const lift = q(350, 'ft'); // Length, 106.68 (m)
 * const flow = q(1200, 'gal/min'); // Flow, 0.0757082... (m3/s)
 * ```
 */
export function q<U extends UnitSymbol>(value: number, unit: U): Quantity<DimensionOf<U>> {
  const def = unitDefinition(unit);
  checkFinite('value', value, unit);
  return toSI(value, def, unit) as Quantity<DimensionOf<U>>;
}

/**
 * Reads a quantity out in a unit of its dimension. The type admits only units of the
 * quantity's dimension, so `to(length, 'psi')` does not compile.
 *
 * The brand exists only at compile time: from plain JavaScript the number carries no
 * dimension, so use {@link convert} (which knows both units) where the type checker cannot
 * help.
 *
 * @param quantity - a quantity in coherent SI
 * @param unit - the unit to read it in
 * @returns the number in `unit`
 * @throws HeadflowError `UNKNOWN_UNIT` for a symbol not in the catalogue,
 *   `INVALID_ARGUMENT` for a NaN or infinite quantity.
 * @example
 * ```ts
 * to(q(1, 'm3/h'), 'L/min'); // 16.666666666666668
 * to(q(20, 'degC'), 'degF'); // 68
 * ```
 */
export function to<D extends Dimension>(quantity: Quantity<D>, unit: UnitOf<D>): number {
  const def = unitDefinition(unit);
  checkFinite('quantity', quantity, 'SI');
  return guardResult('value', quantity / def.factor - def.offset, 'OUT_OF_RANGE');
}

/**
 * Converts a number between two units of the same dimension, checking the dimension at run
 * time (for values that come from files, forms or untyped code). Either unit may be an alias
 * (`gpm`, `feet`: see {@link aliasesOf}) or an absolute-marked pressure unit (`psia`).
 *
 * @throws HeadflowError `UNKNOWN_UNIT` (with "did you mean" for a near or ambiguous
 *   spelling), `WRONG_DIMENSION` when the units differ in dimension, `INVALID_ARGUMENT` for
 *   NaN or infinite values or a gauge-marked unit (`psig`), `OUT_OF_RANGE` below absolute zero.
 * @example
 * ```ts
 * convert(45, 'psi', 'kPa'); // 310.2640781925763
 * convert(3, 'ft', 'psi'); // throws WRONG_DIMENSION
 * ```
 */
export function convert(value: number, from: string, into: string): number {
  const a = UNITS[resolveUnit(unitText('from', from), 'from')];
  const b = UNITS[resolveUnit(unitText('into', into), 'into')];
  if (a.dimension !== b.dimension) {
    throw new HeadflowError(
      'WRONG_DIMENSION',
      `cannot convert ${from} (${a.dimension}) to ${into} (${b.dimension}).`,
      { parameter: 'into', value: into, allowed: `a unit of ${a.dimension}` },
    );
  }
  checkFinite('value', value, from);
  return guardResult('value', toSI(value, a, from) / b.factor - b.offset, 'OUT_OF_RANGE');
}

/** A unit argument as text: a string of bounded length, or `UNKNOWN_UNIT` for anything else. */
function unitText(parameter: string, unit: unknown): string {
  if (typeof unit !== 'string') throw unknownUnit(unit, parameter);
  return guardString(parameter, unit);
}

/**
 * The symbols of every unit of a dimension, SI unit first.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for a name that is not a dimension.
 * @example
 * ```ts
 * unitsOf('rotationalSpeed'); // ['rad/s', 'rpm', 'rev/s']
 * ```
 */
export function unitsOf<D extends Dimension>(dimension: D): readonly UnitOf<D>[] {
  guardString('dimension', dimension);
  const list = (Object.keys(UNITS) as UnitSymbol[]).filter(
    (u) => UNITS[u].dimension === dimension,
  ) as UnitOf<D>[];
  if (list.length === 0) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'dimension',
      dimension,
      undefined,
      DIMENSIONS.join(', '),
    );
  }
  return list;
}

/**
 * The other spellings of a dimension's units that text may use (files, `parseQuantity`,
 * `convert`), each with the catalogue symbol it stands for: `gpm` for `gal/min`, `feet` for
 * `ft`, `deg F` for `degF` ... (`q` and `to` take the symbols of {@link unitsOf}.)
 *
 * @param dimension - a dimension, for example `'flow'`
 * @returns pairs `{ alias, unit }` in catalogue order of the units; empty for a dimension
 *   without aliases
 * @throws HeadflowError `INVALID_ARGUMENT` for a name that is not a dimension.
 * @example
 * ```ts
 * aliasesOf('rotationalSpeed'); // [{ alias: 'RPM', unit: 'rpm' }]
 * ```
 */
export function aliasesOf<D extends Dimension>(
  dimension: D,
): readonly { readonly alias: string; readonly unit: UnitOf<D> }[] {
  unitsOf(dimension);
  return aliasesOfDimension(dimension);
}

/** Every dimension, in catalogue order. */
export const DIMENSIONS: readonly Dimension[] = [
  ...new Set(Object.values(UNITS).map((u) => u.dimension)),
];

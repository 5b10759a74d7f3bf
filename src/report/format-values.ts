/**
 * Number and value formatting shared by the report renderers: fixed significant digits, a
 * dash for every missing value (so no output ever shows `NaN` or `undefined`), and the check
 * of the renderers' options.
 *
 * @module
 * @internal
 */
import type { DesignReport, UnitSystem } from '../design/core';
import { guardOneOf } from '../guards';
import { type Dimension, type Quantity, to, type UnitOf } from '../units/index';
import { checkReportShape } from './report-shape';

/** What a missing value prints as. */
export const DASH = '-';

/** Most decimals a formatted number gets, however small it is. */
const MAX_DECIMALS = 6;

/**
 * A number to `digits` significant digits in fixed notation (never an exponent), trailing
 * zeros kept so that columns line up: `35.09`, `12.00`, `1189`, `0.8500`. Large numbers
 * keep all their integer digits (`123456` at 4 digits). Non-finite or missing: a dash.
 */
export function formatNumber(x: number | undefined, digits = 4): string {
  if (x === undefined || !Number.isFinite(x)) return DASH;
  // Whole numbers at or above 10^(digits - 1) keep every integer digit (no 1.235e+5).
  const rounded = Math.abs(x) >= 10 ** (digits - 1) ? Math.round(x) : Number(x.toPrecision(digits));
  // Zero keeps the decimals of its neighbours in a column (`0.000` beside `11.15`).
  if (rounded === 0) return (0).toFixed(Math.min(MAX_DECIMALS, digits - 1));
  const magnitude = Math.floor(Math.log10(Math.abs(rounded)));
  const decimals = Math.min(MAX_DECIMALS, Math.max(0, digits - 1 - magnitude));
  const text = rounded.toFixed(decimals);
  return Number(text) === 0 ? (0).toFixed(decimals) : text;
}

/** A number with a fixed count of decimals (`78.2`), or a dash. */
export function formatFixed(x: number | undefined, decimals: number): string {
  if (x === undefined || !Number.isFinite(x)) return DASH;
  const text = x.toFixed(decimals);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

/** A number rounded to an integer with thousands grouped by commas (`260,000`), or a dash. */
export function formatGrouped(x: number | undefined): string {
  if (x === undefined || !Number.isFinite(x)) return DASH;
  const rounded = Math.round(x);
  const digits = String(Math.abs(rounded)).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return rounded < 0 ? `-${digits}` : digits;
}

/** A fraction as a percentage with one decimal (`0.782` -> `78.2`), or a dash. */
export function formatPercent(fraction: number | undefined): string {
  return formatFixed(fraction === undefined ? undefined : fraction * 100, 1);
}

/** A quantity read out in a unit and formatted to `digits` significant digits, or a dash. */
export function formatIn<D extends Dimension>(
  quantity: Quantity<D> | undefined,
  unit: UnitOf<D>,
  digits = 4,
): string {
  if (quantity === undefined || !Number.isFinite(quantity)) return DASH;
  return formatNumber(to(quantity, unit), digits);
}

/** A quantity read out in a unit with a fixed count of decimals (`1480` rpm), or a dash. */
export function formatFixedIn<D extends Dimension>(
  quantity: Quantity<D> | undefined,
  unit: UnitOf<D>,
  decimals: number,
): string {
  if (quantity === undefined || !Number.isFinite(quantity)) return DASH;
  return formatFixed(to(quantity, unit), decimals);
}

/** A quantity with its unit (`35.09 m`), or a dash alone. */
export function formatWithUnit<D extends Dimension>(
  quantity: Quantity<D> | undefined,
  unit: UnitOf<D>,
  digits = 4,
): string {
  const text = formatIn(quantity, unit, digits);
  return text === DASH ? DASH : `${text} ${unit}`;
}

/** A shorter form of a number for names and nameplates: `37`, `7.5`, `0.3333`. */
export function formatShort(x: number): string {
  if (!Number.isFinite(x)) return DASH;
  const rounded = Number(x.toPrecision(4));
  return String(rounded === 0 ? 0 : rounded);
}

/** Text of one line: line breaks, tabs and other control characters become spaces. */
export function oneLine(text: string): string {
  // biome-ignore lint/suspicious/noControlCharactersInRegex: control characters are what it removes
  return String(text).replace(/\r\n|[\u0000-\u001f\u007f]/g, ' ');
}

/** Checks the unit system option and picks the report's own when there is none. */
export function chosenUnits(report: DesignReport, units: UnitSystem | undefined): UnitSystem {
  checkReportShape(report);
  if (units !== undefined) return guardOneOf('options.units', units, ['si', 'us'] as const);
  return guardOneOf('report.units', report.units ?? 'si', ['si', 'us'] as const);
}

/**
 * The one error type of headflow, its stable codes, and the small input checks every module
 * uses so that impossible input is refused the same way everywhere.
 *
 * @module
 */

/**
 * Stable error codes. Code that handles errors should switch on these, never on messages.
 *
 * - `INVALID_ARGUMENT`: a value that can never be right (NaN, Infinity, a negative diameter,
 *   an efficiency of 1.3, fewer points than a fit needs, a malformed string).
 * - `UNKNOWN_UNIT`: a unit symbol that the catalogue does not hold.
 * - `WRONG_DIMENSION`: a unit or quantity of another dimension than the one asked for.
 * - `OUT_OF_RANGE`: a possible value outside what the method or the data covers (water above
 *   its boiling point, a pipe size a standard does not list, a flow past a pump's last
 *   catalogue point).
 * - `UNKNOWN_NAME`: a name (fitting, material, schedule, fluid) that a catalogue does not hold.
 * - `NO_SOLUTION`: an equation that has no root in the admissible range (a pump that cannot
 *   reach the static head), or a solver that could not converge within its iteration cap.
 */
export type HeadflowErrorCode =
  | 'INVALID_ARGUMENT'
  | 'UNKNOWN_UNIT'
  | 'WRONG_DIMENSION'
  | 'OUT_OF_RANGE'
  | 'UNKNOWN_NAME'
  | 'NO_SOLUTION';

/** Details attached to a {@link HeadflowError}. Every field is optional. */
export interface HeadflowErrorDetails {
  /** Name of the offending parameter, as spelled in the function's signature or the file. */
  readonly parameter?: string;
  /** The offending value, in the unit named by `unit`. */
  readonly value?: unknown;
  /** Unit of `value` (an SI symbol unless stated). */
  readonly unit?: string;
  /** The allowed range or set, in words (for example `"> 0"` or `"273.15 K to 623.15 K"`). */
  readonly allowed?: string;
}

/**
 * The error thrown by every headflow function for input it cannot accept.
 *
 * @example
 * ```ts
 * try {
 *   q(Number.NaN, 'm');
 * } catch (e) {
 *   if (e instanceof HeadflowError) console.log(e.code, e.parameter); // INVALID_ARGUMENT value
 * }
 * ```
 */
export class HeadflowError extends Error {
  /** Stable machine-readable code. */
  readonly code: HeadflowErrorCode;
  /** Name of the offending parameter, when there is one. */
  readonly parameter: string | undefined;
  /** The offending value, when there is one. */
  readonly value: unknown;
  /** Unit of `value`, when it has one. */
  readonly unit: string | undefined;
  /** Allowed range or set, in words. */
  readonly allowed: string | undefined;

  /**
   * Constructs with any arguments without throwing: a missing or null `details` means none, and
   * a message or code of the wrong type is turned into a string rather than refused.
   */
  constructor(code: HeadflowErrorCode, message: string, details: HeadflowErrorDetails | null = {}) {
    super(typeof message === 'string' ? message : safeString(message));
    this.name = 'HeadflowError';
    this.code = typeof code === 'string' ? code : 'INVALID_ARGUMENT';
    const d: HeadflowErrorDetails = typeof details === 'object' && details !== null ? details : {};
    this.parameter = typeof d.parameter === 'string' ? d.parameter : undefined;
    this.value = d.value;
    this.unit = typeof d.unit === 'string' ? d.unit : undefined;
    this.allowed = typeof d.allowed === 'string' ? d.allowed : undefined;
  }
}

/** `String(x)` that cannot throw (a Symbol, a null-prototype object). */
function safeString(x: unknown): string {
  try {
    return String(x);
  } catch {
    return typeof x;
  }
}

/** Formats a value and its unit for a message: `"-3 m"`, `"NaN"`, `"'abc'"`. */
export function describeValue(value: unknown, unit?: string): string {
  if (typeof value === 'string') {
    // A huge string is named by its start and length, never copied whole into a message.
    return value.length > 60
      ? `${JSON.stringify(value.slice(0, 40))}... (${value.length} characters)`
      : JSON.stringify(value);
  }
  if (typeof value === 'number') return unit ? `${String(value)} ${unit}` : String(value);
  if (value === undefined) return 'undefined';
  if (value === null) return 'null';
  return typeof value;
}

/**
 * Builds the standard error for one parameter: `"diameter = -3 m is not allowed (allowed: > 0)"`.
 * @internal
 */
export function argumentError(
  code: HeadflowErrorCode,
  parameter: string,
  value: unknown,
  unit: string | undefined,
  allowed: string,
  hint?: string,
): HeadflowError {
  const shown = describeValue(value, unit);
  const tail = hint ? ` ${hint}` : '';
  const details: HeadflowErrorDetails =
    unit === undefined ? { parameter, value, allowed } : { parameter, value, unit, allowed };
  return new HeadflowError(
    code,
    `${parameter} = ${shown} is not allowed (allowed: ${allowed}).${tail}`,
    details,
  );
}

/**
 * Throws `INVALID_ARGUMENT` unless `value` is a finite number.
 * @internal
 */
export function checkFinite(parameter: string, value: number, unit?: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw argumentError('INVALID_ARGUMENT', parameter, value, unit, 'a finite number');
  }
}

/**
 * Throws `INVALID_ARGUMENT` unless `value` is finite and strictly positive.
 * @internal
 */
export function checkPositive(parameter: string, value: number, unit?: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw argumentError('INVALID_ARGUMENT', parameter, value, unit, 'a finite number > 0');
  }
}

/**
 * Throws `INVALID_ARGUMENT` unless `value` is finite and not negative.
 * @internal
 */
export function checkNonNegative(parameter: string, value: number, unit?: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw argumentError('INVALID_ARGUMENT', parameter, value, unit, 'a finite number >= 0');
  }
}

/**
 * Throws `INVALID_ARGUMENT` unless `value` is a fraction in (0, 1] (an efficiency, a ratio).
 * @internal
 */
export function checkFraction(parameter: string, value: number): void {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0 || value > 1) {
    throw argumentError('INVALID_ARGUMENT', parameter, value, undefined, '0 < value <= 1');
  }
}

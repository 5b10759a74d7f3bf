/**
 * The shared input guards. Every public function checks the shape of what it is given with
 * these at its entry, so that bad input is refused the same way everywhere: a
 * {@link HeadflowError} with a stable code, the parameter's name (a dotted path for nested
 * fields, `options.tolerance`, `runs[2].length`), the value and the allowed range. Never a
 * bare TypeError, never a NaN carried on, never a hang on a huge string or array.
 *
 * Inner kernels on plain numbers stay unchecked; the guards belong at the public entry.
 *
 * @module
 * @internal
 */

import { argumentError, HeadflowError, type HeadflowErrorCode } from './errors';

/** Longest string a guard accepts where no other bound is given (names, ids, unit symbols). */
export const MAX_NAME_LENGTH = 200;

/** Longest array a guard accepts where no other bound is given. */
export const MAX_ARRAY_LENGTH = 10_000_000;

/** What a value is, in words, for a message: `"null"`, `"an array"`, `"a string"`. */
export function kindOf(value: unknown): string {
  if (value === null) return 'null';
  if (value === undefined) return 'undefined';
  if (Array.isArray(value)) return 'an array';
  const t = typeof value;
  if (t === 'object') return 'an object';
  if (t === 'number') return Number.isNaN(value) ? 'NaN' : 'a number';
  return `a ${t}`;
}

function shapeError(parameter: string, value: unknown, allowed: string): HeadflowError {
  return new HeadflowError(
    'INVALID_ARGUMENT',
    `${parameter} is ${kindOf(value)}, which is not allowed (allowed: ${allowed}).`,
    { parameter, allowed },
  );
}

/**
 * Returns `value` as a finite number or throws `INVALID_ARGUMENT` (wrong type, NaN, ±Infinity).
 * @internal
 */
export function guardNumber(parameter: string, value: unknown, unit?: string): number {
  if (typeof value !== 'number') throw shapeError(parameter, value, 'a finite number');
  if (!Number.isFinite(value)) {
    throw argumentError('INVALID_ARGUMENT', parameter, value, unit, 'a finite number');
  }
  return value;
}

/**
 * Returns `value` as a finite number within `[min, max]` (either bound may be open with
 * `minOpen`/`maxOpen`), or throws `INVALID_ARGUMENT` with the range in the message.
 * @internal
 */
export function guardRange(
  parameter: string,
  value: unknown,
  range: {
    readonly min?: number;
    readonly max?: number;
    readonly minOpen?: boolean;
    readonly maxOpen?: boolean;
    readonly unit?: string;
  },
): number {
  const x = guardNumber(parameter, value, range.unit);
  const { min, max, minOpen = false, maxOpen = false, unit } = range;
  const belowMin = min !== undefined && (minOpen ? x <= min : x < min);
  const aboveMax = max !== undefined && (maxOpen ? x >= max : x > max);
  if (belowMin || aboveMax) {
    const lo = min === undefined ? '' : `${minOpen ? '>' : '>='} ${min}`;
    const hi = max === undefined ? '' : `${maxOpen ? '<' : '<='} ${max}`;
    const allowed = [lo, hi].filter((s) => s !== '').join(' and ') + (unit ? ` ${unit}` : '');
    throw argumentError('INVALID_ARGUMENT', parameter, x, unit, allowed);
  }
  return x;
}

/**
 * Returns `value` as a whole number within `[min, max]` or throws `INVALID_ARGUMENT`.
 * @internal
 */
export function guardInteger(parameter: string, value: unknown, min: number, max: number): number {
  const x = guardNumber(parameter, value);
  if (!Number.isInteger(x) || x < min || x > max) {
    throw argumentError(
      'INVALID_ARGUMENT',
      parameter,
      x,
      undefined,
      `a whole number ${min} to ${max}`,
    );
  }
  return x;
}

/**
 * Returns `value` as a string of at most `maxLength` characters (default
 * {@link MAX_NAME_LENGTH}), or throws `INVALID_ARGUMENT`. The length is checked before any
 * other work, so a huge string is refused at once.
 * @internal
 */
export function guardString(
  parameter: string,
  value: unknown,
  maxLength: number = MAX_NAME_LENGTH,
): string {
  if (typeof value !== 'string') throw shapeError(parameter, value, 'a string');
  if (value.length > maxLength) {
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `${parameter} is ${value.length} characters long (allowed: at most ${maxLength}).`,
      { parameter, allowed: `at most ${maxLength} characters` },
    );
  }
  return value;
}

/**
 * Returns `value` if it is one of `allowed` (compared with `===`), else throws
 * `INVALID_ARGUMENT` listing the choices.
 * @internal
 */
export function guardOneOf<const T extends string | number | boolean>(
  parameter: string,
  value: unknown,
  allowed: readonly T[],
): T {
  for (const a of allowed) if (value === a) return a;
  const list = allowed.map((a) => JSON.stringify(a)).join(', ');
  const shown = typeof value === 'string' ? JSON.stringify(value.slice(0, 40)) : kindOf(value);
  throw new HeadflowError(
    'INVALID_ARGUMENT',
    `${parameter} = ${shown} is not allowed (allowed: one of ${list}).`,
    { parameter, allowed: `one of ${list}` },
  );
}

/**
 * Returns `value` if it is a boolean, else throws `INVALID_ARGUMENT`.
 * @internal
 */
export function guardBoolean(parameter: string, value: unknown): boolean {
  if (typeof value !== 'boolean') throw shapeError(parameter, value, 'true or false');
  return value;
}

/**
 * Returns `value` as a record (a non-null object that is not an array or a typed array) or
 * throws `INVALID_ARGUMENT`.
 * Use for required object arguments (`system`, `pump`, `report`).
 * @internal
 */
export function guardRecord(parameter: string, value: unknown): Readonly<Record<string, unknown>> {
  if (
    typeof value !== 'object' ||
    value === null ||
    Array.isArray(value) ||
    ArrayBuffer.isView(value)
  ) {
    throw shapeError(parameter, value, 'an object');
  }
  return value as Readonly<Record<string, unknown>>;
}

/**
 * Reads an options argument: `undefined` and `null` mean "no options" and give `{}`; any other
 * non-object throws `INVALID_ARGUMENT`. The result is typed as the options type with every field
 * still to be checked by the caller (fields of a plain object may be anything at run time).
 *
 * @example
 * ```ts
 * const o = guardOptions<FrictionOptions>('options', options);
 * const method = o.method === undefined ? 'colebrook' : guardOneOf('options.method', o.method, METHODS);
 * ```
 * @internal
 */
export function guardOptions<T extends object>(
  parameter: string,
  value: T | null | undefined,
): Partial<Record<keyof T, unknown>> {
  if (value === undefined || value === null) return {};
  return guardRecord(parameter, value) as Partial<Record<keyof T, unknown>>;
}

/**
 * Returns field `key` of `record` if it is present (not `undefined`), else throws
 * `INVALID_ARGUMENT` naming `parameter.key`.
 * @internal
 */
export function guardField(
  parameter: string,
  record: Readonly<Record<string, unknown>>,
  key: string,
): unknown {
  const v = Object.hasOwn(record, key) || key in record ? record[key] : undefined;
  if (v === undefined) {
    throw new HeadflowError('INVALID_ARGUMENT', `${parameter}.${key} is missing.`, {
      parameter: `${parameter}.${key}`,
      allowed: 'present',
    });
  }
  return v;
}

/**
 * Returns `value` as a dense array whose length lies in `[min, max]` (defaults 0 and
 * {@link MAX_ARRAY_LENGTH}), or throws `INVALID_ARGUMENT`. Holes (sparse arrays) are refused:
 * they read as `undefined` and would otherwise surface deep inside a computation.
 * @internal
 */
export function guardArray(
  parameter: string,
  value: unknown,
  bounds: { readonly min?: number; readonly max?: number } = {},
): readonly unknown[] {
  if (!Array.isArray(value)) throw shapeError(parameter, value, 'an array');
  const min = bounds.min ?? 0;
  const max = bounds.max ?? MAX_ARRAY_LENGTH;
  if (value.length < min || value.length > max) {
    const allowed = `${min} to ${max} items`;
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `${parameter} has ${value.length} items (allowed: ${allowed}).`,
      { parameter, value: value.length, allowed },
    );
  }
  // An own `constructor` or iterator changes what map, slice and for-of do with the array.
  if (Object.hasOwn(value, 'constructor') || Object.hasOwn(value, Symbol.iterator)) {
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `${parameter} is an array with its own constructor or iterator, which is not allowed.`,
      { parameter, allowed: 'a plain array' },
    );
  }
  for (let i = 0; i < value.length; i++) {
    if (!(i in value)) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `${parameter}[${i}] is a hole in a sparse array.`,
        {
          parameter: `${parameter}[${i}]`,
          allowed: 'a dense array',
        },
      );
    }
  }
  return value;
}

/**
 * Returns `value` as an array of finite numbers (a plain array or a typed array) with a length
 * in `[min, max]`, or throws `INVALID_ARGUMENT` naming the first bad item.
 * @internal
 */
export function guardNumberArray(
  parameter: string,
  value: unknown,
  bounds: { readonly min?: number; readonly max?: number } = {},
): ArrayLike<number> {
  const items: ArrayLike<unknown> =
    value instanceof Float64Array || value instanceof Float32Array
      ? value
      : guardArray(parameter, value, bounds);
  if (items.length < (bounds.min ?? 0) || items.length > (bounds.max ?? MAX_ARRAY_LENGTH)) {
    const allowed = `${bounds.min ?? 0} to ${bounds.max ?? MAX_ARRAY_LENGTH} items`;
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `${parameter} has ${items.length} items (allowed: ${allowed}).`,
      { parameter, value: items.length, allowed },
    );
  }
  for (let i = 0; i < items.length; i++) guardNumber(`${parameter}[${i}]`, items[i]);
  return items as ArrayLike<number>;
}

/**
 * Returns `out` if it is a `Float64Array` with at least `length` elements, else throws
 * `INVALID_ARGUMENT`. For the array forms (`colebrookInto`, `headInto` ...).
 * @internal
 */
export function guardBuffer(parameter: string, out: unknown, length: number): Float64Array {
  if (!(out instanceof Float64Array)) throw shapeError(parameter, out, 'a Float64Array');
  if (out.length < length) {
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `${parameter} has ${out.length} elements but ${length} are needed.`,
      { parameter, value: out.length, allowed: `at least ${length} elements` },
    );
  }
  return out;
}

/**
 * Returns `value` if it is a function, else throws `INVALID_ARGUMENT`.
 * @internal
 */
export function guardFunction<F extends (...args: never[]) => unknown>(
  parameter: string,
  value: unknown,
): F {
  if (typeof value !== 'function') throw shapeError(parameter, value, 'a function');
  return value as F;
}

/**
 * Throws `NO_SOLUTION` (or the given code) or passes `value` through: the last line of defence
 * at a public exit, for a computed result that came out NaN or ±Infinity (a defect, or an input
 * combination no guard foresaw). A function that returns this never hands NaN to its caller.
 * Pass `'OUT_OF_RANGE'` where finite inputs can only overflow the floating-point range (a
 * diameter of 1e300 m, a flow coefficient of 1e-300): the inputs are possible numbers, but the
 * answer is not one.
 * @internal
 */
export function guardResult(
  what: string,
  value: number,
  code: HeadflowErrorCode = 'NO_SOLUTION',
): number {
  if (!Number.isFinite(value)) {
    const why =
      code === 'OUT_OF_RANGE'
        ? 'the inputs lie beyond the range of floating-point numbers for this formula'
        : 'the inputs lie where the method gives no finite answer';
    throw new HeadflowError(code, `${what} came out as ${String(value)}; ${why}.`, {
      parameter: what,
      value,
    });
  }
  return value;
}

import { argumentError, checkPositive } from '../errors';
import { guardArray, guardBuffer, guardRecord, guardResult } from '../guards';
import type { Length } from '../units/index';
import {
  type FittingId,
  type FittingKOptions,
  fitting,
  fittingOptions,
  kParts,
  methodFor,
} from './catalogue';
import { checkReynoldsNumber } from './validate';

/** One line of a {@link fittingSet}: a catalogue id and how many of it. */
export interface FittingCount {
  readonly id: FittingId | (string & {});
  /** Number of such fittings, a whole number >= 0; default 1. */
  readonly count?: number;
}

/**
 * The fittings of one pipe run, precomputed: `k(re) = laminar / re + turbulent`. Evaluating
 * allocates nothing.
 */
export interface FittingSet {
  /** Inside diameter of the pipe (m) that every K is referred to. */
  readonly diameter: Length;
  /** Sum of count x K1 over the set (the coefficient of 1/Re). */
  readonly laminar: number;
  /** Sum of count x (Re-independent part of K) over the set. */
  readonly turbulent: number;
  /**
   * Total K of the set at Reynolds number `re` (finite, > 0).
   * @throws HeadflowError `INVALID_ARGUMENT` for Re <= 0 or NaN.
   */
  k(re: number): number;
  /** Fills `out[i]` with `k(res[i])` and returns `out` (lengths must match). */
  kInto(res: ArrayLike<number>, out: Float64Array): Float64Array;
}

/**
 * Precomputes the total K of a set of catalogue fittings in one pipe, so that the system
 * calculation can evaluate it at every flow with one division and one addition.
 *
 * Each line is evaluated as {@link fittingK} would (same default method and options); the
 * Reynolds-independent parts are summed once here.
 *
 * @param items - catalogue ids with counts (whole numbers >= 0, default 1); an empty list
 *   gives K = 0
 * @param diameter - inside diameter of the pipe (m), finite and > 0
 * @param options - method and size diameter applied to every line, see {@link FittingKOptions}
 * @throws HeadflowError `UNKNOWN_NAME` for an unknown id; `INVALID_ARGUMENT` for a count
 *   that is not a whole number >= 0, a diameter <= 0, or a method a line has no constants for.
 * @example
 * ```ts
 * const run = fittingSet([{ id: 'elbow-90-standard', count: 4 }, { id: 'gate-valve-open', count: 2 }], q(1, 'in'));
 * run.k(1e5); // 4 x 0.708 + 2 x (0.003 + 0.037 x 4.9) = 3.2006
 * ```
 */
export function fittingSet(
  items: readonly FittingCount[],
  diameter: Length,
  options?: FittingKOptions | null,
): FittingSet {
  checkPositive('diameter', diameter, 'm');
  const o = fittingOptions(options);
  const size = o.sizeDiameter ?? diameter;
  guardArray('items', items, { max: 10_000 });
  let laminar = 0;
  let turbulent = 0;
  items.forEach((line, i) => {
    const item = guardRecord(`items[${i}]`, line);
    const entry = fitting(item['id'] as string);
    const n = item['count'] ?? 1;
    if (typeof n !== 'number' || !Number.isInteger(n) || n < 0) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `items[${i}].count`,
        n,
        undefined,
        'a whole number >= 0',
      );
    }
    const parts = kParts(entry, methodFor(entry, o.method), size);
    laminar += n * parts.laminar;
    turbulent += n * parts.turbulent;
  });
  guardResult('K', laminar + turbulent, 'OUT_OF_RANGE');
  const k = (re: number): number => {
    checkReynoldsNumber(re);
    return guardResult('K', laminar / re + turbulent, 'OUT_OF_RANGE');
  };
  return {
    diameter,
    laminar,
    turbulent,
    k,
    kInto: (res: ArrayLike<number>, out: Float64Array): Float64Array => {
      if (!(res instanceof Float64Array)) guardArray('re', res);
      guardBuffer('out', out, 0);
      if (out.length !== res.length) {
        throw argumentError('INVALID_ARGUMENT', 'out', out.length, 'elements', `${res.length}`);
      }
      for (let i = 0; i < res.length; i++) out[i] = k(res[i] as number);
      return out;
    },
  };
}

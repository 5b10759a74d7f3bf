/**
 * The catalogue of fittings by plain trade description, and the K that follows from an
 * entry's published constants at a Reynolds number and pipe size.
 *
 * @module
 */
import { argumentError, checkPositive, type HeadflowError } from '../errors';
import { guardOneOf, guardOptions, guardResult, guardString, MAX_NAME_LENGTH } from '../guards';
import type { Length } from '../units/index';
import { FITTINGS, type FittingId } from './catalogue-data';

export type { FittingId };

import { closeNames } from './names';
import { checkReynoldsNumber, METRES_PER_INCH } from './validate';

/** Constants of the 2-K method (Hooper 1981): `K = K1/Re + Kinf (1 + 1/D_in)`. */
export interface TwoKConstants {
  readonly k1: number;
  readonly kInf: number;
}

/** Constants of the 3-K method (Darby 1999/2001): `K = K1/Re + Ki (1 + Kd/D_in^0.3)`. */
export interface ThreeKConstants {
  readonly k1: number;
  readonly kInf: number;
  readonly kd: number;
}

/**
 * One catalogue entry. K is always referred to the velocity head of the pipe the fitting is
 * in. An entry has at least one of `threeK`, `twoK` or `constantK`; `sources` names the
 * document and table of each constant.
 */
export interface Fitting {
  /** Stable lowercase id, for example `'elbow-90-standard'`. */
  readonly id: string;
  /** Plain trade description, with the source table's own qualifiers. */
  readonly description: string;
  /** 2-K constants, where a source for them was in hand. */
  readonly twoK?: TwoKConstants;
  /** 3-K constants, where a source for them was in hand. */
  readonly threeK?: ThreeKConstants;
  /** A published constant K (no Reynolds-number or size dependence). */
  readonly constantK?: number;
  /** Source of every constant: document, edition, table. */
  readonly sources: readonly string[];
}

/** How {@link fittingK} evaluates an entry. */
export type FittingMethod = '3K' | '2K' | 'constant';

/** Options of {@link fittingK} and {@link fittingSet}. */
export interface FittingKOptions {
  /**
   * Method to use. Default: `'3K'` where the entry has 3-K constants, else `'2K'`, else
   * `'constant'`. Asking for a method the entry has no constants for throws.
   */
  readonly method?: FittingMethod;
  /**
   * Diameter used in the size term of the 2-K/3-K correlation, when it should differ from
   * the pipe's inside diameter (Darby correlates against the nominal size: pass
   * `q(4, 'in')` for 4 in pipe). K stays referred to the velocity head of `diameter`.
   * Default: `diameter`.
   */
  readonly sizeDiameter?: Length;
}

const BY_ID: ReadonlyMap<string, Fitting> = new Map(FITTINGS.map((f) => [f.id, f as Fitting]));
const IDS: readonly FittingId[] = Object.freeze(FITTINGS.map((f) => f.id));

/**
 * The ids of every catalogue entry, in catalogue order (elbows, bends, tees, valves,
 * entrances, exit).
 *
 * @example
 * ```ts
 * fittingIds().includes('gate-valve-open'); // true
 * ```
 */
export function fittingIds(): readonly FittingId[] {
  return IDS;
}

/**
 * The catalogue entry for `id`: description, published constants and their sources.
 *
 * Sources: 3-K constants from R. Darby, "Chemical Engineering Fluid Mechanics", 2nd ed.,
 * 2001, Table 7-3; constant K of butterfly and foot valves, entrances and exit from R. L.
 * Sanks (ed.), "Pumping Station Design", 2nd ed., 1998, Appendix B, Tables B-6 and B-7.
 *
 * @param id - a catalogue id, see {@link fittingIds}
 * @throws HeadflowError `UNKNOWN_NAME` for an id the catalogue does not hold; the message
 *   lists the closest ids.
 * @example
 * ```ts
 * fitting('gate-valve-open').threeK; // { k1: 300, kInf: 0.037, kd: 3.9 }
 * ```
 */
export function fitting(id: FittingId | (string & {})): Fitting {
  // An id longer than any name a catalogue could hold is refused at once, before any search.
  if (typeof id === 'string') guardString('id', id, MAX_NAME_LENGTH);
  const entry = typeof id === 'string' ? BY_ID.get(id) : undefined;
  if (entry === undefined) throw unknownFitting(id);
  return entry;
}

function unknownFitting(id: unknown): HeadflowError {
  const close = typeof id === 'string' ? closeNames(id, IDS) : IDS.slice(0, 5);
  return argumentError(
    'UNKNOWN_NAME',
    'id',
    id,
    undefined,
    `one of the ${IDS.length} catalogue ids (fittingIds())`,
    `Closest ids: ${close.map((x) => `'${x}'`).join(', ')}.`,
  );
}

/**
 * Reads {@link FittingKOptions}: `undefined` and `null` mean none; `sizeDiameter` must be a
 * finite length > 0 and `method` one of the three.
 * @internal
 */
export function fittingOptions(options: FittingKOptions | null | undefined): FittingKOptions {
  const o = guardOptions<FittingKOptions>('options', options);
  const out: { method?: FittingMethod; sizeDiameter?: Length } = {};
  if (o.method !== undefined) {
    out.method = guardOneOf('options.method', o.method, ['3K', '2K', 'constant'] as const);
  }
  if (o.sizeDiameter !== undefined) {
    checkPositive('sizeDiameter', o.sizeDiameter as number, 'm');
    out.sizeDiameter = o.sizeDiameter as Length;
  }
  return out;
}

/** The method fittingK uses for `entry` under `options`; throws when it has no constants. */
export function methodFor(entry: Fitting, method: FittingMethod | undefined): FittingMethod {
  if (method === undefined) {
    if (entry.threeK) return '3K';
    if (entry.twoK) return '2K';
    return 'constant';
  }
  const has =
    method === '3K'
      ? entry.threeK !== undefined
      : method === '2K'
        ? entry.twoK !== undefined
        : method === 'constant'
          ? entry.constantK !== undefined
          : false;
  if (!has) {
    const available = (['3K', '2K', 'constant'] as const).filter((m) =>
      m === '3K' ? entry.threeK : m === '2K' ? entry.twoK : entry.constantK !== undefined,
    );
    throw argumentError(
      'INVALID_ARGUMENT',
      'method',
      method,
      undefined,
      available.map((m) => `'${m}'`).join(' or '),
      `Catalogue entry '${entry.id}' has no published constants for that method here.`,
    );
  }
  return method;
}

/**
 * Splits an entry's K into `laminar / Re + turbulent` for a pipe: the two numbers
 * {@link fittingK} and {@link fittingSet} add up.
 * @internal
 */
export function kParts(
  entry: Fitting,
  method: FittingMethod,
  sizeDiameter: number,
): { laminar: number; turbulent: number } {
  const sizeInches = sizeDiameter / METRES_PER_INCH;
  if (method === '3K' && entry.threeK) {
    const { k1, kInf, kd } = entry.threeK;
    return { laminar: k1, turbulent: kInf * (1 + kd / sizeInches ** 0.3) };
  }
  if (method === '2K' && entry.twoK) {
    const { k1, kInf } = entry.twoK;
    return { laminar: k1, turbulent: kInf * (1 + 1 / sizeInches) };
  }
  return { laminar: 0, turbulent: entry.constantK ?? 0 };
}

/**
 * The loss coefficient K of a catalogue fitting at Reynolds number `re` in a pipe of inside
 * diameter `diameter`, referred to that pipe's velocity head `V^2 / (2 g)`.
 *
 * Method: 3-K (Darby) where the entry has it, else 2-K (Hooper), else the published
 * constant K; `options.method` chooses explicitly. See {@link threeK} and {@link twoK} for
 * the equations and their sources, and {@link fitting} for the entry's table. A constant K
 * does not depend on `re` or `diameter` (both are still checked).
 *
 * For many fittings evaluated at many flows, build a {@link fittingSet} once instead.
 *
 * @param id - a catalogue id, see {@link fittingIds}
 * @param re - Reynolds number of the flow in the pipe (dimensionless), finite and > 0
 * @param diameter - inside diameter of the pipe the fitting is in (m), finite and > 0
 * @param options - method and size diameter, see {@link FittingKOptions}
 * @returns K (dimensionless)
 * @throws HeadflowError `UNKNOWN_NAME` for an unknown id (with the closest ids);
 *   `INVALID_ARGUMENT` for Re <= 0, a diameter <= 0, NaN, or a method the entry has no
 *   constants for.
 * @example
 * ```ts
 * fittingK('elbow-90-standard', 1e5, q(1, 'in')); // 800/1e5 + 0.14 (1 + 4/1^0.3) = 0.708
 * fittingK('exit', 1e5, q(100, 'mm')); // 1
 * ```
 */
export function fittingK(
  id: FittingId | (string & {}),
  re: number,
  diameter: Length,
  options?: FittingKOptions | null,
): number {
  const entry = fitting(id);
  checkReynoldsNumber(re);
  checkPositive('diameter', diameter, 'm');
  const o = fittingOptions(options);
  const size = o.sizeDiameter ?? diameter;
  const { laminar, turbulent } = kParts(entry, methodFor(entry, o.method), size);
  return guardResult('fittingK', laminar / re + turbulent, 'OUT_OF_RANGE');
}

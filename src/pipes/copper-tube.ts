/**
 * Copper water tube dimensions by standard size and type (ASTM B88).
 *
 * @module
 */
import { argumentError } from '../errors';
import { COPPER_TUBE, type CopperTubeRow, type CopperTubeType } from './data/astm-b88';
import { dimensionsFromInches, listed, type PipeDimensions } from './dimensions';
import { resolveNominalSize } from './nominal-size';

const BY_SIZE = new Map<string, CopperTubeRow>(COPPER_TUBE.map((r) => [r.size, r]));
const SIZES = COPPER_TUBE.map((r) => `'${r.size}'`).join(', ');
const TYPES: readonly CopperTubeType[] = ['K', 'L', 'M'];

/** The standard sizes {@link copperTube} serves, smallest first. */
export const COPPER_TUBE_SIZES: readonly string[] = COPPER_TUBE.map((r) => r.size);

/**
 * Outside diameter, wall thickness and inside diameter of seamless copper water tube, type
 * K, L or M, per ASTM B88. The outside diameter is the standard size plus 1/8 in; the wall is
 * the nominal wall of Table 1; the inside diameter is `OD - 2 * wall`. The `schedule` field
 * of the result holds the type.
 *
 * Range: types K and L, sizes 1/4 to 6; type M, sizes 3/8, 1/2 and 3/4 to 4 except 3-1/2.
 *
 * Source: ASTM B88, Standard Specification for Seamless Copper Water Tube, Table 1
 * (inch-pound dimensions).
 *
 * @param size - standard size: trade notation (`'3/4'`, `'1-1/2'`) or a number of inches
 *   (`0.75`); DN is not used for copper tube
 * @param type - `'K'`, `'L'` or `'M'`
 * @returns the dimensions in metres, `standard: 'ASTM B88 Table 1'`
 * @throws HeadflowError `INVALID_ARGUMENT` for input that is not a size (DN included),
 *   `OUT_OF_RANGE` for a
 *   size not served or a type B88 does not list at that size (the message lists those it
 *   does), `UNKNOWN_NAME` for a type other than K, L, M.
 * @example
 * ```ts
 * const t = copperTube('1', 'L');
 * to(t.insideDiameter, 'in'); // 1.025 (1.125 - 2 x 0.050)
 * ```
 */
export function copperTube(size: string | number, type: CopperTubeType): PipeDimensions {
  const s = resolveNominalSize(size, 'size', false);
  const r = s === undefined ? undefined : BY_SIZE.get(s.nps);
  if (r === undefined) {
    throw argumentError(
      'OUT_OF_RANGE',
      'size',
      size,
      typeof size === 'number' ? 'in' : undefined,
      `a copper tube size of ASTM B88: ${SIZES}`,
    );
  }
  if (typeof type !== 'string' || !(TYPES as readonly string[]).includes(type)) {
    throw argumentError(
      'UNKNOWN_NAME',
      'type',
      type,
      undefined,
      "'K', 'L', 'M'",
      `For size ${r.size} ASTM B88 lists ${listed(r.walls)}.`,
    );
  }
  const wall = r.walls[type];
  if (wall === undefined) {
    throw argumentError(
      'OUT_OF_RANGE',
      'type',
      type,
      undefined,
      `for size ${r.size}: ${listed(r.walls)}`,
      `Type ${type} is not served for size ${r.size}.`,
    );
  }
  return dimensionsFromInches(
    r.size,
    undefined,
    type,
    r.outsideDiameterInches,
    wall,
    'nominal',
    'ASTM B88 Table 1',
  );
}

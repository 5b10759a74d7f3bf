/**
 * PVC pressure pipe dimensions by nominal size and schedule (ASTM D1785).
 *
 * @module
 */
import { argumentError } from '../errors';
import { PVC_PIPE, type PvcPipeRow, type PvcSchedule } from './data/astm-d1785';
import { dimensionsFromInches, type PipeDimensions } from './dimensions';
import { resolveNominalSize } from './nominal-size';

const BY_NPS = new Map<string, PvcPipeRow>(PVC_PIPE.map((r) => [r.nps, r]));
const SIZES = PVC_PIPE.map((r) => `'${r.nps}'`).join(', ');

/** The nominal sizes {@link pvcPipe} serves, smallest first. */
export const PVC_PIPE_SIZES: readonly string[] = PVC_PIPE.map((r) => r.nps);

/**
 * Outside diameter, wall thickness and inside diameter of PVC pipe, schedule 40 or 80, per
 * ASTM D1785. The outside diameter is the average OD of Table 1 (the same series as steel
 * pipe); the wall is the MINIMUM wall of Table 2 (`wallBasis: 'minimum'`), so the inside
 * diameter `OD - 2 * wall` is the largest the standard allows. The average wall of real pipe
 * is thicker, within the tolerance of Table 2, so the average bore is slightly smaller.
 *
 * Range: NPS 1/8 to 12 (DN 6 to 300).
 *
 * Source: ASTM D1785, Standard Specification for Poly(Vinyl Chloride) (PVC) Plastic Pipe,
 * Schedules 40, 80, and 120, Tables 1 and 2.
 *
 * @param nps - nominal size: trade notation, a number of inches or a DN (`'DN100'`)
 * @param schedule - `'40'` or `'80'`
 * @returns the dimensions in metres, `standard: 'ASTM D1785 Tables 1 and 2'`
 * @throws HeadflowError `INVALID_ARGUMENT` for input that is not a size, `OUT_OF_RANGE` for a
 *   size not served, `UNKNOWN_NAME` for a schedule other than '40' and '80'.
 * @example
 * ```ts
 * const p = pvcPipe('4', '40');
 * to(p.insideDiameter, 'in'); // 4.026 (4.500 - 2 x 0.237)
 * ```
 */
export function pvcPipe(nps: string | number, schedule: PvcSchedule): PipeDimensions {
  const size = resolveNominalSize(nps, 'nps');
  const r = size === undefined ? undefined : BY_NPS.get(size.nps);
  if (size === undefined || r === undefined) {
    throw argumentError(
      'OUT_OF_RANGE',
      'nps',
      nps,
      typeof nps === 'number' ? 'in' : undefined,
      `a PVC pipe size of ASTM D1785 served here: ${SIZES}`,
    );
  }
  if (schedule !== '40' && schedule !== '80') {
    throw argumentError(
      'UNKNOWN_NAME',
      'schedule',
      schedule,
      undefined,
      "'40', '80'",
      `For NPS ${r.nps} ASTM D1785 lists schedules '40' and '80' (and '120', not served here).`,
    );
  }
  return dimensionsFromInches(
    r.nps,
    size.dn,
    schedule,
    r.outsideDiameterInches,
    r.walls[schedule],
    'minimum',
    'ASTM D1785 Tables 1 and 2',
  );
}

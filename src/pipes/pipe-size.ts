/**
 * Steel pipe dimensions by nominal size and schedule (ASME B36.10M and B36.19M).
 *
 * @module
 */
import { argumentError } from '../errors';
import { STEEL_PIPE, type SteelPipeRow, type SteelSchedule } from './data/asme-b36';
import { dimensionsFromInches, type PipeDimensions } from './dimensions';
import { resolveNominalSize } from './nominal-size';

/** Every steel schedule designation accepted by {@link pipeSize}. */
export const STEEL_SCHEDULES: readonly SteelSchedule[] = [
  '5S',
  '10S',
  '10',
  '40',
  '40S',
  'STD',
  '80',
  '80S',
  'XS',
  '160',
  'XXS',
];

const BY_NPS = new Map<string, SteelPipeRow>(STEEL_PIPE.map((r) => [r.nps, r]));
const STEEL_SIZES = STEEL_PIPE.map((r) => `'${r.nps}'`).join(', ');

/** Schedules listed for a row, in STEEL_SCHEDULES order (object key order puts numeric keys first). */
function listed(walls: SteelPipeRow['walls']): string {
  return STEEL_SCHEDULES.filter((s) => walls[s] !== undefined)
    .map((s) => `'${s}'`)
    .join(', ');
}

function isSteelSchedule(s: unknown): s is SteelSchedule {
  return typeof s === 'string' && (STEEL_SCHEDULES as readonly string[]).includes(s);
}

/**
 * Outside diameter, wall thickness and inside diameter of wrought steel pipe (ASME B36.10M)
 * or stainless steel pipe (ASME B36.19M, the 'S' schedules) for a nominal size and schedule.
 *
 * The inside diameter is `OD - 2 * wall` with the standard's nominal wall; mill tolerance
 * (up to -12.5 % on wall) is not applied. Values are the standards' inch figures converted
 * with the exact 0.0254 m/in.
 *
 * Range: NPS 1/8 to 24 (DN 6 to 600). Schedules '5S', '10S', '10', '40', '40S', 'STD', '80',
 * '80S', 'XS', '160', 'XXS' where Table 1 of the standard lists them. Not served: 5S below
 * NPS 1/2, 40S/80S above NPS 12, 160/XXS for NPS 3-1/2, schedule 40 for NPS 22.
 *
 * Source: ASME B36.10M, Welded and Seamless Wrought Steel Pipe, Table 1; ASME B36.19M,
 * Stainless Steel Pipe, Table 1.
 *
 * @param nps - nominal size: trade notation (`'1/2'`, `'1-1/4'`, `'24'`), a number of inches
 *   (`1.25`) or a DN (`'DN50'`)
 * @param schedule - one of {@link STEEL_SCHEDULES}
 * @returns the dimensions in metres, `standard` naming B36.10M or B36.19M
 * @throws HeadflowError `INVALID_ARGUMENT` for input that is not a size at all (NaN, `'abc'`),
 *   `OUT_OF_RANGE` for a size the tables do not hold or a schedule the standard does not list
 *   for that size (the message lists the schedules it does list), `UNKNOWN_NAME` for a
 *   schedule name that is not one of {@link STEEL_SCHEDULES}.
 * @example
 * ```ts
 * const p = pipeSize('2', '40');
 * to(p.insideDiameter, 'in'); // 2.067 (2.375 - 2 x 0.154)
 * to(p.insideDiameter, 'mm'); // 52.5018
 * ```
 */
export function pipeSize(nps: string | number, schedule: SteelSchedule): PipeDimensions {
  const size = resolveNominalSize(nps, 'nps');
  const r = size === undefined ? undefined : BY_NPS.get(size.nps);
  if (size === undefined || r === undefined) {
    throw argumentError(
      'OUT_OF_RANGE',
      'nps',
      nps,
      typeof nps === 'number' ? 'in' : undefined,
      `a steel pipe size of ASME B36.10M/B36.19M: ${STEEL_SIZES} (or DN6 to DN600)`,
    );
  }
  if (!isSteelSchedule(schedule)) {
    throw argumentError(
      'UNKNOWN_NAME',
      'schedule',
      schedule,
      undefined,
      STEEL_SCHEDULES.map((s) => `'${s}'`).join(', '),
      `For NPS ${r.nps} the tables list ${listed(r.walls)}.`,
    );
  }
  const wall = r.walls[schedule];
  if (wall === undefined) {
    throw argumentError(
      'OUT_OF_RANGE',
      'schedule',
      schedule,
      undefined,
      `for NPS ${r.nps}: ${listed(r.walls)}`,
      `ASME B36.10M/B36.19M Table 1 lists no schedule ${schedule} for NPS ${r.nps}.`,
    );
  }
  const standard = schedule.endsWith('S') && schedule !== 'XS' ? 'ASME B36.19M' : 'ASME B36.10M';
  return dimensionsFromInches(
    r.nps,
    size.dn,
    schedule,
    r.outsideDiameterInches,
    wall,
    'nominal',
    `${standard} Table 1`,
  );
}

/**
 * The schedules the standards list for one nominal size, in {@link STEEL_SCHEDULES} order.
 *
 * @throws HeadflowError as {@link pipeSize} for the size.
 * @example
 * ```ts
 * steelSchedules('22'); // ['5S', '10S', '10', 'STD', '80', 'XS', '160']
 * ```
 */
export function steelSchedules(nps: string | number): readonly SteelSchedule[] {
  const size = resolveNominalSize(nps, 'nps');
  const r = size === undefined ? undefined : BY_NPS.get(size.nps);
  if (r === undefined) {
    throw argumentError(
      'OUT_OF_RANGE',
      'nps',
      nps,
      typeof nps === 'number' ? 'in' : undefined,
      `a steel pipe size of ASME B36.10M/B36.19M: ${STEEL_SIZES}`,
    );
  }
  return STEEL_SCHEDULES.filter((s) => r.walls[s] !== undefined);
}

/** The nominal sizes {@link pipeSize} serves, smallest first. */
export const STEEL_PIPE_SIZES: readonly string[] = STEEL_PIPE.map((r) => r.nps);

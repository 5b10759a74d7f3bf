/**
 * The fitting catalogue: published constants, each row with its source.
 *
 * 3-K constants: R. Darby, "Chemical Engineering Fluid Mechanics", 2nd ed., Marcel Dekker,
 * 2001, Table 7-3 "3-K constants for loss coefficients in valves and fittings" (also Darby,
 * Chem. Eng. 106(7), 1999). Values typed from that table, row by row; the table's row
 * description is kept in `description`.
 *
 * Constant K: R. L. Sanks (ed.), "Pumping Station Design", 2nd ed., Butterworth-Heinemann,
 * 1998, Appendix B, Table B-6 "Recommended energy loss coefficients, K, for flanged pipe
 * fittings" and Table B-7 "Recommended energy loss coefficients, K, for valves fully open".
 * Those tables note that K values vary by -20 % to +30 % or more, and Table B-6 suggests
 * raising K by 5 % per 25 mm below 300 mm pipe; that adjustment is not applied here.
 *
 * 2-K constants (Hooper 1981) are not listed: the source table was not in hand when the
 * catalogue was written, and no constant is typed without its source. {@link twoK} takes
 * constants from the caller.
 *
 * @internal
 */
import type { Fitting } from './catalogue';

const DARBY = 'Darby, Chemical Engineering Fluid Mechanics, 2nd ed. (2001), Table 7-3';
const SANKS_B6 = 'Sanks (ed.), Pumping Station Design, 2nd ed. (1998), Appendix B, Table B-6';
const SANKS_B7 = 'Sanks (ed.), Pumping Station Design, 2nd ed. (1998), Appendix B, Table B-7';

function d(id: string, description: string, k1: number, kInf: number, kd: number): Fitting {
  return Object.freeze({
    id,
    description,
    threeK: Object.freeze({ k1, kInf, kd }),
    sources: Object.freeze([DARBY]),
  });
}

function c<I extends string>(
  id: I,
  description: string,
  k: number,
  source: string,
): Fitting & { readonly id: I } {
  return Object.freeze({ id, description, constantK: k, sources: Object.freeze([source]) });
}

/** Every catalogue entry, in table order. */
export const FITTINGS = Object.freeze([
  // Darby Table 7-3, elbows 90 degrees
  d('elbow-90-standard', '90 degree elbow, threaded, standard (r/D = 1)', 800, 0.14, 4.0),
  d('elbow-90-long-radius', '90 degree elbow, threaded, long radius (r/D = 1.5)', 800, 0.071, 4.2),
  d('elbow-90-flanged', '90 degree elbow or bend, flanged or welded (r/D = 1)', 800, 0.091, 4.0),
  d('bend-90-r2', '90 degree bend, flanged or welded (r/D = 2)', 800, 0.056, 3.9),
  d('bend-90-r4', '90 degree bend, flanged or welded (r/D = 4)', 800, 0.066, 3.9),
  d('bend-90-r6', '90 degree bend, flanged or welded (r/D = 6)', 800, 0.075, 4.2),
  d(
    'elbow-90-mitered-1-weld',
    '90 degree mitered elbow, 1 weld (one 90 degree cut)',
    1000,
    0.27,
    4.0,
  ),
  d(
    'elbow-90-mitered-2-welds',
    '90 degree mitered elbow, 2 welds (45 degrees each)',
    800,
    0.068,
    4.1,
  ),
  d(
    'elbow-90-mitered-3-welds',
    '90 degree mitered elbow, 3 welds (30 degrees each)',
    800,
    0.035,
    4.2,
  ),
  // elbows 45 degrees
  d('elbow-45-standard', '45 degree elbow, threaded, standard (r/D = 1)', 500, 0.071, 4.2),
  d('elbow-45-long-radius', '45 degree elbow, long radius (r/D = 1.5)', 500, 0.052, 4.0),
  d('elbow-45-mitered-1-weld', '45 degree mitered elbow, 1 weld (45 degrees)', 500, 0.086, 4.0),
  d(
    'elbow-45-mitered-2-welds',
    '45 degree mitered elbow, 2 welds (22.5 degrees each)',
    500,
    0.052,
    4.0,
  ),
  // return bends 180 degrees
  d('bend-180-threaded', '180 degree close return bend, threaded (r/D = 1)', 1000, 0.23, 4.0),
  d('bend-180-flanged', '180 degree return bend, flanged (r/D = 1)', 1000, 0.12, 4.0),
  d('bend-180-long-radius', '180 degree return bend, all types (r/D = 1.5)', 1000, 0.1, 4.0),
  // tees
  d(
    'tee-through-branch',
    'tee, flow through the branch (as an elbow), threaded (r/D = 1)',
    500,
    0.274,
    4.0,
  ),
  d(
    'tee-through-branch-long-radius',
    'tee, flow through the branch, threaded (r/D = 1.5)',
    800,
    0.14,
    4.0,
  ),
  d(
    'tee-through-branch-flanged',
    'tee, flow through the branch, flanged (r/D = 1)',
    800,
    0.28,
    4.0,
  ),
  d('tee-through-branch-stub-in', 'tee, flow through a stub-in branch', 1000, 0.34, 4.0),
  d('tee-through-run', 'tee, flow through the run, threaded (r/D = 1)', 200, 0.091, 4.0),
  d('tee-through-run-flanged', 'tee, flow through the run, flanged (r/D = 1)', 150, 0.05, 4.0),
  d('tee-through-run-stub-in', 'tee, flow through the run past a stub-in branch', 100, 0, 0),
  // valves, fully open
  d(
    'angle-valve-45-open',
    'angle valve, 45 degrees, full line size (beta = 1), open',
    950,
    0.25,
    4.0,
  ),
  d(
    'angle-valve-90-open',
    'angle valve, 90 degrees, full line size (beta = 1), open',
    1000,
    0.69,
    4.0,
  ),
  d('globe-valve-open', 'globe valve, standard (beta = 1), open', 1500, 1.7, 3.6),
  d('plug-valve-branch-flow', 'plug valve, flow through the branch, open', 500, 0.41, 4.0),
  d('plug-valve-open', 'plug valve, straight through, open', 300, 0.084, 3.9),
  d('plug-valve-three-way', 'plug valve, three-way, flow through, open', 300, 0.14, 4.0),
  d('gate-valve-open', 'gate valve, standard (beta = 1), open', 300, 0.037, 3.9),
  d('ball-valve-open', 'ball valve, standard (beta = 1), open', 300, 0.015, 3.5),
  d('diaphragm-valve-open', 'diaphragm valve, dam type, open', 1000, 0.69, 4.9),
  d(
    'swing-check-valve',
    'swing check valve, fully open (the source gives V_min = 35 / sqrt(rho) ft/s, rho in lbm/ft3, to hold it open)',
    1500,
    0.46,
    4.0,
  ),
  d(
    'lift-check-valve',
    'lift check valve, fully open (the source gives V_min = 40 / sqrt(rho) ft/s, rho in lbm/ft3, to hold it open)',
    2000,
    2.85,
    3.8,
  ),
  // Sanks Table B-7, valves fully open (K referred to the approach pipe velocity)
  c('butterfly-valve-open', 'butterfly valve, 150-lb class, open', 0.35, SANKS_B7),
  c('butterfly-valve-open-class-75', 'butterfly valve, 75-lb class, open', 0.27, SANKS_B7),
  c('butterfly-valve-open-class-25', 'butterfly valve, 25-lb class, open', 0.16, SANKS_B7),
  c('foot-valve-hinged-disc', 'foot valve, hinged disc, open', 11.4, SANKS_B7),
  // Sanks Table B-6, entrances and exits
  c('entrance-sharp', 'pipe entrance from a tank, sharp-edged (flush)', 0.5, SANKS_B6),
  c('entrance-rounded', 'pipe entrance from a tank, rounded', 0.25, SANKS_B6),
  c('entrance-bellmouth', 'pipe entrance from a tank, bellmouth', 0.05, SANKS_B6),
  c('entrance-projecting', 'pipe entrance from a tank, projecting (re-entrant)', 0.8, SANKS_B6),
  c('exit', 'pipe exit into a tank (all shapes): the velocity head is lost', 1.0, SANKS_B6),
] as const);

/** Every catalogue id, as a type: lets the compiler catch a misspelt id. */
export type FittingId = (typeof FITTINGS)[number]['id'];

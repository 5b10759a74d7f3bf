/**
 * 3-K constants against R. Darby, "Chemical Engineering Fluid Mechanics", 2nd ed., Marcel
 * Dekker, 2001, Table 7-3 "3-K constants for loss coefficients in valves and fittings"
 * (K = K1/Re + Ki (1 + Kd / D^0.3), D in inches). Rows below are the table's, in its order,
 * typed from the table a second time (independently of src/losses/catalogue-data.ts).
 */
import { describe, expect, it } from 'vitest';
import { fitting, fittingIds, fittingK } from '../../src/losses';
import { q } from '../../src/units';
import { expectRelative } from '../helpers/expect';

// [catalogue id, table row, K1, Ki, Kd]
const TABLE_7_3: readonly (readonly [string, string, number, number, number])[] = [
  ['elbow-90-standard', 'Elbows 90 deg, threaded, standard (r/D = 1)', 800, 0.14, 4.0],
  ['elbow-90-long-radius', 'Elbows 90 deg, threaded, long radius (r/D = 1.5)', 800, 0.071, 4.2],
  ['elbow-90-flanged', 'Elbows 90 deg, flanged/welded/bends (r/D = 1)', 800, 0.091, 4.0],
  ['bend-90-r2', 'Elbows 90 deg, flanged/welded/bends (r/D = 2)', 800, 0.056, 3.9],
  ['bend-90-r4', 'Elbows 90 deg, flanged/welded/bends (r/D = 4)', 800, 0.066, 3.9],
  ['bend-90-r6', 'Elbows 90 deg, flanged/welded/bends (r/D = 6)', 800, 0.075, 4.2],
  ['elbow-90-mitered-1-weld', 'Elbows 90 deg, mitered, 1 weld (90 deg)', 1000, 0.27, 4.0],
  ['elbow-90-mitered-2-welds', 'Elbows 90 deg, mitered, 2 welds (45 deg)', 800, 0.068, 4.1],
  ['elbow-90-mitered-3-welds', 'Elbows 90 deg, mitered, 3 welds (30 deg)', 800, 0.035, 4.2],
  ['elbow-45-standard', 'Elbows 45 deg, threaded standard (r/D = 1)', 500, 0.071, 4.2],
  ['elbow-45-long-radius', 'Elbows 45 deg, long radius (r/D = 1.5)', 500, 0.052, 4.0],
  ['elbow-45-mitered-1-weld', 'Elbows 45 deg, mitered 1 weld (45 deg)', 500, 0.086, 4.0],
  ['elbow-45-mitered-2-welds', 'Elbows 45 deg, mitered 2 welds (22.5 deg)', 500, 0.052, 4.0],
  ['bend-180-threaded', '180 deg, threaded, close return bend (r/D = 1)', 1000, 0.23, 4.0],
  ['bend-180-flanged', '180 deg, flanged (r/D = 1)', 1000, 0.12, 4.0],
  ['bend-180-long-radius', '180 deg, all (r/D = 1.5)', 1000, 0.1, 4.0],
  ['tee-through-branch', 'Tees through-branch (as elbow), threaded (r/D = 1)', 500, 0.274, 4.0],
  ['tee-through-branch-long-radius', 'Tees through-branch, threaded (r/D = 1.5)', 800, 0.14, 4.0],
  ['tee-through-branch-flanged', 'Tees through-branch, flanged (r/D = 1)', 800, 0.28, 4.0],
  ['tee-through-branch-stub-in', 'Tees through-branch, stub-in branch', 1000, 0.34, 4.0],
  ['tee-through-run', 'Tees run through, threaded (r/D = 1)', 200, 0.091, 4.0],
  ['tee-through-run-flanged', 'Tees run through, flanged (r/D = 1)', 150, 0.05, 4.0],
  ['tee-through-run-stub-in', 'Tees run through, stub-in branch', 100, 0, 0],
  ['angle-valve-45-open', 'Valves, angle valve 45 deg, full line size, beta = 1', 950, 0.25, 4.0],
  ['angle-valve-90-open', 'Valves, angle valve 90 deg, full line size, beta = 1', 1000, 0.69, 4.0],
  ['globe-valve-open', 'Valves, globe valve, standard, beta = 1', 1500, 1.7, 3.6],
  ['plug-valve-branch-flow', 'Valves, plug valve, branch flow', 500, 0.41, 4.0],
  ['plug-valve-open', 'Valves, plug valve, straight through', 300, 0.084, 3.9],
  ['plug-valve-three-way', 'Valves, plug valve, three-way (flow through)', 300, 0.14, 4.0],
  ['gate-valve-open', 'Valves, gate valve, standard, beta = 1', 300, 0.037, 3.9],
  ['ball-valve-open', 'Valves, ball valve, standard, beta = 1', 300, 0.015, 3.5],
  ['diaphragm-valve-open', 'Valves, diaphragm, dam type', 1000, 0.69, 4.9],
  ['swing-check-valve', 'Valves, swing check, V_min = 35 [rho (lbm/ft3)]^-1/2', 1500, 0.46, 4.0],
  ['lift-check-valve', 'Valves, lift check, V_min = 40 [rho (lbm/ft3)]^-1/2', 2000, 2.85, 3.8],
];

describe('Darby (2001) Table 7-3: 3-K constants', () => {
  for (const [id, row, k1, kInf, kd] of TABLE_7_3) {
    it(`${row} -> ${id}: K1 = ${k1}, Ki = ${kInf}, Kd = ${kd}`, () => {
      expect(fitting(id).threeK).toEqual({ k1, kInf, kd });
      expect(fitting(id).sources.join(' ')).toContain('Table 7-3');
    });
  }
  it('every catalogue entry with 3-K constants is a row of the table', () => {
    const rows = new Set(TABLE_7_3.map((r) => r[0]));
    for (const id of fittingIds()) if (fitting(id).threeK) expect(rows.has(id)).toBe(true);
  });
  it('K of a table row follows the 3-K equation at 1 in and 10 in (Darby eq. for Table 7-3)', () => {
    // Standard threaded elbow, Re = 1e4: 800/1e4 + 0.14 (1 + 4.0/D^0.3).
    expectRelative(fittingK('elbow-90-standard', 1e4, q(1, 'in')), 0.08 + 0.14 * 5, 1e-14);
    expectRelative(
      fittingK('elbow-90-standard', 1e4, q(10, 'in')),
      0.08 + 0.14 * (1 + 4 / 10 ** 0.3),
      1e-14,
    );
  });
});

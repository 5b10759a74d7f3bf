/**
 * PVC pipe against ASTM D1785, Tables 1 (outside diameter) and 2 (minimum wall). Sources
 * as reproduced:
 * - "ASTM D1785 Schedule 40 / 80" table in mm with min/max OD and min/max wall, NPS 1/2 to
 *   8 (pdfcoffee.com, "astm-d1785-9"): the module's average OD must lie inside [min, max]
 *   and its minimum wall must equal the printed minimum (rounded to 0.01 mm).
 * - "PVC and CPVC Pipes - Schedule 40" (Engineering ToolBox, pdfcoffee "astm-d1785-3"):
 *   OD, minimum wall and ID = OD - 2 x min wall in inches, NPS 1/2 to 12.
 * - "PVC Pipe Data" (sd-w.com): schedule 80 minimum walls in inches, NPS 1/8 to 12.
 */
import { describe, expect, it } from 'vitest';
import { pipeSize, pvcPipe } from '../../src/pipes';
import { to } from '../../src/units';
import { expectAbsolute } from '../helpers/expect';

/** [NPS, OD min mm, OD max mm, sch 40 min wall mm, sch 80 min wall mm]. */
const MM: readonly (readonly [string, number, number, number, number])[] = [
  ['1/2', 21.24, 21.44, 2.77, 3.73],
  ['3/4', 26.57, 26.77, 2.87, 3.91],
  ['1', 33.27, 33.53, 3.38, 4.55],
  ['1-1/4', 42.03, 42.29, 3.56, 4.85],
  ['1-1/2', 48.11, 48.41, 3.68, 5.08],
  ['2', 60.17, 60.47, 3.91, 5.54],
  ['2-1/2', 72.84, 73.2, 5.16, 7.01],
  ['3', 88.7, 89.1, 5.49, 7.62],
  ['4', 114.07, 114.53, 6.02, 8.56],
  ['5', 141.05, 141.55, 6.55, 9.52],
  ['6', 168.0, 168.56, 7.11, 10.97],
  ['8', 218.7, 219.46, 8.18, 12.7],
];

/** [NPS, OD in, sch 40 min wall in, sch 40 ID in] (Engineering ToolBox). */
const SCH40_IN: readonly (readonly [string, number, number, number])[] = [
  ['1/2', 0.84, 0.109, 0.622],
  ['3/4', 1.05, 0.113, 0.824],
  ['1', 1.315, 0.133, 1.049],
  ['1-1/4', 1.66, 0.14, 1.38],
  ['1-1/2', 1.9, 0.145, 1.61],
  ['2', 2.375, 0.154, 2.067],
  ['2-1/2', 2.875, 0.203, 2.469],
  ['3', 3.5, 0.216, 3.068],
  ['4', 4.5, 0.237, 4.026],
  ['5', 5.563, 0.258, 5.047],
  ['6', 6.625, 0.28, 6.065],
  ['8', 8.625, 0.322, 7.981],
  ['10', 10.75, 0.365, 10.02],
  ['12', 12.75, 0.406, 11.938],
];

/** [NPS, sch 80 min wall in] (sd-w.com). */
const SCH80_IN: readonly (readonly [string, number])[] = [
  ['1/8', 0.095],
  ['1/4', 0.119],
  ['3/8', 0.126],
  ['1/2', 0.147],
  ['3/4', 0.154],
  ['1', 0.179],
  ['1-1/4', 0.191],
  ['1-1/2', 0.2],
  ['2', 0.218],
  ['2-1/2', 0.276],
  ['3', 0.3],
  ['3-1/2', 0.318],
  ['4', 0.337],
  ['5', 0.375],
  ['6', 0.432],
  ['8', 0.5],
  ['10', 0.593],
  ['12', 0.687],
];

describe('ASTM D1785 Tables 1 and 2 in mm', () => {
  it.each(MM)('NPS %s: OD in [%d, %d] mm, min walls %d / %d mm', (nps, lo, hi, w40, w80) => {
    const p40 = pvcPipe(nps, '40');
    const od = to(p40.outsideDiameter, 'mm');
    expect(od).toBeGreaterThanOrEqual(lo);
    expect(od).toBeLessThanOrEqual(hi);
    // Rounded to 0.01 mm, half up: 0.375 in = 9.525 mm is printed 9.52, so 0.0051 mm.
    expectAbsolute(to(p40.wallThickness, 'mm'), w40, 0.0051, `${nps} sch 40`);
    expectAbsolute(to(pvcPipe(nps, '80').wallThickness, 'mm'), w80, 0.0051, `${nps} sch 80`);
  });
});

describe('ASTM D1785 schedule 40 in inches', () => {
  it.each(SCH40_IN)('NPS %s: OD %d, wall %d, ID %d in', (nps, od, wall, id) => {
    const p = pvcPipe(nps, '40');
    expectAbsolute(to(p.outsideDiameter, 'in'), od, 1e-12, nps);
    expectAbsolute(to(p.wallThickness, 'in'), wall, 1e-12, nps);
    expectAbsolute(to(p.insideDiameter, 'in'), id, 0.0005, nps);
    expect(p.wallBasis).toBe('minimum');
  });
});

describe('ASTM D1785 schedule 80 in inches', () => {
  it.each(SCH80_IN)('NPS %s: min wall %d in', (nps, wall) => {
    expectAbsolute(to(pvcPipe(nps, '80').wallThickness, 'in'), wall, 1e-12, nps);
  });

  it('keeps the PVC figure where it differs from steel: NPS 10 is 0.593 in, steel 0.594 in', () => {
    expectAbsolute(to(pvcPipe('10', '80').wallThickness, 'in'), 0.593, 1e-12);
    expect(pvcPipe('10', '80').wallThickness).not.toBe(pipeSize('10', '80').wallThickness);
  });
});

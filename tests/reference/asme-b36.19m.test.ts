/**
 * Stainless steel pipe against ASME B36.19M, Stainless Steel Pipe, Table 1, schedules 5S,
 * 10S, 40S and 80S. Inch walls as reproduced in "Stainless Steel Welded Pipe
 * Specifications", Nominal Wall Thickness table (summitstainless.com, NPS 1/4 to 12); mm
 * walls for NPS 14 to 24 as reproduced in "Stainless steel pipe dimension as per ASTM"
 * (nandishwarsteel.com). The standard's own text (para. 1, quoted in both B36.19M
 * reproductions found) says that 10S for NPS 14-22, 40S for NPS 12 and 80S for NPS 10-12
 * differ from B36.10M; those differences are checked too.
 */
import { describe, expect, it } from 'vitest';
import { pipeSize, type SteelSchedule } from '../../src/pipes';
import { to } from '../../src/units';
import { expectAbsolute } from '../helpers/expect';

/** [NPS, OD in, 5S, 10S, 40S, 80S] in inches as printed; undefined where not printed. */
const INCH: readonly (readonly [
  string,
  number,
  number | undefined,
  number,
  number,
  number | undefined,
])[] = [
  ['1/4', 0.54, undefined, 0.065, 0.088, 0.119],
  ['3/8', 0.675, undefined, 0.065, 0.091, 0.126],
  ['1/2', 0.84, 0.065, 0.083, 0.109, 0.147],
  ['3/4', 1.05, 0.065, 0.083, 0.113, 0.154],
  ['1', 1.315, 0.065, 0.109, 0.133, 0.179],
  ['1-1/4', 1.66, 0.065, 0.109, 0.14, 0.191],
  ['1-1/2', 1.9, 0.065, 0.109, 0.145, 0.2],
  ['2', 2.375, 0.065, 0.109, 0.154, 0.218],
  ['2-1/2', 2.875, 0.083, 0.12, 0.203, 0.276],
  ['3', 3.5, 0.083, 0.12, 0.216, 0.3],
  ['3-1/2', 4.0, 0.083, 0.12, 0.226, 0.318],
  ['4', 4.5, 0.083, 0.12, 0.237, 0.337],
  ['5', 5.563, 0.109, 0.134, 0.258, 0.375],
  ['6', 6.625, 0.109, 0.134, 0.28, 0.432],
  ['8', 8.625, 0.109, 0.148, 0.322, 0.5],
  ['10', 10.75, 0.134, 0.165, 0.365, undefined], // 80S not printed in that table
  ['12', 12.75, 0.156, 0.18, 0.375, undefined],
];

/** [NPS, 5S mm, 10S mm] as printed for the large sizes; tolerance 0.0051 mm. */
const LARGE_MM: readonly (readonly [string, number, number])[] = [
  ['14', 3.96, 4.78],
  ['16', 4.19, 4.78],
  ['18', 4.19, 4.78],
  ['20', 4.78, 5.54],
  ['24', 5.54, 6.35],
];

const IN_TOL = 1e-12; // the module holds the same printed inch decimals

describe('ASME B36.19M Table 1, NPS 1/4 to 12 (inches)', () => {
  it.each(INCH)('NPS %s', (nps, od, s5, s10, s40, s80) => {
    const check = (s: SteelSchedule, w: number | undefined) => {
      if (w === undefined) return;
      const p = pipeSize(nps, s);
      expectAbsolute(to(p.outsideDiameter, 'in'), od, IN_TOL, `${nps} OD`);
      expectAbsolute(to(p.wallThickness, 'in'), w, IN_TOL, `${nps} ${s}`);
      expect(p.standard).toBe('ASME B36.19M Table 1');
    };
    check('5S', s5);
    check('10S', s10);
    check('40S', s40);
    check('80S', s80);
  });
});

describe('ASME B36.19M Table 1, NPS 14 to 24 (mm)', () => {
  it.each(LARGE_MM)('NPS %s: 5S %d mm, 10S %d mm', (nps, s5, s10) => {
    expectAbsolute(to(pipeSize(nps, '5S').wallThickness, 'mm'), s5, 0.0051, `${nps} 5S`);
    expectAbsolute(to(pipeSize(nps, '10S').wallThickness, 'mm'), s10, 0.0051, `${nps} 10S`);
  });
});

describe('ASME B36.19M para. 1: where S schedules differ from B36.10M', () => {
  it('10S differs from schedule 10 for NPS 14 to 22 and equals it for NPS 24 and below 14', () => {
    for (const n of ['14', '16', '18', '20', '22']) {
      expect(pipeSize(n, '10S').wallThickness).not.toBe(pipeSize(n, '10').wallThickness);
    }
    for (const n of ['1/8', '2', '12', '24']) {
      expect(pipeSize(n, '10S').wallThickness).toBe(pipeSize(n, '10').wallThickness);
    }
  });

  it('40S differs from 40 only at NPS 12; 80S differs from 80 only at NPS 10 and 12', () => {
    expect(to(pipeSize('12', '40S').wallThickness, 'in')).toBeCloseTo(0.375, 12);
    expect(to(pipeSize('12', '40').wallThickness, 'in')).toBeCloseTo(0.406, 12);
    expect(to(pipeSize('10', '80S').wallThickness, 'in')).toBeCloseTo(0.5, 12);
    expect(to(pipeSize('10', '80').wallThickness, 'in')).toBeCloseTo(0.594, 12);
    expect(to(pipeSize('12', '80S').wallThickness, 'in')).toBeCloseTo(0.5, 12);
    for (const n of ['1/8', '1', '4', '8', '10']) {
      expect(pipeSize(n, '40S').wallThickness).toBe(pipeSize(n, '40').wallThickness);
    }
    for (const n of ['1/8', '1', '4', '8']) {
      expect(pipeSize(n, '80S').wallThickness).toBe(pipeSize(n, '80').wallThickness);
    }
  });
});

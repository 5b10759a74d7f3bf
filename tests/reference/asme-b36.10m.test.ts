/**
 * Steel pipe against ASME B36.10M, Welded and Seamless Wrought Steel Pipe, Table 1 (NPS,
 * DN, OD in inches and mm, wall in inches and mm by schedule). The standard prints each
 * dimension in both units; the mm figures (rounded to 0.1 mm for OD, 0.01 mm for walls) are
 * an independent check of the inch figures the module holds. The mm values below are as
 * reproduced in the published charts "Standard Pipe Schedule ... according to ASME B36.10M
 * and ASME B 36.19 in mm" (tubingchina.com, pipe-schedules) and "Pipe Schedule Chart"
 * (dsstainlesssteel.com); the inside diameters in inches are those of the chart "ASME/ANSI
 * B36.10/19 steel pipe data" (studylib doc 27126263), which prints ID = OD - 2t.
 */
import { describe, expect, it } from 'vitest';
import { pipeSize, type SteelSchedule } from '../../src/pipes';
import { to } from '../../src/units';
import { expectAbsolute } from '../helpers/expect';

/** [NPS, DN, OD mm as printed]. Tolerance 0.0501 mm: the print rounds to 0.1 mm, halves up (10.750 in = 273.05 mm is printed 273.1). */
const OD_MM: readonly (readonly [string, number, number])[] = [
  ['1/8', 6, 10.3],
  ['1/4', 8, 13.7],
  ['3/8', 10, 17.1],
  ['1/2', 15, 21.3],
  ['3/4', 20, 26.7],
  ['1', 25, 33.4],
  ['1-1/4', 32, 42.2],
  ['1-1/2', 40, 48.3],
  ['2', 50, 60.3],
  ['2-1/2', 65, 73.0],
  ['3', 80, 88.9],
  ['3-1/2', 90, 101.6],
  ['4', 100, 114.3],
  ['5', 125, 141.3],
  ['6', 150, 168.3],
  ['8', 200, 219.1],
  ['10', 250, 273.1],
  ['12', 300, 323.9],
  ['14', 350, 355.6],
  ['16', 400, 406.4],
  ['18', 450, 457.2],
  ['20', 500, 508.0],
  ['22', 550, 558.8],
  ['24', 600, 609.6],
];

/**
 * [NPS, schedule, wall mm as printed]. Tolerance 0.0051 mm: the print rounds to 0.01 mm
 * (0.005 mm) and B36.10M converts its inch walls, so the inch wall x 25.4 must round to it.
 */
const WALL_MM: readonly (readonly [string, SteelSchedule, number])[] = [
  ['1/8', '10', 1.24], // tubingchina SCH10
  ['1/8', '40', 1.73],
  ['1/8', '80', 2.41],
  ['1/2', '160', 4.78],
  ['1/2', 'XXS', 7.47],
  ['3/4', 'XXS', 7.82],
  ['1', '160', 6.35],
  ['2', '10', 2.77],
  ['2', '40', 3.91],
  ['2', '80', 5.54],
  ['2', '160', 8.74],
  ['2', 'XXS', 11.07],
  ['2-1/2', 'XXS', 14.02],
  ['3', '160', 11.13],
  ['3', 'XXS', 15.24],
  ['3-1/2', '40', 5.74],
  ['3-1/2', '80', 8.08],
  ['4', '10', 3.05],
  ['4', '160', 13.49],
  ['4', 'XXS', 17.12],
  ['5', '160', 15.88],
  ['6', '80', 10.97],
  ['6', '160', 18.26],
  ['6', 'XXS', 21.95],
  ['8', '40', 8.18],
  ['8', '160', 23.01],
  ['8', 'XXS', 22.23],
  ['10', '40', 9.27],
  ['10', '80', 15.09],
  ['10', '160', 28.58],
  ['10', 'XXS', 25.4],
  ['12', '40', 10.31],
  ['12', 'STD', 9.53],
  ['12', '80', 17.48],
  ['12', 'XS', 12.7],
  ['12', '160', 33.32],
  ['14', '10', 6.35], // dsstainlesssteel row 14
  ['14', '40', 11.13],
  ['14', '80', 19.05],
  ['14', '160', 35.71],
  ['16', '40', 12.7],
  ['16', '80', 21.44],
  ['16', '160', 40.49],
  ['18', '40', 14.27],
  ['18', '80', 23.83],
  ['18', '160', 45.24],
  ['20', '40', 15.09],
  ['20', '80', 26.19],
  ['20', '160', 50.01],
  ['22', '80', 28.58],
  ['22', '160', 53.98],
  ['22', 'STD', 9.53],
  ['24', '10', 6.35],
  ['24', '40', 17.48],
  ['24', '80', 30.96],
  ['24', '160', 59.54],
];

/** [NPS, schedule, ID in inches as printed in the studylib chart]; tolerance 0.0005 in. */
const ID_IN: readonly (readonly [string, SteelSchedule, number])[] = [
  ['1/8', '40', 0.269],
  ['1/8', '80', 0.215],
  ['1/4', '40', 0.364],
  ['1/4', '80', 0.302],
  ['3/8', '40', 0.493],
  ['3/8', '80', 0.423],
  ['4', '40', 4.026], // chart text: 4 in schedule 40, bore 4.026 in (102.26 mm)
  ['4', '80', 3.826], // chart text: 4 in schedule 80, bore 3.826 in (97.18 mm)
];

describe('ASME B36.10M Table 1: OD in mm and DN', () => {
  it.each(OD_MM)('NPS %s = DN %d, OD %d mm', (nps, dn, mm) => {
    const p = pipeSize(nps, 'STD');
    expect(p.dn).toBe(dn);
    expectAbsolute(to(p.outsideDiameter, 'mm'), mm, 0.0501, `NPS ${nps}`);
  });
});

describe('ASME B36.10M Table 1: walls in mm', () => {
  it.each(WALL_MM)('NPS %s schedule %s: %d mm', (nps, schedule, mm) => {
    expectAbsolute(
      to(pipeSize(nps, schedule).wallThickness, 'mm'),
      mm,
      0.0051,
      `${nps} ${schedule}`,
    );
  });
});

describe('ASME B36.10M: the one mm figure that is not the rounded inch figure', () => {
  it('NPS 1-1/2 XXS: 0.400 in holds; the mm column prints 10.15 (0.400 x 25.4 = 10.16)', () => {
    // Both reproductions print 10.15 mm. The module keeps the inch figure, which is the
    // unit this module stores; the 0.01 mm difference is recorded here.
    expectAbsolute(to(pipeSize('1-1/2', 'XXS').wallThickness, 'in'), 0.4, 1e-12);
    expectAbsolute(to(pipeSize('1-1/2', 'XXS').wallThickness, 'mm'), 10.15, 0.0101);
  });
});

describe('ASME B36.10M: published inside diameters', () => {
  it.each(ID_IN)('NPS %s schedule %s: ID %d in', (nps, schedule, id) => {
    expectAbsolute(
      to(pipeSize(nps, schedule).insideDiameter, 'in'),
      id,
      0.0005,
      `${nps} ${schedule}`,
    );
  });

  it('NPS 2 schedule 40: ID 2.067 in = 52.5018 mm (the doc-comment example)', () => {
    // 2.375 - 2 x 0.154 = 2.067 in (ASME B36.10M Table 1 inch figures); x 25.4 exactly.
    expectAbsolute(to(pipeSize('2', '40').insideDiameter, 'in'), 2.067, 1e-12);
    expectAbsolute(to(pipeSize('2', '40').insideDiameter, 'mm'), 52.5018, 1e-9);
  });
});

/**
 * PVC pressure pipe, typed in from ASTM D1785 (Standard Specification for Poly(Vinyl
 * Chloride) (PVC) Plastic Pipe, Schedules 40, 80, and 120): average outside diameter
 * (Table 1) and MINIMUM wall thickness (Table 2) for schedules 40 and 80, inches as printed.
 * Not generated.
 *
 * NPS 1/8 to 12. Sizes 14 to 24 are left out: reproductions disagree on the last digit of
 * some walls (0.437 against 0.438 for NPS 14 schedule 40). Checked against the reproductions
 * named in tests/reference/astm-d1785.test.ts.
 *
 * @module
 */

/** PVC schedules served. */
export type PvcSchedule = '40' | '80';

/** One size: average outside diameter (in) and minimum walls (in) by schedule. */
export interface PvcPipeRow {
  readonly nps: string;
  readonly outsideDiameterInches: number;
  readonly walls: Readonly<Record<PvcSchedule, number>>;
}

const row = (nps: string, od: number, w40: number, w80: number): PvcPipeRow => ({
  nps,
  outsideDiameterInches: od,
  walls: { '40': w40, '80': w80 },
});

export const PVC_PIPE: readonly PvcPipeRow[] = [
  row('1/8', 0.405, 0.068, 0.095),
  row('1/4', 0.54, 0.088, 0.119),
  row('3/8', 0.675, 0.091, 0.126),
  row('1/2', 0.84, 0.109, 0.147),
  row('3/4', 1.05, 0.113, 0.154),
  row('1', 1.315, 0.133, 0.179),
  row('1-1/4', 1.66, 0.14, 0.191),
  row('1-1/2', 1.9, 0.145, 0.2),
  row('2', 2.375, 0.154, 0.218),
  row('2-1/2', 2.875, 0.203, 0.276),
  row('3', 3.5, 0.216, 0.3),
  row('3-1/2', 4.0, 0.226, 0.318),
  row('4', 4.5, 0.237, 0.337),
  row('5', 5.563, 0.258, 0.375),
  row('6', 6.625, 0.28, 0.432),
  row('8', 8.625, 0.322, 0.5),
  row('10', 10.75, 0.365, 0.593),
  row('12', 12.75, 0.406, 0.687),
];

/**
 * Wrought steel pipe dimensions, typed in from ASME B36.10M (Welded and Seamless Wrought
 * Steel Pipe, Table 1) for schedules 10, 40, STD, 80, XS, 160 and XXS, and ASME B36.19M
 * (Stainless Steel Pipe, Table 1) for schedules 5S, 10S, 40S and 80S. Inches, as printed
 * (outside diameter and nominal wall thickness). Not generated.
 *
 * Every value was checked against at least two published reproductions of these tables
 * (named in tests/reference/asme-b36.10m.test.ts). Left out on purpose, because the sources
 * disagree or the standards' editions differ: 5S for NPS 1/8 to 3/8; 40S and 80S for NPS 14
 * to 24; schedule 160 and XXS for NPS 3-1/2. B36.10M lists no schedule 40 for NPS 22.
 *
 * @module
 */

/** Wall designations this module serves. */
export type SteelSchedule =
  | '5S'
  | '10S'
  | '10'
  | '40'
  | '40S'
  | 'STD'
  | '80'
  | '80S'
  | 'XS'
  | '160'
  | 'XXS';

/** One size: NPS, outside diameter (in) and nominal walls (in) by designation. */
export interface SteelPipeRow {
  readonly nps: string;
  readonly outsideDiameterInches: number;
  readonly walls: Readonly<Partial<Record<SteelSchedule, number>>>;
}

const row = (
  nps: string,
  outsideDiameterInches: number,
  walls: Partial<Record<SteelSchedule, number>>,
): SteelPipeRow => ({ nps, outsideDiameterInches, walls });

/** Walls that are the same under schedule 40, 40S and STD, and under 80, 80S and XS. */
const same = (w40: number, w80: number) => ({
  '40': w40,
  '40S': w40,
  STD: w40,
  '80': w80,
  '80S': w80,
  XS: w80,
});

export const STEEL_PIPE: readonly SteelPipeRow[] = [
  row('1/8', 0.405, { '10S': 0.049, '10': 0.049, ...same(0.068, 0.095) }),
  row('1/4', 0.54, { '10S': 0.065, '10': 0.065, ...same(0.088, 0.119) }),
  row('3/8', 0.675, { '10S': 0.065, '10': 0.065, ...same(0.091, 0.126) }),
  row('1/2', 0.84, {
    '5S': 0.065,
    '10S': 0.083,
    '10': 0.083,
    ...same(0.109, 0.147),
    '160': 0.188,
    XXS: 0.294,
  }),
  row('3/4', 1.05, {
    '5S': 0.065,
    '10S': 0.083,
    '10': 0.083,
    ...same(0.113, 0.154),
    '160': 0.219,
    XXS: 0.308,
  }),
  row('1', 1.315, {
    '5S': 0.065,
    '10S': 0.109,
    '10': 0.109,
    ...same(0.133, 0.179),
    '160': 0.25,
    XXS: 0.358,
  }),
  row('1-1/4', 1.66, {
    '5S': 0.065,
    '10S': 0.109,
    '10': 0.109,
    ...same(0.14, 0.191),
    '160': 0.25,
    XXS: 0.382,
  }),
  row('1-1/2', 1.9, {
    '5S': 0.065,
    '10S': 0.109,
    '10': 0.109,
    ...same(0.145, 0.2),
    '160': 0.281,
    XXS: 0.4,
  }),
  row('2', 2.375, {
    '5S': 0.065,
    '10S': 0.109,
    '10': 0.109,
    ...same(0.154, 0.218),
    '160': 0.344,
    XXS: 0.436,
  }),
  row('2-1/2', 2.875, {
    '5S': 0.083,
    '10S': 0.12,
    '10': 0.12,
    ...same(0.203, 0.276),
    '160': 0.375,
    XXS: 0.552,
  }),
  row('3', 3.5, {
    '5S': 0.083,
    '10S': 0.12,
    '10': 0.12,
    ...same(0.216, 0.3),
    '160': 0.438,
    XXS: 0.6,
  }),
  row('3-1/2', 4.0, { '5S': 0.083, '10S': 0.12, '10': 0.12, ...same(0.226, 0.318) }),
  row('4', 4.5, {
    '5S': 0.083,
    '10S': 0.12,
    '10': 0.12,
    ...same(0.237, 0.337),
    '160': 0.531,
    XXS: 0.674,
  }),
  row('5', 5.563, {
    '5S': 0.109,
    '10S': 0.134,
    '10': 0.134,
    ...same(0.258, 0.375),
    '160': 0.625,
    XXS: 0.75,
  }),
  row('6', 6.625, {
    '5S': 0.109,
    '10S': 0.134,
    '10': 0.134,
    ...same(0.28, 0.432),
    '160': 0.719,
    XXS: 0.864,
  }),
  row('8', 8.625, {
    '5S': 0.109,
    '10S': 0.148,
    '10': 0.148,
    ...same(0.322, 0.5),
    '160': 0.906,
    XXS: 0.875,
  }),
  row('10', 10.75, {
    '5S': 0.134,
    '10S': 0.165,
    '10': 0.165,
    '40': 0.365,
    '40S': 0.365,
    STD: 0.365,
    '80': 0.594,
    '80S': 0.5,
    XS: 0.5,
    '160': 1.125,
    XXS: 1.0,
  }),
  row('12', 12.75, {
    '5S': 0.156,
    '10S': 0.18,
    '10': 0.18,
    '40': 0.406,
    '40S': 0.375,
    STD: 0.375,
    '80': 0.688,
    '80S': 0.5,
    XS: 0.5,
    '160': 1.312,
    XXS: 1.0,
  }),
  row('14', 14.0, {
    '5S': 0.156,
    '10S': 0.188,
    '10': 0.25,
    '40': 0.438,
    STD: 0.375,
    '80': 0.75,
    XS: 0.5,
    '160': 1.406,
  }),
  row('16', 16.0, {
    '5S': 0.165,
    '10S': 0.188,
    '10': 0.25,
    '40': 0.5,
    STD: 0.375,
    '80': 0.844,
    XS: 0.5,
    '160': 1.594,
  }),
  row('18', 18.0, {
    '5S': 0.165,
    '10S': 0.188,
    '10': 0.25,
    '40': 0.562,
    STD: 0.375,
    '80': 0.938,
    XS: 0.5,
    '160': 1.781,
  }),
  row('20', 20.0, {
    '5S': 0.188,
    '10S': 0.218,
    '10': 0.25,
    '40': 0.594,
    STD: 0.375,
    '80': 1.031,
    XS: 0.5,
    '160': 1.969,
  }),
  row('22', 22.0, {
    '5S': 0.188,
    '10S': 0.218,
    '10': 0.25,
    STD: 0.375,
    '80': 1.125,
    XS: 0.5,
    '160': 2.125,
  }),
  row('24', 24.0, {
    '5S': 0.218,
    '10S': 0.25,
    '10': 0.25,
    '40': 0.688,
    STD: 0.375,
    '80': 1.219,
    XS: 0.5,
    '160': 2.344,
  }),
];

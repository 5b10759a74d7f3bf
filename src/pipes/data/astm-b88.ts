/**
 * Seamless copper water tube, typed in from ASTM B88 (Standard Specification for Seamless
 * Copper Water Tube, Table 1, inch-pound sizes): outside diameter and nominal wall thickness
 * in inches, as printed. Not generated.
 *
 * Types K and L from NPS-style standard size 1/4 to 6; type M from 3/8 to 4 without 3-1/2
 * (type M 3-1/2, 5 and 6 are left out: only one reproduction of them was found). Checked
 * against the Copper Development Association's Copper Tube Handbook, Table 14.2f, and other
 * reproductions named in tests/reference/astm-b88.test.ts.
 *
 * @module
 */

/** Copper water tube types of ASTM B88, thickest wall first. */
export type CopperTubeType = 'K' | 'L' | 'M';

/** One standard size: outside diameter (in) and nominal walls (in) by type. */
export interface CopperTubeRow {
  readonly size: string;
  readonly outsideDiameterInches: number;
  readonly walls: Readonly<Partial<Record<CopperTubeType, number>>>;
}

export const COPPER_TUBE: readonly CopperTubeRow[] = [
  { size: '1/4', outsideDiameterInches: 0.375, walls: { K: 0.035, L: 0.03 } },
  { size: '3/8', outsideDiameterInches: 0.5, walls: { K: 0.049, L: 0.035, M: 0.025 } },
  { size: '1/2', outsideDiameterInches: 0.625, walls: { K: 0.049, L: 0.04, M: 0.028 } },
  { size: '5/8', outsideDiameterInches: 0.75, walls: { K: 0.049, L: 0.042 } },
  { size: '3/4', outsideDiameterInches: 0.875, walls: { K: 0.065, L: 0.045, M: 0.032 } },
  { size: '1', outsideDiameterInches: 1.125, walls: { K: 0.065, L: 0.05, M: 0.035 } },
  { size: '1-1/4', outsideDiameterInches: 1.375, walls: { K: 0.065, L: 0.055, M: 0.042 } },
  { size: '1-1/2', outsideDiameterInches: 1.625, walls: { K: 0.072, L: 0.06, M: 0.049 } },
  { size: '2', outsideDiameterInches: 2.125, walls: { K: 0.083, L: 0.07, M: 0.058 } },
  { size: '2-1/2', outsideDiameterInches: 2.625, walls: { K: 0.095, L: 0.08, M: 0.065 } },
  { size: '3', outsideDiameterInches: 3.125, walls: { K: 0.109, L: 0.09, M: 0.072 } },
  { size: '3-1/2', outsideDiameterInches: 3.625, walls: { K: 0.12, L: 0.1 } },
  { size: '4', outsideDiameterInches: 4.125, walls: { K: 0.134, L: 0.11, M: 0.095 } },
  { size: '5', outsideDiameterInches: 5.125, walls: { K: 0.16, L: 0.125 } },
  { size: '6', outsideDiameterInches: 6.125, walls: { K: 0.192, L: 0.14 } },
];

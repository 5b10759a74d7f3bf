/**
 * IAPWS-IF97 verification tables: IAPWS R7-97(2012), "Revised Release on the IAPWS Industrial
 * Formulation 1997 for the Thermodynamic Properties of Water and Steam".
 * - Table 5: properties from the region 1 basic equation, Eq. (7), at three (T, p).
 * - Table 35: saturation pressures from Eq. (30). Table 36: saturation temperatures from Eq. (31).
 * The release prints nine significant digits (0.ddddddddd x 10^e); each check is to half a
 * unit in the ninth printed digit, that is, the computed value rounds to the printed one.
 */
import { describe, it } from 'vitest';
import { region1Properties } from '../../src/fluids/if97-region1';
import {
  waterDensity,
  waterSaturationPressure,
  waterSaturationTemperature,
  waterSpecificHeat,
  waterSpeedOfSound,
} from '../../src/fluids/index';
import type { Pressure, Temperature } from '../../src/units';
import { expectAbsolute } from '../helpers/expect';

/** Half a unit in the 9th significant digit of a value printed as 0.ddddddddd x 10^e. */
function halfUnit(printed: number): number {
  const e = Math.floor(Math.log10(Math.abs(printed))) + 1; // printed = 0.d... x 10^e
  return 0.5 * 10 ** (e - 9);
}

describe('IAPWS-IF97 Table 5: region 1, Eq. (7)', () => {
  // [T K, p MPa, v m3/kg, h kJ/kg, u kJ/kg, s kJ/(kg K), cp kJ/(kg K), w m/s]
  const rows = [
    [
      300, 3, 0.100215168e-2, 0.115331273e3, 0.112324818e3, 0.392294792, 0.417301218e1,
      0.150773921e4,
    ],
    [
      300, 80, 0.971180894e-3, 0.184142828e3, 0.106448356e3, 0.368563852, 0.401008987e1,
      0.163469054e4,
    ],
    [
      500, 3, 0.1202418e-2, 0.975542239e3, 0.971934985e3, 0.258041912e1, 0.465580682e1,
      0.124071337e4,
    ],
  ] as const;
  for (const [t, p, v, h, u, s, cp, w] of rows) {
    it(`T = ${t} K, p = ${p} MPa: v, h, u, s, cp, w to the nine printed digits`, () => {
      const r = region1Properties(t, p * 1e6);
      const at = `T=${t} K p=${p} MPa`;
      expectAbsolute(r.v, v, halfUnit(v), `${at} v`);
      expectAbsolute(r.h / 1e3, h, halfUnit(h), `${at} h`);
      expectAbsolute(r.u / 1e3, u, halfUnit(u), `${at} u`);
      expectAbsolute(r.s / 1e3, s, halfUnit(s), `${at} s`);
      expectAbsolute(r.cp / 1e3, cp, halfUnit(cp), `${at} cp`);
      expectAbsolute(r.w, w, halfUnit(w), `${at} w`);
    });
    it(`T = ${t} K, p = ${p} MPa: public waterSpeedOfSound and waterSpecificHeat to the printed digits`, () => {
      const at = `T=${t} K p=${p} MPa`;
      const tk = t as Temperature;
      const pa = (p * 1e6) as Pressure;
      expectAbsolute(waterSpeedOfSound(tk, pa), w, halfUnit(w), `${at} w`);
      expectAbsolute(waterSpecificHeat(tk, pa) / 1e3, cp, halfUnit(cp), `${at} cp`);
    });
    it(`T = ${t} K, p = ${p} MPa: public waterDensity is 1 / v to the printed digits`, () => {
      const rho = waterDensity(t as Temperature, (p * 1e6) as Pressure);
      expectAbsolute(1 / rho, v, halfUnit(v), `T=${t} K p=${p} MPa 1/rho`);
    });
  }
});

describe('IAPWS-IF97 Table 35: saturation pressure, Eq. (30)', () => {
  const rows = [
    [300, 0.353658941e-2],
    [500, 0.263889776e1],
    [600, 0.123443146e2],
  ] as const;
  for (const [t, ps] of rows) {
    it(`p_s(${t} K) = ${ps} MPa`, () => {
      const got = waterSaturationPressure(t as Temperature) / 1e6;
      expectAbsolute(got, ps, halfUnit(ps), `T=${t} K`);
    });
  }
});

describe('IAPWS-IF97 Table 36: saturation temperature, Eq. (31)', () => {
  const rows = [
    [0.1, 0.372755919e3],
    [1, 0.453035632e3],
    [10, 0.584149488e3],
  ] as const;
  for (const [p, ts] of rows) {
    it(`T_s(${p} MPa) = ${ts} K`, () => {
      const got = waterSaturationTemperature((p * 1e6) as Pressure);
      expectAbsolute(got, ts, halfUnit(ts), `p=${p} MPa`);
    });
  }
});

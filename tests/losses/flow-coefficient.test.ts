import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { waterDensity } from '../../src/fluids';
import {
  CV_CONSTANT,
  CV_WATER_DENSITY,
  cvFromK,
  KV_CONSTANT,
  KV_WATER_DENSITY,
  kFromCv,
  kFromKv,
  kvFromK,
} from '../../src/losses';
import { type Length, q } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

describe('constants', () => {
  it('Cv constant equals pi^2 psi / (8 rho gpm^2) evaluated in 40 digits', () => {
    Decimal.set({ precision: 40 });
    const inch = new Decimal('0.0254');
    const psi = new Decimal('0.45359237').mul('9.80665').div(inch.pow(2));
    const gpm = inch.pow(3).mul(231).div(60);
    const pi = Decimal.acos(-1);
    const cv = pi.pow(2).mul(psi).div(gpm.pow(2).mul(8).mul(CV_WATER_DENSITY));
    expectRelative(CV_CONSTANT, cv.toNumber(), 1e-15);
    const kv = pi
      .pow(2)
      .mul(1e5)
      .mul(3600 * 3600)
      .div(8 * KV_WATER_DENSITY);
    expectRelative(KV_CONSTANT, kv.toNumber(), 1e-15);
    // The figures quoted in the doc comments.
    expectRelative(CV_CONSTANT * 0.0254 ** 4, 890.36, 1e-5);
    expectRelative(KV_CONSTANT * 1e-12, 1.59888e-3, 1e-5);
  });
  it('Cv water density is water at 60 degF, 1 atm by IAPWS-IF97 (src/fluids), rounded to 0.01', () => {
    const rho = waterDensity(q(60, 'degF'), q(101325, 'Pa'));
    expect(Math.abs(rho - CV_WATER_DENSITY)).toBeLessThan(0.005);
  });
});

describe('kFromCv, cvFromK, kFromKv, kvFromK', () => {
  it('reject zero, negative and NaN input', () => {
    const d = q(2, 'in');
    expect(expectHeadflowError(() => kFromCv(0, d), 'INVALID_ARGUMENT').parameter).toBe('cv');
    expectHeadflowError(() => kFromCv(-3, d), 'INVALID_ARGUMENT');
    expect(expectHeadflowError(() => kFromCv(10, q(0, 'm')), 'INVALID_ARGUMENT').parameter).toBe(
      'diameter',
    );
    expectHeadflowError(() => cvFromK(0, d), 'INVALID_ARGUMENT');
    expectHeadflowError(() => cvFromK(1, q(Number.NaN, 'm')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => kFromKv(Number.POSITIVE_INFINITY, d), 'INVALID_ARGUMENT');
    expectHeadflowError(() => kFromKv(5, q(-1, 'mm')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => kvFromK(-1, d), 'INVALID_ARGUMENT');
    expectHeadflowError(() => kvFromK(1, q(0, 'mm')), 'INVALID_ARGUMENT');
  });
  it('doc examples', () => {
    expectRelative(kFromCv(100, q(2, 'in')), 1.42458, 1e-5);
    expectRelative(cvFromK(1.42458, q(2, 'in')), 100, 1e-5);
    expectRelative(kFromKv(100, q(50, 'mm')), 0.9993, 1e-5);
    expectRelative(kvFromK(0.9993, q(50, 'mm')), 100, 1e-5);
  });
  it('K from Cv reproduces the pressure drop of the Cv definition (1 psi at Cv gal/min of reference water)', () => {
    const d = q(3, 'in');
    const cv = 150;
    const k = kFromCv(cv, d);
    const v = q(cv, 'gal/min') / ((Math.PI * d * d) / 4);
    const dp = (k * CV_WATER_DENSITY * v * v) / 2;
    expectRelative(dp, q(1, 'psi'), 1e-14);
  });
  it('K from Kv reproduces 1 bar at Kv m3/h of reference water', () => {
    const d = q(80, 'mm');
    const k = kFromKv(90, d);
    const v = q(90, 'm3/h') / ((Math.PI * d * d) / 4);
    expectRelative((k * KV_WATER_DENSITY * v * v) / 2, q(1, 'bar'), 1e-14);
  });
  it('round trips (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 1e5, noNaN: true }),
        fc.double({ min: 1e-3, max: 3, noNaN: true }),
        (c, dm) => {
          const d = dm as Length;
          expectRelative(cvFromK(kFromCv(c, d), d), c, 4e-16 * 4);
          expectRelative(kvFromK(kFromKv(c, d), d), c, 4e-16 * 4);
          expectRelative(kFromCv(cvFromK(c, d), d), c, 4e-16 * 8);
          expectRelative(kFromKv(kvFromK(c, d), d), c, 4e-16 * 8);
        },
      ),
    );
  });
  it('Kv / Cv through a common K is 0.865 (common practice: "Kv = 0.865 Cv"; from memory)', () => {
    const d = q(100, 'mm');
    const kv = kvFromK(kFromCv(1, d), d);
    // Exact with these definitions: (gpm in m3/h) sqrt(bar/psi) sqrt(rho_Cv / rho_Kv).
    const gpmInM3h = (231 * 0.0254 ** 3 * 60) / 1;
    const psi = (0.45359237 * 9.80665) / 0.0254 ** 2;
    expectRelative(
      kv,
      gpmInM3h * Math.sqrt((1e5 / psi) * (CV_WATER_DENSITY / KV_WATER_DENSITY)),
      1e-14,
    );
    expect(Math.abs(kv - 0.865)).toBeLessThan(0.0005);
  });
});

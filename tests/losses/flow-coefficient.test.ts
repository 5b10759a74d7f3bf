import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { waterDensity } from '../../src/fluids';
import {
  CV_CONSTANT,
  CV_WATER_DENSITY,
  cvFromK,
  FLOW_COEFFICIENT_WATER_DENSITY,
  KV_CONSTANT,
  KV_PER_CV,
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
    expectRelative(CV_CONSTANT * 0.0254 ** 4, 890.29, 1e-5);
    expectRelative(KV_CONSTANT * 1e-12, 1.60032e-3, 1e-5);
  });
  it('one reference water for Cv and Kv: water at 15 degC, 1 atm by IAPWS-IF97 (src/fluids), rounded to 0.01', () => {
    // IEC 60534-2-1 refers both coefficients to water at 15 degC (from memory).
    const rho = waterDensity(q(15, 'degC'), q(101325, 'Pa'));
    expect(Math.abs(rho - FLOW_COEFFICIENT_WATER_DENSITY)).toBeLessThan(0.005);
    expect(CV_WATER_DENSITY).toBe(FLOW_COEFFICIENT_WATER_DENSITY);
    expect(KV_WATER_DENSITY).toBe(FLOW_COEFFICIENT_WATER_DENSITY);
    // ISA-75.01's 60 degF water is within 1e-4 of it (IAPWS-IF97).
    const rho60F = waterDensity(q(60, 'degF'), q(101325, 'Pa'));
    expectRelative(rho60F, FLOW_COEFFICIENT_WATER_DENSITY, 1e-4);
  });
  it('kFromKv and kFromCv give the same K for the same valve (Kv = KV_PER_CV x Cv)', () => {
    // KV_PER_CV = (1 gal/min in m3/h) sqrt(1 bar / 1 psi), exact NIST SP 811 factors, in 40 digits.
    Decimal.set({ precision: 40 });
    const gpmInM3h = new Decimal('0.0254').pow(3).mul(231).mul(60);
    const psi = new Decimal('0.45359237').mul('9.80665').div(new Decimal('0.0254').pow(2));
    expectRelative(KV_PER_CV, gpmInM3h.mul(new Decimal(1e5).div(psi).sqrt()).toNumber(), 1e-15);
    fc.assert(
      fc.property(
        fc.double({ min: 1e-2, max: 1e4, noNaN: true }),
        fc.double({ min: 5e-3, max: 2, noNaN: true }),
        (cv, dm) => {
          const d = dm as Length;
          expectRelative(kFromKv(KV_PER_CV * cv, d), kFromCv(cv, d), 1e-14);
        },
      ),
    );
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
    expectRelative(kFromCv(100, q(2, 'in')), 1.42446, 1e-5);
    expectRelative(cvFromK(1.42446, q(2, 'in')), 100, 1e-5);
    expectRelative(kFromKv(100, q(50, 'mm')), 1.0002, 1e-5);
    expectRelative(kvFromK(1.0002, q(50, 'mm')), 100, 1e-5);
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
  it("Kv / Cv through a common K is IEC 60534-2-1's 0.865 (N1 = 0.0865 for Cv and 0.1 for Kv, m3/h and kPa; from memory)", () => {
    const d = q(100, 'mm');
    const kv = kvFromK(kFromCv(1, d), d);
    expectRelative(kv, KV_PER_CV, 1e-14);
    // The standard prints three digits: 0.0865 / 0.1 = 0.865.
    expect(Math.abs(kv - 0.0865 / 0.1)).toBeLessThan(0.0005);
  });
});

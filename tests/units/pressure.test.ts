import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  absoluteToGauge,
  gaugeToAbsolute,
  headFromPressure,
  type Pressure,
  pressureFromHead,
  q,
  STANDARD_ATMOSPHERE,
  STANDARD_GRAVITY,
  to,
} from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

describe('constants (NIST SP 811 Appendix B.8, exact)', () => {
  it('standard gravity and atmosphere', () => {
    expect(STANDARD_GRAVITY).toBe(9.80665);
    expect(STANDARD_ATMOSPHERE).toBe(101325);
  });
});

describe('gauge and absolute pressure', () => {
  it('rejects non-finite input and impossible pressures', () => {
    expectHeadflowError(() => gaugeToAbsolute(Number.NaN as Pressure), 'INVALID_ARGUMENT');
    expectHeadflowError(() => gaugeToAbsolute(q(1, 'bar'), q(0, 'Pa')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => gaugeToAbsolute(q(-2, 'atm')), 'OUT_OF_RANGE');
    expectHeadflowError(() => absoluteToGauge(q(-1, 'Pa')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => absoluteToGauge(q(1, 'Pa'), q(-1, 'Pa')), 'INVALID_ARGUMENT');
  });
  it('adds and removes the stated atmosphere', () => {
    expect(gaugeToAbsolute(q(0, 'Pa'))).toBe(101325);
    expectRelative(gaugeToAbsolute(q(45, 'psi')), 45 * 6894.757293168361 + 101325, 1e-15);
    expect(gaugeToAbsolute(q(-20, 'kPa'), q(95, 'kPa'))).toBe(75000);
    expectRelative(to(absoluteToGauge(q(3, 'bar')), 'kPa'), 198.675, 1e-14);
    expect(gaugeToAbsolute(q(-1, 'atm'))).toBe(0);
  });
  it('round trips (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e8, noNaN: true }),
        fc.double({ min: 5e4, max: 1.1e5, noNaN: true }),
        (p, atm) => {
          const back = gaugeToAbsolute(
            absoluteToGauge(p as Pressure, atm as Pressure),
            atm as Pressure,
          );
          expect(Math.abs(back - p)).toBeLessThanOrEqual(1e-15 * (p + atm));
        },
      ),
    );
  });
});

describe('head and pressure', () => {
  it('rejects non-physical density and gravity', () => {
    expectHeadflowError(() => headFromPressure(q(1, 'bar'), q(0, 'kg/m3')), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => headFromPressure(q(1, 'bar'), q(1000, 'kg/m3'), q(-9.8, 'm/s2')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => pressureFromHead(q(Number.NaN, 'm'), q(1000, 'kg/m3')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => headFromPressure(Number.NaN as Pressure, q(1000, 'kg/m3')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => pressureFromHead(q(1, 'm'), q(-1, 'kg/m3')), 'INVALID_ARGUMENT');
  });
  it('10 m of conventional water is 98 066.5 Pa (NIST SP 811 B.8 conventional water column)', () => {
    expectRelative(pressureFromHead(q(10, 'm'), q(1000, 'kg/m3')), 98066.5, 1e-15);
    expectRelative(to(pressureFromHead(q(1, 'ft'), q(1000, 'kg/m3')), 'ftH2O'), 1, 1e-15);
  });
  it('1 psi is 2.31 ft of water at 62.4 lb/ft3 (common practice: "2.31 ft per psi")', () => {
    expectRelative(to(headFromPressure(q(1, 'psi'), q(62.4, 'lb/ft3')), 'ft'), 2.3077, 1e-4);
  });
  it('US customary: p = rho g h with slugs, 1 slug/ft3 x 32.174 ft/s2 x 1 ft = 32.174 psf', () => {
    const p = pressureFromHead(q(1, 'ft'), q(1, 'slug/ft3'), q(32.174, 'ft/s2'));
    expectRelative(to(p, 'psf'), 32.174, 1e-12);
  });
  it('are inverse (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e7, max: 1e7, noNaN: true }),
        fc.double({ min: 1, max: 2e4, noNaN: true }),
        (p, rho) => {
          if (Math.abs(p) < 1e-280) return; // subnormal results lose relative precision
          const back = pressureFromHead(
            headFromPressure(p as Pressure, rho as never),
            rho as never,
          );
          expect(Math.abs(back - p)).toBeLessThanOrEqual(4e-16 * Math.abs(p));
        },
      ),
    );
  });
});

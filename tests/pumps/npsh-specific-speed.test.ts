import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  npshAvailable,
  npshMargin,
  SPECIFIC_SPEED_US_PER_SI,
  specificSpeed,
  suctionSpecificSpeed,
} from '../../src/pumps/index';
import { q, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const base = {
  surfacePressure: q(101.325, 'kPa'),
  vaporPressure: q(2.339, 'kPa'),
  density: q(998.2, 'kg/m3'),
  staticHeadAboveImpeller: q(-3, 'm'),
  suctionLoss: q(1.2, 'm'),
};

describe('npshAvailable', () => {
  it('rejects impossible input', () => {
    expectHeadflowError(
      () => npshAvailable({ ...base, surfacePressure: q(0, 'Pa') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => npshAvailable({ ...base, vaporPressure: q(-1, 'Pa') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => npshAvailable({ ...base, density: q(0, 'kg/m3') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => npshAvailable({ ...base, suctionLoss: q(-1, 'm') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => npshAvailable({ ...base, staticHeadAboveImpeller: q(Number.NaN, 'm') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => npshAvailable({ ...base, g: q(0, 'm/s2') }), 'INVALID_ARGUMENT');
  });
  it('doc example: suction lift from an open tank (5.912 m)', () => {
    expectRelative(to(npshAvailable(base), 'm'), (101325 - 2339) / (998.2 * 9.80665) - 4.2, 1e-14);
    expectRelative(to(npshAvailable(base), 'm'), 5.91196, 1e-5);
  });
  it('may be negative (the liquid flashes before the pump)', () => {
    expect(npshAvailable({ ...base, staticHeadAboveImpeller: q(-12, 'm') })).toBeLessThan(0);
  });
  it('rises one for one with the static head (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -8, max: 30, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        (z, dz) => {
          const a = npshAvailable({ ...base, staticHeadAboveImpeller: q(z, 'm') });
          const b = npshAvailable({ ...base, staticHeadAboveImpeller: q(z + dz, 'm') });
          expect(Math.abs(b - a - dz)).toBeLessThanOrEqual(1e-12 * (1 + Math.abs(z) + dz));
        },
      ),
    );
  });
});

describe('npshMargin', () => {
  it('rejects bad rules', () => {
    expectHeadflowError(
      () => npshMargin({ available: q(5, 'm'), required: q(0, 'm') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => npshMargin({ available: q(5, 'm'), required: q(4, 'm'), marginRatio: 0.9 }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => npshMargin({ available: q(5, 'm'), required: q(4, 'm'), minimumMargin: q(-1, 'm') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => npshMargin({ available: q(Number.NaN, 'm'), required: q(4, 'm') }),
      'INVALID_ARGUMENT',
    );
  });
  it('applies the ratio and the minimum margin, whichever is greater (doc example)', () => {
    const r = npshMargin({
      available: q(5.9, 'm'),
      required: q(4.5, 'm'),
      marginRatio: 1.2,
      minimumMargin: q(1, 'm'),
    });
    expectRelative(r.ratio, 5.9 / 4.5, 1e-15);
    expectRelative(r.margin, 1.4, 1e-14);
    expectRelative(r.requiredAvailable, 5.5, 1e-15);
    expect(r.ok).toBe(true);
    // default ratio 1.1: 4.5 x 1.1 = 4.95 m
    expect(npshMargin({ available: q(4.9, 'm'), required: q(4.5, 'm') }).ok).toBe(false);
    expect(npshMargin({ available: q(4.95, 'm'), required: q(4.5, 'm') }).ok).toBe(true);
    // small NPSHr: the 1 m minimum margin governs
    expect(
      npshMargin({ available: q(2.9, 'm'), required: q(2, 'm'), minimumMargin: q(1, 'm') }).ok,
    ).toBe(false);
  });
});

describe('specific speed and suction specific speed', () => {
  it('reject bad input', () => {
    expectHeadflowError(
      () => specificSpeed(q(0, 'rpm'), q(1, 'm3/s'), q(1, 'm')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => specificSpeed(q(1, 'rpm'), q(0, 'm3/s'), q(1, 'm')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => specificSpeed(q(1, 'rpm'), q(1, 'm3/s'), q(-1, 'm')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => specificSpeed(q(1, 'rpm'), q(1, 'm3/s'), q(1, 'm'), 'x' as never),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => suctionSpecificSpeed(q(1, 'rpm'), q(1, 'm3/s'), q(0, 'm')),
      'INVALID_ARGUMENT',
    );
  });
  it('definition N Q^0.5 / H^0.75 in both unit systems (doc examples)', () => {
    expectRelative(specificSpeed(q(1750, 'rpm'), q(1000, 'gal/min'), q(100, 'ft')), 1750, 1e-13);
    expectRelative(
      specificSpeed(q(1450, 'rpm'), q(0.1, 'm3/s'), q(20, 'm'), 'si'),
      (1450 * Math.sqrt(0.1)) / 20 ** 0.75,
      1e-13,
    );
    expectRelative(
      suctionSpecificSpeed(q(3560, 'rpm'), q(500, 'gal/min'), q(20, 'ft')),
      8417.1003,
      1e-7,
    );
    expectRelative(
      suctionSpecificSpeed(q(1450, 'rpm'), q(0.05, 'm3/s'), q(4, 'm'), 'si'),
      (1450 * Math.sqrt(0.05)) / 4 ** 0.75,
      1e-13,
    );
  });
  it('US / SI = 51.645, derived from the exact gallon and foot (NIST SP 811)', () => {
    expectRelative(
      SPECIFIC_SPEED_US_PER_SI,
      Math.sqrt(60 / (231 * 0.0254 ** 3)) * 0.3048 ** 0.75,
      1e-15,
    );
    expectRelative(SPECIFIC_SPEED_US_PER_SI, 51.645, 1e-4);
    fc.assert(
      fc.property(
        fc.double({ min: 500, max: 4000, noNaN: true }),
        fc.double({ min: 1e-3, max: 5, noNaN: true }),
        fc.double({ min: 1, max: 300, noNaN: true }),
        (n, Q, H) => {
          const us = specificSpeed(q(n, 'rpm'), Q as never, H as never, 'us');
          const si = specificSpeed(q(n, 'rpm'), Q as never, H as never, 'si');
          expectRelative(us / si, SPECIFIC_SPEED_US_PER_SI, 1e-13);
          const sus = suctionSpecificSpeed(q(n, 'rpm'), Q as never, H as never);
          const ssi = suctionSpecificSpeed(q(n, 'rpm'), Q as never, H as never, 'si');
          expectRelative(sus / ssi, SPECIFIC_SPEED_US_PER_SI, 1e-13);
        },
      ),
    );
  });
});

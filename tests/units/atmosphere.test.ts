import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ATMOSPHERE_ELEVATION_RANGE, atmosphereAt, type Length, q } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

describe('atmosphereAt', () => {
  it('refuses what is not a finite number, and elevations outside the troposphere', () => {
    expectHeadflowError(() => atmosphereAt(Number.NaN as Length), 'INVALID_ARGUMENT');
    expectHeadflowError(() => atmosphereAt(Number.POSITIVE_INFINITY as Length), 'INVALID_ARGUMENT');
    expectHeadflowError(() => atmosphereAt('100 m' as unknown as Length), 'INVALID_ARGUMENT');
    expectHeadflowError(() => atmosphereAt(undefined as unknown as Length), 'INVALID_ARGUMENT');
    const high = expectHeadflowError(() => atmosphereAt(q(11001, 'm')), 'OUT_OF_RANGE');
    expect(high.message).toContain('11000 m');
    expectHeadflowError(() => atmosphereAt(q(-5001, 'm')), 'OUT_OF_RANGE');
  });
  it('gives the doc comment example: 84.56 kPa at 1500 m', () => {
    expectRelative(atmosphereAt(q(1500, 'm')) / 1000, 84.556, 1e-4);
  });
  it('falls as the site rises, stays positive, and is above 101 325 Pa below sea level (property)', () => {
    const { min, max } = ATMOSPHERE_ELEVATION_RANGE;
    fc.assert(
      fc.property(
        fc.double({ min, max, noNaN: true }),
        fc.double({ min, max, noNaN: true }),
        (a, b) => {
          const pa = atmosphereAt(a as Length);
          const pb = atmosphereAt(b as Length);
          if (!(pa > 0 && pb > 0)) return false;
          if (a < b) return pa >= pb;
          if (a > b) return pa <= pb;
          return pa === pb;
        },
      ),
    );
    expect(atmosphereAt(q(-400, 'm'))).toBeGreaterThan(101325);
  });
});

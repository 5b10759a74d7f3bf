/**
 * `atmosphereAt` against the U.S. Standard Atmosphere, 1976 (NOAA, NASA, USAF; NOAA-S/T
 * 76-1562), which is identical to the ICAO Standard Atmosphere (Doc 7488) below 32 km.
 * The table rows below were read from reproductions of the publication's tables (named beside
 * each value), not from the printed book itself; the tables print five significant digits,
 * so the checks are to half a unit in the last printed digit.
 */
import { describe, it } from 'vitest';
import { atmosphereAt, q } from '../../src/units';
import { expectRelative } from '../helpers/expect';

/** Earth radius of the 1976 standard for geopotential altitude, r0 = 6 356 766 m. */
const R0 = 6356766;
/** Geopotential altitude H of a geometric altitude Z: H = r0 Z / (r0 + Z). */
const geopotential = (z: number) => (R0 * z) / (R0 + z);

describe('atmosphereAt against the U.S. Standard Atmosphere, 1976', () => {
  it('sea level: 101 325 Pa, the standard sea-level pressure (a definition of the standard)', () => {
    expectRelative(atmosphereAt(q(0, 'm')), 101325, 1e-15);
  });
  it("Z = 3000 m (H = 2999 m'): P = 7.0121E+02 mb (Table I row as reproduced at luizmonteiro.com/StdAtmHelpM3.aspx)", () => {
    // 701.21 mb = 70 121 Pa, printed to 5 digits: tolerance half a unit in the 5th digit.
    expectRelative(atmosphereAt(q(geopotential(3000), 'm')), 70121, 0.5 / 70121);
  });
  it("tropopause, H = 11 000 m': P = 22 632 Pa (base pressure of the second layer, as listed at crnslab.org/util/atmo.php)", () => {
    expectRelative(atmosphereAt(q(11000, 'm')), 22632, 0.5 / 22632);
  });
});

import { argumentError } from '../errors';
import { guardNumber } from '../guards';
import { STANDARD_ATMOSPHERE, STANDARD_GRAVITY } from './constants';
import type { Length, Pressure } from './quantity';

/** Sea-level temperature of the standard atmosphere, T0 = 288.15 K. */
const SEA_LEVEL_TEMPERATURE = 288.15;
/** Temperature gradient of the first layer (troposphere), L = -6.5 K per km' of geopotential. */
const LAPSE_RATE = 0.0065;
/** Mean molar mass of sea-level air, M0 = 28.9644 kg/kmol. */
const MOLAR_MASS = 0.0289644;
/** Gas constant as the 1976 standard states it, R* = 8.31432 J/(mol K). */
const GAS_CONSTANT = 8.31432;
/** Exponent g0 M0 / (R* L) = 5.255876... */
const EXPONENT = (STANDARD_GRAVITY * MOLAR_MASS) / (GAS_CONSTANT * LAPSE_RATE);

/** Lowest and highest elevation (geopotential, m) the formula serves here. */
export const ATMOSPHERE_ELEVATION_RANGE = { min: -5000, max: 11000 } as const;

/**
 * The standard atmosphere's pressure at a site's elevation: the troposphere formula of the
 * U.S. Standard Atmosphere, 1976 (NOAA, NASA, USAF; identical to the ICAO Standard
 * Atmosphere, Doc 7488, below 32 km), for the gauge/absolute conversion and the pressure on
 * an open suction surface (NPSH available) at a site above or below sea level.
 *
 * Equation (first layer, constant temperature gradient):
 * `p = p0 (1 - L H / T0)^(g0 M0 / (R* L))` with p0 = 101 325 Pa, T0 = 288.15 K,
 * L = 0.0065 K/m, g0 = 9.80665 m/s2, M0 = 28.9644 kg/kmol, R* = 8.31432 J/(mol K)
 * (exponent 5.255876).
 *
 * Range: H from -5000 m (the foot of the standard's tables) to 11 000 m (the tropopause,
 * where the first layer ends). The elevation is taken as the standard's geopotential
 * altitude H; a site's surveyed (geometric) elevation Z differs from it by Z^2 / r0
 * (r0 = 6 356 766 m): 1.4 m at 3000 m, which changes the pressure by 0.02 %. The standard
 * atmosphere is a yearly mid-latitude mean: the weather moves the barometer a few percent
 * either way, so NPSH margins must not rest on the difference.
 *
 * @param elevation - the site's elevation above mean sea level (m), -5000 to 11 000
 * @returns the absolute pressure of the standard atmosphere there (Pa)
 * @throws HeadflowError `INVALID_ARGUMENT` for a value that is not a finite number,
 *   `OUT_OF_RANGE` outside -5000 m to 11 000 m.
 * @example
 * ```ts
 * atmosphereAt(q(0, 'm')); // 101325 (Pa)
 * to(atmosphereAt(q(1500, 'm')), 'kPa'); // 84.56 (kPa)
 * ```
 */
export function atmosphereAt(elevation: Length): Pressure {
  const h = guardNumber('elevation', elevation, 'm');
  const { min, max } = ATMOSPHERE_ELEVATION_RANGE;
  if (h < min || h > max) {
    throw argumentError(
      'OUT_OF_RANGE',
      'elevation',
      h,
      'm',
      `${min} m to ${max} m (the troposphere of the standard atmosphere)`,
    );
  }
  return (STANDARD_ATMOSPHERE *
    (1 - (LAPSE_RATE * h) / SEA_LEVEL_TEMPERATURE) ** EXPONENT) as Pressure;
}

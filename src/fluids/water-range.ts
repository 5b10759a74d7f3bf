/**
 * Where the water formulations apply: the liquid region of IAPWS-IF97 (region 1), and the
 * checks that refuse ice, steam and impossible input with a message that says what to change.
 *
 * @module
 */
import { argumentError, HeadflowError } from '../errors';
import { checkStateInput, showPressure, showTemperature } from './checks';
import { SATURATION_P_MIN, saturationPressureSI, saturationTemperatureSI } from './if97-region4';

/** Lower temperature bound of IF97 region 1 (and of headflow's liquid water), 273.15 K. */
export const WATER_T_MIN = 273.15;
/** Upper temperature bound of IF97 region 1, 623.15 K. */
export const WATER_T_MAX = 623.15;
/** Upper pressure bound of IF97 region 1, 100 MPa. */
export const WATER_P_MAX = 100e6;
/** Saturation pressure at 623.15 K (IF97 Eq. 30), 16.529 MPa: above it, all of 273.15-623.15 K is liquid. */
const P_SAT_AT_T_MAX = saturationPressureSI(WATER_T_MAX);

/**
 * Throws unless (T, p) is liquid water inside IF97 region 1. Plain numbers in SI; allocates
 * only when it throws.
 *
 * - NaN, infinity, T < 0 K or p < 0 Pa: `INVALID_ARGUMENT`.
 * - T < 273.15 K (ice; the melting line is approximated by the region 1 bound), T > 623.15 K,
 *   p > 100 MPa, or T at or above the saturation temperature of p (boiling, steam):
 *   `OUT_OF_RANGE`, with the change that would make the state liquid.
 * @internal
 */
export function checkLiquidWater(temperature: number, pressure: number, index = -1): void {
  const tName = index < 0 ? 'temperature' : `temperatures[${String(index)}]`;
  checkStateInput(temperature, pressure, tName);
  if (temperature < WATER_T_MIN) {
    throw new HeadflowError(
      'OUT_OF_RANGE',
      `${tName} = ${showTemperature(temperature)} is below 273.15 K (0 degC): the water may be ice. ` +
        'Raise the temperature to 273.15 K or more (headflow takes the melting line as the ' +
        '273.15 K lower bound of IAPWS-IF97 region 1).',
      { parameter: tName, value: temperature, unit: 'K', allowed: '273.15 K to 623.15 K' },
    );
  }
  if (temperature > WATER_T_MAX) {
    throw new HeadflowError(
      'OUT_OF_RANGE',
      `${tName} = ${showTemperature(temperature)} is above 623.15 K (350 degC), the upper ` +
        'bound of IAPWS-IF97 region 1 (compressed liquid). Lower the temperature.',
      { parameter: tName, value: temperature, unit: 'K', allowed: '273.15 K to 623.15 K' },
    );
  }
  if (pressure > WATER_P_MAX) {
    throw argumentError(
      'OUT_OF_RANGE',
      'pressure',
      pressure,
      'Pa',
      'up to 100 MPa (upper bound of IAPWS-IF97 region 1)',
      'Lower the pressure.',
    );
  }
  if (pressure < P_SAT_AT_T_MAX) {
    // Below the saturation pressure of 623.15 K the pressure has a boiling point in range.
    const boiling = pressure < SATURATION_P_MIN ? 0 : saturationTemperatureSI(pressure);
    if (temperature >= boiling) {
      const needed = saturationPressureSI(temperature);
      throw new HeadflowError(
        'OUT_OF_RANGE',
        `water at ${showTemperature(temperature)} and ${showPressure(pressure)} absolute is not ` +
          `liquid: it boils at ${boiling > 0 ? showTemperature(boiling) : 'any temperature'} at ` +
          'this pressure (IAPWS-IF97 region 4). Raise the pressure above the saturation pressure ' +
          `${showPressure(needed)}, or lower the temperature below the boiling point. ` +
          'Pressures are absolute: convert a gauge reading with gaugeToAbsolute().',
        {
          parameter: tName,
          value: temperature,
          unit: 'K',
          allowed: `below the saturation temperature of the pressure${boiling > 0 ? ` (${showTemperature(boiling)})` : ''}`,
        },
      );
    }
  }
}

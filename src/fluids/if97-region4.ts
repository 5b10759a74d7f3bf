/**
 * IAPWS-IF97 region 4: the saturation-pressure equation of water and its inverse.
 *
 * @module
 */
import { argumentError, checkFinite } from '../errors';
import type { Pressure, Temperature } from '../units/index';
import { checkSameLength } from './checks';

// IAPWS-IF97 (IAPWS R7-97(2012)), Table 34: coefficients n1..n10 of the dimensionless
// saturation equation, Eq. (29).
const N1 = 0.11670521452767e4;
const N2 = -0.72421316703206e6;
const N3 = -0.17073846940092e2;
const N4 = 0.1202082470247e5;
const N5 = -0.32325550322333e7;
const N6 = 0.1491510861353e2;
const N7 = -0.48232657361591e4;
const N8 = 0.40511340542057e6;
const N9 = -0.23855557567849;
const N10 = 0.65017534844798e3;

/** Lower temperature bound of region 4, 273.15 K (IF97 Section 8.1). */
export const SATURATION_T_MIN = 273.15;
/** Critical temperature, 647.096 K (IF97 Eq. 3): upper bound of region 4. */
export const SATURATION_T_MAX = 647.096;

/**
 * Lower pressure bound of region 4: Eq. (30) at 273.15 K, 611.2127 Pa (the release rounds it
 * to 611.213 Pa). Computed so that Eqs. (30) and (31) are inverse over the whole range.
 */
export const SATURATION_P_MIN: number = saturationPressureSI(SATURATION_T_MIN);
/** Upper pressure bound of region 4: Eq. (30) at 647.096 K, the critical pressure 22.064 MPa. */
export const SATURATION_P_MAX: number = saturationPressureSI(SATURATION_T_MAX);

/**
 * Saturation pressure (Pa) at a temperature (K) from IF97 Eq. (30); plain numbers, no checks,
 * no allocation.
 * @internal
 */
export function saturationPressureSI(temperature: number): number {
  const theta = temperature + N9 / (temperature - N10);
  const a = theta * theta + N1 * theta + N2;
  const b = N3 * theta * theta + N4 * theta + N5;
  const c = N6 * theta * theta + N7 * theta + N8;
  const r = (2 * c) / (-b + Math.sqrt(b * b - 4 * a * c));
  const r2 = r * r;
  return r2 * r2 * 1e6;
}

/**
 * Saturation temperature (K) at a pressure (Pa) from IF97 Eq. (31); plain numbers, no checks,
 * no allocation.
 * @internal
 */
export function saturationTemperatureSI(pressure: number): number {
  const beta = Math.sqrt(Math.sqrt(pressure / 1e6));
  const e = beta * beta + N3 * beta + N6;
  const f = N1 * beta * beta + N4 * beta + N7;
  const g = N2 * beta * beta + N5 * beta + N8;
  const d = (2 * g) / (-f - Math.sqrt(f * f - 4 * e * g));
  const s = N10 + d;
  return (s - Math.sqrt(s * s - 4 * (N9 + N10 * d))) / 2;
}

function checkSaturationTemperature(temperature: number, parameter = 'temperature'): void {
  checkFinite(parameter, temperature, 'K');
  if (temperature < 0) {
    throw argumentError('INVALID_ARGUMENT', parameter, temperature, 'K', '>= 0 K (absolute)');
  }
  if (temperature < SATURATION_T_MIN || temperature > SATURATION_T_MAX) {
    throw argumentError(
      'OUT_OF_RANGE',
      parameter,
      temperature,
      'K',
      '273.15 K to 647.096 K (IAPWS-IF97 region 4, from the ice point to the critical point)',
    );
  }
}

/**
 * Saturation (vapour) pressure of water at a temperature: the pressure at which water at
 * that temperature boils. The NPSH available of a pump draws on this number.
 *
 * Equation: IAPWS-IF97 Eq. (30), `p_s / 1 MPa = [2C / (-B + (B^2 - 4AC)^0.5)]^4` with
 * `theta = T + n9 / (T - n10)`, `A = theta^2 + n1 theta + n2`, `B = n3 theta^2 + n4 theta + n5`,
 * `C = n6 theta^2 + n7 theta + n8` (coefficients Table 34).
 *
 * Validity: 273.15 K <= T <= 647.096 K (the critical point). Accuracy: within 0.025 % of
 * IAPWS-95 (IF97 Section 8.1); reproduces IF97 Table 35 to its nine printed digits.
 *
 * Source: IAPWS R7-97(2012), "Revised Release on the IAPWS Industrial Formulation 1997 for the
 * Thermodynamic Properties of Water and Steam", Section 8.1.
 *
 * @param temperature - temperature (K)
 * @returns saturation pressure (Pa, absolute)
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinity or a negative absolute
 *   temperature; `OUT_OF_RANGE` below 273.15 K or above 647.096 K.
 * @example
 * ```ts
 * waterSaturationPressure(q(300, 'K')); // 3536.58941...(Pa), IF97 Table 35: 0.353658941e-2 MPa
 * to(waterSaturationPressure(q(100, 'degC')), 'kPa'); // 101.4179...
 * ```
 */
export function waterSaturationPressure(temperature: Temperature): Pressure {
  checkSaturationTemperature(temperature);
  return saturationPressureSI(temperature) as Pressure;
}

/**
 * Saturation temperature of water at a pressure: the boiling point at that absolute pressure.
 *
 * Equation: IAPWS-IF97 Eq. (31), `T_s / 1 K = [n10 + D - ((n10 + D)^2 - 4(n9 + n10 D))^0.5] / 2`
 * with `beta = (p / 1 MPa)^0.25`, `E = beta^2 + n3 beta + n6`, `F = n1 beta^2 + n4 beta + n7`,
 * `G = n2 beta^2 + n5 beta + n8`, `D = 2G / (-F - (F^2 - 4EG)^0.5)` (coefficients Table 34).
 * It is the exact algebraic inverse of Eq. (30); the two agree to rounding error (better
 * than 1e-9 relative over the whole range).
 *
 * Validity: 611.2127 Pa (p_s at 273.15 K) <= p <= 22.064 MPa (absolute). Reproduces IF97 Table 36 to its nine
 * printed digits.
 *
 * Source: IAPWS R7-97(2012), Section 8.2.
 *
 * @param pressure - absolute pressure (Pa)
 * @returns saturation temperature (K)
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinity or a negative pressure;
 *   `OUT_OF_RANGE` below 611.2127 Pa or above 22.064 MPa.
 * @example
 * ```ts
 * waterSaturationTemperature(q(0.1, 'MPa')); // 372.755919...(K), IF97 Table 36
 * to(waterSaturationTemperature(q(1, 'atm')), 'degC'); // 99.97...
 * ```
 */
export function waterSaturationTemperature(pressure: Pressure): Temperature {
  checkFinite('pressure', pressure, 'Pa');
  if (pressure < 0) {
    throw argumentError('INVALID_ARGUMENT', 'pressure', pressure, 'Pa', '>= 0 Pa (absolute)');
  }
  if (pressure < SATURATION_P_MIN || pressure > SATURATION_P_MAX) {
    throw argumentError(
      'OUT_OF_RANGE',
      'pressure',
      pressure,
      'Pa',
      '611.2127 Pa to 22.064 MPa absolute (IAPWS-IF97 region 4, ice point to critical point)',
    );
  }
  return saturationTemperatureSI(pressure) as Temperature;
}

/**
 * Array form of {@link waterSaturationPressure}: fills `out[i]` with the saturation pressure
 * (Pa) at `temperatures[i]` (K); allocates nothing.
 *
 * @throws HeadflowError as {@link waterSaturationPressure}, naming the first offending
 *   element; `INVALID_ARGUMENT` when the arrays differ in length.
 * @example
 * ```ts
 * waterSaturationPressureInto(Float64Array.of(300, 500), new Float64Array(2)); // [3536.58..., 2638897.76...]
 * ```
 */
export function waterSaturationPressureInto(
  temperatures: ArrayLike<number>,
  out: Float64Array,
): Float64Array {
  checkSameLength(temperatures, out);
  for (let i = 0; i < temperatures.length; i++) {
    const t = temperatures[i] as number;
    checkSaturationTemperature(t, `temperatures[${i}]`);
    out[i] = saturationPressureSI(t);
  }
  return out;
}

/**
 * Isobaric specific heat capacity of liquid water from IAPWS-IF97 region 1.
 *
 * @module
 */
import { guardNumber } from '../guards';
import type { Pressure, SpecificHeat, Temperature } from '../units/index';
import { region1Acoustic } from './if97-region1';
import { checkLiquidWater } from './water-range';

const scratch = new Float64Array(3);

/**
 * Isobaric specific heat capacity c_p of liquid water, from the IAPWS-IF97 basic equation for
 * region 1: the heat that warms one kilogram by one kelvin at constant pressure. It sets how
 * fast the liquid in a pump warms when the pump runs near shut-off (`temperatureRise`).
 *
 * Equation (IF97 Table 3): `c_p = -R tau^2 gamma_tautau`, with gamma the dimensionless Gibbs
 * free energy of Eq. 7, `tau = 1386 K / T`, R = 0.461 526 kJ/(kg K).
 *
 * Validity: IF97 region 1, 273.15 K <= T <= 623.15 K and p_s(T) < p <= 100 MPa (absolute).
 *
 * Accuracy: reproduces the c_p values of IF97 Table 5 to the nine printed digits.
 *
 * Source: IAPWS, "Revised Release on the IAPWS Industrial Formulation 1997 for the
 * Thermodynamic Properties of Water and Steam", IAPWS R7-97(2012), Section 5.1, Table 3.
 *
 * @param temperature - temperature (K)
 * @param pressure - absolute pressure (Pa)
 * @returns isobaric specific heat capacity (J/(kg K))
 * @throws HeadflowError `INVALID_ARGUMENT` for a non-number, NaN, infinite or negative
 *   absolute input; `OUT_OF_RANGE` for ice, boiling water, above 623.15 K or above 100 MPa
 *   (as {@link waterDensity}).
 * @example
 * ```ts
 * to(waterSpecificHeat(q(300, 'K'), q(3, 'MPa')), 'kJ/(kg*K)'); // 4.17301218 (IF97 Table 5)
 * to(waterSpecificHeat(q(20, 'degC'), q(1, 'atm')), 'kJ/(kg*K)'); // 4.1848...
 * ```
 */
export function waterSpecificHeat(temperature: Temperature, pressure: Pressure): SpecificHeat {
  const t = guardNumber('temperature', temperature, 'K');
  const p = guardNumber('pressure', pressure, 'Pa');
  checkLiquidWater(t, p);
  region1Acoustic(t, p, scratch);
  return scratch[1] as SpecificHeat;
}

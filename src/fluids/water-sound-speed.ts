/**
 * Speed of sound in liquid water from IAPWS-IF97 region 1.
 *
 * @module
 */
import { guardNumber } from '../guards';
import type { Pressure, Temperature, Velocity } from '../units/index';
import { region1Acoustic } from './if97-region1';
import { checkLiquidWater } from './water-range';

const scratch = new Float64Array(3);

/**
 * Speed of sound in liquid water (the speed of a pressure wave in water that no pipe wall
 * confines), from the IAPWS-IF97 basic equation for region 1. Its square times the density is
 * the isentropic bulk modulus, `K = rho w^2`, which is the modulus a pressure surge sees
 * (see `FluidState.bulkModulus` and `waveSpeed`).
 *
 * Equation (IF97 Table 3, with gamma the dimensionless Gibbs free energy of Eq. 7 and its
 * derivatives): `w^2 = R T gamma_pi^2 / ((gamma_pi - tau gamma_pitau)^2 / (tau^2 gamma_tautau)
 * - gamma_pipi)`, `pi = p / 16.53 MPa`, `tau = 1386 K / T`, R = 0.461 526 kJ/(kg K).
 *
 * Validity: IF97 region 1, 273.15 K <= T <= 623.15 K and p_s(T) < p <= 100 MPa (absolute):
 * liquid water above its saturation pressure.
 *
 * Accuracy: reproduces the speeds of sound of IF97 Table 5 to the nine printed digits. At
 * 1 atm from 0 to 95 degC it lies within 0.2 % of the measured speeds in pure water
 * (Greenspan and Tschiegg 1959; Marczak 1997): IF97 region 1 reads up to 0.19 % high near
 * 60 degC (tests/reference/water-sound-speed.test.ts). For surge screening, where the pipe
 * wall usually lowers the wave speed by far more, this is immaterial.
 *
 * Source: IAPWS, "Revised Release on the IAPWS Industrial Formulation 1997 for the
 * Thermodynamic Properties of Water and Steam", IAPWS R7-97(2012), Section 5.1, Table 3.
 *
 * @param temperature - temperature (K)
 * @param pressure - absolute pressure (Pa)
 * @returns speed of sound (m/s)
 * @throws HeadflowError `INVALID_ARGUMENT` for a non-number, NaN, infinite or negative
 *   absolute input; `OUT_OF_RANGE` for ice, boiling water, above 623.15 K or above 100 MPa
 *   (as {@link waterDensity}).
 * @example
 * ```ts
 * to(waterSpeedOfSound(q(300, 'K'), q(3, 'MPa')), 'm/s'); // 1507.73921 (IF97 Table 5: 0.150773921e4)
 * to(waterSpeedOfSound(q(20, 'degC'), q(1, 'atm')), 'm/s'); // 1483.4... (measured: 1482.4)
 * ```
 */
export function waterSpeedOfSound(temperature: Temperature, pressure: Pressure): Velocity {
  const t = guardNumber('temperature', temperature, 'K');
  const p = guardNumber('pressure', pressure, 'Pa');
  checkLiquidWater(t, p);
  region1Acoustic(t, p, scratch);
  return scratch[0] as Velocity;
}

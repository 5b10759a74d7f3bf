/**
 * Water as a {@link Fluid}: IAPWS-IF97 density and saturation pressure, IAPWS 2008 viscosity.
 *
 * @module
 */
import {
  type Density,
  type DynamicViscosity,
  type KinematicViscosity,
  type Pressure,
  type SpecificHeat,
  STANDARD_ATMOSPHERE,
  type Temperature,
} from '../units/index';
import type { Fluid, FluidState } from './fluid';
import { viscosityFromDensity, waterViscosityInto } from './iapws-2008-viscosity';
import { region1Acoustic, waterDensityInto } from './if97-region1';
import { saturationPressureSI, waterSaturationPressureInto } from './if97-region4';
import { checkLiquidWater, WATER_P_MAX, WATER_T_MAX, WATER_T_MIN } from './water-range';

/** Scratch for region1Acoustic: speed of sound, c_p, density. */
const scratch = new Float64Array(3);

const WATER: Fluid = {
  name: 'water (IAPWS-IF97 region 1 and 4, IAPWS 2008 viscosity)',
  validRange: {
    minTemperature: WATER_T_MIN as Temperature,
    maxTemperature: WATER_T_MAX as Temperature,
    minPressure: saturationPressureSI(WATER_T_MIN) as Pressure,
    maxPressure: WATER_P_MAX as Pressure,
    description:
      'liquid water: 273.15 K to 623.15 K, absolute pressure above the saturation pressure of ' +
      'the temperature and at most 100 MPa (IAPWS-IF97 region 1)',
  },
  hasVaporPressure: true,
  at(temperature: Temperature, pressure: Pressure = STANDARD_ATMOSPHERE): FluidState {
    checkLiquidWater(temperature, pressure);
    region1Acoustic(temperature, pressure, scratch);
    const w = scratch[0] as number;
    const rho = scratch[2] as number;
    const mu = viscosityFromDensity(temperature, rho);
    return {
      temperature,
      pressure,
      density: rho as Density,
      dynamicViscosity: mu as DynamicViscosity,
      kinematicViscosity: (mu / rho) as KinematicViscosity,
      vaporPressure: saturationPressureSI(temperature) as Pressure,
      bulkModulus: (rho * w * w) as Pressure,
      specificHeat: scratch[1] as SpecificHeat,
    };
  },
  densityInto: (temperatures, out, pressure = STANDARD_ATMOSPHERE) =>
    waterDensityInto(temperatures, pressure, out),
  dynamicViscosityInto: (temperatures, out, pressure = STANDARD_ATMOSPHERE) =>
    waterViscosityInto(temperatures, pressure, out),
  vaporPressureInto: (temperatures, out) => waterSaturationPressureInto(temperatures, out),
};

/**
 * Liquid water, from the international formulations: density from IAPWS-IF97 region 1,
 * vapour pressure from IAPWS-IF97 region 4, viscosity from the IAPWS 2008 formulation (see
 * {@link waterDensity}, {@link waterSaturationPressure}, {@link waterViscosity}); the
 * (isentropic) bulk modulus `rho w^2` and the isobaric specific heat capacity from IF97
 * region 1 too (see {@link waterSpeedOfSound}, {@link waterSpecificHeat}).
 *
 * `at(temperature, pressure)` takes an absolute pressure, by default the standard atmosphere
 * (101 325 Pa). States that are not liquid are refused with `OUT_OF_RANGE`: below 273.15 K
 * (ice), at or above the boiling point of the pressure (the message names the pressure that
 * would keep the water liquid), above 623.15 K or above 100 MPa.
 *
 * @returns the water {@link Fluid} (one shared, immutable object)
 * @example
 * ```ts
 * const s = water().at(q(20, 'degC'));
 * to(s.density, 'kg/m3'); // 998.206...
 * to(s.dynamicViscosity, 'mPa*s'); // 1.00160...
 * to(s.kinematicViscosity, 'cSt'); // 1.00341...
 * to(s.vaporPressure ?? q(0, 'Pa'), 'kPa'); // 2.3392...
 * to(s.bulkModulus ?? q(0, 'Pa'), 'MPa'); // 2196.6... (rho w^2)
 * to(s.specificHeat ?? q(0, 'J/(kg*K)'), 'kJ/(kg*K)'); // 4.1848...
 * water().at(q(100, 'degC')); // throws OUT_OF_RANGE: boils at 99.97 degC at 1 atm
 * ```
 */
export function water(): Fluid {
  return WATER;
}

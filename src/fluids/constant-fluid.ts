/**
 * A fluid known at one state: the same properties at every temperature and pressure.
 *
 * @module
 */
import { argumentError, checkPositive } from '../errors';
import { guardRange, guardRecord, guardResult, guardString } from '../guards';
import {
  type Density,
  type DynamicViscosity,
  type KinematicViscosity,
  type Pressure,
  type SpecificHeat,
  STANDARD_ATMOSPHERE,
  type Temperature,
} from '../units/index';
import { checkSameLength, checkStateInput, noVaporPressure } from './checks';
import type { Fluid, FluidState } from './fluid';

/** Definition of a {@link constantFluid}. */
export interface ConstantFluidDefinition {
  /** Name for reports. */
  readonly name: string;
  /** Density (kg/m^3), > 0. */
  readonly density: Density;
  /** Dynamic viscosity (Pa s), > 0. */
  readonly dynamicViscosity: DynamicViscosity;
  /** Vapour pressure (Pa, absolute), >= 0; leave out when unknown (no NPSH check possible). */
  readonly vaporPressure?: Pressure;
  /** Bulk modulus of elasticity (Pa), > 0; leave out when unknown (no surge estimate). */
  readonly bulkModulus?: Pressure;
  /** Isobaric specific heat capacity (J/(kg K)), > 0; leave out when unknown. */
  readonly specificHeat?: SpecificHeat;
}

/**
 * A fluid whose properties are known at one state and taken as constant: `at()` returns the
 * same density, viscosity and vapour pressure at any temperature and pressure. Use it for a
 * fluid from a data sheet at the operating temperature; where the temperature varies, prefer
 * {@link tabulatedFluid} (the constant fluid cannot tell you that a value no longer holds).
 *
 * @param definition - name, density (kg/m^3), dynamic viscosity (Pa s), optional vapour
 *   pressure (Pa), optional bulk modulus (Pa) and specific heat capacity (J/(kg K))
 * @returns a {@link Fluid}; its `validRange` is 0 K to Infinity (no temperature dependence)
 * @throws HeadflowError `INVALID_ARGUMENT` for an empty name, a non-positive or non-finite
 *   density or viscosity, a negative vapour pressure, or a bulk modulus or specific heat that
 *   is given but not a finite number > 0.
 * @example
 * ```ts
 * const oil = constantFluid({ name: 'light oil', density: q(870, 'kg/m3'), dynamicViscosity: q(30, 'cP') });
 * to(oil.at(q(40, 'degC')).kinematicViscosity, 'cSt'); // 34.48...
 * ```
 */
export function constantFluid(definition: ConstantFluidDefinition): Fluid {
  const { name, density, dynamicViscosity, vaporPressure } = guardRecord(
    'definition',
    definition,
  ) as unknown as ConstantFluidDefinition;
  if (typeof name === 'string') guardString('name', name);
  if (typeof name !== 'string' || name.trim() === '') {
    throw argumentError('INVALID_ARGUMENT', 'name', name, undefined, 'a non-empty string');
  }
  checkPositive('density', density, 'kg/m3');
  checkPositive('dynamicViscosity', dynamicViscosity, 'Pa*s');
  if (
    vaporPressure !== undefined &&
    (typeof vaporPressure !== 'number' || !Number.isFinite(vaporPressure) || vaporPressure < 0)
  ) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'vaporPressure',
      vaporPressure,
      'Pa',
      'a finite absolute pressure >= 0 Pa',
    );
  }
  const extras: { bulkModulus?: Pressure; specificHeat?: SpecificHeat } = {};
  if (definition.bulkModulus !== undefined) {
    extras.bulkModulus = guardRange('bulkModulus', definition.bulkModulus, {
      min: 0,
      minOpen: true,
      unit: 'Pa',
    }) as Pressure;
  }
  if (definition.specificHeat !== undefined) {
    extras.specificHeat = guardRange('specificHeat', definition.specificHeat, {
      min: 0,
      minOpen: true,
      unit: 'J/(kg*K)',
    }) as SpecificHeat;
  }
  const nu = guardResult(
    'kinematicViscosity',
    dynamicViscosity / density,
    'OUT_OF_RANGE',
  ) as KinematicViscosity;
  const fill = (
    temperatures: ArrayLike<number>,
    out: Float64Array,
    value: number,
  ): Float64Array => {
    checkSameLength(temperatures, out);
    for (let i = 0; i < temperatures.length; i++) {
      checkStateInput(temperatures[i] as number, 0, `temperatures[${String(i)}]`);
      out[i] = value;
    }
    return out;
  };
  return {
    name,
    validRange: {
      minTemperature: 0 as Temperature,
      maxTemperature: Number.POSITIVE_INFINITY as Temperature,
      description: 'constant properties, taken as valid at any temperature and pressure',
    },
    hasVaporPressure: vaporPressure !== undefined,
    at(temperature: Temperature, pressure: Pressure = STANDARD_ATMOSPHERE): FluidState {
      checkStateInput(temperature, pressure);
      const state = {
        temperature,
        pressure,
        density,
        dynamicViscosity,
        kinematicViscosity: nu,
        ...extras,
      };
      return vaporPressure === undefined ? state : { ...state, vaporPressure };
    },
    densityInto: (temperatures, out) => fill(temperatures, out, density),
    dynamicViscosityInto: (temperatures, out) => fill(temperatures, out, dynamicViscosity),
    vaporPressureInto: (temperatures, out) => {
      if (vaporPressure === undefined) throw noVaporPressure(name);
      return fill(temperatures, out, vaporPressure);
    },
  };
}

/**
 * The common shape of every fluid: a name, the range where its data hold, and its state at a
 * temperature and pressure.
 *
 * @module
 */
import type {
  Density,
  DynamicViscosity,
  KinematicViscosity,
  Pressure,
  SpecificHeat,
  Temperature,
} from '../units/index';

/** The properties of a fluid at one temperature and pressure (branded SI quantities). */
export interface FluidState {
  /** Temperature (K). */
  readonly temperature: Temperature;
  /** Absolute pressure (Pa) the state was evaluated at. */
  readonly pressure: Pressure;
  /** Density (kg/m^3). */
  readonly density: Density;
  /** Dynamic viscosity (Pa s). */
  readonly dynamicViscosity: DynamicViscosity;
  /** Kinematic viscosity, dynamic viscosity / density (m^2/s). */
  readonly kinematicViscosity: KinematicViscosity;
  /** Vapour (saturation) pressure at the temperature (Pa, absolute), when the fluid has one. */
  readonly vaporPressure?: Pressure;
  /**
   * Bulk modulus of elasticity (Pa), the pressure rise per relative change of density,
   * `K = rho dp/drho`, when the fluid has one. For water it is the isentropic modulus
   * `rho w^2` from the IAPWS-IF97 speed of sound; a pressure surge travels at `sqrt(K/rho)`
   * in a rigid pipe (see `waveSpeed`).
   */
  readonly bulkModulus?: Pressure;
  /** Isobaric specific heat capacity (J/(kg K)), when the fluid has one (see `temperatureRise`). */
  readonly specificHeat?: SpecificHeat;
}

/** Where a fluid's properties are defined. Outside it, `at()` throws `OUT_OF_RANGE`. */
export interface FluidRange {
  /** Lowest temperature (K). */
  readonly minTemperature: Temperature;
  /** Highest temperature (K); `Infinity` when the data do not depend on temperature. */
  readonly maxTemperature: Temperature;
  /** Lowest absolute pressure (Pa), where one applies. */
  readonly minPressure?: Pressure;
  /** Highest absolute pressure (Pa), where one applies. */
  readonly maxPressure?: Pressure;
  /** The range in words, with any condition the numbers cannot say (for example "liquid only"). */
  readonly description: string;
}

/** A fluid: water, a fluid known at one state, a table, or a catalogue entry. */
export interface Fluid {
  /** Name for reports, for example `"water (IAPWS-IF97, IAPWS 2008)"`. */
  readonly name: string;
  /** Where the fluid's data hold. */
  readonly validRange: FluidRange;
  /** True when states carry a vapour pressure (needed for NPSH). */
  readonly hasVaporPressure: boolean;
  /**
   * The fluid's properties at a temperature and absolute pressure.
   * @param temperature - temperature (K)
   * @param pressure - absolute pressure (Pa); default the standard atmosphere, 101 325 Pa
   * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinite or negative absolute input;
   *   `OUT_OF_RANGE` outside {@link Fluid.validRange} (for water: ice or boiling).
   */
  at(temperature: Temperature, pressure?: Pressure): FluidState;
  /** Fills `out[i]` with the density (kg/m^3) at `temperatures[i]` (K); allocates nothing. */
  densityInto(
    temperatures: ArrayLike<number>,
    out: Float64Array,
    pressure?: Pressure,
  ): Float64Array;
  /** Fills `out[i]` with the dynamic viscosity (Pa s) at `temperatures[i]` (K); allocates nothing. */
  dynamicViscosityInto(
    temperatures: ArrayLike<number>,
    out: Float64Array,
    pressure?: Pressure,
  ): Float64Array;
  /**
   * Fills `out[i]` with the vapour pressure (Pa) at `temperatures[i]` (K); allocates nothing.
   * @throws HeadflowError `OUT_OF_RANGE` when the fluid has no vapour-pressure data.
   */
  vaporPressureInto(temperatures: ArrayLike<number>, out: Float64Array): Float64Array;
}

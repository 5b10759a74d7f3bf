/**
 * Fluid properties: liquid water from the IAPWS formulations (IAPWS-IF97 density and
 * saturation pressure, IAPWS 2008 viscosity), fluids known at one state, tabulated fluids with
 * monotone interpolation, and the common {@link Fluid} shape that the rest of headflow reads.
 *
 * @module fluids
 */
export { type ConstantFluidDefinition, constantFluid } from './constant-fluid';
export type { Fluid, FluidRange, FluidState } from './fluid';
export { waterViscosity, waterViscosityInto } from './iapws-2008-viscosity';
export { waterDensity, waterDensityInto } from './if97-region1';
export {
  waterSaturationPressure,
  waterSaturationPressureInto,
  waterSaturationTemperature,
} from './if97-region4';
export {
  type FluidTableRow,
  type TabulatedFluidDefinition,
  tabulatedFluid,
} from './tabulated-fluid';
export { water } from './water';
export { waterSpeedOfSound } from './water-sound-speed';
export { waterSpecificHeat } from './water-specific-heat';

/**
 * Physical quantities as branded SI numbers: make them with `q`, read them with `to`, parse
 * and format them as text, and convert gauge/absolute pressure and head.
 *
 * @module units
 */
export {
  type DimensionOf,
  UNITS,
  type UnitDefinition,
  type UnitOf,
  type UnitSymbol,
} from './catalogue';
export { STANDARD_ATMOSPHERE, STANDARD_GRAVITY } from './constants';
export { convert, DIMENSIONS, isUnit, q, to, unitsOf } from './convert';
export { formatQuantity, parseQuantity } from './parse';
export { absoluteToGauge, gaugeToAbsolute, headFromPressure, pressureFromHead } from './pressure';
export type {
  Acceleration,
  Area,
  Density,
  Dimension,
  DynamicViscosity,
  Energy,
  Flow,
  Force,
  KinematicViscosity,
  Length,
  Mass,
  MassFlow,
  Power,
  Pressure,
  Quantity,
  RotationalSpeed,
  SpecificHeat,
  Temperature,
  Time,
  Velocity,
  Volume,
} from './quantity';
export { si } from './quantity';

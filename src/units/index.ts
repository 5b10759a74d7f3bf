/**
 * Physical quantities as branded SI numbers: make them with `q`, read them with `to`, parse
 * and format them as text, and convert gauge/absolute pressure and head.
 *
 * @module units
 */
export { type PressureReference, UNIT_ALIASES, type UnitAlias } from './aliases';
export { ATMOSPHERE_ELEVATION_RANGE, atmosphereAt } from './atmosphere';
export {
  type DimensionOf,
  UNITS,
  type UnitDefinition,
  type UnitOf,
  type UnitSymbol,
} from './catalogue';
export { STANDARD_ATMOSPHERE, STANDARD_GRAVITY } from './constants';
export { aliasesOf, convert, DIMENSIONS, isUnit, q, to, unitsOf } from './convert';
export {
  formatQuantity,
  type ParsePressureOptions,
  type PressureReading,
  parsePressure,
  parseQuantity,
} from './parse';
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

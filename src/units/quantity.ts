/**
 * Branded quantity types: a plain `number` in coherent SI that carries its dimension in the
 * type only. The brand costs nothing at run time.
 *
 * @module
 */

/** The physical dimensions headflow works with. Head is a `length` (of the fluid column). */
export type Dimension =
  | 'length'
  | 'area'
  | 'volume'
  | 'flow'
  | 'massFlow'
  | 'velocity'
  | 'acceleration'
  | 'pressure'
  | 'density'
  | 'dynamicViscosity'
  | 'kinematicViscosity'
  | 'temperature'
  | 'power'
  | 'energy'
  | 'specificHeat'
  | 'force'
  | 'mass'
  | 'time'
  | 'rotationalSpeed';

/**
 * A number in coherent SI whose dimension `D` is known to the type checker. The brand
 * `'~dimension'` exists only in the types (no object carries it at run time); a plain string
 * key keeps it nameable in declaration files.
 * Make one with `q(value, unit)`; read it with `to(quantity, unit)`.
 */
export type Quantity<D extends Dimension> = number & { readonly '~dimension': D };

/** Length in metres (also head, as the height of a fluid column). */
export type Length = Quantity<'length'>;
/** Area in square metres. */
export type Area = Quantity<'area'>;
/** Volume in cubic metres. */
export type Volume = Quantity<'volume'>;
/** Volumetric flow rate in cubic metres per second. */
export type Flow = Quantity<'flow'>;
/** Mass flow rate in kilograms per second. */
export type MassFlow = Quantity<'massFlow'>;
/** Velocity in metres per second. */
export type Velocity = Quantity<'velocity'>;
/** Acceleration in metres per second squared. */
export type Acceleration = Quantity<'acceleration'>;
/** Pressure in pascals; absolute unless a name says otherwise (a drop, a difference). */
export type Pressure = Quantity<'pressure'>;
/** Density in kilograms per cubic metre. */
export type Density = Quantity<'density'>;
/** Dynamic viscosity in pascal seconds. */
export type DynamicViscosity = Quantity<'dynamicViscosity'>;
/** Kinematic viscosity in square metres per second. */
export type KinematicViscosity = Quantity<'kinematicViscosity'>;
/** Thermodynamic (absolute) temperature in kelvins. */
export type Temperature = Quantity<'temperature'>;
/** Power in watts. */
export type Power = Quantity<'power'>;
/** Energy in joules. */
export type Energy = Quantity<'energy'>;
/** Specific heat capacity in joules per kilogram kelvin. */
export type SpecificHeat = Quantity<'specificHeat'>;
/** Force in newtons. */
export type Force = Quantity<'force'>;
/** Mass in kilograms. */
export type Mass = Quantity<'mass'>;
/** Time in seconds. */
export type Time = Quantity<'time'>;
/** Rotational speed in radians per second. */
export type RotationalSpeed = Quantity<'rotationalSpeed'>;

/**
 * Brands a number that is already in coherent SI. Use it only where the number is known to
 * be SI of that dimension (inside the library, or reading back one of its own results).
 *
 * A type brand only: it returns `value` itself and checks nothing (a test may brand NaN on
 * purpose); every function that takes the quantity checks it.
 *
 * @example
 * ```ts
 * const d = si<'length'>(0.1023); // 102.3 mm as a Length
 * ```
 */
export function si<D extends Dimension>(value: number): Quantity<D> {
  return value as Quantity<D>;
}

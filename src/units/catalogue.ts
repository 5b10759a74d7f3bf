/**
 * The unit catalogue: one table from symbol to dimension, factor and offset.
 *
 * A value `v` in a unit converts to coherent SI as `(v + offset) * factor`; the offset is
 * zero except for degC and degF. Every factor is an exact definition from NIST Special
 * Publication 811 (2008 edition), "Guide for the Use of the International System of Units",
 * Appendix B.8 (factors in alphabetical order) and B.9 (by kind of quantity); where SP 811
 * prints a rounded number for a unit defined exactly by others (psi, slug, hp), the factor
 * here is built from those exact definitions (lbf = 0.45359237 kg x 9.80665 m/s^2,
 * ft = 0.3048 m, US gal = 231 in^3) and tests/reference/nist-sp811.test.ts checks it
 * against the printed value.
 *
 * @module
 */

import type { Dimension } from './quantity';

/** One row of the catalogue. */
export interface UnitDefinition {
  readonly dimension: Dimension;
  /** Multiplier to coherent SI after the offset is added. */
  readonly factor: number;
  /** Added to the value before the factor (degC, degF); zero for all other units. */
  readonly offset: number;
  /** Plain name for messages and docs. */
  readonly name: string;
}

/** Exact base definitions (NIST SP 811, Appendix B). */
const INCH = 0.0254; // m, exact
const FOOT = 0.3048; // m, exact
const POUND = 0.45359237; // kg (avoirdupois pound), exact
const GRAVITY = 9.80665; // m/s^2, standard acceleration of gravity, exact (CGPM 1901)
const POUND_FORCE = POUND * GRAVITY; // N = 4.448 221 615 260 5, exact
const US_GALLON = 231 * INCH ** 3; // m^3 = 3.785 411 784 E-03, exact
const IMPERIAL_GALLON = 4.54609e-3; // m^3, exact
const CUBIC_FOOT = FOOT ** 3; // m^3 = 2.831 684 659 2 E-02, exact
const SLUG = POUND_FORCE / FOOT; // kg = 1.459 390 E+01 (lbf s^2/ft)
const WATER_DENSITY_CONVENTIONAL = 1000; // kg/m^3, conventional water column (SP 811 B.8 note)
const MERCURY_DENSITY_CONVENTIONAL = 13595.1; // kg/m^3, conventional mercury column
const MINUTE = 60;
const HOUR = 3600;
const DAY = 86400;
const TWO_PI = 2 * Math.PI;

function unit<D extends Dimension>(
  dimension: D,
  factor: number,
  name: string,
  offset = 0,
): UnitDefinition & { readonly dimension: D } {
  return { dimension, factor, offset, name };
}

/**
 * Every unit headflow understands, by symbol. Symbols are ASCII: `m3/h`, `Pa*s`, `degC`.
 * `gal` is the US gallon, `hp` the mechanical horsepower (550 ft lbf/s), `lb` the
 * pound-mass, `Btu` the International Table Btu, `psi` pound-force per square inch.
 * The litre (1 L = 1e-3 m^3), the hour (3600 s), the day (86 400 s) and the kilowatt hour
 * (3.6e6 J) are exact in NIST SP 811 Appendix B.8; `ML/d`, `m3/d`, `L/h`, `MWh` and `GJ`
 * are built from them with SI prefixes (SP 811 section 4). Text may also use the spellings
 * engineers write (`gpm`, `m3/hr`, `feet`, `deg F` ...): see `aliasesOf`.
 */
export const UNITS = {
  // length
  m: unit('length', 1, 'metre'),
  mm: unit('length', 1e-3, 'millimetre'),
  cm: unit('length', 1e-2, 'centimetre'),
  km: unit('length', 1e3, 'kilometre'),
  in: unit('length', INCH, 'inch'),
  ft: unit('length', FOOT, 'foot'),
  yd: unit('length', 3 * FOOT, 'yard'),
  mi: unit('length', 5280 * FOOT, 'mile (international)'),
  // area
  m2: unit('area', 1, 'square metre'),
  cm2: unit('area', 1e-4, 'square centimetre'),
  mm2: unit('area', 1e-6, 'square millimetre'),
  in2: unit('area', INCH * INCH, 'square inch'),
  ft2: unit('area', FOOT * FOOT, 'square foot'),
  // volume
  m3: unit('volume', 1, 'cubic metre'),
  L: unit('volume', 1e-3, 'litre'),
  mL: unit('volume', 1e-6, 'millilitre'),
  gal: unit('volume', US_GALLON, 'US gallon'),
  impgal: unit('volume', IMPERIAL_GALLON, 'imperial gallon'),
  ft3: unit('volume', CUBIC_FOOT, 'cubic foot'),
  in3: unit('volume', INCH ** 3, 'cubic inch'),
  // volumetric flow
  'm3/s': unit('flow', 1, 'cubic metre per second'),
  'm3/h': unit('flow', 1 / HOUR, 'cubic metre per hour'),
  'L/s': unit('flow', 1e-3, 'litre per second'),
  'L/min': unit('flow', 1e-3 / MINUTE, 'litre per minute'),
  'gal/min': unit('flow', US_GALLON / MINUTE, 'US gallon per minute'),
  'impgal/min': unit('flow', IMPERIAL_GALLON / MINUTE, 'imperial gallon per minute'),
  'ft3/s': unit('flow', CUBIC_FOOT, 'cubic foot per second'),
  'ft3/min': unit('flow', CUBIC_FOOT / MINUTE, 'cubic foot per minute'),
  'Mgal/d': unit('flow', (1e6 * US_GALLON) / DAY, 'million US gallons per day'),
  'm3/d': unit('flow', 1 / DAY, 'cubic metre per day'),
  'ML/d': unit('flow', (1e6 * 1e-3) / DAY, 'megalitre per day'),
  'L/h': unit('flow', 1e-3 / HOUR, 'litre per hour'),
  // mass flow
  'kg/s': unit('massFlow', 1, 'kilogram per second'),
  'kg/h': unit('massFlow', 1 / HOUR, 'kilogram per hour'),
  'lb/s': unit('massFlow', POUND, 'pound per second'),
  'lb/h': unit('massFlow', POUND / HOUR, 'pound per hour'),
  // velocity
  'm/s': unit('velocity', 1, 'metre per second'),
  'ft/s': unit('velocity', FOOT, 'foot per second'),
  'ft/min': unit('velocity', FOOT / MINUTE, 'foot per minute'),
  // acceleration
  'm/s2': unit('acceleration', 1, 'metre per second squared'),
  'ft/s2': unit('acceleration', FOOT, 'foot per second squared'),
  // pressure (absolute unless converted explicitly from gauge)
  Pa: unit('pressure', 1, 'pascal'),
  kPa: unit('pressure', 1e3, 'kilopascal'),
  MPa: unit('pressure', 1e6, 'megapascal'),
  bar: unit('pressure', 1e5, 'bar'),
  mbar: unit('pressure', 1e2, 'millibar'),
  atm: unit('pressure', 101325, 'standard atmosphere'),
  psi: unit('pressure', POUND_FORCE / (INCH * INCH), 'pound-force per square inch'),
  psf: unit('pressure', POUND_FORCE / (FOOT * FOOT), 'pound-force per square foot'),
  inHg: unit(
    'pressure',
    MERCURY_DENSITY_CONVENTIONAL * INCH * GRAVITY,
    'inch of mercury (conventional)',
  ),
  mmHg: unit(
    'pressure',
    MERCURY_DENSITY_CONVENTIONAL * 1e-3 * GRAVITY,
    'millimetre of mercury (conventional)',
  ),
  ftH2O: unit(
    'pressure',
    WATER_DENSITY_CONVENTIONAL * FOOT * GRAVITY,
    'foot of water (conventional)',
  ),
  mH2O: unit('pressure', WATER_DENSITY_CONVENTIONAL * GRAVITY, 'metre of water (conventional)'),
  inH2O: unit(
    'pressure',
    WATER_DENSITY_CONVENTIONAL * INCH * GRAVITY,
    'inch of water (conventional)',
  ),
  // density
  'kg/m3': unit('density', 1, 'kilogram per cubic metre'),
  'g/cm3': unit('density', 1e3, 'gram per cubic centimetre'),
  'lb/ft3': unit('density', POUND / CUBIC_FOOT, 'pound per cubic foot'),
  'slug/ft3': unit('density', SLUG / CUBIC_FOOT, 'slug per cubic foot'),
  // dynamic viscosity
  'Pa*s': unit('dynamicViscosity', 1, 'pascal second'),
  'mPa*s': unit('dynamicViscosity', 1e-3, 'millipascal second'),
  cP: unit('dynamicViscosity', 1e-3, 'centipoise'),
  P: unit('dynamicViscosity', 0.1, 'poise'),
  'lbf*s/ft2': unit(
    'dynamicViscosity',
    POUND_FORCE / (FOOT * FOOT),
    'pound-force second per square foot',
  ),
  // kinematic viscosity
  'm2/s': unit('kinematicViscosity', 1, 'square metre per second'),
  'mm2/s': unit('kinematicViscosity', 1e-6, 'square millimetre per second'),
  cSt: unit('kinematicViscosity', 1e-6, 'centistokes'),
  St: unit('kinematicViscosity', 1e-4, 'stokes'),
  'ft2/s': unit('kinematicViscosity', FOOT * FOOT, 'square foot per second'),
  // temperature (absolute scale; degC and degF carry an offset)
  K: unit('temperature', 1, 'kelvin'),
  degC: unit('temperature', 1, 'degree Celsius', 273.15),
  degF: unit('temperature', 5 / 9, 'degree Fahrenheit', 459.67),
  degR: unit('temperature', 5 / 9, 'degree Rankine'),
  // power
  W: unit('power', 1, 'watt'),
  kW: unit('power', 1e3, 'kilowatt'),
  MW: unit('power', 1e6, 'megawatt'),
  hp: unit('power', 550 * FOOT * POUND_FORCE, 'horsepower (550 ft lbf/s)'),
  // energy
  J: unit('energy', 1, 'joule'),
  kJ: unit('energy', 1e3, 'kilojoule'),
  MJ: unit('energy', 1e6, 'megajoule'),
  GJ: unit('energy', 1e9, 'gigajoule'),
  kWh: unit('energy', 3.6e6, 'kilowatt hour'),
  MWh: unit('energy', 3.6e9, 'megawatt hour'),
  Btu: unit('energy', 1055.05585262, 'British thermal unit (International Table)'),
  // specific heat capacity
  'J/(kg*K)': unit('specificHeat', 1, 'joule per kilogram kelvin'),
  'kJ/(kg*K)': unit('specificHeat', 1e3, 'kilojoule per kilogram kelvin'),
  // SP 811 B.8: Btu_IT/(lb degF) = 4.1868 E+03 J/(kg K), exact (1055.05585262 / (lb x 5/9)).
  'Btu/(lb*degF)': unit(
    'specificHeat',
    4186.8,
    'Btu (International Table) per pound degree Fahrenheit',
  ),
  // force
  N: unit('force', 1, 'newton'),
  kN: unit('force', 1e3, 'kilonewton'),
  lbf: unit('force', POUND_FORCE, 'pound-force'),
  // mass
  kg: unit('mass', 1, 'kilogram'),
  g: unit('mass', 1e-3, 'gram'),
  lb: unit('mass', POUND, 'pound (avoirdupois, mass)'),
  slug: unit('mass', SLUG, 'slug'),
  // time
  s: unit('time', 1, 'second'),
  min: unit('time', MINUTE, 'minute'),
  h: unit('time', HOUR, 'hour'),
  d: unit('time', DAY, 'day'),
  // rotational speed
  'rad/s': unit('rotationalSpeed', 1, 'radian per second'),
  rpm: unit('rotationalSpeed', TWO_PI / MINUTE, 'revolution per minute'),
  'rev/s': unit('rotationalSpeed', TWO_PI, 'revolution per second'),
} as const satisfies Record<string, UnitDefinition>;

/** Every unit symbol in the catalogue. */
export type UnitSymbol = keyof typeof UNITS;

/** The dimension of a unit symbol: `DimensionOf<'ft'>` is `'length'`. */
export type DimensionOf<U extends UnitSymbol> = (typeof UNITS)[U]['dimension'];

/** The unit symbols of one dimension: `UnitOf<'flow'>` is `'m3/s' | 'm3/h' | ...`. */
export type UnitOf<D extends Dimension> = {
  [U in UnitSymbol]: DimensionOf<U> extends D ? U : never;
}[UnitSymbol];

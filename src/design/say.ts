/**
 * Values in words, in one unit system: every number a report or a check message shows goes
 * through here, so that an SI report never prints a foot and a US report never a metre.
 *
 * @module
 * @internal
 */
import {
  type Dimension,
  type Power,
  type Pressure,
  type Quantity,
  to,
  type UnitOf,
} from '../units/index';
import { displayUnits } from './display-units';
import type { DisplayUnits, UnitSystem } from './types';

/** How unit symbols are written: `'ascii'` (`m3/h`, `degC`) or `'unicode'` (`m³/h`, `°C`). */
export type SymbolStyle = 'ascii' | 'unicode';

const UNICODE: Readonly<Record<string, string>> = {
  'm3/h': 'm³/h',
  'm3/s': 'm³/s',
  'kg/m3': 'kg/m³',
  'lb/ft3': 'lb/ft³',
  'mm2/s': 'mm²/s',
  'ft2/s': 'ft²/s',
  degC: '°C',
  degF: '°F',
  'kWh/m3': 'kWh/m³',
  'kWh/kgal': 'kWh/kgal',
};

/** A unit symbol written in a style. */
export function symbol(unit: string, style: SymbolStyle): string {
  return style === 'unicode' ? (UNICODE[unit] ?? unit) : unit;
}

/** A number to `digits` significant digits, without trailing zeros (`38`, `0.25`, `1692`). */
export function short(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return '-';
  const r = Math.abs(x) >= 10 ** digits ? Math.round(x) : Number(x.toPrecision(digits));
  return String(r === 0 ? 0 : r);
}

/** Units of the quantities beyond {@link DisplayUnits} that a report shows. */
export interface MoreUnits {
  readonly temperature: UnitOf<'temperature'>;
  readonly density: UnitOf<'density'>;
  readonly kinematicViscosity: UnitOf<'kinematicViscosity'>;
  readonly diameter: UnitOf<'length'>;
  readonly roughness: UnitOf<'length'>;
  /** Energy per volume pumped: kWh per m3 or per 1000 US gallons (written `kWh/kgal`). */
  readonly specificEnergy: 'kWh/m3' | 'kWh/kgal';
}

const MORE_SI: MoreUnits = {
  temperature: 'degC',
  density: 'kg/m3',
  kinematicViscosity: 'mm2/s',
  diameter: 'mm',
  roughness: 'mm',
  specificEnergy: 'kWh/m3',
};
const MORE_US: MoreUnits = {
  temperature: 'degF',
  density: 'lb/ft3',
  // Centistokes: the unit US pump practice quotes viscosity in (ANSI/HI 9.6.7 tables use cSt).
  kinematicViscosity: 'cSt',
  diameter: 'in',
  roughness: 'in',
  specificEnergy: 'kWh/kgal',
};

/** The extra units of a unit system. */
export function moreUnits(system: UnitSystem): MoreUnits {
  return system === 'us' ? MORE_US : MORE_SI;
}

/** J per m3 in one kWh per m3, and in one kWh per 1000 US gallons. */
const J_PER_KWH = 3.6e6;
const M3_PER_KGAL = 3.785411784; // 1000 US gallons (NIST SP 811: 1 gal = 3.785411784 L)

/** Formats values of a report in one unit system and symbol style. */
export interface Say {
  readonly system: UnitSystem;
  readonly style: SymbolStyle;
  readonly units: DisplayUnits;
  readonly more: MoreUnits;
  /** A unit symbol in this style. */
  sym(unit: string): string;
  /** A quantity with its unit, `digits` significant digits (`144 m3/h`). */
  q<D extends Dimension>(x: Quantity<D> | number, unit: UnitOf<D>, digits?: number): string;
  flow(x: number, digits?: number): string;
  head(x: number, digits?: number): string;
  length(x: number, digits?: number): string;
  velocity(x: number, digits?: number): string;
  power(x: number, digits?: number): string;
  speed(x: number): string;
  temperature(x: number): string;
  density(x: number): string;
  /** An absolute pressure, marked absolute (`101.3 kPa abs`, `14.7 psia`). */
  absolute(x: number, digits?: number): string;
  /** Energy per volume pumped (J/m3 in). */
  specificEnergy(x: number): string;
  /**
   * A motor rating: in an SI report in kW, with a NEMA nameplate in hp in brackets
   * (`44.7 kW (60 hp)`); in a US report in hp, with an IEC nameplate in kW in brackets
   * (`49.6 hp (37 kW)`).
   */
  motor(rating: number, nameplate: number, unit: 'hp' | 'kW'): string;
}

/** `kPa abs` / `psia`: a pressure unit with its reference. */
export function pressureUnit(system: UnitSystem, reference: 'absolute' | 'gauge'): string {
  if (system === 'us') return reference === 'absolute' ? 'psia' : 'psig';
  return reference === 'absolute' ? 'kPa abs' : 'kPa gauge';
}

/** Words for values in a unit system. */
export function sayIn(system: UnitSystem, style: SymbolStyle = 'ascii'): Say {
  const u = displayUnits(system);
  const more = moreUnits(system);
  const sym = (unit: string): string => symbol(unit, style);
  const q = <D extends Dimension>(x: Quantity<D> | number, unit: UnitOf<D>, digits = 4): string =>
    Number.isFinite(x) ? `${short(to(x as Quantity<D>, unit), digits)} ${sym(unit)}` : '-';
  return {
    system,
    style,
    units: u,
    more,
    sym,
    q,
    flow: (x, d = 4) => q(x, u.flow, d),
    head: (x, d = 3) => q(x, u.head, d),
    length: (x, d = 4) => q(x, u.length, d),
    velocity: (x, d = 3) => q(x, u.velocity, d),
    power: (x, d = 3) => q(x, u.power, d),
    speed: (x) =>
      Number.isFinite(x) ? `${Math.round(to(x as Quantity<'rotationalSpeed'>, 'rpm'))} rpm` : '-',
    temperature: (x) => q(x, more.temperature, 4),
    density: (x) => q(x, more.density, 5),
    absolute: (x, d = 4) =>
      Number.isFinite(x)
        ? `${short(to(x as Pressure, u.pressure), d)} ${pressureUnit(system, 'absolute')}`
        : '-',
    specificEnergy: (x) => {
      const perM3 = x / J_PER_KWH;
      const v = system === 'us' ? perM3 * M3_PER_KGAL : perM3;
      return `${short(v, 3)} ${sym(more.specificEnergy)}`;
    },
    motor: (rating, nameplate, unit) => {
      if (!Number.isFinite(rating) || !Number.isFinite(nameplate)) return '-';
      const own = u.power === 'kW' ? 'kW' : 'hp';
      if (unit === own) return `${short(nameplate)} ${own}`;
      return `${short(to(rating as Power, u.power), 3)} ${own} (${short(nameplate)} ${unit})`;
    },
  };
}

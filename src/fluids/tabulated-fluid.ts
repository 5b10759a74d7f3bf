/**
 * A fluid given by a table of properties at temperatures, interpolated monotonically.
 *
 * @module
 */
import { argumentError, HeadflowError } from '../errors';
import { guardArray, guardRecord, guardResult, guardString } from '../guards';
import { type MonotoneCubic, monotoneCubic } from '../numeric/index';
import {
  type Density,
  type DynamicViscosity,
  type KinematicViscosity,
  type Pressure,
  type SpecificHeat,
  STANDARD_ATMOSPHERE,
  type Temperature,
} from '../units/index';
import { checkSameLength, checkStateInput, noVaporPressure, showTemperature } from './checks';
import type { Fluid, FluidState } from './fluid';

/** One row of a {@link tabulatedFluid}: the properties at one temperature. */
export interface FluidTableRow {
  /** Temperature (K); rows in strictly increasing temperature. */
  readonly temperature: Temperature;
  /** Density (kg/m^3), > 0. */
  readonly density: Density;
  /** Dynamic viscosity (Pa s), > 0. */
  readonly dynamicViscosity: DynamicViscosity;
  /** Vapour pressure (Pa, absolute), > 0; give it in every row or in none. */
  readonly vaporPressure?: Pressure;
  /** Bulk modulus of elasticity (Pa), > 0; give it in every row or in none. */
  readonly bulkModulus?: Pressure;
  /** Isobaric specific heat capacity (J/(kg K)), > 0; give it in every row or in none. */
  readonly specificHeat?: SpecificHeat;
}

/** Definition of a {@link tabulatedFluid}. */
export interface TabulatedFluidDefinition {
  /** Name for reports. */
  readonly name: string;
  /** At least two rows, in strictly increasing temperature. */
  readonly rows: readonly FluidTableRow[];
  /** Where the numbers come from (handbook, table, data sheet), for reports. */
  readonly source?: string;
}

function positive(value: unknown, parameter: string, unit: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw argumentError('INVALID_ARGUMENT', parameter, value, unit, 'a finite number > 0');
  }
  return value;
}

/**
 * A fluid from a table of density, viscosity and (optionally) vapour pressure at
 * temperatures, for liquids that headflow has no formulation for (a heat-transfer fluid from
 * its data sheet, a glycol solution from a handbook table).
 *
 * Between rows the properties are interpolated in temperature by the monotone piecewise cubic
 * of Steffen (1990) (the monotone cubic of src/numeric/interpolate.ts): density directly, viscosity and vapour
 * pressure through their logarithms (both vary roughly exponentially with temperature), bulk
 * modulus and specific heat capacity (optional columns) directly, so the
 * interpolant passes through every row, never overshoots between rows and keeps the trend of
 * the table. The table is taken as independent of pressure. Outside the table `at()` throws
 * `OUT_OF_RANGE`: headflow never extrapolates a table.
 *
 * @param definition - name, rows (temperature K, density kg/m^3, dynamic viscosity Pa s,
 *   optional vapour pressure Pa), optional source text
 * @returns a {@link Fluid} whose `validRange` is the table's temperature span
 * @throws HeadflowError `INVALID_ARGUMENT` for an empty name, fewer than two rows,
 *   temperatures that do not strictly increase, a non-positive or non-finite property, or a
 *   vapour pressure, bulk modulus or specific heat in some rows but not in others.
 * @example
 * ```ts
 * const brine = tabulatedFluid({
 *   name: 'demo brine (invented numbers)',
 *   rows: [
 *     { temperature: q(0, 'degC'), density: q(1100, 'kg/m3'), dynamicViscosity: q(4, 'cP') },
 *     { temperature: q(20, 'degC'), density: q(1090, 'kg/m3'), dynamicViscosity: q(2, 'cP') },
 *   ],
 * });
 * to(brine.at(q(10, 'degC')).dynamicViscosity, 'cP'); // 2.828... (geometric mean: log interpolation)
 * ```
 */
export function tabulatedFluid(definition: TabulatedFluidDefinition): Fluid {
  // Every field is checked below; the record guard refuses null, arrays and non-objects.
  const { name, rows, source } = guardRecord(
    'definition',
    definition,
  ) as unknown as TabulatedFluidDefinition;
  if (typeof name === 'string') guardString('name', name);
  if (source !== undefined) guardString('source', source, 2000);
  if (Array.isArray(rows)) guardArray('rows', rows, { max: 100_000 });
  if (typeof name !== 'string' || name.trim() === '') {
    throw argumentError('INVALID_ARGUMENT', 'name', name, undefined, 'a non-empty string');
  }
  if (!Array.isArray(rows) || rows.length < 2) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'rows',
      Array.isArray(rows) ? rows.length : rows,
      'rows',
      'at least 2 rows',
    );
  }
  const n = rows.length;
  const t = new Float64Array(n);
  const rho = new Float64Array(n);
  const lnMu = new Float64Array(n);
  const lnPv = new Float64Array(n);
  const withPv = rows[0]?.vaporPressure !== undefined;
  for (let i = 0; i < n; i++) {
    const row = guardRecord(`rows[${i}]`, rows[i]) as Partial<FluidTableRow>;
    t[i] = positive(row.temperature, `rows[${i}].temperature`, 'K');
    if (i > 0 && !((t[i] as number) > (t[i - 1] as number))) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `rows[${i}].temperature`,
        t[i],
        'K',
        `> ${String(t[i - 1])} K (rows in strictly increasing temperature)`,
      );
    }
    rho[i] = positive(row.density, `rows[${i}].density`, 'kg/m3');
    lnMu[i] = Math.log(positive(row.dynamicViscosity, `rows[${i}].dynamicViscosity`, 'Pa*s'));
    if ((row.vaporPressure !== undefined) !== withPv) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `rows[${i}].vaporPressure`,
        row.vaporPressure,
        'Pa',
        'a vapour pressure in every row or in none',
      );
    }
    if (withPv) lnPv[i] = Math.log(positive(row.vaporPressure, `rows[${i}].vaporPressure`, 'Pa'));
  }
  const bulk = optionalColumn(rows, 'bulkModulus', 'Pa');
  const heat = optionalColumn(rows, 'specificHeat', 'J/(kg*K)');
  const density = monotoneCubic(t, rho);
  const logViscosity = monotoneCubic(t, lnMu);
  const logVapor: MonotoneCubic | undefined = withPv ? monotoneCubic(t, lnPv) : undefined;
  const bulkCurve = bulk === undefined ? undefined : monotoneCubic(t, bulk);
  const heatCurve = heat === undefined ? undefined : monotoneCubic(t, heat);
  const tMin = t[0] as number;
  const tMax = t[n - 1] as number;
  const span = `${showTemperature(tMin)} to ${showTemperature(tMax)}`;

  const inTable = (temperature: number, tName: string): void => {
    checkStateInput(temperature, 0, tName);
    if (!density.covers(temperature)) {
      throw new HeadflowError(
        'OUT_OF_RANGE',
        `${tName} = ${showTemperature(temperature)} is outside the table of ${JSON.stringify(name)} ` +
          `(${span}); tables are never extrapolated: extend the table to cover this temperature.`,
        { parameter: tName, value: temperature, unit: 'K', allowed: span },
      );
    }
  };
  const fill = (
    temperatures: ArrayLike<number>,
    out: Float64Array,
    f: (x: number) => number,
  ): Float64Array => {
    checkSameLength(temperatures, out);
    for (let i = 0; i < temperatures.length; i++) {
      const x = temperatures[i] as number;
      inTable(x, `temperatures[${String(i)}]`);
      out[i] = f(x);
    }
    return out;
  };
  const rhoAt = (x: number): number => density.evaluate(x);
  const muAt = (x: number): number => Math.exp(logViscosity.evaluate(x));

  return {
    name,
    validRange: {
      minTemperature: tMin as Temperature,
      maxTemperature: tMax as Temperature,
      description: `table of ${String(n)} rows, ${span}${source ? `; source: ${source}` : ''}`,
    },
    hasVaporPressure: withPv,
    at(temperature: Temperature, pressure: Pressure = STANDARD_ATMOSPHERE): FluidState {
      checkStateInput(temperature, pressure);
      inTable(temperature, 'temperature');
      const r = rhoAt(temperature);
      const mu = muAt(temperature);
      const state: {
        -readonly [K in keyof FluidState]: FluidState[K];
      } = {
        temperature,
        pressure,
        density: r as Density,
        dynamicViscosity: mu as DynamicViscosity,
        kinematicViscosity: guardResult(
          'kinematicViscosity',
          mu / r,
          'OUT_OF_RANGE',
        ) as KinematicViscosity,
      };
      if (bulkCurve) state.bulkModulus = bulkCurve.evaluate(temperature) as Pressure;
      if (heatCurve) state.specificHeat = heatCurve.evaluate(temperature) as SpecificHeat;
      return logVapor === undefined
        ? state
        : { ...state, vaporPressure: Math.exp(logVapor.evaluate(temperature)) as Pressure };
    },
    densityInto: (temperatures, out) => fill(temperatures, out, rhoAt),
    dynamicViscosityInto: (temperatures, out) => fill(temperatures, out, muAt),
    vaporPressureInto: (temperatures, out) => {
      if (logVapor === undefined) throw noVaporPressure(name);
      return fill(temperatures, out, (x) => Math.exp(logVapor.evaluate(x)));
    },
  };
}

/**
 * Reads an optional column (`bulkModulus`, `specificHeat`) that must be given in every row or
 * in none: undefined when absent from all rows, else the values (each finite and > 0).
 */
function optionalColumn(
  rows: readonly FluidTableRow[],
  key: 'bulkModulus' | 'specificHeat',
  unit: string,
): Float64Array | undefined {
  const present = rows[0]?.[key] !== undefined;
  const out = new Float64Array(rows.length);
  for (let i = 0; i < rows.length; i++) {
    const v = (rows[i] as FluidTableRow)[key];
    if ((v !== undefined) !== present) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `rows[${i}].${key}`,
        v,
        unit,
        `a value in every row or in none`,
      );
    }
    if (present) out[i] = positive(v, `rows[${i}].${key}`, unit);
  }
  return present ? out : undefined;
}

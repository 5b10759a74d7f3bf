import { argumentError, checkFinite, checkPositive } from '../errors';
import { guardResult } from '../guards';
import { STANDARD_ATMOSPHERE, STANDARD_GRAVITY } from './constants';
import type { Acceleration, Density, Length, Pressure } from './quantity';

/**
 * Converts a gauge pressure to absolute: `p_abs = p_gauge + p_atm`. headflow's `Pressure` is
 * absolute; a gauge reading must pass through here (or {@link absoluteToGauge}) so that the
 * atmosphere it is referred to is stated, never assumed silently.
 *
 * @param gauge - gauge pressure (Pa); negative for a vacuum
 * @param atmosphere - local atmospheric pressure (Pa, absolute); default 101 325 Pa
 * @throws HeadflowError `INVALID_ARGUMENT` for non-finite input or a non-positive atmosphere,
 *   `OUT_OF_RANGE` when the result would be below zero absolute.
 * @example
 * ```ts
 * gaugeToAbsolute(q(45, 'psi')); // 411589.07...(Pa)
 * gaugeToAbsolute(q(-20, 'kPa'), q(95, 'kPa')); // 75000 (Pa), a vacuum at altitude
 * ```
 */
export function gaugeToAbsolute(
  gauge: Pressure,
  atmosphere: Pressure = STANDARD_ATMOSPHERE,
): Pressure {
  checkFinite('gauge', gauge, 'Pa');
  checkPositive('atmosphere', atmosphere, 'Pa');
  const absolute = gauge + atmosphere;
  if (absolute < 0) {
    throw argumentError(
      'OUT_OF_RANGE',
      'gauge',
      gauge,
      'Pa',
      `>= -${String(atmosphere)} Pa (no pressure below a perfect vacuum)`,
    );
  }
  return absolute as Pressure;
}

/**
 * Converts an absolute pressure to gauge: `p_gauge = p_abs - p_atm`.
 *
 * @param absolute - absolute pressure (Pa), not negative
 * @param atmosphere - local atmospheric pressure (Pa, absolute); default 101 325 Pa
 * @throws HeadflowError `INVALID_ARGUMENT` for non-finite input, a negative absolute pressure
 *   or a non-positive atmosphere.
 * @example
 * ```ts
 * to(absoluteToGauge(q(3, 'bar')), 'kPa'); // 198.675
 * ```
 */
export function absoluteToGauge(
  absolute: Pressure,
  atmosphere: Pressure = STANDARD_ATMOSPHERE,
): Pressure {
  if (!Number.isFinite(absolute) || absolute < 0) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'absolute',
      absolute,
      'Pa',
      'a finite absolute pressure >= 0',
    );
  }
  checkPositive('atmosphere', atmosphere, 'Pa');
  return (absolute - atmosphere) as Pressure;
}

/**
 * Head of a fluid column equivalent to a pressure: `H = p / (rho g)`.
 * Works for pressure differences too (a negative pressure gives a negative head).
 *
 * @param pressure - pressure or pressure difference (Pa)
 * @param density - fluid density (kg/m^3), > 0
 * @param g - gravity (m/s^2), > 0; default 9.80665
 * @returns head (m of the fluid)
 * @throws HeadflowError `INVALID_ARGUMENT` for non-finite input or non-positive density or g.
 * @example
 * ```ts
 * to(headFromPressure(q(1, 'psi'), q(62.4, 'lb/ft3')), 'ft'); // 2.3077 (ft)
 * ```
 */
export function headFromPressure(
  pressure: Pressure,
  density: Density,
  g: Acceleration = STANDARD_GRAVITY,
): Length {
  checkFinite('pressure', pressure, 'Pa');
  checkPositive('density', density, 'kg/m3');
  checkPositive('g', g, 'm/s2');
  return guardResult('headFromPressure', pressure / (density * g), 'OUT_OF_RANGE') as Length;
}

/**
 * Pressure of a fluid column of a given head: `p = rho g H`.
 *
 * @param head - head (m of the fluid); negative for a drop
 * @param density - fluid density (kg/m^3), > 0
 * @param g - gravity (m/s^2), > 0; default 9.80665
 * @returns pressure (Pa)
 * @throws HeadflowError `INVALID_ARGUMENT` for non-finite input or non-positive density or g.
 * @example
 * ```ts
 * pressureFromHead(q(10, 'm'), q(1000, 'kg/m3')); // 98066.5 (Pa)
 * ```
 */
export function pressureFromHead(
  head: Length,
  density: Density,
  g: Acceleration = STANDARD_GRAVITY,
): Pressure {
  checkFinite('head', head, 'm');
  checkPositive('density', density, 'kg/m3');
  checkPositive('g', g, 'm/s2');
  return guardResult('pressureFromHead', head * density * g, 'OUT_OF_RANGE') as Pressure;
}

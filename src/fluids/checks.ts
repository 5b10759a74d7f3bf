/**
 * Small input checks shared by the fluids module.
 *
 * @module
 */
import { argumentError, HeadflowError } from '../errors';
import { guardArray, guardBuffer } from '../guards';

/** Refuses an output array whose length differs from the input's. @internal */
export function checkSameLength(input: ArrayLike<number>, out: Float64Array): void {
  if (!(input instanceof Float64Array || input instanceof Float32Array)) {
    guardArray('temperatures', input);
  }
  guardBuffer('out', out, 0);
  if (out.length !== input.length) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'out',
      out.length,
      'elements',
      `a Float64Array of ${String(input.length)} elements, one per temperature`,
    );
  }
}

/** Formats a temperature in K with its Celsius value for messages: `"380 K (106.85 degC)"`. */
export function showTemperature(kelvin: number): string {
  return `${formatNumber(kelvin)} K (${formatNumber(kelvin - 273.15)} degC)`;
}

/** Formats a pressure in Pa with kPa for messages: `"101325 Pa (101.325 kPa)"`. */
export function showPressure(pascal: number): string {
  return `${formatNumber(pascal)} Pa (${formatNumber(pascal / 1000)} kPa)`;
}

function formatNumber(v: number): string {
  return String(Number(v.toPrecision(6)));
}

/**
 * Throws `INVALID_ARGUMENT` unless the temperature is a finite absolute temperature (>= 0 K)
 * and the pressure a finite absolute pressure (>= 0 Pa). @internal
 */
export function checkStateInput(
  temperature: number,
  pressure: number,
  tName = 'temperature',
): void {
  if (typeof temperature !== 'number' || !Number.isFinite(temperature) || temperature < 0) {
    throw argumentError('INVALID_ARGUMENT', tName, temperature, 'K', 'a finite temperature >= 0 K');
  }
  if (typeof pressure !== 'number' || !Number.isFinite(pressure) || pressure < 0) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'pressure',
      pressure,
      'Pa',
      'a finite absolute pressure >= 0 Pa',
    );
  }
}

/** The error for a fluid without vapour-pressure data. @internal */
export function noVaporPressure(name: string): HeadflowError {
  return new HeadflowError(
    'OUT_OF_RANGE',
    `fluid ${JSON.stringify(name)} has no vapour-pressure data; give vaporPressure when you ` +
      'define it (it is needed for NPSH).',
    { parameter: 'vaporPressure', allowed: 'a fluid defined with vapour pressure' },
  );
}

import { argumentError } from '../errors';
import { UNITS } from '../units/index';

/** Metres per inch, exact (NIST SP 811 B.8): the 2-K and 3-K size terms take inches. */
export const METRES_PER_INCH = UNITS.in.factor;

/**
 * Throws `INVALID_ARGUMENT` unless `re` is a finite number > 0 (the 1/Re term of the 2-K and
 * 3-K methods has no value at Re = 0). One comparison pair on the fast path.
 * @internal
 */
export function checkReynoldsNumber(re: number): void {
  if (typeof re !== 'number' || !(re > 0 && re < Number.POSITIVE_INFINITY)) {
    throw argumentError(
      'INVALID_ARGUMENT',
      're',
      re,
      undefined,
      'a finite number > 0',
      'The Reynolds number of the flow in the pipe that holds the fitting is needed; at zero flow there is no loss to compute.',
    );
  }
}

/**
 * Throws `INVALID_ARGUMENT` unless `value` is a finite number >= 0 (a loss constant).
 * @internal
 */
export function checkConstant(parameter: string, value: number): void {
  if (typeof value !== 'number' || !(value >= 0 && value < Number.POSITIVE_INFINITY)) {
    throw argumentError('INVALID_ARGUMENT', parameter, value, undefined, 'a finite number >= 0');
  }
}

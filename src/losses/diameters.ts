import { argumentError, checkPositive } from '../errors';

/**
 * Checks a (small, large) diameter pair of an expansion or contraction and returns
 * beta = small / large.
 * @internal
 */
export function diameterRatio(
  smallName: string,
  small: number,
  largeName: string,
  large: number,
  hint: string,
): number {
  checkPositive(smallName, small, 'm');
  checkPositive(largeName, large, 'm');
  if (small > large) {
    throw argumentError(
      'INVALID_ARGUMENT',
      smallName,
      small,
      'm',
      `<= ${largeName} = ${String(large)} m`,
      hint,
    );
  }
  return small / large;
}

/**
 * Checks a cone's total included angle in degrees: finite, 0 < angle <= 180.
 * @internal
 */
export function checkAngle(angle: number): void {
  if (typeof angle !== 'number' || !(angle > 0 && angle <= 180)) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'angle',
      angle,
      'degree',
      '0 < angle <= 180 (total included angle of the cone; 180 is a sudden change)',
    );
  }
}

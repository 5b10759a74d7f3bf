/**
 * Check `motor-overload`: the given motor rating against the pump's shaft power.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';

const RATED = 'NEMA MG 1 / IEC 60034-1 (rated output)';

export const MOTOR_OVERLOAD: CheckInfo = {
  id: 'motor-overload',
  guards: 'a motor that overloads, trips or overheats',
  inputs:
    'candidates[].motorRating (and serviceFactor); shaft power in each case and at the end of the curve',
  severity:
    'error when the shaft power in a case exceeds rating x service factor; warning when only the end of the curve does',
  source: `${RATED}; common practice (end of curve)`,
};

/** The check in a case: the pump's shaft power above the motor's rating times service factor. */
export function motorOverloadInCase(
  candidate: string,
  caseName: string,
  perPumpPower: number,
  motorRating: number,
  serviceFactor: number,
): Check | undefined {
  if (perPumpPower <= motorRating * serviceFactor) return undefined;
  return check(
    MOTOR_OVERLOAD.id,
    'error',
    candidate,
    caseName,
    { shaftPower: perPumpPower, motorRating, serviceFactor },
    RATED,
  );
}

/** The candidate's check: the motor would overload at the end of the curve. */
export function motorOverloadAtRunOut(
  candidate: string,
  maxShaftPower: number,
  motorRating: number,
  serviceFactor: number,
): Check | undefined {
  if (maxShaftPower <= motorRating * serviceFactor) return undefined;
  return check(
    MOTOR_OVERLOAD.id,
    'warning',
    candidate,
    undefined,
    { maxShaftPower, motorRating },
    COMMON,
  );
}

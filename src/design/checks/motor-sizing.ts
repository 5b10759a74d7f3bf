/**
 * Check `motor-sizing`: the motor for the duty alone against the non-overloading motor.
 *
 * @module
 */
import type { MotorRating, MotorSeries } from '../../pumps/index';
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';

export const MOTOR_SIZING: CheckInfo = {
  id: 'motor-sizing',
  guards: 'a motor sized for the duty that overloads when the pump runs out its curve',
  inputs: "the pump's shaft power over its whole curve; candidates[].motorSeries, serviceFactor",
  severity:
    'note when the duty-only motor is smaller than the non-overloading one; error when no standard rating covers the pump',
  source: 'IEC 60072-1 or NEMA MG 1 (standard ratings)',
};

/** The note: a smaller motor covers the duty points but not the end of the curve. */
export function motorSizingNote(
  candidate: string,
  series: MotorSeries,
  dutyOnly: MotorRating,
  nonOverloading: MotorRating,
  maxShaftPower: number,
): Check | undefined {
  if (dutyOnly.rating >= nonOverloading.rating) return undefined;
  return check(
    MOTOR_SIZING.id,
    'info',
    candidate,
    undefined,
    {
      dutyOnly: dutyOnly.rating,
      dutyOnlyNameplate: dutyOnly.nameplate,
      nonOverloading: nonOverloading.rating,
      nonOverloadingNameplate: nonOverloading.nameplate,
      maxShaftPower,
    },
    series === 'nema' ? 'NEMA MG 1 (standard ratings)' : 'IEC 60072-1 (standard ratings)',
    { dutyOnlyUnit: dutyOnly.unit, nonOverloadingUnit: nonOverloading.unit },
  );
}

/** The error: no standard motor is large enough. */
export function motorSizingError(candidate: string, power: number): Check {
  return check(MOTOR_SIZING.id, 'error', candidate, undefined, { power }, COMMON);
}

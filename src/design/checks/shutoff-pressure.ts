/**
 * Check `shutoff-pressure`: the highest pressure the pump can make against the design pressure.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, check } from './check';

/** Source of the shut-off pressure check. */
export const SHUTOFF_SOURCE =
  'ASME B31.1/B31.3 and local pressure-equipment codes (design pressure covers the highest pressure the pump can make)';

export const SHUTOFF_PRESSURE: CheckInfo = {
  id: 'shutoff-pressure',
  guards: 'piping burst or leaks when the discharge is closed',
  inputs:
    "limits.designPressure; the set's shut-off head; suction pressure and height in each case",
  severity: 'error when the shut-off pressure exceeds the design pressure',
  source: SHUTOFF_SOURCE,
};

/** The check in a case, or undefined when the design pressure covers shut-off. */
export function shutoffPressureCheck(
  candidate: string,
  caseName: string,
  maxPressure: number,
  designPressure: number,
): Check | undefined {
  if (maxPressure <= designPressure) return undefined;
  return check(
    SHUTOFF_PRESSURE.id,
    'error',
    candidate,
    caseName,
    { maxPressure, designPressure },
    SHUTOFF_SOURCE,
  );
}

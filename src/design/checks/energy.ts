/**
 * Check `energy`: the duty profile cannot be met, so the year's energy cannot be found.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';

export const ENERGY: CheckInfo = {
  id: 'energy',
  guards: 'a duty profile the set cannot run',
  inputs: 'profile (flows and hours); the pump and system curves in the design case',
  severity: 'error',
  source: COMMON,
};

/** The check: a flow of the profile the set cannot deliver. */
export function energyCheck(
  candidate: string,
  caseName: string,
  flow: number,
  control: 'fixed' | 'speed',
): Check {
  return check(ENERGY.id, 'error', candidate, caseName, { flow }, COMMON, {
    detail:
      control === 'speed'
        ? "the set cannot deliver it within the drive's highest speed and the catalogue curve"
        : 'at full speed the set gives less head than the system needs there, and throttling cannot raise head',
  });
}

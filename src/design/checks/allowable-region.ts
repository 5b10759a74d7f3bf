/**
 * Check `allowable-region`: a pump running outside its allowable operating region.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, check } from './check';

const SOURCE = 'ANSI/HI 9.6.3 (allowable operating region; the manufacturer states it)';

export const ALLOWABLE_REGION: CheckInfo = {
  id: 'allowable-region',
  guards: 'vibration, recirculation and overheating far from the best efficiency point',
  inputs: "the pump curve's regions; the operating point in each case",
  severity: 'error outside the allowable region',
  source: SOURCE,
};

/** The check of a pump that runs outside its allowable region. */
export function allowableRegionCheck(
  candidate: string,
  caseName: string,
  percentOfBep: number | undefined,
): Check {
  return check(
    ALLOWABLE_REGION.id,
    'error',
    candidate,
    caseName,
    { percentOfBep: percentOfBep ?? 0 },
    SOURCE,
  );
}

/**
 * Check `preferred-region`: a pump running outside its preferred operating region.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, check } from './check';

export const REGION_SOURCE =
  'ANSI/HI 9.6.3 (preferred operating region 70-120 % of BEP flow by default)';

export const PREFERRED_REGION: CheckInfo = {
  id: 'preferred-region',
  guards: 'running away from the best efficiency point: wear, vibration, lost efficiency',
  inputs: "the pump curve's regions; the operating point in each case",
  severity: 'warning inside the allowable region but outside the preferred one',
  source: REGION_SOURCE,
};

/** The check of a pump that runs in its allowable but not its preferred region. */
export function preferredRegionCheck(
  candidate: string,
  caseName: string,
  percentOfBep: number | undefined,
): Check {
  return check(
    PREFERRED_REGION.id,
    'warning',
    candidate,
    caseName,
    { percentOfBep: percentOfBep ?? 0 },
    REGION_SOURCE,
  );
}

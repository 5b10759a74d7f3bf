/**
 * Check `velocity`: a suction or discharge run's velocity outside its usual range.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';

export const VELOCITY: CheckInfo = {
  id: 'velocity',
  guards: 'erosion, noise and suction losses (fast); settling and air pockets (slow)',
  inputs:
    'pumpLocation; each run outside parallel groups; limits.suctionVelocity, limits.dischargeVelocity',
  severity: 'warning outside 0.5 to 1.5 m/s (suction) or 1 to 3 m/s (discharge) by default',
  source: COMMON,
};

/** The check for one run in one case, or undefined inside the range. */
export function velocityCheck(
  caseName: string,
  run: string,
  side: 'suction' | 'discharge',
  velocity: number,
  range: { readonly min: number; readonly max: number },
): Check | undefined {
  if (velocity >= range.min && velocity <= range.max) return undefined;
  return check(
    VELOCITY.id,
    'warning',
    undefined,
    caseName,
    { velocity, min: range.min, max: range.max },
    COMMON,
    { run, side },
  );
}

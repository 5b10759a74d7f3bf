/**
 * Check `dead-head`: running against a closed discharge.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';

export const DEAD_HEAD: CheckInfo = {
  id: 'dead-head',
  guards: 'a pump churning at shut-off: heat, vibration, damage',
  inputs: "the pump's shut-off head",
  severity: 'warning, always (a reminder with the set’s shut-off head)',
  source: COMMON,
};

/** The reminder, with the set's shut-off head. */
export function deadHeadCheck(candidate: string, shutoffHead: number): Check {
  return check(DEAD_HEAD.id, 'warning', candidate, undefined, { shutoffHead }, COMMON);
}

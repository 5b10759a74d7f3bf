/**
 * Check `npsh-data`: cavitation cannot be checked for want of data.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';

export const NPSH_DATA: CheckInfo = {
  id: 'npsh-data',
  guards: 'an unchecked cavitation risk',
  inputs: 'pumpLocation; fluid vapour pressure; the NPSH-required curve over the operating range',
  severity:
    'warning when the fluid has no vapour pressure (design) or the pump no NPSH-required data at its operating flow (candidate, case)',
  source: COMMON,
};

/** The design-level check: a fluid without vapour pressure. */
export function npshNoVaporPressureCheck(): Check {
  return check(NPSH_DATA.id, 'warning', undefined, undefined, {}, COMMON);
}

/** The candidate's check in a case: no NPSH-required data at its flow. */
export function npshNoDataCheck(candidate: string, caseName: string, flow: number): Check {
  return check(NPSH_DATA.id, 'warning', candidate, caseName, { flow }, COMMON);
}

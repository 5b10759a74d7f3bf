/**
 * Check `near-boiling`: the liquid's vapour pressure close to the suction surface's pressure.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';
import type { Limits } from './context';

export const NEAR_BOILING: CheckInfo = {
  id: 'near-boiling',
  guards: 'a liquid so close to boiling at the suction that small changes flash it',
  inputs: 'fluid vapour pressure, suction surface pressure; limits.nearBoilingRatio',
  severity: 'warning when p_v >= ratio x suction pressure (default 0.8)',
  source: COMMON,
};

/** The check in one case, or undefined when the liquid is far from boiling. */
export function nearBoilingCheck(
  caseName: string,
  vaporPressure: number | undefined,
  suctionPressure: number,
  limits: Limits,
): Check | undefined {
  if (vaporPressure === undefined || vaporPressure < limits.nearBoilingRatio * suctionPressure) {
    return undefined;
  }
  return check(
    NEAR_BOILING.id,
    'warning',
    undefined,
    caseName,
    { vaporPressure, suctionPressure, ratio: vaporPressure / suctionPressure },
    COMMON,
  );
}

/**
 * The `service-pressure` check: every node of a network below the minimum pressure its
 * service asks for, with the shortfall. An error: the candidate fails.
 *
 * @module
 */
import type { NetworkSolution } from '../../network/index';
import type { Check, ServicePressure } from '../types';
import { type CheckInfo, COMMON, check } from './check';

/** Where the service minimum comes from. */
export const SERVICE_SOURCE =
  'the design input (service pressures the owner or the local plumbing code asks for)';

export const SERVICE_PRESSURE: CheckInfo = {
  id: 'service-pressure',
  guards: 'an outlet or floor that gets too little pressure (a network with service minimums)',
  inputs: '`duty.service` (node and minimum pressure); the network solved with the candidate',
  severity: 'error for every node below its minimum, with the shortfall',
  source: SERVICE_SOURCE,
};

export const NODE_VAPOUR_PRESSURE: CheckInfo = {
  id: 'node-vapour-pressure',
  guards: 'a steady result that is not physical: the liquid would boil (column separation)',
  inputs: 'the solved pressure at every node of a network; the liquid vapour pressure',
  severity: 'error at every node below the vapour pressure',
  source: COMMON,
};

export const NODE_BELOW_ATMOSPHERE: CheckInfo = {
  id: 'node-below-atmosphere',
  guards: 'air drawn in at leaks, joints and air valves where the pressure is below atmospheric',
  inputs: 'the solved pressure at every node of a network (surfaces excepted); the atmosphere',
  severity: 'warning at every node below the atmosphere',
  source: COMMON,
};

/**
 * Shortfalls below this fraction of the minimum (absolute; 1e-4 Pa at 1 bar) are round-off of
 * the solve and of the speed a drive is set to, not a finding.
 */
export const ROUND_OFF = 1e-9;

/**
 * Adds one `service-pressure` error for every node whose solved pressure is below its
 * minimum. Values (SI, absolute): `pressure`, `minPressure`, `shortfall` (Pa) and
 * `atmosphere`, so that a message can show gauge pressures; words: `node`.
 */
export function serviceChecks(
  service: readonly ServicePressure[],
  solution: NetworkSolution,
  atmosphere: number,
  candidate: string | undefined,
  caseName: string,
  checks: Check[],
): void {
  for (const r of service) {
    const pressure = solution.nodes[r.node]?.pressure ?? Number.NaN;
    if (!(pressure >= r.minPressure * (1 - ROUND_OFF))) {
      checks.push(
        check(
          'service-pressure',
          'error',
          candidate,
          caseName,
          {
            pressure,
            minPressure: r.minPressure,
            shortfall: r.minPressure - pressure,
            atmosphere,
          },
          SERVICE_SOURCE,
          { node: r.node },
        ),
      );
    }
  }
}

/**
 * Check `duty-flow`: a fixed-speed set that falls short of (or well above) the duty flow.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';
import type { Limits } from './context';

export const DUTY_TOLERANCE_SOURCE =
  'limits.dutyFlowTolerance (default 2 %: system-curve uncertainty, common practice; within the flow tolerance of pump acceptance tests, ISO 9906 / ANSI/HI 14.6)';

export const DUTY_FLOW: CheckInfo = {
  id: 'duty-flow',
  guards: 'a fixed-speed set that does not deliver the duty flow',
  inputs: 'dutyFlow; the operating point in each case; limits.dutyFlowTolerance',
  severity:
    'error for a shortfall beyond the tolerance (default 2 %); note for a smaller shortfall or an excess beyond it',
  source: DUTY_TOLERANCE_SOURCE,
};

/** Shortfalls below this fraction of the duty flow are round-off of the operating point. */
const FLOW_ROUND_OFF = 1e-9;

/**
 * The duty-flow check of a fixed-speed set: any shortfall is a note with its percentage, a
 * shortfall beyond `limits.dutyFlowTolerance` an error; an excess beyond it a note (a valve or
 * a trim would bring the flow down).
 */
export function dutyFlowCheck(
  duty: number,
  flow: number,
  candidate: string,
  caseName: string,
  limits: Limits,
  checks: Check[],
): void {
  const tolerance = limits.dutyFlowTolerance;
  const short = (duty - flow) / duty;
  const values = { flow, dutyFlow: duty, shortfall: Math.max(0, short), tolerance };
  if (short > FLOW_ROUND_OFF) {
    const beyond = short > tolerance;
    checks.push(
      check(
        DUTY_FLOW.id,
        beyond ? 'error' : 'info',
        candidate,
        caseName,
        values,
        DUTY_TOLERANCE_SOURCE,
      ),
    );
  } else if (-short > tolerance) {
    checks.push(check(DUTY_FLOW.id, 'info', candidate, caseName, values, COMMON));
  }
}

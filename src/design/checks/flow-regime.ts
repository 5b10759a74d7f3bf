/**
 * Check `flow-regime`: a run in laminar or transitional flow at the duty.
 *
 * @module
 */
import type { Check } from '../types';
import { type CheckInfo, check } from './check';

export const FLOW_REGIME: CheckInfo = {
  id: 'flow-regime',
  guards: 'friction outside the turbulent correlations; a viscous liquid on a water curve',
  inputs: 'each run at the duty (Reynolds number)',
  severity: 'warning for a laminar run (Re < 2300) or one in transition (2300 to 4000)',
  source:
    'ANSI/HI 9.6.7 (viscosity correction) for laminar runs; common practice for the transition',
};

/** The check for one run in one case, or undefined for a turbulent run. */
export function flowRegimeCheck(
  caseName: string,
  run: string,
  regime: string,
  reynolds: number,
): Check | undefined {
  if (regime !== 'laminar' && regime !== 'transition') return undefined;
  return check(
    FLOW_REGIME.id,
    'warning',
    undefined,
    caseName,
    { reynolds },
    regime === 'laminar'
      ? 'ANSI/HI 9.6.7 (viscosity correction)'
      : 'common practice (transition 2300 < Re < 4000)',
    { run, regime },
  );
}

/**
 * What a check of one operating case (before any candidate) is given. Checks of this kind are
 * listed in `CASE_CHECKS` and run in turn by `evaluateDesign` for every case.
 *
 * @module
 */
import type { ScenarioCurve } from '../../system/index';
import type { CaseDuty, Check, DesignInput } from '../types';
import type { CheckInfo } from './check';
import type { Limits } from './context';

/** The inputs of a case-level check. */
export interface CaseCheckContext {
  readonly input: DesignInput;
  /** The case's system. */
  readonly scenario: ScenarioCurve;
  /** The duty in that case (head, parts, steady pressures). */
  readonly duty: CaseDuty;
  readonly limits: Limits;
}

/** A check of one operating case. */
export interface CaseCheck {
  readonly info: CheckInfo;
  /** Its findings (none when the design does not ask for it). */
  run(context: CaseCheckContext): Check[];
}

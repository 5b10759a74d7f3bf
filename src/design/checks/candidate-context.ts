/**
 * What a check of a whole candidate set is given: the design, the set, every case's system
 * and the set's result in it. Checks of this kind are listed in `CANDIDATE_CHECKS` and run
 * in turn by `evaluateDesign`: adding one is adding a file and a line to that list.
 *
 * @module
 */
import type { ScenarioCurve, SystemCurve } from '../../system/index';
import type { Length } from '../../units/index';
import type { CaseResult, Check, DesignInput } from '../types';
import type { CheckInfo } from './check';
import type { Candidate, Limits } from './context';

/** The inputs of a candidate-level check. */
export interface CandidateCheckContext {
  readonly input: DesignInput;
  readonly candidate: Candidate;
  /** The set as it runs on each case's liquid (its curve corrected for viscosity where due). */
  readonly inCase: readonly Candidate[];
  /** The operating cases' systems, the design case first. */
  readonly family: readonly ScenarioCurve[];
  /** The set's result in each case, in the order of `family`. */
  readonly cases: readonly CaseResult[];
  readonly limits: Limits;
  /** NPSH available at a set flow in a case's system, where it can be known. */
  readonly npshAvailableAt: (curve: SystemCurve, flow: number) => Length | undefined;
}

/** A check of a candidate set over all cases. */
export interface CandidateCheck {
  readonly info: CheckInfo;
  /** Its findings (none when the design does not ask for it). */
  run(context: CandidateCheckContext): Check[];
}

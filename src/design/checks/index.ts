/**
 * The design checks, one file each: every file gives the check's id, what it guards against,
 * its inputs, its severity rules and its source ({@link CheckInfo}), and the function that
 * makes its findings. `CHECKS` lists them all (docs/checks.md is their table).
 *
 * @module
 */
import { ALLOWABLE_REGION } from './allowable-region';
import type { CandidateCheck } from './candidate-context';
import type { CaseCheck } from './case-context';
import type { CheckInfo } from './check';
import { CURVE_FIT } from './curve-fit';
import { DEAD_HEAD } from './dead-head';
import { DUTY_FLOW } from './duty-flow';
import { ENERGY } from './energy';
import { FLOW_REGIME } from './flow-regime';
import { INTAKE_SUBMERGENCE, intakeSubmergence } from './intake-submergence';
import { LOW_FLOW_HEATING, lowFlowHeating } from './low-flow-heating';
import { MOTOR_OVERLOAD } from './motor-overload';
import { MOTOR_SIZING } from './motor-sizing';
import { NEAR_BOILING } from './near-boiling';
import { NO_OPERATING_POINT } from './no-operating-point';
import { NPSH_DATA } from './npsh-data';
import { NPSH_MARGIN } from './npsh-margin';
import { PREFERRED_REGION } from './preferred-region';
import { NODE_BELOW_ATMOSPHERE, NODE_VAPOUR_PRESSURE, SERVICE_PRESSURE } from './service-pressure';
import { SHUTOFF_PRESSURE } from './shutoff-pressure';
import { SURGE, surge } from './surge';
import { VELOCITY } from './velocity';
import { VISCOUS_CORRECTION } from './viscous-correction';

export { allowableRegionCheck } from './allowable-region';
export type { CandidateCheck, CandidateCheckContext } from './candidate-context';
export type { CaseCheck, CaseCheckContext } from './case-context';
export { type CheckInfo, COMMON, check } from './check';
export type { Candidate, Limits } from './context';
export { curveFitChecks } from './curve-fit';
export { deadHeadCheck } from './dead-head';
export { dutyFlowCheck } from './duty-flow';
export { energyCheck } from './energy';
export { flowRegimeCheck } from './flow-regime';
export { guardCheckInputs } from './inputs';
export { intakeSubmergenceMessage } from './intake-submergence';
export { lowFlowHeatingMessage } from './low-flow-heating';
export { motorOverloadAtRunOut, motorOverloadInCase } from './motor-overload';
export { motorSizingError, motorSizingNote } from './motor-sizing';
export { nearBoilingCheck } from './near-boiling';
export { noOperatingPointCheck } from './no-operating-point';
export { npshNoDataCheck, npshNoVaporPressureCheck } from './npsh-data';
export { npshMarginCheck } from './npsh-margin';
export { preferredRegionCheck } from './preferred-region';
export { SHUTOFF_SOURCE, shutoffPressureCheck } from './shutoff-pressure';
export { surgeMessage } from './surge';
export { velocityCheck } from './velocity';
export { viscousCorrection, viscousCorrectionMessage } from './viscous-correction';

/** Every check the design evaluation makes, in the order of docs/checks.md. */
export const CHECKS: readonly CheckInfo[] = [
  NEAR_BOILING,
  FLOW_REGIME,
  VELOCITY,
  NPSH_DATA,
  CURVE_FIT,
  NO_OPERATING_POINT,
  DUTY_FLOW,
  PREFERRED_REGION,
  ALLOWABLE_REGION,
  NPSH_MARGIN,
  MOTOR_OVERLOAD,
  MOTOR_SIZING,
  ENERGY,
  DEAD_HEAD,
  SHUTOFF_PRESSURE,
  VISCOUS_CORRECTION,
  SURGE,
  LOW_FLOW_HEATING,
  INTAKE_SUBMERGENCE,
  SERVICE_PRESSURE,
  NODE_VAPOUR_PRESSURE,
  NODE_BELOW_ATMOSPHERE,
];

/** Checks of each operating case, run by `evaluateDesign` in turn: add a file, add it here. */
export const CASE_CHECKS: readonly CaseCheck[] = [surge];

/** Checks of a candidate set over all cases, run in turn: add a file, add it here. */
export const CANDIDATE_CHECKS: readonly CandidateCheck[] = [lowFlowHeating, intakeSubmergence];

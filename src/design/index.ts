/**
 * The whole job: a design (system, operating cases, duty, candidate pumps, duty profile, price
 * of energy) evaluated into a report with every case's operating point, every check, the motor,
 * the yearly energy and the cautions.
 *
 * @module design
 */
export { CAUTIONS } from './cautions';
export { checkMessage } from './check-message';
export { displayUnits } from './display-units';
export { DESIGN_DEFAULTS, evaluateDesign } from './evaluate';
export {
  type ReadScenarioOptions,
  readScenario,
  SCENARIO_FORMAT,
  ScenarioFileError,
  type ScenarioIssue,
} from './scenario-file';
export type {
  Arrangement,
  CandidateInput,
  CandidatePump,
  CandidateReport,
  CaseDuty,
  CaseResult,
  Check,
  DesignInput,
  DesignLimits,
  DesignReport,
  DisplayUnits,
  EvaluateOptions,
  IntakeInput,
  LowFlowInput,
  NpshTerms,
  PumpLocation,
  ReportCurves,
  ReportFluid,
  ReportInputs,
  RunFitting,
  RunInputSummary,
  SampledCurve,
  Severity,
  SpeedControl,
  SurgeInput,
  UnitSystem,
  Verdict,
} from './types';

/**
 * The whole job: a design (system, operating cases, duty, candidate pumps, duty profile, price
 * of energy) evaluated into a report with every case's operating point, every check, the motor,
 * the yearly energy and the cautions.
 *
 * @module design
 */
export { CAUTIONS } from './cautions';
export { checkMessage } from './check-message';
export { SERVICE_SOURCE } from './checks/service-pressure';
export { displayUnits } from './display-units';
export { DESIGN_DEFAULTS, evaluateDesign } from './evaluate';
export { isNetworkDesign, MAX_SEARCH_SOLVES } from './network-design';
export {
  type ReadScenarioOptions,
  readDesignFile,
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
  LinkRow,
  LowFlowInput,
  NetworkDesignInput,
  NetworkLayout,
  NetworkTables,
  NodeRow,
  NpshTerms,
  PumpLocation,
  ReportCurves,
  ReportFluid,
  ReportInputs,
  RunFitting,
  RunInputSummary,
  SampledCurve,
  ServicePressure,
  Severity,
  SpeedControl,
  SurgeInput,
  UnitSystem,
  Verdict,
} from './types';

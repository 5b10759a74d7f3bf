/**
 * Systems: pipe runs with their fittings, valves and equipment, the energy balance between two
 * points, series and parallel composition, system curves and operating cases.
 *
 * @module system
 */
export {
  type LossComponent,
  type PipeRun,
  type PipeRunInput,
  pipeRun,
  type RunFrictionLaw,
  type ValveCoefficient,
} from '../network/index';
export {
  applyCase,
  dutyFor,
  type OperatingCase,
  type ScenarioCurve,
  systemScenarios,
} from './scenarios';
export {
  type Endpoint,
  type LineElement,
  type ParallelInput,
  type RunDetails,
  runsOf,
  type SystemCurve,
  type SystemDefinition,
  type SystemPoint,
  systemCurve,
} from './system-curve';

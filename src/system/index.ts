/**
 * Systems: pipe runs with their fittings, valves and equipment, the energy balance between two
 * points, series and parallel composition, system curves and operating cases; and the surge
 * screening of a line (wave speed, Joukowsky, slow closure).
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
export { type ClosureSurge, type ClosureSurgeInput, closureSurgeHead } from './closure-surge';
export { joukowskyHead } from './joukowsky';
export {
  PIPE_ANCHORINGS,
  type PipeAnchoring,
  type RestraintFactorInput,
  restraintFactor,
} from './restraint-factor';
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
export { type WaveSpeedInput, waveSpeed } from './wave-speed';

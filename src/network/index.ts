/**
 * Networks: branched and looped piping with junctions, fixed-level surfaces and
 * pressure-dependent outlets, linked by pipe runs, pumps, check valves and control valves,
 * solved by the global gradient method (Todini and Pilati 1988). The pipe run lives here too:
 * it is the network's link, and systems build their lines from it.
 *
 * @module network
 */

export { type ParallelGroup, parallelGroup, parallelSplit } from './parallel';
export {
  checkRunRoughness,
  LOW_FLOW_VELOCITY,
  type LossComponent,
  type LossSlope,
  type PipeRun,
  type PipeRunInput,
  pipeRun,
  type RunContext,
  type RunEvaluator,
  type RunFrictionLaw,
  type RunLossBreakdown,
  runContext,
  runEvaluator,
  runLoss,
  runLossSlope,
  type ValveCoefficient,
} from './run';
export {
  applyNetworkCase,
  MAX_STATE_CHANGES,
  outletCoefficient,
  type PreparedNetwork,
  prepareNetwork,
  solveNetwork,
} from './solve';
export type {
  ControlValve,
  HeadRiseCurve,
  JunctionNode,
  LinkSolution,
  LinkState,
  LinkStatus,
  NetworkCase,
  NetworkDefinition,
  NetworkLink,
  NetworkNode,
  NetworkSolution,
  NetworkSolveOptions,
  NodeSolution,
  OutletNode,
  PumpLink,
  RunLink,
  SurfaceNode,
  ValveLink,
} from './types';

/**
 * Networks: branched and looped piping with junctions, fixed-level surfaces and
 * pressure-dependent outlets, linked by pipe runs, pumps, check valves and control valves,
 * solved by the global gradient method (Todini and Pilati 1988). The pipe run lives here too:
 * it is the network's link, and systems build their lines from it (through the unchecked
 * kernels of `./internal`, which are not public).
 *
 * @module network
 */

export { applyNetworkCase } from './cases';
export { outletCoefficient } from './outlet';
export {
  type LossComponent,
  type PipeRun,
  type PipeRunInput,
  pipeRun,
  type ValveCoefficient,
} from './run';
export {
  LOW_FLOW_VELOCITY,
  type RunFrictionLaw,
} from './run-law';
export {
  MAX_STATE_CHANGES,
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

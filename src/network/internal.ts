/**
 * The network module's unchecked hydraulic kernels for the modules above it (systems build
 * their lines and split their parallel groups with them). Not public: they take validated
 * runs and plain numbers and check nothing.
 *
 * @module
 * @internal
 */
export { type ParallelGroup, parallelGroup, parallelSplit } from './parallel';
export {
  type RunContext,
  type RunEvaluator,
  type RunLossBreakdown,
  runEvaluator,
  runLoss,
} from './run';
export {
  checkRunRoughness,
  type LossSlope,
  runContext,
  runLossSlope,
} from './run-law';

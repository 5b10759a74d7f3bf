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
  checkRunRoughness,
  type LossSlope,
  type RunContext,
  type RunEvaluator,
  type RunLossBreakdown,
  runContext,
  runEvaluator,
  runLoss,
  runLossSlope,
} from './run';

/**
 * Networks: branched and looped piping. The pipe run lives here: it is the network's link,
 * and systems build their lines from it.
 *
 * @module network
 */
export {
  type LossComponent,
  type PipeRun,
  type PipeRunInput,
  pipeRun,
  type RunContext,
  type RunEvaluator,
  type RunLossBreakdown,
  runEvaluator,
  runLoss,
  type ValveCoefficient,
} from './run';

/**
 * Minor losses: loss coefficients K of fittings and valves from a catalogue (3-K constants of
 * Darby, published constant K), the 2-K and 3-K methods, Cv/Kv conversion, expansions and
 * contractions, equivalent length, and equipment given by a rated point or a curve.
 *
 * Every K is referred to the velocity head `V^2 / (2 g)` of a stated pipe diameter.
 *
 * @module losses
 */
export { suddenExpansionK } from './borda-carnot';
export {
  type Fitting,
  type FittingId,
  type FittingKOptions,
  type FittingMethod,
  fitting,
  fittingIds,
  fittingK,
  type ThreeKConstants,
  type TwoKConstants,
} from './catalogue';
export { gradualContractionK, suddenContractionK } from './crane-contraction';
export { gradualExpansionK } from './crane-expansion';
export { equivalentLength, kFromEquivalentLength } from './equivalent-length';
export { type FittingCount, type FittingSet, fittingSet } from './fitting-set';
export {
  type CurveLoss,
  curveLoss,
  type FixedLoss,
  type RatedLoss,
  type RatedPoint,
  ratedLoss,
} from './fixed-loss';
export {
  CV_CONSTANT,
  CV_WATER_DENSITY,
  cvFromK,
  FLOW_COEFFICIENT_WATER_DENSITY,
  KV_CONSTANT,
  KV_PER_CV,
  KV_WATER_DENSITY,
  kFromCv,
  kFromKv,
  kvFromK,
} from './flow-coefficient';
export { referK } from './refer';
export { threeK } from './three-k';
export { twoK } from './two-k';

/**
 * Selection: from a duty and a pump catalogue to ranked pumps with their trims or speeds,
 * life-cycle costs and economic pipe sizes.
 *
 * @module select
 */
export {
  CATALOGUE_FORMAT,
  CatalogueFileError,
  type CatalogueIssue,
  type ReadCatalogueOptions,
  readCatalogue,
} from './catalogue-file';
export {
  DEFAULT_LIFE_YEARS,
  type LifeCycleCostInput,
  lifeCycleCost,
  presentValueFactor,
} from './life-cycle-cost';
export { DEFAULT_MAX_COMBINATIONS, economicPipeSize } from './pipe-size';
export { SELECT_DEFAULTS, selectPumps } from './select-pumps';
export type {
  CatalogueCurve,
  CatalogueDrive,
  CataloguePump,
  LifeCycleCost,
  PipeSizeOption,
  PipeSizeOptions,
  PipeSizeResult,
  PipeSizeRow,
  PumpCatalogue,
  RunSizes,
  Selection,
  SelectionCase,
  SelectionCosts,
  SelectionEntry,
  SelectionMethod,
  SelectOptions,
} from './types';

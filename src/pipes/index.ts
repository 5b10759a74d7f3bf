/**
 * Pipes: nominal sizes and schedules to inside diameter (ASME B36.10M / B36.19M steel,
 * ASTM B88 copper tube, ASTM D1785 PVC), flow area, and wall materials to roughness and
 * Hazen-Williams C.
 *
 * @module pipes
 */
export { COPPER_TUBE_SIZES, copperTube } from './copper-tube';
export type { SteelSchedule } from './data/asme-b36';
export type { CopperTubeType } from './data/astm-b88';
export type { PvcSchedule } from './data/astm-d1785';
export type { MaterialName } from './data/materials';
export type { PipeDimensions } from './dimensions';
export { flowArea } from './flow-area';
export {
  type LengthRange,
  MATERIAL_NAMES,
  material,
  type PipeMaterial,
  type PressureRange,
} from './materials';
export { pipeSize, STEEL_PIPE_SIZES, STEEL_SCHEDULES, steelSchedules } from './pipe-size';
export { PVC_PIPE_SIZES, pvcPipe } from './pvc-pipe';

/** Requirement masks: regions with limits in dB, judged live against a response, built from requirements. */
export type {
  MaskLimit,
  MaskRegion,
  MaskRegionKind,
  MaskRegionResult,
  MaskResult,
  RequirementMask,
} from './types.ts';
export { regionProblem, validateMask } from './validate.ts';
export {
  evaluateMask,
  evaluateMaskOn,
  MASK_GRID_POINTS,
  MASK_PASS_TOLERANCE_DB,
  MASK_REFINE_CANDIDATES,
  MASK_REFINE_FRACTION,
} from './evaluate.ts';
export type { MaskOptions } from './evaluate.ts';
export { functionSource, sampledSource, sectionsSource, zpkSource } from './source.ts';
export type { MagnitudeSource } from './source.ts';
export { magnitudeDbAt, magnitudeDbReader, magnitudeDbZpk } from '../response/magnitude.ts';
export { maskFromIirDesigner, maskFromNotchRequirement, maskFromRequirement } from './fromRequirement.ts';
export { maskFromDesigner } from './designerMask.ts';
export {
  maskFromNotchDesigner,
  NOTCH_PASS_GAP_WIDTHS,
  NOTCH_PASS_TOLERANCE_DB,
  NOTCH_STOP_HALF_WIDTH,
  NOTCH_STOP_ATTENUATION_DB,
} from './notchMask.ts';
export type { NotchRequirement } from './fromRequirement.ts';
export {
  addRegion,
  deleteRegion,
  moveRegionEdge,
  nextRegionId,
  patchRegion,
  updateRegion,
  MIN_LIMIT_GAP_DB,
  MIN_REGION_WIDTH_FRACTION,
} from './edit.ts';
export type { MaskRegionPatch, RegionEdge } from './edit.ts';
export { composeMask, CARVE_SLIVER_FRACTION } from './compose.ts';

/** Requirement masks: regions with limits in dB, judged live against a response, built from requirements. */
export type {
  MaskLimit,
  MaskRegion,
  MaskRegionKind,
  MaskRegionResult,
  MaskResult,
  RequirementMask,
} from './mask/types.ts';
export { regionProblem, validateMask } from './mask/validate.ts';
export {
  evaluateMask,
  evaluateMaskOn,
  MASK_GRID_POINTS,
  MASK_PASS_TOLERANCE_DB,
  MASK_REFINE_CANDIDATES,
  MASK_REFINE_FRACTION,
} from './mask/evaluate.ts';
export type { MaskOptions } from './mask/evaluate.ts';
export { functionSource, sampledSource, sectionsSource, zpkSource } from './mask/source.ts';
export type { MagnitudeSource } from './mask/source.ts';
export { magnitudeDbAt, magnitudeDbReader, magnitudeDbZpk } from './response/magnitude.ts';
export {
  maskFromIirDesigner,
  maskFromNotchRequirement,
  maskFromRequirement,
} from './mask/fromRequirement.ts';
export { maskFromDesigner } from './mask/designerMask.ts';
export {
  maskFromNotchDesigner,
  NOTCH_PASS_GAP_WIDTHS,
  NOTCH_PASS_TOLERANCE_DB,
  NOTCH_STOP_HALF_WIDTH,
  NOTCH_STOP_ATTENUATION_DB,
} from './mask/notchMask.ts';
export type { NotchRequirement } from './mask/fromRequirement.ts';
export {
  addRegion,
  deleteRegion,
  moveRegionEdge,
  nextRegionId,
  patchRegion,
  updateRegion,
  MIN_LIMIT_GAP_DB,
  MIN_REGION_WIDTH_FRACTION,
} from './mask/edit.ts';
export type { MaskRegionPatch, RegionEdge } from './mask/edit.ts';

/** Second-order sections for implementation: pairing, ordering, gain distribution, scaling, norms. */
export { buildCascade, DEFAULT_CASCADE_OPTIONS, RADIUS_TIE_TOLERANCE } from './cascade.ts';
export type {
  Cascade,
  CascadeOptions,
  CascadeSection,
  GainDistribution,
  ScalingNorm,
  SectionOrdering,
} from './cascade.ts';
export {
  partialCascadeNorms,
  largestPoleRadius,
  normLength,
  NORM_TAIL_DECAY,
  MAX_NORM_SAMPLES,
} from './norms.ts';
export type { CascadeNorms } from './norms.ts';
export { peakMagnitude, PEAK_GRID_POINTS, PEAK_REFINE_STEPS } from './peak.ts';

/** Designers: notches, resonators, combs, equaliser sections and classical IIR families, from Hz and dB to roots. */
export { runDesigner, COMB_DIVISOR_TOLERANCE } from './runDesigner.ts';
export type { DesignerSpec, DesignResult, IirSpec, NotchWidth } from './spec.ts';
export { designNotch, designPeak, designDcBlocker } from './notch.ts';
export { designComb, designHarmonicNotches } from './comb.ts';
export { designPeakingEq, designShelf } from './equaliser.ts';
export type { EqWidth } from './equaliser.ts';
export { biquadToZpk } from './biquad.ts';
export { designIir } from './iir.ts';
export type { IirFamily, BandShape, IirParameters } from './iir.ts';
export { estimateOrder } from './orderEstimate.ts';
export type { OrderEstimate } from './orderEstimate.ts';
export { requirementMargin, MARGIN_GRID_POINTS, MARGIN_REFINE_TOLERANCE } from './margin.ts';
export type { RequirementMargin } from './margin.ts';
export { requirementRegions } from './requirement.ts';
export type { Requirement } from './requirement.ts';
export { MAX_DESIGN_ORDER } from './validate.ts';

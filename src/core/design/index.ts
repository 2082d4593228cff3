/** Designers: notches, resonators, combs, equaliser sections and classical IIR families, from Hz and dB to roots. */
// The whole engine, installed on import: the command line and the tests design synchronously. The page's
// first view imports light.ts instead and loads engine.ts after its first paint (store/designEngine.ts).
import { DESIGN_ENGINE } from './engine.ts';
import { installDesignEngine } from './engineSlot.ts';

installDesignEngine(DESIGN_ENGINE);

export { runDesigner, COMB_DIVISOR_TOLERANCE } from './runDesigner.ts'; // directly, not through the slot
export type { DesignerSpec, DesignResult, IirSpec } from './spec.ts';
export { DESIGNERS, DESIGNER_VARIANTS, designerEntry, registryOf, variantOf } from './registry.ts';
export type { DesignerKind, VariantOfEntry } from './registry.ts';
export { defineDesigner } from './parameters.ts';
export { FAMILY_OPTIONS, BAND_SHAPE_OPTIONS } from './entries/classicalParameters.ts';
export type * from './parameters.ts';
export { textFor, orderMax } from './parameters.ts';
export { isRequired, expectedOf } from './checkParameters.ts';
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
export { chooseFamily, passbandDelaySpread, FAMILY_TIE_BREAK } from './familyChoice.ts';
export type { FamilyChoice, FamilyTrial } from './familyChoice.ts';
export { DESIGN_ENGINE } from './engine.ts';
export { DesignEnginePending, designEngineReady, installDesignEngine } from './engineSlot.ts';
export type { DesignEngine } from './engineSlot.ts';

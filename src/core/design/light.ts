/**
 * The designers without their heavy algorithms: the registry (parameters, checks, examples), the door that
 * runs a description, and the small designers (notches, combs, equaliser sections). What the page's first
 * view imports; a classical or FIR-operator design run here needs the engine installed (engineSlot.ts), or
 * it throws DesignEnginePending. index.ts is the whole engine, installed.
 */
export { runDesigner, COMB_DIVISOR_TOLERANCE } from './runDesigner.ts';
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
export { requirementRegions } from './requirement.ts';
export type { Requirement } from './requirement.ts';
export { MAX_DESIGN_ORDER } from './validate.ts';
export { DesignEnginePending, designEngineReady, installDesignEngine } from './engineSlot.ts';
export type { DesignEngine } from './engineSlot.ts';

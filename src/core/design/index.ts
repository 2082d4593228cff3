/** Designers: notches, resonators, combs, equaliser sections and classical IIR families, from Hz and dB to roots. */
// The whole engine, installed on import: the command line and the tests design synchronously. The page's
// first view imports light.ts instead and loads engine.ts after its first paint (store/designEngine.ts).
import { DESIGN_ENGINE } from './engine.ts';
import { installDesignEngine } from './engineSlot.ts';

installDesignEngine(DESIGN_ENGINE);

export * from './light.ts';
export { DESIGN_ENGINE } from './engine.ts';
export { designIir } from './iir.ts';
export type { IirFamily, BandShape, IirParameters } from './iir.ts';
export { estimateOrder } from './orderEstimate.ts';
export type { OrderEstimate } from './orderEstimate.ts';
export { requirementMargin, MARGIN_GRID_POINTS, MARGIN_REFINE_TOLERANCE } from './margin.ts';
export type { RequirementMargin } from './margin.ts';

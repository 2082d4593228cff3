/**
 * Linear phase kept by hand edits of an FIR (core/design/fir/, in the design engine, which loads after the
 * first paint): a dragged or keyboard-moved zero of a linear-phase FIR takes its reciprocal partner with it;
 * an edit that breaks the symmetry anyway (a typed value, a deleted zero) is said on the page with an offer
 * to restore it (linearPhaseStatus.ts, loaded with the page's words for it). Before the engine has arrived a
 * zero moves alone and nothing is said.
 */
import { designEngine, designEngineReady } from '../core/design/light.ts';
import type { Design } from '../core/model/design.ts';

/** The design with zero `index` moved and its partner following, or null when the zero moves alone. */
export function linearPhaseMove(design: Design, index: number, re: number, im: number): Design | null {
  return designEngineReady() ? designEngine().moveDesignKeepingLinearPhase(design, index, re, im) : null;
}

/** The design with linear phase restored (`keep`, the zero just edited, stays where it is). */
export function restoreLinearPhaseOf(design: Design, keep: number | null): Design {
  return designEngineReady() ? designEngine().restoreLinearPhaseDesign(design, keep) : design;
}

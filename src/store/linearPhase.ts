/**
 * Linear phase kept by hand edits of an FIR (core/design/fir/linearPhaseEdit.ts, in the design engine,
 * which loads after the first paint): a dragged or keyboard-moved zero of a linear-phase FIR takes its
 * reciprocal partner with it; an edit that breaks the symmetry anyway (a typed value, a deleted zero) is
 * said on the page with an offer to restore it (linearPhaseStatus.ts, loaded with the page's words for it).
 * Before the engine has arrived a zero moves alone and nothing is said.
 */
import { designEngine, designEngineReady } from '../core/design/light.ts';
import { withRoots, type Design } from '../core/model/design.ts';
import type { Root } from '../core/types.ts';

/**
 * Whether the design is an FIR filter as designed or typed ones are: poles, all at the origin (a causal FIR
 * of the zeros' count). Zeros placed by hand on an empty plane have no poles, and move freely.
 */
export function firWithDelay(poles: readonly Root[]): boolean {
  return poles.length > 0 && poles.every((p) => p.re === 0 && p.im === 0);
}

/** The design with zero `index` moved and its partner following, or null when the zero moves alone. */
export function linearPhaseMove(design: Design, index: number, re: number, im: number): Design | null {
  if (!designEngineReady() || !firWithDelay(design.poles)) return null;
  const zeros = designEngine().moveKeepingLinearPhase(design.zeros, index, re, im);
  if (!zeros) return null;
  return zeros === design.zeros ? design : withRoots(design, 'zero', zeros);
}

/** Count of zeros, a stored pair counting twice. */
function zeroCount(roots: readonly Root[]): number {
  let n = 0;
  for (const r of roots) n += r.im > 0 ? 2 * r.multiplicity : r.multiplicity;
  return n;
}

/**
 * The design with linear phase restored (every zero without its reciprocal partner given one; `keep`, the
 * zero just edited, stays where it is). Zeros added beyond the poles at the origin bring as many poles
 * there, so the filter stays causal.
 */
export function restoreLinearPhaseOf(design: Design, keep: number | null): Design {
  if (!designEngineReady()) return design;
  const r = designEngine().restoreLinearPhase(design.zeros, keep);
  const before = design.zeros.length;
  let d: Design = withRoots(design, 'zero', r.zeros.slice(0, before));
  if (!d.parts) {
    // one designed part (or none): the partners given back are its own zeros, not a part placed by hand
    d = { ...d, zeros: r.zeros };
  } else {
    for (let i = before; i < r.zeros.length; i++) d = withRoots(d, 'zero', [...d.zeros, r.zeros[i]!]);
  }
  const short = zeroCount(d.zeros) - zeroCount(d.poles);
  const origin = d.poles.findIndex((p) => p.re === 0 && p.im === 0);
  if (short > 0 && origin >= 0) {
    const poles = d.poles.slice();
    poles[origin] = { ...poles[origin]!, multiplicity: poles[origin]!.multiplicity + short };
    d = withRoots(d, 'pole', poles);
  }
  return d;
}

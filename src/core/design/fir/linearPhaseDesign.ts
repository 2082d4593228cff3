/**
 * The design-level side of fir/linearPhaseEdit.ts, run through the design engine (engineSlot.ts) so the
 * page's first view carries none of it: a zero of an FIR with its delay moved with its partner, and the lost
 * partners given back with as many poles at the origin as keep the filter causal.
 */
import { withRoots, type Design } from '../../model/design.ts';
import type { Root } from '../../types.ts';
import { moveKeepingLinearPhase, restoreLinearPhase } from './linearPhaseEdit.ts';

/**
 * Whether the design is an FIR filter as designed or typed ones are: poles, all at the origin (a causal FIR
 * of the zeros' count). Zeros placed by hand on an empty plane have no poles, and move freely.
 */
export function firWithDelay(poles: readonly Root[]): boolean {
  return poles.length > 0 && poles.every((p) => p.re === 0 && p.im === 0);
}

/** The design with zero `index` moved and its partner following, or null when the zero moves alone. */
export function moveDesignKeepingLinearPhase(
  design: Design,
  index: number,
  re: number,
  im: number,
): Design | null {
  if (!firWithDelay(design.poles)) return null;
  const zeros = moveKeepingLinearPhase(design.zeros, index, re, im);
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
export function restoreLinearPhaseDesign(design: Design, keep: number | null): Design {
  const r = restoreLinearPhase(design.zeros, keep);
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

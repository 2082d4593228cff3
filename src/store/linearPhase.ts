/**
 * Linear phase kept by hand edits of an FIR (core/design/fir/linearPhaseEdit.ts, in the design engine,
 * which loads after the first paint): a dragged or keyboard-moved zero of a linear-phase FIR takes its
 * reciprocal partner with it; an edit that breaks the symmetry anyway (a typed value, a deleted zero) is
 * said on the page with an offer to restore it. Before the engine has arrived a zero moves alone and
 * nothing is said.
 */
import { designEngine, designEngineReady } from '../core/design/light.ts';
import { withRoots, type Design } from '../core/model/design.ts';
import type { Root } from '../core/types.ts';
import type { LinearPhaseShape } from '../core/design/fir/linearPhaseEdit.ts';
import type { WorkbenchState } from './store.ts';
import { memoLast } from './memo.ts';

/**
 * Whether the design is an FIR filter as designed or typed ones are: poles, all at the origin (a causal FIR
 * of the zeros' count). Zeros placed by hand on an empty plane have no poles, and move freely.
 */
function firWithDelay(poles: readonly Root[]): boolean {
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
  let d: Design = design;
  const before = design.zeros.length;
  d = withRoots(d, 'zero', r.zeros.slice(0, before));
  for (let i = before; i < r.zeros.length; i++) d = withRoots(d, 'zero', [...d.zeros, r.zeros[i]!]);
  const short = zeroCount(d.zeros) - zeroCount(d.poles);
  const origin = d.poles.findIndex((p) => p.re === 0 && p.im === 0);
  if (short > 0 && origin >= 0) {
    const poles = d.poles.slice();
    poles[origin] = { ...poles[origin]!, multiplicity: poles[origin]!.multiplicity + short };
    d = withRoots(d, 'pole', poles);
  }
  return d;
}

export interface LinearPhaseStatus {
  /** Linear phase, with its constant delay in samples. */
  linear: boolean;
  delaySamples: number;
  /** Linear phase broken by a hand edit: the zeros without a partner (stored indices). */
  broken: boolean;
  orphans: number[];
}

const statusOf = memoLast((zeros: Root[], poles: Root[], ready: boolean): LinearPhaseStatus | null => {
  if (!ready || !firWithDelay(poles) || zeros.length === 0) return null;
  const shape: LinearPhaseShape = designEngine().linearPhaseShape(zeros, poles);
  if (shape.linear) {
    if (shape.partnered === 0) return null; // zeros at the origin only: a pure delay
    return { linear: true, delaySamples: shape.delaySamples, broken: false, orphans: [] };
  }
  // Said only where most zeros still keep the symmetry: an FIR shaped by hand without it is not "broken".
  const broken = shape.partnered >= shape.orphans.length;
  return broken ? { linear: false, delaySamples: NaN, broken: true, orphans: shape.orphans } : null;
});

/**
 * Whether the design is a linear-phase FIR (and its delay), or one whose symmetry a hand edit broke; null
 * for any other design, and before the design engine has arrived.
 */
export function selectLinearPhase(s: WorkbenchState): LinearPhaseStatus | null {
  return statusOf(s.design.zeros, s.design.poles, designEngineReady());
}

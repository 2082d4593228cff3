/**
 * Whether the design on show is a linear-phase FIR, or one whose symmetry a hand edit broke (loaded with
 * views/linearPhase/, not in the page's first view).
 */
import { designEngine, designEngineReady } from '../core/design/light.ts';
import type { Root } from '../core/types.ts';
import type { LinearPhaseShape } from '../core/design/fir/linearPhaseEdit.ts';
import type { WorkbenchState } from './store.ts';
import { memoLast } from './memo.ts';
import { firWithDelay } from '../core/design/fir/linearPhaseDesign.ts';

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

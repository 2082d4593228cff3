/**
 * Norms of the partial cascades H₁, H₁H₂, …, H₁…H_N from one impulse response run: the sum of |h[n]| (L1),
 * the root of the sum of h[n]² (L2) and the peak of |H| (L∞). For a signal bounded by 1 these bound the
 * output: |y| ≤ L1 always; L∞ bounds a sinusoid's amplitude; L2 bounds |y| for inputs of unit energy.
 */
import type { Section } from '../types.ts';
import { sectionsToZpk } from '../system/index.ts';
import { peakMagnitude } from './peak.ts';
import { createSectionFilter, runSectionFilter } from '../signal/sectionFilter.ts';

/**
 * The impulse response is summed until the slowest pole has decayed by this factor (r^n ≤ 1e-13), so the
 * neglected tail changes L1 and L2 by less than about 1e-13/(1 − r) relative to h's scale.
 */
export const NORM_TAIL_DECAY = 1e-13;

/** Most impulse-response samples one norm run may use (pole radius up to ~0.99997 reaches the decay). */
export const MAX_NORM_SAMPLES = 1 << 20;

/** Norms of one partial cascade (linear, not dB). */
export interface CascadeNorms {
  l1: number;
  l2: number;
  linf: number;
}

/** Largest pole radius of a cascade (0 for no poles). */
export function largestPoleRadius(sections: readonly Section[]): number {
  let r = 0;
  for (const p of sectionsToZpk(sections).poles) r = Math.max(r, Math.hypot(p.re, p.im));
  return r;
}

/** Number of impulse-response samples needed for the tail to fall below NORM_TAIL_DECAY, and whether it can. */
export function normLength(radius: number): { samples: number; converged: boolean } {
  if (radius >= 1) return { samples: MAX_NORM_SAMPLES, converged: false };
  if (radius === 0) return { samples: 8, converged: true };
  const need = Math.ceil(Math.log(NORM_TAIL_DECAY) / Math.log(radius)) + 8;
  return need > MAX_NORM_SAMPLES
    ? { samples: MAX_NORM_SAMPLES, converged: false }
    : { samples: need, converged: true };
}

/**
 * L1, L2 and L∞ of every partial cascade H₁…H_i (i = 1..N), in cascade order. `converged` is false when a
 * pole lies on or outside the unit circle, or so close to it that the impulse response outlasts
 * MAX_NORM_SAMPLES; L1 and L2 are then Infinity for an unstable cascade and lower bounds otherwise.
 */
export function partialCascadeNorms(sections: readonly Section[]): {
  norms: CascadeNorms[];
  converged: boolean;
} {
  const radius = largestPoleRadius(sections);
  const { samples, converged } = normLength(radius);
  const h = new Float64Array(samples);
  h[0] = 1;
  const norms: CascadeNorms[] = [];
  for (let s = 0; s < sections.length; s++) {
    // One pass of this section over the running impulse response, in place.
    runSectionFilter(createSectionFilter([sections[s]!]), h, h);
    let l1 = 0;
    let e = 0;
    for (let n = 0; n < samples; n++) {
      l1 += Math.abs(h[n]!);
      e += h[n]! * h[n]!;
    }
    const unstable = radius > 1;
    norms.push({
      l1: unstable ? Infinity : l1,
      l2: unstable ? Infinity : Math.sqrt(e),
      linf: peakMagnitude(sections.slice(0, s + 1)).peak,
    });
  }
  return { norms, converged };
}

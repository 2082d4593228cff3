/**
 * Norms of the partial cascades H₁, H₁H₂, …, H₁…H_N from one impulse response run: the sum of |h[n]| (L1),
 * the root of the sum of h[n]² (L2) and the peak of |H| (L∞). For a signal bounded by 1 these bound the
 * output: |y| ≤ L1 always; L∞ bounds a sinusoid's amplitude; L2 bounds |y| for inputs of unit energy.
 */
import type { Section } from '../types.ts';
import { sectionsToZpk } from '../system/index.ts';
import { partialCascadePeaks } from './peak.ts';
import { createSectionFilter } from '../signal/sectionFilter.ts';

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

/** Largest pole radius of a cascade (0 for no poles), section by section. */
export function largestPoleRadius(sections: readonly Section[]): number {
  let r = 0;
  for (const s of sections) for (const p of sectionsToZpk([s]).poles) r = Math.max(r, Math.hypot(p.re, p.im));
  return r;
}

/**
 * Number of impulse-response samples needed for the tail to fall below NORM_TAIL_DECAY, and whether it can.
 * The numerators of `sections` sections delay and lengthen the response by up to two samples each (an FIR
 * cascade of N sections has 2N + 1 taps), so they are added to the pole's decay time.
 */
export function normLength(radius: number, sections = 1): { samples: number; converged: boolean } {
  if (radius >= 1) return { samples: MAX_NORM_SAMPLES, converged: false };
  const fir = 2 * sections + 1;
  if (radius === 0) return { samples: fir + 8, converged: true };
  const need = Math.ceil(Math.log(NORM_TAIL_DECAY) / Math.log(radius)) + fir + 8;
  return need > MAX_NORM_SAMPLES
    ? { samples: MAX_NORM_SAMPLES, converged: false }
    : { samples: need, converged: true };
}

/**
 * One pass of a section over the running impulse response h, in place, summing |y| and y² as it goes: the
 * section step of signal/sectionFilter.ts (transposed direct form II with the output folded out of the state
 * update; the same operations in the same order, so the same numbers — a test holds the two together), fused
 * with the sums so the long response is read once.
 */
export function passWithSums(section: Section, h: Float64Array): { l1: number; energy: number } {
  const c = createSectionFilter([section]).coefficients;
  const b0 = c[0]!;
  const a1 = c[3]!;
  const a2 = c[4]!;
  const c1 = c[1]! - a1 * b0;
  const c2 = c[2]! - a2 * b0;
  let s0 = 0;
  let s1 = 0;
  let l1 = 0;
  let energy = 0;
  for (let i = 0; i < h.length; i++) {
    const xi = h[i]!;
    const yi = b0 * xi + s0;
    const t = c1 * xi - a1 * s0 + s1;
    s1 = c2 * xi - a2 * s0;
    s0 = t;
    h[i] = yi;
    l1 += Math.abs(yi);
    energy += yi * yi;
  }
  return { l1, energy };
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
  const { samples, converged } = normLength(radius, sections.length);
  const peaks = partialCascadePeaks(sections);
  const h = new Float64Array(samples);
  h[0] = 1;
  const norms: CascadeNorms[] = [];
  const unstable = radius > 1;
  for (let s = 0; s < sections.length; s++) {
    const { l1, energy } = passWithSums(sections[s]!, h);
    norms.push({
      l1: unstable ? Infinity : l1,
      l2: unstable ? Infinity : Math.sqrt(energy),
      linf: peaks[s]!.peak,
    });
  }
  return { norms, converged };
}

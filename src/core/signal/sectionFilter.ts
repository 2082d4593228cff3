/**
 * The biquad cascade kernel: second-order sections in transposed direct form II, keeping their state
 * between calls so a long signal can be filtered in pieces. Any split of a signal into pieces gives the
 * one-shot output (time/filter.ts filterSections, which runs this kernel) bit for bit. Every float64 cascade
 * of the project runs here.
 */
import type { Section } from '../types.ts';

/** Normalised coefficients (b0 b1 b2 a1 a2 per section, divided by a0) and the two state values per section. */
export interface SectionFilterState {
  readonly coefficients: Float64Array;
  /** z0, z1 of each section, in section order; zero at the start of a signal. */
  readonly state: Float64Array;
  readonly sectionCount: number;
}

/** A cascade ready to filter, starting from zero state (as scipy.signal.sosfilt without zi). */
export function createSectionFilter(sections: readonly Section[]): SectionFilterState {
  const coefficients = new Float64Array(5 * sections.length);
  sections.forEach(([b0, b1, b2, a0, a1, a2], s) => {
    if (a0 === 0 || !Number.isFinite(a0)) {
      throw new Error(`createSectionFilter: section ${s} has a0 = ${a0}; it must be a nonzero number`);
    }
    coefficients.set([b0 / a0, b1 / a0, b2 / a0, a1 / a0, a2 / a0], 5 * s);
  });
  return { coefficients, state: new Float64Array(2 * sections.length), sectionCount: sections.length };
}

/** Sets the cascade back to zero state, as at the start of a new signal. */
export function resetSectionFilter(filter: SectionFilterState): void {
  filter.state.fill(0);
}

/**
 * Samples per block: every section of the cascade runs over one block before the next block is read, so
 * the block stays in the first-level cache and the signal is read from memory once, however many sections.
 */
export const SECTION_BLOCK = 2048;

/**
 * Filters x through the cascade, continuing from and updating its state; writes into `out` (which may be x
 * itself) or a new array, and returns it. One pass over the samples: block by block, two sections at a time
 * run in one loop with their coefficients and state in local variables, the first pair reading x and
 * writing out, the rest working in out.
 *
 * Each section is the transposed direct form II with the output folded out of the state update:
 *   y = b0·x + s0,   s0 ← c1·x − a1·s0 + s1,   s1 ← c2·x − a2·s0,   c1 = b1 − a1·b0,  c2 = b2 − a2·b0,
 * which is z0 ← b1·x + z1 − a1·y, z1 ← b2·x − a2·y with y substituted (the same state, s = z). The state
 * no longer waits for y, so consecutive samples overlap in the processor and a section costs about half the
 * time; the products and sums differ from the plain order (one section at a time), so outputs agree with it (and with
 * scipy.signal.sosfilt) to rounding, not bit for bit. Any split of a signal into pieces gives the one-shot
 * output bit for bit.
 */
export function runSectionFilter(
  filter: SectionFilterState,
  x: ArrayLike<number>,
  out: Float64Array = new Float64Array(x.length),
): Float64Array {
  const n = x.length;
  if (out.length < n) throw new Error(`runSectionFilter: output holds ${out.length} samples; ${n} needed`);
  const count = filter.sectionCount;
  if (count === 0) {
    if (out !== x) for (let i = 0; i < n; i++) out[i] = x[i]!;
    return out;
  }
  const c = filter.coefficients;
  const st = filter.state;
  for (let i0 = 0; i0 < n; i0 += SECTION_BLOCK) {
    const i1 = Math.min(n, i0 + SECTION_BLOCK);
    let src: ArrayLike<number> = x;
    for (let s = 0; s < count;) {
      if (count - s >= 2) {
        twoSections(c, st, s, src, out, i0, i1);
        s += 2;
      } else {
        oneSection(c, st, s, src, out, i0, i1);
        s += 1;
      }
      src = out;
    }
  }
  return out;
}

// The kernels below run sections s (and s+1) over [i0, i1) in the form described above.

function oneSection(
  c: Float64Array,
  st: Float64Array,
  s: number,
  src: ArrayLike<number>,
  dst: Float64Array,
  i0: number,
  i1: number,
): void {
  const k = 5 * s;
  const b0 = c[k]!;
  const a1 = c[k + 3]!;
  const a2 = c[k + 4]!;
  const c1 = c[k + 1]! - a1 * b0;
  const c2 = c[k + 2]! - a2 * b0;
  let s0 = st[2 * s]!;
  let s1 = st[2 * s + 1]!;
  for (let i = i0; i < i1; i++) {
    const xi = src[i]!;
    const yi = b0 * xi + s0;
    const t = c1 * xi - a1 * s0 + s1;
    s1 = c2 * xi - a2 * s0;
    s0 = t;
    dst[i] = yi;
  }
  st[2 * s] = s0;
  st[2 * s + 1] = s1;
}

function twoSections(
  c: Float64Array,
  st: Float64Array,
  s: number,
  src: ArrayLike<number>,
  dst: Float64Array,
  i0: number,
  i1: number,
): void {
  const k = 5 * s;
  const pb0 = c[k]!;
  const pa1 = c[k + 3]!;
  const pa2 = c[k + 4]!;
  const pc1 = c[k + 1]! - pa1 * pb0;
  const pc2 = c[k + 2]! - pa2 * pb0;
  const qb0 = c[k + 5]!;
  const qa1 = c[k + 8]!;
  const qa2 = c[k + 9]!;
  const qc1 = c[k + 6]! - qa1 * qb0;
  const qc2 = c[k + 7]! - qa2 * qb0;
  let p0 = st[2 * s]!;
  let p1 = st[2 * s + 1]!;
  let q0 = st[2 * s + 2]!;
  let q1 = st[2 * s + 3]!;
  for (let i = i0; i < i1; i++) {
    const x = src[i]!;
    const u = pb0 * x + p0;
    const tp = pc1 * x - pa1 * p0 + p1;
    p1 = pc2 * x - pa2 * p0;
    p0 = tp;
    const v = qb0 * u + q0;
    const tq = qc1 * u - qa1 * q0 + q1;
    q1 = qc2 * u - qa2 * q0;
    q0 = tq;
    dst[i] = v;
  }
  st[2 * s] = p0;
  st[2 * s + 1] = p1;
  st[2 * s + 2] = q0;
  st[2 * s + 3] = q1;
}

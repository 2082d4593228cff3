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
 * itself) or a new array, and returns it. One pass over the samples: block by block, up to four sections at a
 * time run in one loop with their coefficients and state in local variables (the out-of-order core overlaps
 * their dependency chains), the first group reading x and writing out, the rest working in out. Every
 * section computes the same products and sums in the same order as a section-by-section pass, so the output
 * is bit for bit that of any other split of the signal.
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
      const left = count - s;
      if (left >= 4) {
        fourSections(c, st, s, src, out, i0, i1);
        s += 4;
      } else if (left >= 2) {
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

// The kernels below are the transposed direct form II biquad, y = b0·x + z0, z0 ← b1·x + z1 − a1·y,
// z1 ← b2·x − a2·y, written out for one, two and four consecutive sections s, s+1, ... over [i0, i1).

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
  const b1 = c[k + 1]!;
  const b2 = c[k + 2]!;
  const a1 = c[k + 3]!;
  const a2 = c[k + 4]!;
  let z0 = st[2 * s]!;
  let z1 = st[2 * s + 1]!;
  for (let i = i0; i < i1; i++) {
    const xi = src[i]!;
    const yi = b0 * xi + z0;
    z0 = b1 * xi + z1 - a1 * yi;
    z1 = b2 * xi - a2 * yi;
    dst[i] = yi;
  }
  st[2 * s] = z0;
  st[2 * s + 1] = z1;
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
  const pb1 = c[k + 1]!;
  const pb2 = c[k + 2]!;
  const pa1 = c[k + 3]!;
  const pa2 = c[k + 4]!;
  const qb0 = c[k + 5]!;
  const qb1 = c[k + 6]!;
  const qb2 = c[k + 7]!;
  const qa1 = c[k + 8]!;
  const qa2 = c[k + 9]!;
  let p0 = st[2 * s]!;
  let p1 = st[2 * s + 1]!;
  let q0 = st[2 * s + 2]!;
  let q1 = st[2 * s + 3]!;
  for (let i = i0; i < i1; i++) {
    const x = src[i]!;
    const u = pb0 * x + p0;
    p0 = pb1 * x + p1 - pa1 * u;
    p1 = pb2 * x - pa2 * u;
    const v = qb0 * u + q0;
    q0 = qb1 * u + q1 - qa1 * v;
    q1 = qb2 * u - qa2 * v;
    dst[i] = v;
  }
  st[2 * s] = p0;
  st[2 * s + 1] = p1;
  st[2 * s + 2] = q0;
  st[2 * s + 3] = q1;
}

function fourSections(
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
  const pb1 = c[k + 1]!;
  const pb2 = c[k + 2]!;
  const pa1 = c[k + 3]!;
  const pa2 = c[k + 4]!;
  const qb0 = c[k + 5]!;
  const qb1 = c[k + 6]!;
  const qb2 = c[k + 7]!;
  const qa1 = c[k + 8]!;
  const qa2 = c[k + 9]!;
  const rb0 = c[k + 10]!;
  const rb1 = c[k + 11]!;
  const rb2 = c[k + 12]!;
  const ra1 = c[k + 13]!;
  const ra2 = c[k + 14]!;
  const tb0 = c[k + 15]!;
  const tb1 = c[k + 16]!;
  const tb2 = c[k + 17]!;
  const ta1 = c[k + 18]!;
  const ta2 = c[k + 19]!;
  let p0 = st[2 * s]!;
  let p1 = st[2 * s + 1]!;
  let q0 = st[2 * s + 2]!;
  let q1 = st[2 * s + 3]!;
  let r0 = st[2 * s + 4]!;
  let r1 = st[2 * s + 5]!;
  let t0 = st[2 * s + 6]!;
  let t1 = st[2 * s + 7]!;
  for (let i = i0; i < i1; i++) {
    const x = src[i]!;
    const u = pb0 * x + p0;
    p0 = pb1 * x + p1 - pa1 * u;
    p1 = pb2 * x - pa2 * u;
    const v = qb0 * u + q0;
    q0 = qb1 * u + q1 - qa1 * v;
    q1 = qb2 * u - qa2 * v;
    const w = rb0 * v + r0;
    r0 = rb1 * v + r1 - ra1 * w;
    r1 = rb2 * v - ra2 * w;
    const y = tb0 * w + t0;
    t0 = tb1 * w + t1 - ta1 * y;
    t1 = tb2 * w - ta2 * y;
    dst[i] = y;
  }
  st[2 * s] = p0;
  st[2 * s + 1] = p1;
  st[2 * s + 2] = q0;
  st[2 * s + 3] = q1;
  st[2 * s + 4] = r0;
  st[2 * s + 5] = r1;
  st[2 * s + 6] = t0;
  st[2 * s + 7] = t1;
}

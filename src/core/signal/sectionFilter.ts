/**
 * The biquad cascade kernel: second-order sections in transposed direct form II, keeping their state
 * between calls so a long signal can be filtered in pieces. Each section runs over the whole piece before
 * the next, so any split of a signal into pieces gives the one-shot output (time/filter.ts filterSections,
 * which runs this kernel) bit for bit. Every float64 cascade of the project runs here.
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
 * Filters x through the cascade, continuing from and updating its state; writes into `out` (which may be x
 * itself) or a new array, and returns it.
 */
export function runSectionFilter(
  filter: SectionFilterState,
  x: ArrayLike<number>,
  out: Float64Array = new Float64Array(x.length),
): Float64Array {
  const n = x.length;
  if (out.length < n) throw new Error(`runSectionFilter: output holds ${out.length} samples; ${n} needed`);
  if (out !== x) for (let i = 0; i < n; i++) out[i] = x[i]!;
  const c = filter.coefficients;
  const st = filter.state;
  for (let s = 0; s < filter.sectionCount; s++) {
    const k = 5 * s;
    const b0 = c[k]!;
    const b1 = c[k + 1]!;
    const b2 = c[k + 2]!;
    const a1 = c[k + 3]!;
    const a2 = c[k + 4]!;
    let z0 = st[2 * s]!;
    let z1 = st[2 * s + 1]!;
    for (let i = 0; i < n; i++) {
      const xi = out[i]!;
      const yi = b0 * xi + z0;
      z0 = b1 * xi + z1 - a1 * yi;
      z1 = b2 * xi - a2 * yi;
      out[i] = yi;
    }
    st[2 * s] = z0;
    st[2 * s + 1] = z1;
  }
  return out;
}

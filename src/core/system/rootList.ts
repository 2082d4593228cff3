/**
 * Root lists: the stored form (one entry per distinct root, im >= 0, conjugate implied, with a multiplicity)
 * and the expanded form (every conjugate listed).
 */
import type { Root, Zpk } from '../types.ts';

/**
 * Relative distance below which two computed roots count as one repeated root: |a - b| <= tol·max(1, |a|).
 * Rounding in the coefficients splits an m-fold root into a cluster of radius about eps^(1/m)·scale; 1e-6
 * gathers double roots (spread ~1e-8) with room to spare while staying far below the spacing of distinct
 * roots in practical designs (a 40th-order low-pass at 0.001·fs still spaces its poles ~1e-4 apart).
 */
export const ROOT_MERGE_TOLERANCE = 1e-6;

/** Lists every root and, for im != 0, its conjugate as a separate entry; each entry keeps its multiplicity. */
export function expandRoots(roots: readonly Root[]): Root[] {
  const out: Root[] = [];
  for (const r of roots) {
    out.push({ re: r.re, im: r.im, multiplicity: r.multiplicity });
    if (r.im !== 0) out.push({ re: r.re, im: -r.im, multiplicity: r.multiplicity });
  }
  return out;
}

/**
 * Inverse of expandRoots for a conjugate-symmetric list: roots within ROOT_MERGE_TOLERANCE are merged
 * (multiplicity-weighted mean, multiplicities added); a cluster straddling the real axis becomes one real
 * root; only clusters with im > 0 are kept for complex roots.
 */
export function compressRoots(roots: readonly Root[], tolerance = ROOT_MERGE_TOLERANCE): Root[] {
  const n = roots.length;
  const used = new Uint8Array(n);
  const out: Root[] = [];
  for (let i = 0; i < n; i++) {
    if (used[i]) continue;
    used[i] = 1;
    const seed = roots[i]!;
    const limit = tolerance * Math.max(1, Math.hypot(seed.re, seed.im));
    let m = seed.multiplicity;
    let sr = seed.re * m;
    let si = seed.im * m;
    for (let j = i + 1; j < n; j++) {
      const r = roots[j]!;
      if (used[j] || Math.hypot(r.re - seed.re, r.im - seed.im) > limit) continue;
      used[j] = 1;
      m += r.multiplicity;
      sr += r.re * r.multiplicity;
      si += r.im * r.multiplicity;
    }
    const re = sr / m;
    const im = si / m;
    if (Math.abs(im) <= limit) out.push({ re, im: 0, multiplicity: m });
    else if (im > 0) out.push({ re, im, multiplicity: m });
  }
  return out;
}

/** Number of roots counting implied conjugates and multiplicities. */
export function rootCount(roots: readonly Root[]): number {
  let n = 0;
  for (const r of roots) n += r.im === 0 ? r.multiplicity : 2 * r.multiplicity;
  return n;
}

/** Order of the system: the larger of the zero and pole counts (conjugates and multiplicities included). */
export function systemOrder(zpk: Zpk): number {
  return Math.max(rootCount(zpk.zeros), rootCount(zpk.poles));
}

/**
 * Root lists: the stored form (one entry per distinct root, im >= 0, conjugate implied, with a multiplicity)
 * and the expanded form (every conjugate listed).
 */
import type { Root, Zpk } from '../types.ts';

/**
 * Distance below which two roots count as one repeated root in compressRoots: 0, so only identical roots
 * merge. Computed roots arrive already grouped (findRoots merges a cluster only when the merged root
 * reproduces the polynomial as well as the separate ones), and two distinct roots 1e-7 apart on either side
 * of the unit circle must never become one double root inside it.
 */
export const ROOT_MERGE_TOLERANCE = 0;

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
 * Inverse of expandRoots for a conjugate-symmetric list: roots within `tolerance` (default
 * ROOT_MERGE_TOLERANCE: identical only) are merged, multiplicities added; only roots with im ≥ 0 are kept.
 */
export function compressRoots(roots: readonly Root[], tolerance = ROOT_MERGE_TOLERANCE): Root[] {
  const n = roots.length;
  const used = new Uint8Array(n);
  // Roots sorted by real part: a seed's neighbours lie in a window of real parts ±limit, found by bisection,
  // so a list of n roots costs O(n log n) instead of comparing every pair. skip[k] leads past used entries.
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => roots[a]!.re - roots[b]!.re || a - b);
  const rank = new Int32Array(n);
  order.forEach((i, k) => (rank[i] = k));
  const skip = Int32Array.from({ length: n + 1 }, (_, k) => k);
  const live = (k: number): number => {
    let r = k;
    while (skip[r] !== r) r = skip[r]!;
    while (skip[k] !== r) [k, skip[k]] = [skip[k]!, r];
    return r;
  };
  const markUsed = (i: number) => {
    used[i] = 1;
    skip[rank[i]!] = rank[i]! + 1;
  };
  const out: Root[] = [];
  for (let i = 0; i < n; i++) {
    if (used[i]) continue;
    markUsed(i);
    const seed = roots[i]!;
    const limit = tolerance * Math.max(1, Math.hypot(seed.re, seed.im));
    // The window is a little wider than ±limit, so rounding in its bounds never hides a neighbour.
    const reach = 2 * limit + Math.abs(seed.re) * 1e-15 + 1e-300;
    let lo = 0;
    let hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (roots[order[mid]!]!.re < seed.re - reach) lo = mid + 1;
      else hi = mid;
    }
    const merged: number[] = [];
    for (let k = live(lo); k < n && roots[order[k]!]!.re <= seed.re + reach; k = live(k + 1)) {
      const j = order[k]!;
      const r = roots[j]!;
      if (Math.hypot(r.re - seed.re, r.im - seed.im) <= limit) merged.push(j);
    }
    // Summed in list order, as a pairwise scan would, so the mean comes out the same to the bit.
    merged.sort((a, b) => a - b);
    let m = seed.multiplicity;
    let sr = seed.re * m;
    let si = seed.im * m;
    for (const j of merged) {
      const r = roots[j]!;
      markUsed(j);
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

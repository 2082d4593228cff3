/**
 * Merges numerically split copies of a repeated pole into one pole with a multiplicity. A root of
 * multiplicity m comes out of a root finder as m values spread over about ε^(1/m); partial fractions need
 * the multiplicity and an accurate centre. Candidates are merged closest first; a merged centre is refined
 * by Newton's method on A^(m−1), where the root is simple, and accepted only if A, A', …, A^(m−1) vanish
 * there to within MULTIPLE_POLE_TOLERANCE — the multiple-root test of Z. Zeng, "Computing multiple roots of
 * inexact polynomials" (Math. Comp. 74, 2005), in a simple form. Private helper of the time-response code;
 * findRoots(...).grouped does the same job and this pass is then a check that changes nothing.
 */
import type { Root } from '../types.ts';
import { taylorAt, taylorBound } from './taylor.ts';

/**
 * Poles are treated as one repeated pole when merging them perturbs the denominator's Taylor coefficients
 * at the merged pole by at most this fraction of their rounding bound Σ|a_k|·C(k, j)|p|^(k−j): far above
 * the 1e-16 of arithmetic and coefficient rounding, far below what distinct design poles produce (two poles
 * 1e-4 apart perturb by about 1e-8).
 */
export const MULTIPLE_POLE_TOLERANCE = 1e-10;

/** Poles farther apart than this (relative to max(1, |pole|)) are never candidates for merging. */
export const POLE_MERGE_SEARCH_RADIUS = 1e-2;

/** Newton steps allowed when refining a merged centre; convergence is linear while a cluster is incomplete. */
const REFINE_STEPS = 60;

interface Cluster {
  re: number;
  im: number;
  multiplicity: number;
  /** Indices into the input list. */
  members: number[];
  id: number;
}

/**
 * Groups of poles (conjugates listed separately) with numerically coincident ones merged. a: denominator in
 * descending powers of z whose roots the groups are; groups: the root finder's groups.
 */
export function mergeRepeatedPoles(a: ArrayLike<number>, groups: readonly Root[]): Root[] {
  let clusters: Cluster[] = groups.map((g, i) => polish(a, g, i));
  let nextId = clusters.length;
  const rejected = new Set<string>();
  for (;;) {
    let best: [Cluster, Cluster] | undefined;
    let bestDist = Infinity;
    for (let i = 0; i < clusters.length; i++) {
      const p = clusters[i]!;
      for (let j = i + 1; j < clusters.length; j++) {
        const q = clusters[j]!;
        const d = Math.hypot(p.re - q.re, p.im - q.im);
        const reach = POLE_MERGE_SEARCH_RADIUS * Math.max(1, Math.hypot(p.re, p.im));
        if (d < bestDist && d <= reach && !rejected.has(`${p.id}:${q.id}`)) {
          bestDist = d;
          best = [p, q];
        }
      }
    }
    if (!best) break;
    const [p, q] = best;
    const merged = tryMerge(a, p, q, nextId);
    if (merged) {
      nextId++;
      clusters = clusters.filter((c) => c !== p && c !== q);
      clusters.push(merged);
    } else {
      rejected.add(`${p.id}:${q.id}`);
    }
  }
  return symmetrize(clusters, groups);
}

function tryMerge(a: ArrayLike<number>, p: Cluster, q: Cluster, id: number): Cluster | undefined {
  const m = p.multiplicity + q.multiplicity;
  if (m > a.length - 1) return undefined;
  const startRe = (p.re * p.multiplicity + q.re * q.multiplicity) / m;
  const startIm = (p.im * p.multiplicity + q.im * q.multiplicity) / m;
  const centre = refineCentre(a, startRe, startIm, m);
  if (!centre || !isMultipleRoot(a, centre[0], centre[1], m)) return undefined;
  return { re: centre[0], im: centre[1], multiplicity: m, members: [...p.members, ...q.members], id };
}

/** The root finder's group, polished by Newton on A^(m−1) when that gives a verified m-fold root. */
function polish(a: ArrayLike<number>, g: Root, i: number): Cluster {
  const centre = refineCentre(a, g.re, g.im, g.multiplicity);
  const ok = centre !== undefined && isMultipleRoot(a, centre[0], centre[1], g.multiplicity);
  const [re, im] = ok ? centre : [g.re, g.im];
  return { re, im, multiplicity: g.multiplicity, members: [i], id: i };
}

/** Newton's method on A^(m−1) from (re, im); undefined if it leaves the search radius or breaks down. */
function refineCentre(
  a: ArrayLike<number>,
  startRe: number,
  startIm: number,
  m: number,
): [number, number] | undefined {
  let re = startRe;
  let im = startIm;
  for (let s = 0; s < REFINE_STEPS; s++) {
    // With A(c + t) = Σ α_j t^j the Newton step for A^(m−1) is α_{m−1} / (m·α_m).
    const [ar, ai] = taylorAt(a, re, im, m + 1);
    const nr = ar[m - 1]!;
    const ni = ai[m - 1]!;
    const dr = m * ar[m]!;
    const di = m * ai[m]!;
    const den = dr * dr + di * di;
    if (den === 0) break;
    const sr = (nr * dr + ni * di) / den;
    const si = (ni * dr - nr * di) / den;
    if (!Number.isFinite(sr) || !Number.isFinite(si)) return undefined;
    re -= sr;
    im -= si;
    if (Math.hypot(sr, si) <= 2 * Number.EPSILON * Math.hypot(re, im)) break;
  }
  const reach = POLE_MERGE_SEARCH_RADIUS * Math.max(1, Math.hypot(startRe, startIm));
  return Math.hypot(re - startRe, im - startIm) <= reach ? [re, im] : undefined;
}

/** Whether A, A', …, A^(m−1) all vanish at (re, im) to within MULTIPLE_POLE_TOLERANCE of their bounds. */
function isMultipleRoot(a: ArrayLike<number>, re: number, im: number, m: number): boolean {
  const [ar, ai] = taylorAt(a, re, im, m);
  const bound = taylorBound(a, Math.hypot(re, im), m);
  for (let j = 0; j < m; j++) {
    if (!(Math.hypot(ar[j]!, ai[j]!) <= MULTIPLE_POLE_TOLERANCE * bound[j]!)) return false;
  }
  return true;
}

/** Makes the result exactly conjugate-symmetric: self-conjugate clusters become real, mirrors exact conjugates. */
function symmetrize(clusters: Cluster[], groups: readonly Root[]): Root[] {
  const mate = groups.map((g, i) => {
    if (g.im === 0) return i;
    let best = i;
    let bestDist = Infinity;
    groups.forEach((h, j) => {
      const d = Math.hypot(h.re - g.re, h.im + g.im);
      if (j !== i && h.multiplicity === g.multiplicity && d < bestDist) {
        bestDist = d;
        best = j;
      }
    });
    return best;
  });
  const owner = new Int32Array(groups.length);
  clusters.forEach((c, k) => c.members.forEach((i) => (owner[i] = k)));
  const out: Root[] = clusters.map((c) => ({ re: c.re, im: c.im, multiplicity: c.multiplicity }));
  clusters.forEach((c, k) => {
    const mirror = owner[mate[c.members[0]!]!]!;
    const root = out[k]!;
    if (mirror === k) root.im = 0;
    else if (c.im > 0 && out[mirror]!.multiplicity === c.multiplicity) {
      out[mirror] = { re: root.re, im: -root.im, multiplicity: root.multiplicity };
    }
  });
  return out;
}

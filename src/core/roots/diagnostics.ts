/**
 * What a user should know about roots computed from typed coefficients: whether the iteration converged,
 * how well the reported set reproduces the polynomial, and for each root a certified error bound (the
 * inclusion disks of roots/inclusion.ts) with an "uncertain" flag when that bound is large.
 */
import type { Root } from '../types.ts';
import { findRoots, type RootsResult } from './index.ts';
import { inclusionDisks, type InclusionDisks } from './inclusion.ts';
import { groupedSetBackwardError } from './setBackwardError.ts';

/**
 * A root whose certified error bound exceeds this fraction of max(1, |root|) is flagged uncertain: fewer
 * than six significant digits of it are known from the coefficients as typed.
 */
export const UNCERTAIN_RELATIVE_ERROR = 1e-6;

/** One root with its error bound. */
export interface RootDiagnostic extends Root {
  /** Radius (in the z-plane) of a disk around this root that certainly holds the true root(s) it stands for. */
  errorBound: number;
  /** errorBound > UNCERTAIN_RELATIVE_ERROR · max(1, |root|). */
  uncertain: boolean;
}

/** Diagnostics of one polynomial's roots. */
export interface PolynomialDiagnostics {
  /** The simultaneous iteration met its stopping test for every root. */
  converged: boolean;
  /** max_k |c_k − q_k| / max_k |c_k| for the reported roots multiplied out (double-double). */
  setBackwardError: number;
  /** The roots in the stored form (im ≥ 0, multiplicity), each with its bound. */
  roots: RootDiagnostic[];
}

/** Diagnostics for the roots of p (descending powers; b or a in powers of z^-1), from a findRoots result. */
export function diagnoseRoots(
  p: ArrayLike<number>,
  found: RootsResult = findRoots(p),
): PolynomialDiagnostics {
  const roots: RootDiagnostic[] = [];
  let first = 0;
  while (first < p.length && p[first] === 0) first++;
  let last = p.length - 1;
  while (last > first && p[last] === 0) last--;
  // findRoots lists the exact roots at the origin (trailing zeros) last; the disks cover the others.
  const n = last - first;
  const re = found.re.subarray(0, n);
  const im = found.im.subarray(0, n);
  const c = Float64Array.from({ length: n + 1 }, (_, k) => p[first + k]!);
  const disks = n > 0 && !found.zeroPolynomial ? inclusionDisks(c, re, im) : null;
  const origin = p.length - 1 - last;
  for (const g of found.grouped) {
    if (g.im < 0) continue;
    const exact = origin > 0 && g.re === 0 && g.im === 0 && !re.some((x, i) => x === 0 && im[i] === 0);
    const bound = exact || !disks ? 0 : boundFor(g, re, im, disks);
    const scale = UNCERTAIN_RELATIVE_ERROR * Math.max(1, Math.hypot(g.re, g.im));
    roots.push({ ...g, errorBound: bound, uncertain: !(bound <= scale) });
  }
  return {
    converged: found.converged,
    setBackwardError: found.zeroPolynomial ? 0 : groupedSetBackwardError(p, found.grouped),
    roots,
  };
}

/** The radius around g of the group of touching disks g belongs to. */
function boundFor(g: Root, re: Float64Array, im: Float64Array, disks: InclusionDisks): number {
  const n = re.length;
  // The nearest approximation whose disk holds g, else the nearest approximation.
  let home = -1;
  let nearest = Infinity;
  for (const within of [true, false]) {
    for (let i = 0; i < n; i++) {
      const d = Math.hypot(g.re - re[i]!, g.im - im[i]!);
      if ((!within || d <= disks.radius[i]!) && d < nearest) [home, nearest] = [i, d];
    }
    if (home >= 0) break;
  }
  if (home < 0) return Infinity;
  const id = disks.component[home]!;
  let bound = 0;
  for (let j = 0; j < n; j++)
    if (disks.component[j] === id)
      bound = Math.max(bound, Math.hypot(g.re - re[j]!, g.im - im[j]!) + disks.radius[j]!);
  return bound;
}

/**
 * Poles of a monic denominator for partial fractions: findRoots' groups, checked against the coefficients.
 * When the groups do not multiply back to the denominator (a root finder that lost a copy of a repeated
 * root), the eigenvalues of the companion matrix — the method of numpy.roots, via ml-matrix's Hessenberg QR —
 * are used instead. Private helper of the time-response code; to be merged with roots.ts once that is stable.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import type { Root } from '../types.ts';
import { findRoots } from '../roots.ts';
import { polyFromRoots } from '../poly.ts';

/**
 * Largest coefficient mismatch, relative to the largest coefficient, accepted between the denominator and the
 * product of its found poles: generous for ill-conditioned clusters, far below a lost or duplicated root.
 */
export const POLE_SET_CONSISTENCY = 1e-6;

/** Pole groups (conjugates listed) of the monic polynomial a (descending powers), and whether they are trusted. */
export function findPoleGroups(a: ArrayLike<number>): { groups: Root[]; converged: boolean } {
  const found = findRoots(a);
  if (found.converged && consistent(a, found.grouped)) return { groups: found.grouped, converged: true };
  const companion = companionRoots(a);
  return { groups: companion, converged: consistent(a, companion) };
}

function consistent(a: ArrayLike<number>, groups: readonly Root[]): boolean {
  // polyFromRoots treats im > 0 as implying its conjugate, so rebuild from the upper half and the real axis.
  const rebuilt = polyFromRoots(groups.filter((g) => g.im >= 0));
  if (rebuilt.length !== a.length) return false;
  let scale = 0;
  for (let i = 0; i < a.length; i++) scale = Math.max(scale, Math.abs(a[i]!));
  for (let i = 0; i < a.length; i++)
    if (!(Math.abs(rebuilt[i]! - a[i]!) <= POLE_SET_CONSISTENCY * scale)) return false;
  return true;
}

/** Roots as eigenvalues of the companion matrix of the monic polynomial a, each with multiplicity 1. */
function companionRoots(a: ArrayLike<number>): Root[] {
  const n = a.length - 1;
  if (n < 1) return [];
  const m = Matrix.zeros(n, n);
  for (let j = 0; j < n; j++) m.set(0, j, -a[j + 1]! / a[0]!);
  for (let i = 1; i < n; i++) m.set(i, i - 1, 1);
  const eig = new EigenvalueDecomposition(m, { assumeSymmetric: false });
  return eig.realEigenvalues.map((re, i) => ({ re, im: eig.imaginaryEigenvalues[i]!, multiplicity: 1 }));
}

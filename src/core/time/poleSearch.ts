/**
 * Poles of a monic denominator for partial fractions: findRoots' groups, checked against the coefficients.
 * The check catches a pole set that does not multiply back to the denominator (an ill-conditioned cluster
 * the root finder could not resolve), which is then reported as not converged rather than used silently.
 */
import type { Root } from '../types.ts';
import { findRoots } from '../roots/index.ts';
import { polyFromRoots } from '../poly.ts';

/**
 * Largest coefficient mismatch, relative to the largest coefficient, accepted between the denominator and the
 * product of its found poles: generous for ill-conditioned clusters, far below a lost or duplicated root.
 */
export const POLE_SET_CONSISTENCY = 1e-6;

/** Pole groups (conjugates listed) of the monic polynomial a (descending powers), and whether they are trusted. */
export function findPoleGroups(a: ArrayLike<number>): { groups: Root[]; converged: boolean } {
  const found = findRoots(a);
  return { groups: found.grouped, converged: found.converged && consistent(a, found.grouped) };
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

/**
 * What double precision can tell apart in a designed filter. A design is refused when it puts roots where the
 * workbench could not keep them apart: two distinct zeros (or poles) closer than √ε — a rounding of one unit
 * in the last place of a coefficient moves a double root by about √ε, so closer roots are no longer
 * determined by the sections or the b/a the design becomes — or a pole closer to the unit circle than the
 * stability verdict's tolerance, where the workbench can no longer tell it from a pole on the circle.
 */
import type { Root, Zpk } from '../types.ts';
import { expandRoots } from '../system/index.ts';
import { UNIT_CIRCLE_TOLERANCE } from '../stability/index.ts';
import { shortNumber } from '../shortNumber.ts';

/** √ε for doubles (2⁻²⁶): the least distance, relative to max(1, |z|), at which two roots stay apart. */
export const ROOT_SEPARATION = 2 ** -26;

/** Why a designed set of roots is beyond double precision (a noun phrase), or null when every root is kept apart. */
export function separationProblem(zpk: Zpk): string | null {
  const fmt = (v: number) => shortNumber(v, 2);
  for (const [list, what] of [
    [zpk.poles, 'poles'],
    [zpk.zeros, 'zeros'],
  ] as const) {
    const distance = closestTooClose(expandRoots(list));
    if (distance !== null)
      return `two ${what} ${fmt(distance)} apart, closer than double precision separates (${fmt(ROOT_SEPARATION)})`;
  }
  let nearest = 0;
  for (const p of zpk.poles) nearest = Math.max(nearest, Math.hypot(p.re, p.im));
  if (nearest < 1 && 1 - nearest <= UNIT_CIRCLE_TOLERANCE)
    return `a pole ${fmt(1 - nearest)} inside the unit circle, closer than ${fmt(UNIT_CIRCLE_TOLERANCE)}, within which it cannot be told from a pole on the circle`;
  return null;
}

/**
 * The distance of the closest two distinct roots that are nearer than ROOT_SEPARATION·max(1, |z|), or null.
 * Sorted by real part, each root is compared only with those whose real part is that near: O(n log n).
 */
function closestTooClose(roots: readonly Root[]): number | null {
  const sorted = roots.slice().sort((a, b) => a.re - b.re);
  let widest = 1;
  for (const r of sorted) widest = Math.max(widest, Math.hypot(r.re, r.im));
  const reach = ROOT_SEPARATION * widest;
  let best: number | null = null;
  for (let i = 0; i < sorted.length; i++) {
    const a = sorted[i]!;
    const limit = ROOT_SEPARATION * Math.max(1, Math.hypot(a.re, a.im));
    for (let j = i + 1; j < sorted.length && sorted[j]!.re - a.re <= reach; j++) {
      const b = sorted[j]!;
      const distance = Math.hypot(a.re - b.re, a.im - b.im);
      // Distance 0 is the same root repeated, as designers place on purpose.
      if (distance > 0 && distance < limit && (best === null || distance < best)) best = distance;
    }
  }
  return best;
}

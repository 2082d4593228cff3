/**
 * What double precision can tell apart in a designed filter. A design is refused when it puts roots where the
 * workbench could not keep them apart: two distinct zeros (or poles) closer than √ε — a rounding of one unit
 * in the last place of a coefficient moves a double root by about √ε, so closer roots are no longer
 * determined by the sections or the b/a the design becomes — or a pole closer to the unit circle than the
 * stability verdict's tolerance, where the workbench can no longer tell it from a pole on the circle.
 */
import type { Root, Zpk } from '../types.ts';
import { expandRoots } from '../system/index.ts';
import { UNIT_CIRCLE_TOLERANCE } from '../stability.ts';
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
    const close = closestDistinct(expandRoots(list));
    if (close && close.distance < ROOT_SEPARATION * close.scale)
      return `two ${what} ${fmt(close.distance)} apart, closer than double precision separates (${fmt(ROOT_SEPARATION)})`;
  }
  let nearest = 0;
  for (const p of zpk.poles) nearest = Math.max(nearest, Math.hypot(p.re, p.im));
  if (nearest < 1 && 1 - nearest <= UNIT_CIRCLE_TOLERANCE)
    return `a pole ${fmt(1 - nearest)} inside the unit circle, closer than ${fmt(UNIT_CIRCLE_TOLERANCE)}, within which it cannot be told from a pole on the circle`;
  return null;
}

/** The two distinct roots of the list that are closest, with their distance and scale max(1, |z|). */
function closestDistinct(roots: readonly Root[]): { distance: number; scale: number } | null {
  let best: { distance: number; scale: number } | null = null;
  for (let i = 0; i < roots.length; i++) {
    const a = roots[i]!;
    for (let j = i + 1; j < roots.length; j++) {
      const b = roots[j]!;
      const distance = Math.hypot(a.re - b.re, a.im - b.im);
      if (distance === 0) continue; // the same root repeated, as designers place on purpose
      const scale = Math.max(1, Math.hypot(a.re, a.im));
      if (!best || distance / scale < best.distance / best.scale) best = { distance, scale };
    }
  }
  return best;
}

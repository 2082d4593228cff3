/** Test helper: compares root sets regardless of order, conjugates and multiplicities expanded. */
import { expect } from 'vitest';
import type { Root } from '../../../src/core/types.ts';

/** Every root as one complex number per copy, conjugates listed. */
export function allRoots(roots: readonly Root[]): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  for (const r of roots) {
    for (let m = 0; m < r.multiplicity; m++) {
      out.push([r.re, r.im]);
      if (r.im !== 0) out.push([r.re, -r.im]);
    }
  }
  return out;
}

/** Asserts the two root sets match one-to-one within `tol` (absolute distance), greedy nearest matching. */
export function expectSameRoots(
  actual: readonly Root[],
  expected: readonly Root[],
  tol: number,
  label = '',
): void {
  const a = allRoots(actual);
  const e = allRoots(expected);
  expect(a.length, `${label} root count`).toBe(e.length);
  const used = new Uint8Array(a.length);
  for (const [er, ei] of e) {
    let best = -1;
    let bestD = Infinity;
    a.forEach(([ar, ai], i) => {
      const d = Math.hypot(ar - er, ai - ei);
      if (!used[i] && d < bestD) [best, bestD] = [i, d];
    });
    expect(bestD, `${label} root ${er}+${ei}i unmatched`).toBeLessThanOrEqual(tol);
    used[best] = 1;
  }
}

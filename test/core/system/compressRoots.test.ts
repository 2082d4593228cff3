/**
 * compressRoots by sorting gives exactly what the pairwise scan it replaced gave (the reference below): the
 * same merged roots, multiplicities and means to the bit, on random lists with clusters and repeats.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compressRoots } from '../../../src/core/system/index.ts';
import type { Root } from '../../../src/core/types.ts';

/** The pairwise scan: each unused root in list order gathers every later unused root within the limit. */
function scanCompress(roots: readonly Root[], tolerance: number): Root[] {
  const used = new Uint8Array(roots.length);
  const out: Root[] = [];
  for (let i = 0; i < roots.length; i++) {
    if (used[i]) continue;
    used[i] = 1;
    const seed = roots[i]!;
    const limit = tolerance * Math.max(1, Math.hypot(seed.re, seed.im));
    let m = seed.multiplicity;
    let sr = seed.re * m;
    let si = seed.im * m;
    for (let j = i + 1; j < roots.length; j++) {
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

const near = (c: number) =>
  fc.oneof(
    fc.constant(c),
    fc.integer({ min: -5, max: 5 }).map((k) => c + k * 3e-7),
    fc.double({ min: -2, max: 2, noNaN: true }),
  );
const root: fc.Arbitrary<Root> = fc.record({
  re: fc.constantFrom(0, 0.5, -0.8, 1).chain(near),
  im: fc.constantFrom(0, 0.3, -0.3).chain(near),
  multiplicity: fc.integer({ min: 1, max: 3 }),
});

describe('compressRoots', () => {
  it('matches the pairwise scan on random clustered lists, for several tolerances', () => {
    fc.assert(
      fc.property(
        fc.array(root, { maxLength: 40 }),
        fc.constantFrom(0, 1e-9, 1e-6, 1e-3, 0.5),
        (roots, tol) => {
          expect(compressRoots(roots, tol)).toEqual(scanCompress(roots, tol));
        },
      ),
      { seed: 18_004, numRuns: 3000 },
    );
  });
});

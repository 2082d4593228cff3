/**
 * b/a in powers of z^-1 -> zeros/poles/gain, with the alignment of transferFunction.ts. It needs the root
 * finder (core/roots), which the page's first view does without: the modules that read coefficients (the
 * system entry's reader, the FIR designers, the command line) import this module, so the root finder loads
 * with them.
 */
import type { Root, TransferFunction, Zpk } from '../types.ts';
import { findRoots } from '../roots/index.ts';

/**
 * Roots of a polynomial given in descending powers, in the stored form (im >= 0, multiplicities merged).
 * Uses the root finder's verified, refined grouping of repeated roots: the centre of a raw cluster can sit
 * ~1e-8 off a double root, enough to move a double pole on the circle off it.
 */
export function polyRoots(p: ArrayLike<number>): Root[] {
  return findRoots(p).grouped.filter((r) => r.im >= 0);
}

function firstNonZero(p: readonly number[]): number {
  let i = 0;
  while (i < p.length && p[i] === 0) i++;
  return i;
}

/**
 * Zeros, poles and gain of B(z^-1)/A(z^-1). Arrays of different lengths are padded with trailing zeros
 * first (extra roots at the origin); leading zeros of b (pure delays) become poles at the origin.
 * Throws a RangeError when a is all zeros or a coefficient is not finite.
 */
export function tfToZpk(tf: TransferFunction): Zpk {
  for (const [name, arr] of [
    ['b', tf.b],
    ['a', tf.a],
  ] as const) {
    const bad = arr.findIndex((v) => !Number.isFinite(v));
    if (bad >= 0) throw new RangeError(`${name}[${bad}] is ${arr[bad]}; coefficients must be finite numbers`);
  }
  const n = Math.max(tf.b.length, tf.a.length);
  const b = [...tf.b, ...new Array<number>(n - tf.b.length).fill(0)];
  const a = [...tf.a, ...new Array<number>(n - tf.a.length).fill(0)];
  const la = firstNonZero(a);
  if (la === n)
    throw new RangeError('the denominator a is all zeros; it needs at least one non-zero coefficient');
  const lb = firstNonZero(b);
  const poles = polyRoots(a.slice(la));
  if (lb === n) return { zeros: [], poles, gain: 0 };
  return { zeros: polyRoots(b.slice(lb)), poles, gain: b[lb]! / a[la]! };
}

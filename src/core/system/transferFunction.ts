/**
 * Zeros/poles/gain <-> b/a in powers of z^-1, keeping H(z) = k·Π(z − zᵢ)/Π(z − pᵢ) exact in z.
 *
 * Alignment: b and a are read as B(z^-1)/A(z^-1). With more poles than zeros the system delays by
 * (poles − zeros) samples, which shows up as leading zeros of b. scipy's zpk2tf and tf2zpk instead
 * left-align arrays of different lengths, i.e. they describe z^(poles − zeros)·H(z); both agree whenever the
 * counts are equal (tf2zpk also agrees when b and a are first padded with trailing zeros to equal length).
 */
import type { Root, TransferFunction, Zpk } from '../types.ts';
import { polyFromRoots } from '../poly.ts';
import { findRoots } from '../roots/index.ts';
import { rootCount } from './rootList.ts';

/**
 * b/a (a[0] = 1) of the zpk. With more zeros than poles H is not causal; the arrays then describe the causal
 * z^-(zeros − poles)·H(z), i.e. extra poles at the origin (scipy zpk2tf's arrays).
 */
export function zpkToTf(zpk: Zpk): TransferFunction {
  const num = polyFromRoots(zpk.zeros);
  const den = polyFromRoots(zpk.poles);
  const delay = Math.max(0, rootCount(zpk.poles) - rootCount(zpk.zeros));
  const b = new Array<number>(delay).fill(0);
  for (const c of num) b.push(zpk.gain * c);
  return { b, a: Array.from(den) };
}

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

/**
 * The backward error of a whole root set: how far the coefficients c_0·Π(z − r_i), multiplied out, are from
 * the given ones, max_k |c_k − q_k| / max_k |c_k|. Unlike a per-root residual, it fails a set in which two
 * approximations sit on one root of a cluster and another root is missing. The product is formed in
 * double-double arithmetic (T. J. Dekker, "A floating-point technique for extending the available
 * precision", Numer. Math. 18, 1971), conjugate pairs as exact real quadratics, and multiplied in an order
 * that interleaves the roots by angle, so partial products stay near the size of the result.
 */
import { ddAdd, ddMul } from './doubleDouble.ts';
import { multiplyOutDd } from '../multiplyOut.ts';
import type { Root } from '../types.ts';

const tmp = new Float64Array(2);

/**
 * max_k |c_k − c_0·Π(z − r_i)_k| / max_k |c_k| for descending coefficients c (leading and trailing zeros as
 * findRoots reads them: leading zeros dropped, trailing zeros are roots at 0 that must be in the set) and a
 * root set listed in full (every conjugate, repeated roots repeated). Conjugates are paired by exact
 * mirror; a complex root without its exact mirror means the set is not of a real polynomial, and the error
 * is Infinity. mate (optional): the index of each root's conjugate, as symmetrizeConjugates gives it, which
 * spares the sort that pairs them; a mate that is not the exact mirror also gives Infinity.
 */
export function setBackwardError(
  c: ArrayLike<number>,
  re: ArrayLike<number>,
  im: ArrayLike<number>,
  mate?: Int32Array,
): number {
  let first = 0;
  while (first < c.length && c[first] === 0) first++;
  const length = c.length - first;
  const n = re.length;
  if (length - 1 !== n) return Infinity;
  // Each upper root meets its exact mirror: with `mate` given, member by member; else both halves sorted by
  // (re, |im|) must agree.
  const upper: number[] = [];
  let lowers = 0;
  let reals = 0;
  for (let i = 0; i < n; i++) {
    if (im[i] === 0) reals++;
    else if (im[i]! > 0) upper.push(i);
    else lowers++;
  }
  if (upper.length !== lowers || !(mate ? matesMirror(re, im, upper, mate) : sortedMirror(re, im, upper)))
    return Infinity;
  // Factors: each real root once, each conjugate pair once (its upper member), multiplied out in order of angle.
  const m = reals + upper.length;
  const fr = new Float64Array(m);
  const fi = new Float64Array(m);
  let f = 0;
  for (let i = 0; i < n; i++) {
    if (im[i] !== 0) continue;
    fr[f] = re[i]!;
    fi[f++] = 0;
  }
  for (const i of upper) {
    fr[f] = re[i]!;
    fi[f++] = im[i]!;
  }
  const { hi, lo } = multiplyOutDd(fr, fi, length);
  const lead = c[first]!;
  let worst = 0;
  let scale = 0;
  for (let k = 0; k < length; k++) {
    ddMul(hi[k]!, lo[k]!, lead, 0, tmp);
    ddAdd(c[first + k]!, 0, -tmp[0]!, -tmp[1]!, tmp);
    worst = Math.max(worst, Math.abs(tmp[0]!));
    scale = Math.max(scale, Math.abs(c[first + k]!));
  }
  return worst / scale;
}

/**
 * The set backward error of a grouped root list (findRoots' `grouped`: conjugates listed, a repeated root
 * once with its multiplicity), each root taken as many times as its multiplicity.
 */
export function groupedSetBackwardError(c: ArrayLike<number>, grouped: readonly Root[]): number {
  const re: number[] = [];
  const im: number[] = [];
  for (const g of grouped)
    for (let m = 0; m < g.multiplicity; m++) {
      re.push(g.re);
      im.push(g.im);
    }
  return setBackwardError(c, re, im);
}

/** Whether mate[i] is the exact mirror of every upper root i. */
function matesMirror(
  re: ArrayLike<number>,
  im: ArrayLike<number>,
  upper: number[],
  mate: Int32Array,
): boolean {
  for (const i of upper) {
    const j = mate[i]!;
    if (!(j >= 0) || re[j] !== re[i] || im[j] !== -im[i]!) return false;
  }
  return true;
}

/** Whether the upper roots and the lower ones, each sorted by (re, |im|), are exact mirrors member by member. */
function sortedMirror(re: ArrayLike<number>, im: ArrayLike<number>, upper: number[]): boolean {
  const lower: number[] = [];
  for (let i = 0; i < re.length; i++) if (im[i]! < 0) lower.push(i);
  const byMirror = (a: number, b: number) => re[a]! - re[b]! || Math.abs(im[a]!) - Math.abs(im[b]!);
  const sortedUpper = [...upper].sort(byMirror);
  lower.sort(byMirror);
  for (let k = 0; k < upper.length; k++) {
    const i = sortedUpper[k]!;
    const j = lower[k]!;
    if (re[i] !== re[j] || im[i] !== -im[j]!) return false;
  }
  return true;
}

/**
 * The backward error of a whole root set: how far the coefficients c_0·Π(z − r_i), multiplied out, are from
 * the given ones, max_k |c_k − q_k| / max_k |c_k|. Unlike a per-root residual, it fails a set in which two
 * approximations sit on one root of a cluster and another root is missing. The product is formed in
 * double-double arithmetic (T. J. Dekker, "A floating-point technique for extending the available
 * precision", Numer. Math. 18, 1971), conjugate pairs as exact real quadratics, and multiplied in an order
 * that interleaves the roots by angle, so partial products stay near the size of the result.
 */
import { ddAdd, ddMul, twoProd } from './doubleDouble.ts';

const tmp = new Float64Array(2);

/** Veltkamp's splitting constant 2^27 + 1. */
const SPLIT = 134217729;

/**
 * max_k |c_k − c_0·Π(z − r_i)_k| / max_k |c_k| for descending coefficients c (leading and trailing zeros as
 * findRoots reads them: leading zeros dropped, trailing zeros are roots at 0 that must be in the set) and a
 * root set listed in full (every conjugate, repeated roots repeated). Conjugates are paired by exact
 * mirror; a complex root without its exact mirror means the set is not of a real polynomial, and the error
 * is Infinity.
 */
export function setBackwardError(c: ArrayLike<number>, re: ArrayLike<number>, im: ArrayLike<number>): number {
  let first = 0;
  while (first < c.length && c[first] === 0) first++;
  const length = c.length - first;
  const n = re.length;
  if (length - 1 !== n) return Infinity;
  // Each upper root meets its exact mirror: both halves sorted by (re, |im|) must agree member by member.
  const upper: number[] = [];
  const lower: number[] = [];
  let reals = 0;
  for (let i = 0; i < n; i++) {
    if (im[i] === 0) reals++;
    else (im[i]! > 0 ? upper : lower).push(i);
  }
  if (upper.length !== lower.length) return Infinity;
  const byMirror = (a: number, b: number) => re[a]! - re[b]! || Math.abs(im[a]!) - Math.abs(im[b]!);
  const sortedUpper = [...upper].sort(byMirror);
  lower.sort(byMirror);
  for (let k = 0; k < upper.length; k++) {
    const i = sortedUpper[k]!;
    const j = lower[k]!;
    if (re[i] !== re[j] || im[i] !== -im[j]!) return Infinity;
  }
  // Factors in order of angle: (kind, re, im) with kind 1 linear, 2 quadratic.
  const m = reals + upper.length;
  const angle = new Float64Array(m);
  const fr = new Float64Array(m);
  const fi = new Float64Array(m);
  let f = 0;
  for (let i = 0; i < n; i++) {
    if (im[i] !== 0) continue;
    angle[f] = re[i]! < 0 ? Math.PI : 0;
    fr[f] = re[i]!;
    fi[f++] = 0;
  }
  for (const i of upper) {
    angle[f] = Math.atan2(im[i]!, re[i]!);
    fr[f] = re[i]!;
    fi[f++] = im[i]!;
  }
  const order = Array.from({ length: m }, (_, k) => k).sort((a, b) => angle[a]! - angle[b]!);
  const { hi, lo } = interleavedProduct(order, fr, fi, length);
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
 * Π factors (z − r) or z² − 2·re·z + (re² + im²) (the constant exact in double-double), taken in
 * bit-reversed order of their angle ranks (the order the even/odd halving would give), accumulated in place
 * in one double-double buffer of the final length. The double-double products and sums are Dekker's, written
 * out so the inner loop allocates and calls nothing.
 */
function interleavedProduct(
  order: number[],
  fr: Float64Array,
  fi: Float64Array,
  length: number,
): { hi: Float64Array; lo: Float64Array } {
  const hi = new Float64Array(length);
  const lo = new Float64Array(length);
  hi[0] = 1;
  let deg = 0;
  const m = order.length;
  let bits = 0;
  while (1 << bits < m) bits++;
  const q = new Float64Array(2);
  for (let r = 0; r < 1 << bits; r++) {
    let k = 0;
    for (let b = 0; b < bits; b++) if (r & (1 << b)) k |= 1 << (bits - 1 - b);
    if (k >= m) continue;
    const f = order[k]!;
    const x = fr[f]!;
    const y = fi[f]!;
    // The factor's coefficients below its leading 1: b1 (a double) and, for a pair, b2 = b2h + b2l.
    const b1 = y === 0 ? -x : -2 * x;
    let b2h = 0;
    let b2l = 0;
    if (y !== 0) {
      twoProd(x, x, tmp);
      twoProd(y, y, q);
      ddAdd(tmp[0]!, tmp[1]!, q[0]!, q[1]!, q);
      b2h = q[0]!;
      b2l = q[1]!;
    }
    const fd = y === 0 ? 1 : 2;
    const b1h = b1 * SPLIT - (b1 * SPLIT - b1);
    const b1lo = b1 - b1h;
    const b2hh = b2h * SPLIT - (b2h * SPLIT - b2h);
    const b2hl = b2h - b2hh;
    // (hi, lo) ← (hi, lo) · f, from the top down so each coefficient is read before it is overwritten:
    // new_i = old_i + b1·old_{i−1} + b2·old_{i−2}, each term a Dekker product and sum.
    for (let i = deg + fd; i >= 0; i--) {
      let sh = i <= deg ? hi[i]! : 0;
      let sl = i <= deg ? lo[i]! : 0;
      if (i >= 1 && i - 1 <= deg) {
        const ah = hi[i - 1]!;
        const al = lo[i - 1]!;
        // ddMul(ah, al, b1, 0)
        const p = ah * b1;
        const ahh = ah * SPLIT - (ah * SPLIT - ah);
        const ahl = ah - ahh;
        const pe = ahl * b1lo - (p - ahh * b1h - ahl * b1h - ahh * b1lo) + al * b1;
        const th = p + pe;
        const tl = pe - (th - p);
        // ddAdd(sh, sl, th, tl)
        const s = sh + th;
        const z = s - sh;
        const e = sh - (s - z) + (th - z) + sl + tl;
        sh = s + e;
        sl = e - (sh - s);
      }
      if (fd === 2 && i >= 2 && i - 2 <= deg) {
        const ah = hi[i - 2]!;
        const al = lo[i - 2]!;
        // ddMul(ah, al, b2h, b2l)
        const p = ah * b2h;
        const ahh = ah * SPLIT - (ah * SPLIT - ah);
        const ahl = ah - ahh;
        const pe = ahl * b2hl - (p - ahh * b2hh - ahl * b2hh - ahh * b2hl) + (ah * b2l + al * b2h);
        const th = p + pe;
        const tl = pe - (th - p);
        const s = sh + th;
        const z = s - sh;
        const e = sh - (s - z) + (th - z) + sl + tl;
        sh = s + e;
        sl = e - (sh - s);
      }
      hi[i] = sh;
      lo[i] = sl;
    }
    deg += fd;
  }
  return { hi, lo };
}

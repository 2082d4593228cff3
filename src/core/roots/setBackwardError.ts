/**
 * The backward error of a whole root set: how far the coefficients c_0·Π(z − r_i), multiplied out, are from
 * the given ones, max_k |c_k − q_k| / max_k |c_k|. Unlike a per-root residual, it fails a set in which two
 * approximations sit on one root of a cluster and another root is missing. The product is formed in
 * double-double arithmetic (T. J. Dekker, "A floating-point technique for extending the available
 * precision", Numer. Math. 18, 1971), conjugate pairs as exact real quadratics, and multiplied in an order
 * that interleaves the roots by angle, so partial products stay near the size of the result.
 */
import { ddAdd, ddMul, factor, type DdPoly } from './doubleDouble.ts';

const tmp = new Float64Array(2);

/**
 * max_k |c_k − c_0·Π(z − r_i)_k| / max_k |c_k| for descending coefficients c (leading and trailing zeros as
 * findRoots reads them: leading zeros dropped, trailing zeros are roots at 0 that must be in the set) and a
 * root set listed in full (every conjugate, repeated roots repeated). Conjugates are paired by exact
 * mirror; a complex root without its exact mirror counts as its own linear factor via a pair with itself
 * only if mirrored, otherwise the set is not of a real polynomial and the error is Infinity.
 */
export function setBackwardError(c: ArrayLike<number>, re: ArrayLike<number>, im: ArrayLike<number>): number {
  let first = 0;
  while (first < c.length && c[first] === 0) first++;
  const coeffs = Array.prototype.slice.call(c, first) as number[];
  if (coeffs.length - 1 !== re.length) return Infinity;
  const upper: number[] = [];
  const lower = new Map<string, number>();
  const factors: { angle: number; f: DdPoly }[] = [];
  for (let i = 0; i < re.length; i++) {
    if (im[i] === 0) factors.push({ angle: re[i]! < 0 ? Math.PI : 0, f: factor(re[i]!, 0) });
    else if (im[i]! > 0) upper.push(i);
    else {
      const key = `${re[i]}:${-im[i]!}`;
      lower.set(key, (lower.get(key) ?? 0) + 1);
    }
  }
  for (const i of upper) {
    const key = `${re[i]}:${im[i]}`;
    const left = lower.get(key) ?? 0;
    if (left === 0) return Infinity;
    lower.set(key, left - 1);
    factors.push({ angle: Math.atan2(im[i]!, re[i]!), f: factor(re[i]!, im[i]!) });
  }
  factors.sort((a, b) => a.angle - b.angle);
  const q = interleavedProduct(
    factors.map((x) => x.f),
    coeffs.length,
  );
  const lead = coeffs[0]!;
  let worst = 0;
  let scale = 0;
  for (let k = 0; k < coeffs.length; k++) {
    ddMul(q.hi[k]!, q.lo[k]!, lead, 0, tmp);
    ddAdd(coeffs[k]!, 0, -tmp[0]!, -tmp[1]!, tmp);
    worst = Math.max(worst, Math.abs(tmp[0]!));
    scale = Math.max(scale, Math.abs(coeffs[k]!));
  }
  return worst / scale;
}

/**
 * Π factors, taken in bit-reversed order of their angle ranks (the order the even/odd halving would give),
 * accumulated in place in one double-double buffer of the final length.
 */
function interleavedProduct(factors: DdPoly[], length: number): DdPoly {
  const hi = new Float64Array(length);
  const lo = new Float64Array(length);
  hi[0] = 1;
  let deg = 0;
  const m = factors.length;
  let bits = 0;
  while (1 << bits < m) bits++;
  const t = new Float64Array(2);
  const u = new Float64Array(2);
  for (let r = 0; r < 1 << bits; r++) {
    let k = 0;
    for (let b = 0; b < bits; b++) if (r & (1 << b)) k |= 1 << (bits - 1 - b);
    if (k >= m) continue;
    const f = factors[k]!;
    const fd = f.hi.length - 1;
    // (hi, lo) ← (hi, lo) · f, from the top down so each coefficient is read before it is overwritten.
    for (let i = deg + fd; i >= 0; i--) {
      let sh = 0;
      let sl = 0;
      for (let j = Math.max(0, i - deg); j <= Math.min(fd, i); j++) {
        ddMul(hi[i - j]!, lo[i - j]!, f.hi[j]!, f.lo[j]!, t);
        ddAdd(sh, sl, t[0]!, t[1]!, u);
        sh = u[0]!;
        sl = u[1]!;
      }
      hi[i] = sh;
      lo[i] = sl;
    }
    deg += fd;
  }
  return { hi, lo };
}

/**
 * Double-double arithmetic (T. J. Dekker, "A floating-point technique for extending the available
 * precision", Numer. Math. 18, 1971) for polynomials: products of root factors and long division, used
 * where a root set must be compared with the coefficients beyond double precision.
 */

import { ddAdd, ddMul, SPLIT, twoProd } from '../doubleDoubleArith.ts';

export { ddAdd, ddMul, twoProd };

/** A polynomial in double-double: hi + lo per coefficient, descending. */
export interface DdPoly {
  hi: Float64Array;
  lo: Float64Array;
}

const tmp = new Float64Array(2);

export function multiply(a: DdPoly, b: DdPoly): DdPoly {
  const n = a.hi.length + b.hi.length - 1;
  const hi = new Float64Array(n);
  const lo = new Float64Array(n);
  for (let i = 0; i < a.hi.length; i++) {
    for (let j = 0; j < b.hi.length; j++) {
      ddMul(a.hi[i]!, a.lo[i]!, b.hi[j]!, b.lo[j]!, tmp);
      ddAdd(hi[i + j]!, lo[i + j]!, tmp[0]!, tmp[1]!, tmp);
      hi[i + j] = tmp[0]!;
      lo[i + j] = tmp[1]!;
    }
  }
  return { hi, lo };
}

/** z − r, or z² − 2·re·z + (re² + im²) for a pair, with the constant exact in double-double. */
export function factor(re: number, im: number): DdPoly {
  if (im === 0) return { hi: Float64Array.of(1, -re), lo: Float64Array.of(0, 0) };
  const q = new Float64Array(2);
  twoProd(re, re, tmp);
  twoProd(im, im, q);
  ddAdd(tmp[0]!, tmp[1]!, q[0]!, q[1]!, q);
  return { hi: Float64Array.of(1, -2 * re, q[0]!), lo: Float64Array.of(0, 0, q[1]!) };
}

/** Product of the factors, interleaved: the even- and odd-indexed halves (by angle) recursively. */
export function product(factors: DdPoly[]): DdPoly {
  if (factors.length === 0) return { hi: Float64Array.of(1), lo: Float64Array.of(0) };
  if (factors.length === 1) return factors[0]!;
  const even: DdPoly[] = [];
  const odd: DdPoly[] = [];
  for (let i = 0; i < factors.length; i++) (i % 2 === 0 ? even : odd).push(factors[i]!);
  return multiply(product(even), product(odd));
}

/** (ah + al) / (bh + bl) into out. */
export function ddDiv(ah: number, al: number, bh: number, bl: number, out: Float64Array): void {
  const q1 = ah / bh;
  ddMul(q1, 0, bh, bl, out);
  ddAdd(ah, al, -out[0]!, -out[1]!, out);
  const q2 = out[0]! / bh;
  const s = q1 + q2;
  out[0] = s;
  out[1] = q2 - (s - q1);
}

let bufHi = new Float64Array(64);
let bufLo = new Float64Array(64);
const tmpQ = new Float64Array(2);
/** The divisor's Veltkamp halves in remainderSize. */
let divH = new Float64Array(8);
let divL = new Float64Array(8);

/**
 * The remainder of c (double, descending) divided by f (double-double, descending, f[0] ≠ 0), as the
 * largest remainder coefficient relative to max|c_k|. Division runs from the top, so the remainder is exact
 * up to double-double rounding when f's roots lie in the closed unit disk; callers pass reversed
 * polynomials for factors with roots outside it.
 */
export function remainderSize(c: ArrayLike<number>, f: DdPoly): number {
  const n = c.length - 1;
  const m = f.hi.length - 1;
  if (m > n) return 0;
  if (bufHi.length < c.length) {
    bufHi = new Float64Array(2 * c.length);
    bufLo = new Float64Array(2 * c.length);
  }
  const hi = bufHi;
  const lo = bufLo;
  for (let k = 0; k <= n; k++) {
    hi[k] = c[k]!;
    lo[k] = 0;
  }
  const q = tmpQ;
  const monic = f.hi[0] === 1 && f.lo[0] === 0;
  // The divisor's Veltkamp halves, once (the products below are the same as splitting each time).
  if (divH.length <= m) {
    divH = new Float64Array(2 * (m + 1));
    divL = new Float64Array(2 * (m + 1));
  }
  for (let j = 0; j <= m; j++) {
    const bh = f.hi[j]!;
    divH[j] = bh * SPLIT - (bh * SPLIT - bh);
    divL[j] = bh - divH[j]!;
  }
  for (let k = 0; k + m <= n; k++) {
    // q = (hi_k + lo_k) / f_0, then (hi, lo)_{k+j} −= q·f_j: Dekker's product and sum written out.
    let qh = hi[k]!;
    let ql = lo[k]!;
    if (!monic) {
      ddDiv(qh, ql, f.hi[0]!, f.lo[0]!, q);
      qh = q[0]!;
      ql = q[1]!;
    }
    const qhh = qh * SPLIT - (qh * SPLIT - qh);
    const qhl = qh - qhh;
    for (let j = 0; j <= m; j++) {
      const bh = f.hi[j]!;
      const bl = f.lo[j]!;
      const p = qh * bh;
      const bhh = divH[j]!;
      const bhl = divL[j]!;
      const pe = qhl * bhl - (p - qhh * bhh - qhl * bhh - qhh * bhl) + (qh * bl + ql * bh);
      const th = -(p + pe);
      const tl = -(pe - (p + pe - p));
      const ah = hi[k + j]!;
      const s = ah + th;
      const z = s - ah;
      const e = ah - (s - z) + (th - z) + lo[k + j]! + tl;
      const r = s + e;
      hi[k + j] = r;
      lo[k + j] = e - (r - s);
    }
  }
  let worst = 0;
  let scale = 0;
  for (let k = 0; k <= n; k++) scale = Math.max(scale, Math.abs(c[k]!));
  for (let k = n - m + 1; k <= n; k++) worst = Math.max(worst, Math.abs(hi[k]! + lo[k]!));
  return scale === 0 ? 0 : worst / scale;
}

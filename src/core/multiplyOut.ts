/**
 * Roots multiplied out to coefficients beyond double precision: Π (z − r) over real roots and
 * z² − 2·re·z + (re² + im²) over conjugate pairs (the constant exact in double-double), in double-double
 * arithmetic (T. J. Dekker, 1971; core/doubleDoubleArith.ts), taking the factors in bit-reversed order of
 * their angle ranks (the order an even/odd halving would give), so partial products stay near the size of the
 * result. A high-order FIR's taps or a high-order denominator multiplied out one factor at a time in doubles
 * cancel from partial products far larger than the result (an order-128 equiripple FIR's taps came out
 * 1e-6 of the largest tap off, and no longer symmetric); this keeps them to a rounding of the result.
 */
import { ddAdd, SPLIT, twoProd } from './doubleDoubleArith.ts';

const tmp = new Float64Array(2);
const q = new Float64Array(2);

/**
 * The monic product of the factors (fr[k], fi[k]) — a real root where fi[k] = 0, else the conjugate pair
 * fr ± j·fi — as hi + lo per coefficient, descending, `length` = 1 + the number of roots counted.
 */
export function multiplyOutDd(
  fr: Float64Array,
  fi: Float64Array,
  length: number,
): { hi: Float64Array; lo: Float64Array } {
  const m = fr.length;
  const angle = new Float64Array(m);
  for (let k = 0; k < m; k++)
    angle[k] = fi[k] === 0 ? (fr[k]! < 0 ? Math.PI : 0) : Math.atan2(fi[k]!, fr[k]!);
  // Ranked by insertion: no comparator closure or boxed index array (this runs for every set test, mostly of
  // a few factors), and at most m²/2 moves where the product itself takes m² double-double steps.
  const order = new Int32Array(m);
  for (let k = 0; k < m; k++) {
    const a = angle[k]!;
    let j = k;
    for (; j > 0 && angle[order[j - 1]!]! > a; j--) order[j] = order[j - 1]!;
    order[j] = k;
  }
  return interleavedProduct(order, fr, fi, length);
}

/**
 * 0 … m − 1 in bit-reversed order (the order an even/odd halving gives: 0, m/2, m/4, 3m/4, … for a power of
 * two): taken in this order, items ranked by angle are spread evenly around the circle at every prefix.
 */
export function bitReversedOrder(m: number): Int32Array {
  const out = new Int32Array(m);
  let bits = 0;
  while (1 << bits < m) bits++;
  let at = 0;
  for (let r = 0; r < 1 << bits; r++) {
    let k = 0;
    for (let b = 0; b < bits; b++) if (r & (1 << b)) k |= 1 << (bits - 1 - b);
    if (k < m) out[at++] = k;
  }
  return out;
}

/**
 * Π factors (z − r) or z² − 2·re·z + (re² + im²) (the constant exact in double-double), taken in
 * bit-reversed order of their angle ranks (the order the even/odd halving would give), accumulated in place
 * in one double-double buffer of the final length. The double-double products and sums are Dekker's, written
 * out so the inner loop allocates and calls nothing.
 */
function interleavedProduct(
  order: Int32Array,
  fr: Float64Array,
  fi: Float64Array,
  length: number,
): { hi: Float64Array; lo: Float64Array } {
  const hi = new Float64Array(length);
  const lo = new Float64Array(length);
  hi[0] = 1;
  let deg = 0;
  for (const k of bitReversedOrder(order.length)) {
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

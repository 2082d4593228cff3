/**
 * Double-double arithmetic primitives (T. J. Dekker, "A floating-point technique for extending the available
 * precision", Numer. Math. 18, 1971): exact products and renormalised sums of hi + lo pairs. Kept outside
 * core/roots so the page's first view can multiply roots out (core/multiplyOut.ts) without the root finder.
 */

/** Veltkamp's splitting constant 2^27 + 1. */
export const SPLIT = 134217729;

/** a·b exactly, as the rounded product and its error (out[0] + out[1]). */
export function twoProd(a: number, b: number, out: Float64Array): void {
  const p = a * b;
  const ah = a * SPLIT - (a * SPLIT - a);
  const al = a - ah;
  const bh = b * SPLIT - (b * SPLIT - b);
  const bl = b - bh;
  out[0] = p;
  out[1] = al * bl - (p - ah * bh - al * bh - ah * bl);
}

/** (ah + al) + (bh + bl) into out, renormalised. */
export function ddAdd(ah: number, al: number, bh: number, bl: number, out: Float64Array): void {
  const s = ah + bh;
  const z = s - ah;
  const e = ah - (s - z) + (bh - z) + al + bl;
  out[0] = s + e;
  out[1] = e - (out[0] - s);
}

const tmp2 = new Float64Array(2);

/** (ah + al)(bh + bl) into out. */
export function ddMul(ah: number, al: number, bh: number, bl: number, out: Float64Array): void {
  twoProd(ah, bh, tmp2);
  const e = tmp2[1]! + (ah * bl + al * bh);
  const s = tmp2[0]! + e;
  out[0] = s;
  out[1] = e - (s - tmp2[0]!);
}

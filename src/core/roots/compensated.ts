/**
 * Compensated Horner scheme in complex arithmetic (S. Graillat, Ph. Langlois, N. Louvet, "Compensated
 * Horner scheme", 2005; complex form: Graillat & Ménissier-Morain, 2012). Error-free transformations
 * (Knuth's TwoSum, Dekker's TwoProduct with Veltkamp splitting) recover the rounding error of every
 * step; evaluating those errors by a second Horner pass gives p(z) as accurately as if computed in twice
 * the working precision and then rounded.
 */

/** Veltkamp's splitting constant 2^27 + 1 for IEEE doubles. */
const SPLIT = 134217729;

/**
 * Writes p(z) (compensated) and p'(z) (plain Horner) for descending coefficients c at z = x + i·y into
 * out = [Re p, Im p, Re p', Im p']. With `lo`, the coefficients are the double-double values c_k + lo_k.
 */
export function compensatedEval(
  c: Float64Array,
  x: number,
  y: number,
  out: Float64Array,
  lo?: Float64Array,
): void {
  const n = c.length - 1;
  const xh = x * SPLIT - (x * SPLIT - x);
  const xl = x - xh;
  const yh = y * SPLIT - (y * SPLIT - y);
  const yl = y - yh;
  let sr = c[0]!;
  let si = 0;
  let er = lo ? lo[0]! : 0;
  let ei = 0;
  let dr = 0;
  let di = 0;
  for (let k = 1; k <= n; k++) {
    const tdr = dr * x - di * y + sr;
    di = dr * y + di * x + si;
    dr = tdr;
    // Exact products sr·x, si·y, sr·y, si·x as value + error (Dekker's TwoProduct).
    const srh = sr * SPLIT - (sr * SPLIT - sr);
    const srl = sr - srh;
    const sih = si * SPLIT - (si * SPLIT - si);
    const sil = si - sih;
    const p1 = sr * x;
    const e1 = srl * xl - (p1 - srh * xh - srl * xh - srh * xl);
    const p2 = si * y;
    const e2 = sil * yl - (p2 - sih * yh - sil * yh - sih * yl);
    const p3 = sr * y;
    const e3 = srl * yl - (p3 - srh * yh - srl * yh - srh * yl);
    const p4 = si * x;
    const e4 = sil * xl - (p4 - sih * xh - sil * xh - sih * xl);
    // Exact sums p1 − p2 + c_k and p3 + p4 (Knuth's TwoSum).
    const q1 = p1 - p2;
    const z1 = q1 - p1;
    const f1 = p1 - (q1 - z1) + (-p2 - z1);
    const r1 = q1 + c[k]!;
    const z2 = r1 - q1;
    const g1 = q1 - (r1 - z2) + (c[k]! - z2);
    const q2 = p3 + p4;
    const z3 = q2 - p3;
    const f2 = p3 - (q2 - z3) + (p4 - z3);
    // The error polynomial, by plain Horner.
    const ter = er * x - ei * y + (e1 - e2 + f1 + g1 + (lo ? lo[k]! : 0));
    ei = er * y + ei * x + (e3 + e4 + f2);
    er = ter;
    sr = r1;
    si = q2;
  }
  out[0] = sr + er;
  out[1] = si + ei;
  out[2] = dr;
  out[3] = di;
}

/** The derivative's coefficients as double-double (hi, lo): k·c_k exactly. */
export function derivativeDd(c: Float64Array): { hi: Float64Array; lo: Float64Array } {
  const n = c.length - 1;
  const hi = new Float64Array(Math.max(1, n));
  const lo = new Float64Array(Math.max(1, n));
  for (let i = 0; i < n; i++) {
    const a = c[i]!;
    const b = n - i;
    const p = a * b;
    const ah = a * SPLIT - (a * SPLIT - a);
    const al = a - ah;
    const bh = b * SPLIT - (b * SPLIT - b);
    const bl = b - bh;
    hi[i] = p;
    lo[i] = al * bl - (p - ah * bh - al * bh - ah * bl);
  }
  return { hi, lo };
}

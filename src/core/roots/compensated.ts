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

/**
 * p(z) and p'(z), both compensated, for real descending coefficients c at z = x + i·y, with the bound
 * Σ|c_k||z|^k; out = [Re p, Im p, Re p', Im p', bound]. Instead of complex Horner, p is divided by the real
 * quadratic D(w) = w² − t·w + m whose roots are z and z̄ (t = 2x, m = x² + y²): with p = Q·D + r₁w + r₀,
 * p(z) = r₁z + r₀ and p'(z) = Q(z)·D'(z) + r₁ = Q(z)·2iy + r₁, and Q(z) comes from a second division run in
 * the same loop (the real-coefficient evaluation of e.g. Goertzel's and Clenshaw's recurrences). Each level
 * costs two real products per coefficient where complex Horner costs four, so p and p' together cost about
 * what complex compensated Horner pays for p alone. As in compensatedEval, the rounding error of every
 * product and sum is recovered exactly (Dekker's TwoProduct, Knuth's TwoSum; m is kept as a double-double)
 * and run through the same recurrence, so both values come out as if computed in twice the working
 * precision; the recurrence may amplify rounding errors by up to n + 1 where Horner's would not (its
 * characteristic roots z and z̄ meet on the real axis), which moves the result's error from about
 * (nε)²·bound to about n·(nε)²·bound, still far below ε·bound.
 */
export function compensatedEvalWithDerivative(
  c: Float64Array,
  x: number,
  y: number,
  out: Float64Array,
): void {
  const n = c.length - 1;
  const t = 2 * x;
  const th = t * SPLIT - (t * SPLIT - t);
  const tl = t - th;
  // m = x² + y² as mh + ml.
  const xx = x * x;
  const xh = x * SPLIT - (x * SPLIT - x);
  const xl = x - xh;
  const exx = xl * xl - (xx - xh * xh - xl * xh - xh * xl);
  const yy = y * y;
  const yh = y * SPLIT - (y * SPLIT - y);
  const yl = y - yh;
  const eyy = yl * yl - (yy - yh * yh - yl * yh - yh * yl);
  const ms = xx + yy;
  const mz = ms - xx;
  const mErr = xx - (ms - mz) + (yy - mz) + exx + eyy;
  const mh = ms + mErr;
  const ml = mErr - (mh - ms);
  const mhh = mh * SPLIT - (mh * SPLIT - mh);
  const mhl = mh - mhh;
  const mod = Math.sqrt(ms);
  // b: the first division (b_k = c_k + t·b_{k−1} − m·b_{k−2}), a the second (of the quotient); suffix 1 is
  // step k − 1, suffix 2 step k − 2, h/l a value's Veltkamp halves. A rounding error made at step k of the
  // first division acts as a change of c_k, so its effect on p(z) and p'(z) is that error times z^(n−k) and
  // (n−k)·z^(n−k−1): the errors are summed by complex Horner (ep, its derivative ed), not through the
  // recurrence, which would amplify them; those of the second division act on Q(z) the same way (eq).
  let b1 = 0;
  let b1h = 0;
  let b1l = 0;
  let b2 = 0;
  let b2h = 0;
  let b2l = 0;
  let a1 = 0;
  let a1h = 0;
  let a1l = 0;
  let a2 = 0;
  let a2h = 0;
  let a2l = 0;
  let epr = 0;
  let epi = 0;
  let edr = 0;
  let edi = 0;
  let eqr = 0;
  let eqi = 0;
  let bound = 0;
  for (let k = 0; k <= n; k++) {
    const ck = c[k]!;
    bound = bound * mod + Math.abs(ck);
    // b_k = (c_k + t·b1) − m·b2, every rounding error kept.
    const p1 = t * b1;
    const q1 = tl * b1l - (p1 - th * b1h - tl * b1h - th * b1l);
    const p2 = mh * b2;
    const q2 = mhl * b2l - (p2 - mhh * b2h - mhl * b2h - mhh * b2l);
    const s = ck + p1;
    const sz = s - ck;
    const g1 = ck - (s - sz) + (p1 - sz);
    const b = s - p2;
    const bz = b - s;
    const g2 = s - (b - bz) - (p2 + bz);
    const e = q1 - q2 + g1 + g2 - ml * b2;
    const tdr = edr * x - edi * y + epr;
    edi = edr * y + edi * x + epi;
    edr = tdr;
    const tpr = epr * x - epi * y + e;
    epi = epr * y + epi * x;
    epr = tpr;
    const bh = b * SPLIT - (b * SPLIT - b);
    const bl = b - bh;
    if (k <= n - 2) {
      // a_k = (b_k + t·a1) − m·a2.
      const r1 = t * a1;
      const u1 = tl * a1l - (r1 - th * a1h - tl * a1h - th * a1l);
      const r2 = mh * a2;
      const u2 = mhl * a2l - (r2 - mhh * a2h - mhl * a2h - mhh * a2l);
      const v = b + r1;
      const vz = v - b;
      const h1 = b - (v - vz) + (r1 - vz);
      const a = v - r2;
      const az = a - v;
      const h2 = v - (a - az) - (r2 + az);
      const f = u1 - u2 + h1 + h2 - ml * a2;
      const tqr = eqr * x - eqi * y + f;
      eqi = eqr * y + eqi * x;
      eqr = tqr;
      a2 = a1;
      a2h = a1h;
      a2l = a1l;
      a1 = a;
      a1h = a * SPLIT - (a * SPLIT - a);
      a1l = a - a1h;
    }
    b2 = b1;
    b2h = b1h;
    b2l = b1l;
    b1 = b;
    b1h = bh;
    b1l = bl;
  }
  // p(z) = b_n − b_{n−1}·z̄: Re = b_n − x·b_{n−1}, Im = y·b_{n−1} (b1, b2 now hold b_n, b_{n−1}).
  const px = x * b2;
  const pxe = xl * b2l - (px - xh * b2h - xl * b2h - xh * b2l);
  const re = b1 - px;
  const rz = re - b1;
  const reErr = b1 - (re - rz) - (px + rz);
  out[0] = re + (reErr - pxe + epr);
  out[1] = y * b2 + epi;
  // p'(z) = Q(z)·2iy + r₁ with r₁ = b_{n−1} and Q(z) = a_{n−2} − a_{n−3}·z̄ = (A − x·B) + i·y·B:
  // Re p' = r₁ − 2y²·B − 2y·eq_i + ed_r, Im p' = 2y·(A − x·B + eq_r) + ed_i, differences with their errors.
  const qx = x * a2;
  const qxe = xl * a2l - (qx - xh * a2h - xl * a2h - xh * a2l);
  const d = a1 - qx;
  const dz = d - a1;
  const dErr = a1 - (d - dz) - (qx + dz);
  out[3] = 2 * y * (d + (dErr - qxe + eqr)) + edi;
  const yyh = yy * SPLIT - (yy * SPLIT - yy);
  const yyl = yy - yyh;
  const w = yy * a2;
  const we = yyl * a2l - (w - yyh * a2h - yyl * a2h - yyh * a2l) + eyy * a2;
  const g = b2 - 2 * w;
  const gz = g - b2;
  const gErr = b2 - (g - gz) - (2 * w + gz);
  out[2] = g + (gErr - 2 * we - 2 * y * eqi + edr);
  out[4] = bound;
}

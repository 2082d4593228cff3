/**
 * Scale-safe evaluation of a polynomial's logarithmic derivative p'/p at a complex point, with the
 * relative residual |p(z)| / Σ|c_k||z|^k. For |z| > 1 the reversed polynomial is evaluated at 1/z, so no
 * power of |z| overflows at high degree and rounding stays relative (the usual trick in Aberth solvers,
 * e.g. Bini & Fiorentino's MPSolve).
 */

/** Output slots of {@link logDerivative}: [Re g, Im g, |p| / bound] with g = p'(z)/p(z). */
export type LogDerivativeOut = Float64Array;

/**
 * Writes g = p'(z)/p(z) (1/length units of z) and the relative residual |p(z)|/Σ|c_k||z|^k into out.
 * c holds descending coefficients, absC their absolute values. g is ±Infinity/NaN when p(z) = 0.
 */
export function logDerivative(
  c: Float64Array,
  absC: Float64Array,
  x: number,
  y: number,
  out: LogDerivativeOut,
): void {
  const n = c.length - 1;
  const mod2 = x * x + y * y;
  if (mod2 <= 1) {
    const mod = Math.sqrt(mod2);
    let pr = c[0]!;
    let pi = 0;
    let dr = 0;
    let di = 0;
    let b = absC[0]!;
    for (let k = 1; k <= n; k++) {
      const tdr = dr * x - di * y + pr;
      di = dr * y + di * x + pi;
      dr = tdr;
      const tpr = pr * x - pi * y + c[k]!;
      pi = pr * y + pi * x;
      pr = tpr;
      b = b * mod + absC[k]!;
    }
    quotient(dr, di, pr, pi, b, out);
    return;
  }
  // q(w) = w^n p(1/w) has descending coefficients c reversed; p'/p = w (n - w q'/q).
  const wr = x / mod2;
  const wi = -y / mod2;
  const wm = 1 / Math.sqrt(mod2);
  let qr = c[n]!;
  let qi = 0;
  let dr = 0;
  let di = 0;
  let b = absC[n]!;
  for (let k = n - 1; k >= 0; k--) {
    const tdr = dr * wr - di * wi + qr;
    di = dr * wi + di * wr + qi;
    dr = tdr;
    const tqr = qr * wr - qi * wi + c[k]!;
    qi = qr * wi + qi * wr;
    qr = tqr;
    b = b * wm + absC[k]!;
  }
  quotient(dr, di, qr, qi, b, out);
  const rr = out[0]!;
  const ri = out[1]!;
  const tr = n - (wr * rr - wi * ri);
  const ti = -(wr * ri + wi * rr);
  out[0] = wr * tr - wi * ti;
  out[1] = wr * ti + wi * tr;
}

/**
 * Writes d/p and |p|/b into out. Both are scaled by the larger part of p first: at high degree a
 * polynomial's values and derivatives span more than the double range when squared (|p| ≈ 1e-182 or
 * p' ≈ 1e218 for a degree-1024 Butterworth denominator), and |p|² would underflow to 0 or overflow.
 */
function quotient(dr: number, di: number, pr: number, pi: number, b: number, out: LogDerivativeOut): void {
  const m = Math.max(Math.abs(pr), Math.abs(pi));
  if (!(m > 0 && m < Infinity)) {
    out[0] = m === 0 ? Infinity : NaN;
    out[1] = m === 0 ? Infinity : NaN;
    out[2] = m / b;
    return;
  }
  const s = 1 / m;
  const ur = pr * s;
  const ui = pi * s;
  const vr = dr * s;
  const vi = di * s;
  const ud = ur * ur + ui * ui;
  out[0] = (vr * ur + vi * ui) / ud;
  out[1] = (vi * ur - vr * ui) / ud;
  out[2] = (m * Math.sqrt(ud)) / b;
}

/** Relative residual |p(z)| / Σ|c_k||z|^k at re + i·im (dimensionless), scale-safe for any |z|. */
export function relativeResidual(c: ArrayLike<number>, re: number, im: number): number {
  const n = c.length - 1;
  const mod2 = re * re + im * im;
  const rev = mod2 > 1;
  const x = rev ? re / mod2 : re;
  const y = rev ? -im / mod2 : im;
  const mod = Math.sqrt(x * x + y * y);
  let pr = 0;
  let pi = 0;
  let b = 0;
  for (let k = 0; k <= n; k++) {
    const ck = c[rev ? n - k : k]!;
    const tpr = pr * x - pi * y + ck;
    pi = pr * y + pi * x;
    pr = tpr;
    b = b * mod + Math.abs(ck);
  }
  return b === 0 ? 0 : Math.hypot(pr, pi) / b;
}

/**
 * Scaling by powers of two for quotients of polynomial values at high degree, where the values themselves
 * fit in a double but their squares do not (|p| ≈ 1e-182 near a root close to the origin of a degree-1024
 * Butterworth denominator, so |p|² is 0).
 */

/** Largest exponent used, so that the scale and its reciprocal are both finite. */
const LIMIT = 1000;

/** The exponent field of a double, read through its bits (little-endian hosts; see HIGH). */
const bits = new Float64Array(1);
const words = new Uint32Array(bits.buffer);
/** Index of the word holding the sign and exponent. */
const HIGH = new Uint8Array(Float64Array.of(1).buffer)[7] === 0x3f ? 1 : 0;

/**
 * A power of two s with s·max(|a|, |b|) in [1, 2) (clamped to 2^±1000; 1 for zero or non-finite input).
 * Multiplying by s is exact, so a quotient formed from scaled parts has the same bits as the unscaled one
 * wherever the unscaled one neither underflowed nor overflowed. The exponent is read from the bits (a
 * logarithm and a power cost more than the evaluation they scale at low degree); subnormals take the
 * logarithm.
 */
export function powerOfTwoScale(a: number, b: number): number {
  const m = Math.max(Math.abs(a), Math.abs(b));
  if (!(m > 0 && m < Infinity)) return 1;
  bits[0] = m;
  const e = (words[HIGH]! >>> 20) & 0x7ff;
  const k = e === 0 ? Math.floor(Math.log2(m)) : e - 1023;
  const t = -Math.max(-LIMIT, Math.min(LIMIT, k));
  // 2^t built from its bits: t in [−1000, 1000] is a normal exponent.
  words[HIGH] = (t + 1023) << 20;
  words[1 - HIGH] = 0;
  return bits[0]!;
}

/**
 * |x + jy|: √(x² + y²) where the squares neither overflow nor underflow (about ten times faster than
 * Math.hypot in V8, within an ulp of it), Math.hypot's scaled form elsewhere.
 */
export function modulus(x: number, y: number): number {
  const s = x * x + y * y;
  return s < 1e300 && s > 1e-290 ? Math.sqrt(s) : Math.hypot(x, y);
}

/**
 * p'/p at z into out[0], out[1], from p = pr + j·pi and p' = dr + j·di, both scaled by one power of two first
 * so |p|² neither underflows nor overflows. Where |z| ≤ 1 (`inside`) they are the polynomial's own values at
 * z; otherwise they are the reversed polynomial q(w) = w^n p(1/w) and its derivative at w = ux + j·uy = 1/z,
 * and p'/p = w (n − w q'/q). Returns |p| (or |q|), from the same scaled parts.
 */
export function logDerivativeFromValues(
  pr: number,
  pi: number,
  dr: number,
  di: number,
  inside: boolean,
  ux: number,
  uy: number,
  n: number,
  out: Float64Array,
): number {
  const s = powerOfTwoScale(pr, pi);
  const sr = pr * s;
  const si = pi * s;
  const den = sr * sr + si * si;
  const hr = (dr * s * sr + di * s * si) / den;
  const hi = (di * s * sr - dr * s * si) / den;
  if (inside) {
    out[0] = hr;
    out[1] = hi;
  } else {
    const tr = n - (ux * hr - uy * hi);
    const ti = -(ux * hi + uy * hr);
    out[0] = ux * tr - uy * ti;
    out[1] = ux * ti + uy * tr;
  }
  return Math.sqrt(den) / s;
}

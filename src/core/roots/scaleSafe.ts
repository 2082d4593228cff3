/**
 * Scaling by powers of two for quotients of polynomial values at high degree, where the values themselves
 * fit in a double but their squares do not (|p| ≈ 1e-182 near a root close to the origin of a degree-1024
 * Butterworth denominator, so |p|² is 0).
 */

/** Largest exponent used, so that the scale and its reciprocal are both finite. */
const LIMIT = 1000;

/**
 * A power of two s with s·max(|a|, |b|) in [1, 2) (clamped to 2^±1000; 1 for zero or non-finite input).
 * Multiplying by s is exact, so a quotient formed from scaled parts has the same bits as the unscaled one
 * wherever the unscaled one neither underflowed nor overflowed.
 */
export function powerOfTwoScale(a: number, b: number): number {
  const m = Math.max(Math.abs(a), Math.abs(b));
  if (!(m > 0 && m < Infinity)) return 1;
  const k = Math.floor(Math.log2(m));
  return 2 ** -Math.max(-LIMIT, Math.min(LIMIT, k));
}

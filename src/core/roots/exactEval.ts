/**
 * Exact values of a polynomial with double coefficients at points with double coordinates: both are dyadic
 * rationals, so Horner's rule in BigInt arithmetic loses nothing. Costs grow with the degree (the integers
 * gain the point's mantissa bits per step), so this serves certification and the last refinement of badly
 * conditioned roots, not bulk iteration.
 */
import { splitDouble, toIntegers } from '../stability/dyadic.ts';
import { bitLength } from '../stability/bigMagnitude.ts';

/** Descending integer coefficients: the doubles times one common positive power of two. */
export type ExactPoly = bigint[];

/** Prepares descending double coefficients c for exact evaluation. */
export function exactPoly(c: ArrayLike<number>): ExactPoly {
  return toIntegers(c);
}

/** x·2^scale as a double, for |x| up to any size (Infinity or 0 past the double range). */
function scaled(x: bigint, scale: number): number {
  if (x === 0n) return 0;
  const a = x < 0n ? -x : x;
  const drop = Math.max(0, bitLength(a) - 60);
  const v = Number(a >> BigInt(drop)) * 2 ** (drop + scale);
  return x < 0n ? -v : v;
}

/** Exact p(z) and p'(z), returned as doubles after one common scaling (see {@link exactValues}). */
export interface ExactValues {
  /** p(z)·2^-scale, p'(z)·2^-scale, each part rounded once to double. */
  pr: number;
  pi: number;
  dr: number;
  di: number;
  /** log2 of the common factor taken out (relative to the integer coefficients). */
  scale: number;
}

/**
 * p(x + iy) and p'(x + iy) computed exactly, then rounded once each; `derivative` false skips p'. The values
 * are relative to the integer coefficients, so ratios such as p'/p and p(z_i)/p(z_j) are as exact as a
 * double can hold.
 */
export function exactValues(p: ExactPoly, x: number, y: number, derivative = true): ExactValues {
  const sx = splitDouble(x);
  const sy = splitDouble(y);
  const e = Math.min(x === 0 ? 0 : sx.exponent, y === 0 ? 0 : sy.exponent, 0);
  const X = x === 0 ? 0n : sx.mantissa << BigInt(sx.exponent - e);
  const Y = y === 0 ? 0n : sy.mantissa << BigInt(sy.exponent - e);
  const s = BigInt(-e);
  // With z = Z·2^e: q_k = Q_k·2^(e·k) and p' partials d_k = D_k·2^(e(k−1)), so
  // Q_k = Q_{k−1}·Z + c_k·2^(−e·k) and D_k = D_{k−1}·Z + Q_{k−1}.
  let qr = p[0]!;
  let qi = 0n;
  let dr = 0n;
  let di = 0n;
  let shift = 0n;
  for (let k = 1; k < p.length; k++) {
    if (derivative) {
      const ndr = dr * X - di * Y + qr;
      di = dr * Y + di * X + qi;
      dr = ndr;
    }
    shift += s;
    const nr = qr * X - qi * Y + (p[k]! << shift);
    qi = qr * Y + qi * X;
    qr = nr;
  }
  const n = p.length - 1;
  const top = Math.max(bitLength(qr), bitLength(qi), bitLength(dr), bitLength(di));
  const t = 60 - top;
  // p = Q_n·2^(e·n), p' = D_n·2^(e(n−1)).
  return {
    pr: scaled(qr, t),
    pi: scaled(qi, t),
    dr: scaled(dr, t - e),
    di: scaled(di, t - e),
    scale: e * n - t,
  };
}

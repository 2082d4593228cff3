/**
 * Linear-phase FIR by weighted least squares: the symmetric taps whose amplitude A(ω) minimises
 * Σ_bands W ∫ (A(ω) − D(ω))² dω, D linear across each band. A(ω) = Σ a_k cos(u_k ω) with u_k = k (odd
 * taps) or k + ½ (even taps); the normal equations are formed in closed form and solved by Cholesky.
 */
import { checkBands, type FirBand } from './bands.ts';

/** ∫_{w1}^{w2} cos(v ω) dω. */
function cosIntegral(v: number, w1: number, w2: number): number {
  return v === 0 ? w2 - w1 : (Math.sin(v * w2) - Math.sin(v * w1)) / v;
}

/** ∫_{w1}^{w2} ω cos(u ω) dω. */
function rampCosIntegral(u: number, w1: number, w2: number): number {
  if (u === 0) return (w2 * w2 - w1 * w1) / 2;
  const f = (w: number) => (w * Math.sin(u * w)) / u + Math.cos(u * w) / (u * u);
  return f(w2) - f(w1);
}

/**
 * Smallest pivot of the Cholesky factorisation, relative to the largest diagonal entry, that still
 * determines the taps: below it the answer depends on rounding (the Gram matrix of cosines over bands
 * that leave a wide gap is nearly singular).
 */
export const LEAST_SQUARES_PIVOT_FLOOR = 1e-12;

/** Solves the symmetric positive definite q·x = r in place by Cholesky; false when q is (nearly) singular. */
function choleskySolve(q: Float64Array, r: Float64Array, n: number): boolean {
  let top = 0;
  for (let j = 0; j < n; j++) top = Math.max(top, q[j * n + j]!);
  for (let j = 0; j < n; j++) {
    let d = q[j * n + j]!;
    for (let k = 0; k < j; k++) d -= q[j * n + k]! ** 2;
    if (!(d > LEAST_SQUARES_PIVOT_FLOOR * top)) return false;
    const l = Math.sqrt(d);
    q[j * n + j] = l;
    for (let i = j + 1; i < n; i++) {
      let s = q[i * n + j]!;
      for (let k = 0; k < j; k++) s -= q[i * n + k]! * q[j * n + k]!;
      q[i * n + j] = s / l;
    }
  }
  for (let i = 0; i < n; i++) {
    let s = r[i]!;
    for (let k = 0; k < i; k++) s -= q[i * n + k]! * r[k]!;
    r[i] = s / q[i * n + i]!;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = r[i]!;
    for (let k = i + 1; k < n; k++) s -= q[k * n + i]! * r[k]!;
    r[i] = s / q[i * n + i]!;
  }
  return true;
}

/**
 * Taps (symmetric, `taps` of them) of the weighted least-squares design over the bands (cycles per sample).
 * Throws a RangeError when the bands leave the problem without a unique answer (too little band for the taps).
 */
export function leastSquaresTaps(taps: number, bands: readonly FirBand[]): Float64Array {
  checkBands(bands);
  const n = Math.ceil(taps / 2);
  const half = taps % 2 === 0 ? 0.5 : 0;
  const q = new Float64Array(n * n);
  const r = new Float64Array(n);
  for (const b of bands) {
    const w1 = 2 * Math.PI * b.lo;
    const w2 = 2 * Math.PI * b.hi;
    const slope = (b.to - b.from) / (w2 - w1);
    const offset = b.from - slope * w1;
    for (let k = 0; k < n; k++) {
      const uk = k + half;
      for (let l = 0; l <= k; l++) {
        const ul = l + half;
        const v = (b.weight * (cosIntegral(uk - ul, w1, w2) + cosIntegral(uk + ul, w1, w2))) / 2;
        q[k * n + l] = q[k * n + l]! + v;
      }
      r[k] = r[k]! + b.weight * (offset * cosIntegral(uk, w1, w2) + slope * rampCosIntegral(uk, w1, w2));
    }
  }
  for (let k = 0; k < n; k++) for (let l = 0; l < k; l++) q[l * n + k] = q[k * n + l]!;
  if (!choleskySolve(q, r, n))
    throw new RangeError(
      `the gaps between the bands are too wide for ${taps} least-squares taps: the taps are not determined`,
    );
  const h = new Float64Array(taps);
  const mid = (taps - 1) / 2;
  for (let k = 0; k < n; k++) {
    const c = k === 0 && half === 0 ? r[0]! : r[k]! / 2;
    h[Math.round(mid - (k + half))] = c;
    h[Math.round(mid + (k + half))] = c;
  }
  return h;
}

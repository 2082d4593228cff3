/**
 * |H(z)| in dB at many points of the z-plane (the response surface seen from above), for shading. Uses the
 * product form: 20·log10|H| = 20·log10|k| + Σ 10·log10|z − zᵢ|² − Σ 10·log10|z − pᵢ|², with the squared
 * distances multiplied in small batches and one logarithm per batch, so a 256 × 256 grid of an order-32
 * design costs a few milliseconds.
 */
import type { Root, Zpk } from '../types.ts';

/** Level written where |H| is zero (exactly on a zero), dB. */
export const SURFACE_FLOOR_DB = -300;
/** Level written where |H| is infinite (exactly on a pole), dB. */
export const SURFACE_CEILING_DB = 300;
/** Squared distances multiplied before one logarithm: 8 factors of at most ~1e3 each stay far from overflow. */
const BATCH = 8;

/** Every root with its conjugate, as flat arrays (re, im) repeated by multiplicity. */
function flatten(roots: readonly Root[]): { re: Float64Array; im: Float64Array } {
  const re: number[] = [];
  const im: number[] = [];
  for (const r of roots) {
    for (let m = 0; m < r.multiplicity; m++) {
      re.push(r.re);
      im.push(r.im);
      if (r.im !== 0) {
        re.push(r.re);
        im.push(-r.im);
      }
    }
  }
  return { re: Float64Array.from(re), im: Float64Array.from(im) };
}

/** log10 of Π |z − rᵢ|² over flat roots, batched; −Infinity when z hits a root. */
function logProduct(re: Float64Array, im: Float64Array, x: number, y: number): number {
  let sum = 0;
  let acc = 1;
  for (let i = 0; i < re.length; i++) {
    const dx = x - re[i]!;
    const dy = y - im[i]!;
    acc *= dx * dx + dy * dy;
    if ((i + 1) % BATCH === 0) {
      sum += Math.log10(acc);
      acc = 1;
    }
  }
  return sum + Math.log10(acc);
}

/** A rectangle of the plane: real parts at the left/right edges, imaginary parts at the top/bottom edges. */
export interface PlaneRect {
  re0: number;
  re1: number;
  imTop: number;
  imBottom: number;
}

/**
 * 20·log10|H(z)| at the centres of rows j0…j1−1 of an nx × ny grid over the rectangle (rows from the top),
 * written into out[j·nx + i], clamped to [SURFACE_FLOOR_DB, SURFACE_CEILING_DB].
 */
export function surfaceLevelsDb(
  zpk: Zpk,
  rect: PlaneRect,
  nx: number,
  ny: number,
  j0: number,
  j1: number,
  out: Float32Array,
): void {
  const zeros = flatten(zpk.zeros);
  const poles = flatten(zpk.poles);
  const gainDb = 20 * Math.log10(Math.abs(zpk.gain));
  const dx = (rect.re1 - rect.re0) / nx;
  const dy = (rect.imBottom - rect.imTop) / ny;
  for (let j = j0; j < j1; j++) {
    const y = rect.imTop + (j + 0.5) * dy;
    for (let i = 0; i < nx; i++) {
      const x = rect.re0 + (i + 0.5) * dx;
      const db = gainDb + 10 * (logProduct(zeros.re, zeros.im, x, y) - logProduct(poles.re, poles.im, x, y));
      out[j * nx + i] = Number.isNaN(db)
        ? SURFACE_FLOOR_DB
        : Math.min(SURFACE_CEILING_DB, Math.max(SURFACE_FLOOR_DB, db));
    }
  }
}

/**
 * |H(z)| in dB over a rectangle of the plane, for the shading under the roots. Every value comes from the
 * engine (evalZpkAt); this module only walks the grid and writes into a typed array.
 */
import type { Zpk } from '../../core/types.ts';
import { evalZpkAt } from '../../core/response.ts';

/** Floor for |H| before taking dB, so a point on a zero gives a finite (very low) level. */
const MAGNITUDE_FLOOR = 1e-12;

export interface SurfaceRect {
  /** Real part at the left and right edges. */
  re0: number;
  re1: number;
  /** Imaginary part at the top and bottom edges. */
  imTop: number;
  imBottom: number;
}

/**
 * 20·log10|H(z)| sampled at the centres of an nx × ny grid over the rectangle, row by row from the top,
 * written into `out` (reused when large enough).
 */
export function surfaceDb(
  zpk: Zpk,
  rect: SurfaceRect,
  nx: number,
  ny: number,
  out?: Float32Array,
): Float32Array {
  const n = nx * ny;
  const db = out && out.length >= n ? out : new Float32Array(n);
  const dx = (rect.re1 - rect.re0) / nx;
  const dy = (rect.imBottom - rect.imTop) / ny;
  for (let j = 0; j < ny; j++) {
    const im = rect.imTop + (j + 0.5) * dy;
    for (let i = 0; i < nx; i++) {
      const h = evalZpkAt(zpk, rect.re0 + (i + 0.5) * dx, im);
      db[j * nx + i] = 20 * Math.log10(Math.max(MAGNITUDE_FLOOR, Math.hypot(h.re, h.im)));
    }
  }
  return db;
}

/**
 * |H(z)| in dB at many points of the z-plane (the response surface seen from above), for shading, from the
 * product form of squared distances (planeLevelDbReader, the same kernel the mask judges with).
 */
import type { Zpk } from '../types.ts';
import { planeLevelDbReader } from './magnitude.ts';

/** Level written where |H| is zero (exactly on a zero), dB. */
export const SURFACE_FLOOR_DB = -300;
/** Level written where |H| is infinite (exactly on a pole), dB. */
export const SURFACE_CEILING_DB = 300;
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
  const level = planeLevelDbReader(zpk);
  const dx = (rect.re1 - rect.re0) / nx;
  const dy = (rect.imBottom - rect.imTop) / ny;
  for (let j = j0; j < j1; j++) {
    const y = rect.imTop + (j + 0.5) * dy;
    for (let i = 0; i < nx; i++) {
      const x = rect.re0 + (i + 0.5) * dx;
      const db = level(x, y);
      out[j * nx + i] = Number.isNaN(db)
        ? SURFACE_FLOOR_DB
        : Math.min(SURFACE_CEILING_DB, Math.max(SURFACE_FLOOR_DB, db));
    }
  }
}

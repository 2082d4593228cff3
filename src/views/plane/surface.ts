/**
 * |H(z)| in dB over a rectangle of the plane, for the shading under the roots. Every value comes from the
 * engine (surfaceLevelsDb); this module schedules the work and keeps the arrays.
 */
import type { Zpk } from '../../core/types.ts';
import { surfaceLevelsDb } from '../../core/response/index.ts';

export interface SurfaceRect {
  /** Real part at the left and right edges. */
  re0: number;
  re1: number;
  /** Imaginary part at the top and bottom edges. */
  imTop: number;
  imBottom: number;
}

/**
 * 20·log10|H(z)| at the centres of rows j0…j1−1 of an nx × ny grid over the rectangle (rows counted from
 * the top), written into db[j·nx + i].
 */
export function surfaceRows(
  zpk: Zpk,
  rect: SurfaceRect,
  nx: number,
  ny: number,
  j0: number,
  j1: number,
  db: Float32Array,
): void {
  surfaceLevelsDb(zpk, rect, nx, ny, j0, j1, db);
}

/** The whole nx × ny grid (see surfaceRows), into `out` when it is large enough. */
export function surfaceDb(
  zpk: Zpk,
  rect: SurfaceRect,
  nx: number,
  ny: number,
  out?: Float32Array,
): Float32Array {
  const db = out && out.length >= nx * ny ? out : new Float32Array(nx * ny);
  surfaceRows(zpk, rect, nx, ny, 0, ny, db);
  return db;
}

/** Main-thread time one slice of a background grid may take, ms (keeps the page responsive). */
export const SURFACE_SLICE_MS = 8;

/**
 * Computes the grid a few rows at a time between other work, then calls done(db). Returns a function that
 * abandons the job (when the design or the view changed before it finished).
 */
export function surfaceInSlices(
  zpk: Zpk,
  rect: SurfaceRect,
  nx: number,
  ny: number,
  done: (db: Float32Array) => void,
): () => void {
  const db = new Float32Array(nx * ny);
  let row = 0;
  let timer: ReturnType<typeof setTimeout> | null = null;
  const step = () => {
    const t0 = performance.now();
    while (row < ny && performance.now() - t0 < SURFACE_SLICE_MS) {
      surfaceRows(zpk, rect, nx, ny, row, row + 1, db);
      row++;
    }
    if (row < ny) timer = setTimeout(step, 0);
    else {
      timer = null;
      done(db);
    }
  };
  timer = setTimeout(step, 0);
  return () => {
    if (timer !== null) clearTimeout(timer);
    timer = null;
  };
}

/**
 * The |H(z)| shading: a canvas under the plane's SVG. Every change is drawn at once from a coarse grid;
 * at rest a finer grid is then computed in slices between other work and replaces it when complete.
 */
import { useLayoutEffect, useRef } from 'react';
import type { Zpk } from '../../core/types.ts';
import { selectZpk } from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import type { PlaneScale } from './geometry.ts';
import { surfaceDb, surfaceInSlices, type SurfaceRect } from './surface.ts';
import { paintLevels } from './surfaceColours.ts';

/** Grid cells along the longer side of the box: drawn at once (and while dragging), and at rest. */
export const SURFACE_CELLS_DRAGGING = 64;
export const SURFACE_CELLS_AT_REST = 256;

function gridSize(cells: number, width: number, height: number): [number, number] {
  const short = (n: number) => Math.max(2, Math.round(n));
  return width >= height
    ? [cells, short((cells * height) / width)]
    : [short((cells * width) / height), cells];
}

/** Paints dB values on the nx × ny scratch canvas and stretches it (smoothed) over the visible canvas. */
function draw(
  canvas: HTMLCanvasElement,
  grid: HTMLCanvasElement,
  db: Float32Array,
  nx: number,
  ny: number,
  s: PlaneScale,
) {
  const ctx = canvas.getContext('2d');
  grid.width = nx;
  grid.height = ny;
  const gctx = grid.getContext('2d');
  if (!ctx || !gctx) return;
  const img = gctx.createImageData(nx, ny);
  paintLevels(db, img.data, nx * ny);
  gctx.putImageData(img, 0, 0);
  const dpr = window.devicePixelRatio || 1;
  const cw = Math.round(s.width * dpr);
  const ch = Math.round(s.height * dpr);
  if (canvas.width !== cw || canvas.height !== ch) {
    canvas.width = cw;
    canvas.height = ch;
  }
  ctx.imageSmoothingEnabled = true;
  ctx.imageSmoothingQuality = 'high';
  ctx.drawImage(grid, 0, 0, cw, ch);
}

/**
 * Paints the coarse grid (at once, and on every move of a drag) as the canvas's own pixels: the canvas
 * then holds nx × ny pixels and its CSS size stretches them over the plane, so a move costs a few thousand
 * pixels on the main thread and in the compositor rather than the whole plane's (the picture is the one a
 * low-quality stretch of the grid gave before).
 */
function drawCoarse(canvas: HTMLCanvasElement, db: Float32Array, nx: number, ny: number) {
  if (canvas.width !== nx || canvas.height !== ny) {
    canvas.width = nx;
    canvas.height = ny;
  }
  const ctx = canvas.getContext('2d');
  if (!ctx) return;
  const img = ctx.createImageData(nx, ny);
  paintLevels(db, img.data, nx * ny);
  ctx.putImageData(img, 0, 0);
}

function rectOf(s: PlaneScale): SurfaceRect {
  const [re0, re1] = s.x.domain() as [number, number];
  const [imBottom, imTop] = s.y.domain() as [number, number];
  return { re0, re1, imTop, imBottom };
}

export function SurfaceCanvas({ scale }: { scale: PlaneScale }) {
  const zpk: Zpk = useWorkbench(selectZpk);
  const dragging = useWorkbench((s) => s.dragging);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const scratch = useRef<{ db: Float32Array; grid: HTMLCanvasElement } | null>(null);

  useLayoutEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas) return;
    scratch.current ??= { db: new Float32Array(0), grid: document.createElement('canvas') };
    const sc = scratch.current;
    const rect = rectOf(scale);
    const [nx, ny] = gridSize(SURFACE_CELLS_DRAGGING, scale.width, scale.height);
    sc.db = surfaceDb(zpk, rect, nx, ny, sc.db);
    drawCoarse(canvas, sc.db, nx, ny);
    if (dragging) return;
    const [fx, fy] = gridSize(SURFACE_CELLS_AT_REST, scale.width, scale.height);
    return surfaceInSlices(zpk, rect, fx, fy, (db) => draw(canvas, sc.grid, db, fx, fy, scale));
  }, [zpk, dragging, scale]);

  return (
    <canvas
      ref={canvasRef}
      className="pw-surface"
      style={{ width: scale.width, height: scale.height }}
      aria-hidden="true"
    />
  );
}

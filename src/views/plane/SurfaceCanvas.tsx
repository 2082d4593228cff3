/**
 * The |H(z)| shading: a canvas under the plane's SVG, drawn from a coarse grid while a root is dragged and a
 * finer one at rest, then stretched (smoothly) to the box.
 */
import { useLayoutEffect, useRef } from 'react';
import { selectZpk } from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import type { PlaneScale } from './geometry.ts';
import { surfaceDb } from './surface.ts';
import { paintLevels } from './surfaceColours.ts';

/** Grid cells along the longer side of the box while dragging and at rest. */
export const SURFACE_CELLS_DRAGGING = 64;
export const SURFACE_CELLS_AT_REST = 256;

interface Scratch {
  db: Float32Array;
  grid: HTMLCanvasElement;
}

export function SurfaceCanvas({ scale }: { scale: PlaneScale }) {
  const zpk = useWorkbench(selectZpk);
  const dragging = useWorkbench((s) => s.dragging);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const scratch = useRef<Scratch | null>(null);

  useLayoutEffect(() => {
    const canvas = canvasRef.current;
    const ctx = canvas?.getContext('2d');
    if (!canvas || !ctx) return;
    const { width, height, x, y } = scale;
    const cells = dragging ? SURFACE_CELLS_DRAGGING : SURFACE_CELLS_AT_REST;
    const nx = width >= height ? cells : Math.max(2, Math.round((cells * width) / height));
    const ny = width >= height ? Math.max(2, Math.round((cells * height) / width)) : cells;
    scratch.current ??= { db: new Float32Array(0), grid: document.createElement('canvas') };
    const sc = scratch.current;
    const [re0, re1] = x.domain() as [number, number];
    const [imBottom, imTop] = y.domain() as [number, number];
    sc.db = surfaceDb(zpk, { re0, re1, imTop, imBottom }, nx, ny, sc.db);
    sc.grid.width = nx;
    sc.grid.height = ny;
    const gctx = sc.grid.getContext('2d');
    if (!gctx) return;
    const img = gctx.createImageData(nx, ny);
    paintLevels(sc.db, img.data, nx * ny);
    gctx.putImageData(img, 0, 0);
    const dpr = window.devicePixelRatio || 1;
    const cw = Math.round(width * dpr);
    const ch = Math.round(height * dpr);
    if (canvas.width !== cw || canvas.height !== ch) {
      canvas.width = cw;
      canvas.height = ch;
    }
    ctx.imageSmoothingEnabled = true;
    ctx.imageSmoothingQuality = dragging ? 'low' : 'high';
    ctx.drawImage(sc.grid, 0, 0, cw, ch);
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

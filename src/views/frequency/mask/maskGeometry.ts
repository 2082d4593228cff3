/**
 * Where a requirement mask sits in the magnitude plot, in SVG pixels: each region's frequency span, its
 * limit lines and the forbidden zones beyond them (above an upper limit, below a lower one). Pure.
 */
import type { MaskRegion, RegionEdge } from '../../../core/mask/index.ts';
import { fromPixel, toPixel, type AxisMap } from '../../chart/pixels.ts';
import type { PlotRect } from '../layout.ts';

/** A region narrower than this on screen is drawn this wide so it stays visible and grabbable, px. */
export const MIN_REGION_PX = 3;

export interface LimitShape {
  edge: 'upperDb' | 'lowerDb';
  /** The limit line's y, px (may lie outside the plot when the limit is off the axis). */
  y: number;
  /** The forbidden zone: from the line to the plot's top (upper) or bottom (lower), clamped to the plot. */
  zoneTop: number;
  zoneBottom: number;
}

export interface RegionShape {
  id: string;
  x0: number;
  x1: number;
  /** Whether each edge is on screen (0 Hz is not on a log axis). */
  x0Visible: boolean;
  x1Visible: boolean;
  limits: LimitShape[];
}

/** y pixel of a level in dB on the plot's axis (dB, or linear magnitude when `db` is false). */
export function levelToY(yMap: AxisMap, levelDb: number, db: boolean): number {
  return toPixel(yMap, db ? levelDb : 10 ** (levelDb / 20));
}

/** Level in dB at a y pixel (inverse of levelToY; −∞ dB at or below zero on a linear axis). */
export function yToLevel(yMap: AxisMap, y: number, db: boolean): number {
  const v = fromPixel(yMap, y);
  return db ? v : v > 0 ? 20 * Math.log10(v) : -Infinity;
}

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/** x pixel of a frequency, or NaN when it is off a log axis (0 Hz). */
export const hzToX = (xMap: AxisMap, hz: number) => toPixel(xMap, hz);

/** The shapes of every region, in the mask's order. */
export function regionShapes(
  regions: readonly MaskRegion[],
  xMap: AxisMap,
  yMap: AxisMap,
  db: boolean,
  rect: PlotRect,
): RegionShape[] {
  return regions.map((r) => {
    const a = toPixel(xMap, r.fromHz);
    const b = toPixel(xMap, r.toHz);
    let x0 = clamp(Number.isFinite(a) ? a : rect.left, rect.left, rect.right);
    let x1 = clamp(Number.isFinite(b) ? b : rect.left, rect.left, rect.right);
    if (x1 - x0 < MIN_REGION_PX) {
      const mid = (x0 + x1) / 2;
      x0 = mid - MIN_REGION_PX / 2;
      x1 = mid + MIN_REGION_PX / 2;
    }
    const limits: LimitShape[] = [];
    if (r.upperDb !== undefined) {
      const y = levelToY(yMap, r.upperDb, db);
      limits.push({ edge: 'upperDb', y, zoneTop: rect.top, zoneBottom: clamp(y, rect.top, rect.bottom) });
    }
    if (r.lowerDb !== undefined) {
      const y = levelToY(yMap, r.lowerDb, db);
      const top = Number.isFinite(y) ? clamp(y, rect.top, rect.bottom) : rect.bottom;
      limits.push({ edge: 'lowerDb', y, zoneTop: top, zoneBottom: rect.bottom });
    }
    return {
      id: r.id,
      x0,
      x1,
      x0Visible: Number.isFinite(a) && a >= rect.left - 0.5 && a <= rect.right + 0.5,
      x1Visible: Number.isFinite(b) && b >= rect.left - 0.5 && b <= rect.right + 0.5,
      limits,
    };
  });
}

/**
 * A dragged value rounded to what one pixel can resolve there (a power of ten no larger than a pixel's
 * worth), so a drag leaves 118 Hz rather than 118.3724 Hz. `perPixel` is the value change per pixel.
 */
export function roundToPixel(value: number, perPixel: number): number {
  if (!(perPixel > 0) || !Number.isFinite(value)) return value;
  const step = 10 ** Math.floor(Math.log10(perPixel));
  const rounded = Math.round(value / step) * step;
  // Strip binary noise (0.30000000000000004) by printing at the step's precision.
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  return Number(rounded.toFixed(Math.min(decimals, 12)));
}

/** The value (Hz or dB) of an edge or limit dragged to pixel `px`, rounded to the pixel's resolution. */
export function draggedValue(
  edge: RegionEdge,
  px: number,
  xMap: AxisMap,
  yMap: AxisMap,
  db: boolean,
): number {
  if (edge === 'fromHz' || edge === 'toHz') {
    const hz = fromPixel(xMap, px);
    const perPx = Math.abs(fromPixel(xMap, px + 1) - hz);
    return Math.max(0, roundToPixel(hz, perPx));
  }
  const level = yToLevel(yMap, px, db);
  const perPx = Math.abs(yToLevel(yMap, px + 1, db) - level);
  return Number.isFinite(level) ? roundToPixel(level, perPx) : level;
}

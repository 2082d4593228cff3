/**
 * SVG path strings built from pixel arrays in one pass: a polyline that clips to a band, breaks at gaps and
 * jumps and thins dense data per pixel column; stems and dots as ONE path each (thousands of samples must
 * redraw within a frame, which separate elements would not).
 */

/** Pixels beyond the plot edge that a clipped point is drawn at, so clipped segments leave the plot. */
export const CLIP_OVERSHOOT_PX = 2;

export interface LineOptions {
  /** Top and bottom of the plot in pixels (top < bottom); y is clamped just beyond them (±∞ included). */
  top: number;
  bottom: number;
  /** Start a new sub-path when consecutive points differ by more than this many pixels vertically. */
  maxJumpPx?: number;
  /** Keep only the lowest and highest point per pixel column (x must be increasing). */
  thin?: boolean;
}

/** Magnitude past which tenths are formatted as a plain number (an integer that size is no longer a small integer). */
const FAST_FORMAT_LIMIT = 1e9;

/**
 * v rounded to tenths as text, the same text as String(Math.round(v * 10) / 10) but built from integers:
 * formatting a fractional double is the costliest step of a path, and thousands run per frame during a drag.
 */
const r1 = (v: number): string => {
  const t = Math.round(v * 10);
  if (!(Math.abs(t) < FAST_FORMAT_LIMIT)) return String(t / 10);
  const d = t % 10;
  if (d === 0) return String(t / 10);
  const w = (t - d) / 10;
  if (t > 0) return `${w}.${d}`;
  return `${w === 0 ? '-0' : w}.${-d}`;
};

/**
 * A polyline through (px[i], py[i]). NaN in x or y breaks the line. With `thin`, points sharing a pixel
 * column are reduced to their lowest and highest, which draws the same picture to within a pixel (the
 * min/max part of M4 aggregation, Jugel et al., VLDB 2014) — a deep narrow notch survives, unlike plain
 * decimation.
 */
export function linePath(px: ArrayLike<number>, py: ArrayLike<number>, o: LineOptions): string {
  const lo = o.top - CLIP_OVERSHOOT_PX;
  const hi = o.bottom + CLIP_OVERSHOOT_PX;
  const jump = o.maxJumpPx ?? Infinity;
  const parts: string[] = [];
  let penDown = false;
  let lastY = NaN;
  const emit = (x: number, y: number) => {
    parts.push(`${penDown ? 'L' : 'M'}${r1(x)} ${r1(y)}`);
    penDown = true;
  };
  // Column state for thinning, in scalars (no array per column): the column's lowest and highest points
  // with the index each came at.
  let open = false;
  let col = 0;
  let minI = 0;
  let minX = 0;
  let minY = 0;
  let maxI = 0;
  let maxX = 0;
  let maxY = 0;
  const flush = () => {
    if (!open) return;
    // The column's lowest and highest points in the order they came: within one pixel column that draws
    // the same vertical extent as every point of it (first and last add nothing visible).
    if (minI < maxI) {
      emit(minX, minY);
      emit(maxX, maxY);
    } else if (maxI < minI) {
      emit(maxX, maxY);
      emit(minX, minY);
    } else emit(minX, minY);
    open = false;
  };
  for (let i = 0; i < px.length; i++) {
    const x = px[i]!;
    const raw = py[i]!;
    if (Number.isNaN(x) || Number.isNaN(raw)) {
      flush();
      penDown = false;
      lastY = NaN;
      continue;
    }
    const y = raw < lo ? lo : raw > hi ? hi : raw;
    if (Math.abs(y - lastY) > jump) {
      flush();
      penDown = false;
    }
    lastY = y;
    if (!o.thin) {
      emit(x, y);
      continue;
    }
    const c = Math.round(x);
    if (!open || c !== col) {
      flush();
      open = true;
      col = c;
      minI = maxI = i;
      minX = maxX = x;
      minY = maxY = y;
    } else {
      if (y < minY) {
        minI = i;
        minX = x;
        minY = y;
      }
      if (y > maxY) {
        maxI = i;
        maxX = x;
        maxY = y;
      }
    }
  }
  flush();
  return parts.join('');
}

/**
 * Vertical stems from the baseline y0 to each (px[i], py[i]), clamped to [top, bottom], as one path. With
 * `thin` (x increasing), the stems sharing a pixel column become one segment covering them all.
 */
export function stemsPath(
  px: ArrayLike<number>,
  py: ArrayLike<number>,
  y0: number,
  top: number,
  bottom: number,
  thin = false,
): string {
  const lo = top - CLIP_OVERSHOOT_PX;
  const hi = bottom + CLIP_OVERSHOOT_PX;
  const base = r1(y0);
  const parts: string[] = [];
  let col = NaN;
  let cx = 0;
  let cMin = 0;
  let cMax = 0;
  const flush = () => {
    if (!Number.isNaN(col)) parts.push(`M${r1(cx)} ${r1(cMin)}V${r1(cMax)}`);
    col = NaN;
  };
  for (let i = 0; i < px.length; i++) {
    const x = px[i]!;
    const raw = py[i]!;
    if (Number.isNaN(x) || Number.isNaN(raw)) continue;
    const y = raw < lo ? lo : raw > hi ? hi : raw;
    if (!thin) {
      parts.push(`M${r1(x)} ${base}V${r1(y)}`);
      continue;
    }
    const c = Math.round(x);
    if (c !== col) {
      flush();
      col = c;
      cx = c;
      cMin = Math.min(y0, y);
      cMax = Math.max(y0, y);
    } else {
      if (y < cMin) cMin = y;
      if (y > cMax) cMax = y;
    }
  }
  flush();
  return parts.join('');
}

/** Small circles of radius r at each point, as one path (two arcs per circle); clipped points are left out. */
export function dotsPath(
  px: ArrayLike<number>,
  py: ArrayLike<number>,
  r: number,
  top: number,
  bottom: number,
): string {
  const parts: string[] = [];
  const d = Math.round(20 * r) / 10;
  for (let i = 0; i < px.length; i++) {
    const x = px[i]!;
    const y = py[i]!;
    if (Number.isNaN(x) || !(y >= top && y <= bottom)) continue;
    parts.push(`M${r1(x - r)} ${r1(y)}a${r} ${r} 0 1 0 ${d} 0a${r} ${r} 0 1 0 ${-d} 0`);
  }
  return parts.join('');
}

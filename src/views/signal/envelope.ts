/**
 * Drawing a long signal from what the recording worker sends for the plot (workers/viewJob.ts): per pixel
 * column the smallest and largest sample (the min/max part of M4 aggregation, Jugel et al., VLDB 2014),
 * drawn as a closed band so a spike one sample wide still shows; where there are fewer samples than
 * columns, the samples themselves as a line. A trace is drawn in the frame it was asked for or, while a
 * newer one is on its way (a zoom, a resize), in the current frame at its own samples' places.
 */
import type { Trace, ViewResult } from '../../workers/viewJob.ts';

/** Pixel frame of a plot: sample i sits at x0 + i·kx; value v at y0 − v·ky. */
export interface Frame {
  left: number;
  right: number;
  top: number;
  bottom: number;
  x0: number;
  /** Pixels per sample. */
  kx: number;
  y0: number;
  /** Pixels per unit value. */
  ky: number;
}

/** The samples [i0, i1) and columns a trace was computed for. */
export type TraceSpan = ViewResult['request'];

const r1 = (v: number) => Math.round(v * 10) / 10;

function yPixel(f: Frame, v: number): number {
  const y = f.y0 - v * f.ky;
  return y < f.top - 2 ? f.top - 2 : y > f.bottom + 2 ? f.bottom + 2 : y;
}

/** The samples inside the frame's width, one either side included so a line reaches the edges. */
export function visibleSamples(f: Frame, n: number): [number, number] {
  const i0 = Math.max(0, Math.floor((f.left - f.x0) / f.kx));
  const i1 = Math.min(n, Math.ceil((f.right - f.x0) / f.kx) + 1);
  return [i0, Math.max(i0, i1)];
}

/**
 * What to ask the worker for to fill the frame's width: the samples themselves (one either side) while
 * there are at most two pixel columns per sample, else one band per pixel column over the samples inside.
 */
export function spanFor(f: Frame, n: number): Omit<TraceSpan, 'id'> {
  const columns = Math.max(1, Math.round(f.right - f.left));
  const [v0, v1] = visibleSamples(f, n);
  if (v1 - v0 <= columns / 2) return { i0: v0, i1: v1, columns, line: true };
  const a = Math.max(0, Math.ceil((f.left - f.x0) / f.kx));
  const b = Math.min(n, Math.ceil((f.right - f.x0) / f.kx));
  return { i0: a, i1: Math.max(a + 1, b), columns, line: false };
}

/** Smallest and largest finite value of the trace's first `count` entries (columns or samples); null for none. */
export function traceExtent(t: Trace, count = Infinity): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  const scan = (a: Float32Array) => {
    const m = Math.min(a.length, count);
    for (let i = 0; i < m; i++) {
      const v = a[i]!;
      if (v < lo && v > -Infinity) lo = v;
      if (v > hi && v < Infinity) hi = v;
    }
  };
  if (t.kind === 'line') scan(t.values);
  else {
    scan(t.min);
    scan(t.max);
  }
  return lo <= hi ? [lo, hi] : null;
}

/**
 * SVG path of the trace (computed for `span`) in frame f, entries [from, to) only: a closed band through the
 * column maxima left to right and the minima back, or a line through the samples. `band` tells the caller
 * which it got, so it can fill the band.
 */
export function tracePathOf(
  t: Trace,
  span: TraceSpan,
  f: Frame,
  from = 0,
  to = Infinity,
): { d: string; band: boolean } {
  if (t.kind === 'line') {
    const parts: string[] = [];
    const end = Math.min(t.values.length, to);
    for (let k = Math.max(0, from); k < end; k++) {
      const v = t.values[k]!;
      if (!Number.isFinite(v)) continue;
      parts.push(`${parts.length === 0 ? 'M' : 'L'}${r1(f.x0 + (span.i0 + k) * f.kx)} ${r1(yPixel(f, v))}`);
    }
    return { d: parts.join(''), band: false };
  }
  const per = (span.i1 - span.i0) / span.columns;
  const top: string[] = [];
  const bottom: string[] = [];
  const end = Math.min(span.columns, to);
  for (let c = Math.max(0, from); c < end; c++) {
    const lo = t.min[c]!;
    const hi = t.max[c]!;
    if (!(hi >= lo) || !Number.isFinite(lo) || !Number.isFinite(hi)) continue;
    // The column's middle sample, placed by the frame (the same pixel when the frame is the one asked for).
    const px = r1(f.x0 + (span.i0 + (c + 0.5) * per) * f.kx);
    top.push(`${top.length === 0 ? 'M' : 'L'}${px} ${r1(yPixel(f, hi))}`);
    bottom.push(`L${px} ${r1(yPixel(f, lo))}`);
  }
  if (top.length === 0) return { d: '', band: true };
  return { d: top.join('') + bottom.reverse().join('') + 'Z', band: true };
}

// Arrays held on the page (the fixed-point run's codes and its difference from the ideal filter) are drawn
// from their samples directly.

/** Per-column extremes of samples i0..i1−1 spread evenly over `columns` columns. */
export interface ColumnEnvelope {
  min: Float64Array;
  max: Float64Array;
}

/** Min and max of x over each of `columns` equal stretches of the index range [i0, i1). */
export function columnEnvelope(
  x: ArrayLike<number>,
  i0: number,
  i1: number,
  columns: number,
): ColumnEnvelope {
  const min = new Float64Array(columns).fill(Infinity);
  const max = new Float64Array(columns).fill(-Infinity);
  const per = (i1 - i0) / columns;
  for (let c = 0; c < columns; c++) {
    const a = i0 + Math.floor(c * per);
    const b = Math.max(a + 1, Math.min(i1, i0 + Math.floor((c + 1) * per)));
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = a; i < b; i++) {
      const v = x[i]!;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    min[c] = lo;
    max[c] = hi;
  }
  return { min, max };
}

/** Smallest and largest of x over [i0, i1), ignoring non-finite values; [0, 0] for none. */
export function extentOf(x: ArrayLike<number>, i0: number, i1: number): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = i0; i < i1; i++) {
    const v = x[i]!;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return Number.isFinite(lo) && Number.isFinite(hi) ? [lo, hi] : [0, 0];
}

/**
 * SVG path of x across the frame: with more than one sample per two pixel columns, a closed band (column
 * maxima left to right, minima back); otherwise a line through the samples at their own positions.
 * `band` tells the caller which it got, so it can fill the band.
 */
export function tracePath(x: ArrayLike<number>, f: Frame): { d: string; band: boolean } {
  const [i0, i1] = visibleSamples(f, x.length);
  const width = f.right - f.left;
  const columns = Math.max(1, Math.round(width));
  const count = i1 - i0;
  if (count <= 0) return { d: '', band: false };
  if (count <= columns / 2) {
    const parts: string[] = [];
    for (let i = i0; i < i1; i++) {
      parts.push(`${i === i0 ? 'M' : 'L'}${r1(f.x0 + i * f.kx)} ${r1(yPixel(f, x[i]!))}`);
    }
    return { d: parts.join(''), band: false };
  }
  const a = Math.max(0, Math.ceil((f.left - f.x0) / f.kx));
  const b = Math.min(x.length, Math.ceil((f.right - f.x0) / f.kx));
  const { min, max } = columnEnvelope(x, a, Math.max(a + 1, b), columns);
  const k = width / columns;
  const top: string[] = [];
  const bottom: string[] = [];
  for (let c = 0; c < columns; c++) {
    if (!(max[c]! >= min[c]!)) continue;
    const px = r1(f.left + (c + 0.5) * k);
    top.push(`${top.length === 0 ? 'M' : 'L'}${px} ${r1(yPixel(f, max[c]!))}`);
    bottom.push(`L${px} ${r1(yPixel(f, min[c]!))}`);
  }
  return { d: top.join('') + bottom.reverse().join('') + 'Z', band: true };
}

/**
 * Drawing a long signal: the smallest and largest sample in each pixel column (the min/max part of M4
 * aggregation, Jugel et al., VLDB 2014), so half a million samples become two numbers per column and a
 * spike one sample wide still shows. Where there are fewer samples than columns, the samples themselves.
 */

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

/** Data → pixel mapping for whole arrays at once (no object per point), linear or log. */

export type AxisKind = 'linear' | 'log';

/** One axis' mapping: data domain [d0, d1] onto pixels [p0, p1], linear or logarithmic. */
export interface AxisMap {
  kind: AxisKind;
  d0: number;
  d1: number;
  p0: number;
  p1: number;
}

/** Pixel position of one data value (NaN for a non-positive value on a log axis). */
export function toPixel(m: AxisMap, v: number): number {
  if (m.kind === 'log') {
    if (!(v > 0)) return NaN;
    return m.p0 + ((Math.log(v) - Math.log(m.d0)) / (Math.log(m.d1) - Math.log(m.d0))) * (m.p1 - m.p0);
  }
  return m.p0 + ((v - m.d0) / (m.d1 - m.d0)) * (m.p1 - m.p0);
}

/** Data value at a pixel position (inverse of toPixel). */
export function fromPixel(m: AxisMap, p: number): number {
  const t = (p - m.p0) / (m.p1 - m.p0);
  if (m.kind === 'log') return Math.exp(Math.log(m.d0) + t * (Math.log(m.d1) - Math.log(m.d0)));
  return m.d0 + t * (m.d1 - m.d0);
}

/** Pixel positions of every value; ±∞ map to ±∞ pixels so path builders can clip them. */
export function toPixels(m: AxisMap, values: ArrayLike<number>, scale = 1): Float64Array {
  const n = values.length;
  const out = new Float64Array(n);
  if (m.kind === 'log') {
    const l0 = Math.log(m.d0);
    const k = (m.p1 - m.p0) / (Math.log(m.d1) - l0);
    for (let i = 0; i < n; i++) {
      const v = values[i]! * scale;
      out[i] = v > 0 ? m.p0 + (Math.log(v) - l0) * k : NaN;
    }
    return out;
  }
  const k = (m.p1 - m.p0) / (m.d1 - m.d0);
  for (let i = 0; i < n; i++) out[i] = m.p0 + (values[i]! * scale - m.d0) * k;
  return out;
}

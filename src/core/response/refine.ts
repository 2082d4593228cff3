/**
 * The response on the display grid plus the exact frequencies of the roots' angles. A zero on the unit
 * circle between two grid points would otherwise show as a shallow dip instead of the true notch (−∞ dB
 * exactly there), and a sharp resonance would lose its peak. The engine evaluates the extra points.
 */
import { responseZpk, type FrequencyResponse } from './zpkResponse.ts';
import type { Zpk } from '../types.ts';

/** Roots farther than this from the unit circle (in radius) add no point: their features are broad. */
export const REFINE_RADIUS_BAND = 0.2;

/** Angles (rad/sample, in [lo, hi]) of the roots near the unit circle, sorted, without duplicates. */
export function rootAngles(zpk: Zpk, lo: number, hi = Math.PI): number[] {
  const out: number[] = [];
  for (const r of [...zpk.zeros, ...zpk.poles]) {
    if (Math.abs(Math.hypot(r.re, r.im) - 1) > REFINE_RADIUS_BAND) continue;
    const w = Math.atan2(r.im, r.re);
    if (w >= lo && w <= hi) out.push(w);
  }
  out.sort((a, b) => a - b);
  return out.filter((w, i) => i === 0 || w !== out[i - 1]);
}

const FIELDS = [
  'omega',
  're',
  'im',
  'magnitude',
  'magnitudeDb',
  'phase',
  'phaseUnwrapped',
  'groupDelay',
] as const;

/** `grid` with the response at each root angle merged in, in frequency order (grid itself if none to add). */
export function refineAtRoots(zpk: Zpk, grid: FrequencyResponse): FrequencyResponse {
  const g = grid.omega;
  if (g.length === 0) return grid;
  // Only the grid's own band: a zoomed grid gets no points outside what it shows.
  const extra = rootAngles(zpk, g[0]!, g[g.length - 1]!).filter((w) => !gridHas(g, w));
  if (extra.length === 0) return grid;
  const add = responseZpk(zpk, Float64Array.from(extra));
  const n = g.length + extra.length;
  // Where each extra point lands in the merged arrays; the grid's runs between them are copied whole.
  const at = extra.map((w, j) => lowerBound(g, w) + j);
  const out = {} as FrequencyResponse;
  for (const f of FIELDS) {
    const src = grid[f];
    const dst = new Float64Array(n);
    let from = 0;
    for (let j = 0; j < extra.length; j++) {
      const k = at[j]!;
      dst.set(src.subarray(from, k - j), from + j);
      dst[k] = add[f][j]!;
      from = k - j;
    }
    dst.set(src.subarray(from), from + extra.length);
    out[f] = dst;
  }
  return out;
}

/** Number of grid frequencies below w (the grid is increasing). */
function lowerBound(g: Float64Array, w: number): number {
  let lo = 0;
  let hi = g.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (g[mid]! < w) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Whether w is one of the grid's frequencies exactly (binary search; the grid is increasing). */
function gridHas(g: Float64Array, w: number): boolean {
  let lo = 0;
  let hi = g.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const v = g[mid]!;
    if (v === w) return true;
    if (v < w) lo = mid + 1;
    else hi = mid - 1;
  }
  return false;
}

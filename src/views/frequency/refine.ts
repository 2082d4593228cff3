/**
 * The response on the display grid plus the exact frequencies of the roots' angles. A zero on the unit
 * circle between two grid points would otherwise show as a shallow dip instead of the true notch (−∞ dB
 * exactly there), and a sharp resonance would lose its peak. The engine evaluates the extra points.
 */
import { responseZpk, type FrequencyResponse } from '../../core/response.ts';
import type { Zpk } from '../../core/types.ts';

/** Roots farther than this from the unit circle (in radius) add no point: their features are broad. */
export const REFINE_RADIUS_BAND = 0.2;

/** Angles (rad/sample, in [lo, π]) of the roots near the unit circle, sorted, without duplicates. */
export function rootAngles(zpk: Zpk, lo: number): number[] {
  const out: number[] = [];
  for (const r of [...zpk.zeros, ...zpk.poles]) {
    if (Math.abs(Math.hypot(r.re, r.im) - 1) > REFINE_RADIUS_BAND) continue;
    const w = Math.atan2(r.im, r.re);
    if (w >= lo && w <= Math.PI) out.push(w);
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
  const extra = rootAngles(zpk, g[0]!).filter((w) => !gridHas(g, w));
  if (extra.length === 0) return grid;
  const add = responseZpk(zpk, Float64Array.from(extra));
  const n = g.length + extra.length;
  const out = Object.fromEntries(FIELDS.map((f) => [f, new Float64Array(n)])) as unknown as FrequencyResponse;
  let i = 0;
  let j = 0;
  for (let k = 0; k < n; k++) {
    const fromGrid = j >= extra.length || (i < g.length && g[i]! <= extra[j]!);
    const src = fromGrid ? grid : add;
    const at = fromGrid ? i++ : j++;
    for (const f of FIELDS) out[f][k] = src[f][at]!;
  }
  return out;
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

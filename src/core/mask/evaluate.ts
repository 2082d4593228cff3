/**
 * Judging a response against a requirement mask. Each region is read on a grid of evenly spread points
 * plus its two edges exactly plus every root angle (or sample) inside it, so a narrow notch or resonance
 * sits on a grid point; the few lowest local minima of the margin are then refined between their grid
 * neighbours by golden-section search (Kiefer, 1953), so a ripple peak between grid points is found too.
 *
 * Accuracy: the worst frequency is located to MASK_REFINE_FRACTION of the grid spacing, where the margin
 * is flat to second order, so the reported margin is the true local minimum to far below 1e-6 dB. A minimum
 * can only be missed if the margin has more than MASK_REFINE_CANDIDATES local minima lower than the one
 * the grid under-samples, and that one is narrower than a grid step and away from every root angle.
 */
import type { Zpk } from '../types.ts';
import { minimiseOnInterval } from '../design/minimise.ts';
import type { MagnitudeSource } from './source.ts';
import { zpkSource } from './source.ts';
import type { MaskLimit, MaskRegion, MaskRegionResult, MaskResult, RequirementMask } from './types.ts';
import { regionProblem } from './validate.ts';

/** Evenly spread grid points per region (before the edges and root angles are added). */
export const MASK_GRID_POINTS = 512;
/** How many of the lowest local minima of a region's grid margin are refined. */
export const MASK_REFINE_CANDIDATES = 4;
/** Refinement stops when the bracket is this fraction of the two grid steps it started from. */
export const MASK_REFINE_FRACTION = 1e-6;
/**
 * A region passes when its worst margin is >= −MASK_PASS_TOLERANCE_DB: far below any display precision,
 * it lets a design that meets a limit exactly (an equiripple edge, a 0 dB peak) pass despite rounding.
 */
export const MASK_PASS_TOLERANCE_DB = 1e-6;

export interface MaskOptions {
  /** Evenly spread points per region, >= 2 (default MASK_GRID_POINTS). */
  pointsPerRegion?: number;
}

/** Distance to the limits in dB: positive inside, negative outside; NaN (an undefined response) fails. */
function margin(db: number, upper: number | undefined, lower: number | undefined): number {
  let m = Infinity;
  if (upper !== undefined) m = upper - db;
  if (lower !== undefined) m = Math.min(m, db - lower);
  return m === m ? m : -Infinity;
}

/** The region's frequencies: an even grid (continuous sources), its edges, and the features inside. */
function regionGrid(lo: number, hi: number, source: MagnitudeSource, points: number): Float64Array {
  const inside = source.featuresHz.filter((f) => f > lo && f < hi);
  const n = source.continuous ? points : 2;
  const grid = new Float64Array(n + inside.length);
  for (let i = 0; i < n; i++) grid[i] = lo + ((hi - lo) * i) / (n - 1);
  grid[n - 1] = hi;
  grid.set(inside, n);
  return grid.sort();
}

/** Indices of the lowest local minima of m, lowest first (at most `count`). */
function lowestMinima(m: Float64Array, count: number): number[] {
  const picks: number[] = [];
  const n = m.length;
  for (let i = 0; i < n; i++) {
    const v = m[i]!;
    if ((i > 0 && v > m[i - 1]!) || (i < n - 1 && v > m[i + 1]!)) continue;
    if (picks.length === count && v >= m[picks[count - 1]!]!) continue;
    let j = Math.min(picks.length, count - 1);
    picks[j] = i;
    while (j > 0 && m[picks[j - 1]!]! > v) {
      [picks[j - 1], picks[j]] = [i, picks[j - 1]!];
      j--;
    }
  }
  return picks;
}

function judgeRegion(
  region: MaskRegion,
  source: MagnitudeSource,
  fs: number,
  points: number,
): MaskRegionResult {
  const { upperDb: upper, lowerDb: lower } = region;
  const fail = (problem: string): MaskRegionResult => ({
    id: region.id,
    pass: false,
    worstMarginDb: NaN,
    worstAtHz: NaN,
    worstDb: NaN,
    limit: region.upperDb !== undefined ? 'upper' : 'lower',
    problem,
  });
  const nyq = fs / 2;
  // A region reaching past Nyquist after a sample-rate change is judged on the part that remains.
  const clipped = { ...region, toHz: Math.min(region.toHz, nyq) };
  if (region.fromHz >= nyq && region.toHz > region.fromHz)
    return fail(`region ${JSON.stringify(region.id)} lies above fs/2 = ${nyq} Hz at this sample rate`);
  const problem = regionProblem(clipped, fs);
  if (problem) return fail(problem.message);
  const lo = clipped.fromHz;
  const hi = clipped.toHz;
  const grid = regionGrid(lo, hi, source, points);
  const dbs = new Float64Array(grid.length);
  source.readDb(grid, dbs);
  const m = new Float64Array(grid.length);
  for (let i = 0; i < m.length; i++) m[i] = margin(dbs[i]!, upper, lower);
  const minima = lowestMinima(m, MASK_REFINE_CANDIDATES);
  let worstHz = grid[minima[0]!]!;
  let worst = m[minima[0]!]!;
  let db = dbs[minima[0]!]!;
  const readAt = source.readDbAt;
  if (readAt) {
    for (const i of minima) {
      const a = grid[Math.max(0, i - 1)]!;
      const b = grid[Math.min(grid.length - 1, i + 1)]!;
      if (!(b > a)) continue;
      // Search x in [1, 2] so that the relative tolerance is relative to the bracket, not to the frequency.
      const at = (x: number) => a + (x - 1) * (b - a);
      const r = minimiseOnInterval((x) => margin(readAt(at(x)), upper, lower), 1, 2, MASK_REFINE_FRACTION);
      if (r.value < worst) [worst, worstHz, db] = [r.value, at(r.x), readAt(at(r.x))];
    }
  }
  const limit: MaskLimit =
    lower === undefined || (upper !== undefined && upper - db <= db - lower) ? 'upper' : 'lower';
  return {
    id: region.id,
    pass: worst >= -MASK_PASS_TOLERANCE_DB,
    worstMarginDb: worst,
    worstAtHz: worstHz,
    worstDb: db,
    limit,
  };
}

/** Judges a magnitude source against a mask at sample rate fs (Hz): per-region and overall margins in dB. */
export function evaluateMaskOn(
  mask: RequirementMask,
  source: MagnitudeSource,
  fs: number,
  opts: MaskOptions = {},
): MaskResult {
  const points = Math.max(2, Math.round(opts.pointsPerRegion ?? MASK_GRID_POINTS));
  const regions = mask.regions.map((r) => judgeRegion(r, source, fs, points));
  // The worst judged region; a region that could not be judged (problem) only when no other exists.
  let worst: MaskRegionResult | null = null;
  for (const r of regions)
    if (
      !worst ||
      (worst.problem !== undefined && r.problem === undefined) ||
      r.worstMarginDb < worst.worstMarginDb
    )
      worst = r;
  return {
    pass: regions.every((r) => r.pass),
    regions,
    worstMarginDb: worst ? worst.worstMarginDb : Infinity,
    worstAtHz: worst ? worst.worstAtHz : NaN,
    worstRegionId: worst ? worst.id : null,
  };
}

/** Judges zeros/poles/gain at sample rate fs (Hz) against a mask: per-region and overall margins in dB. */
export function evaluateMask(
  mask: RequirementMask,
  zpk: Zpk,
  fs: number,
  opts: MaskOptions = {},
): MaskResult {
  return evaluateMaskOn(mask, zpkSource(zpk, fs), fs, opts);
}

/**
 * Axis ranges that follow the data without jitter: nice rounding, a dB floor below the peak, and hysteresis
 * (grow at once when the data leaves the range, shrink only when the data has become much smaller).
 */
import { niceDomain } from './linearScale.ts';

export type Range = readonly [number, number];

/** Deepest level shown below the highest, dB: deeper notches are clipped so they don't flatten the plot. */
export const DB_FLOOR_BELOW_PEAK = 120;
/**
 * A peak this little above a multiple of 10 dB is ranged as if it were on it (the curve overshoots the frame
 * by under a pixel), so a response peaking at +0.01 dB does not get a whole empty 20 dB step on top.
 */
export const DB_TOP_SNAP = 0.5;
/** Smallest dB span shown, so a flat response isn't blown up to fill the plot with rounding noise. */
export const DB_MIN_SPAN = 12;
/** The range shrinks once the data covers less than this fraction of it (hysteresis against jitter). */
export const SHRINK_BELOW_FRACTION = 0.55;

/** Smallest and largest finite values of an array (NaN and ±∞ ignored); null when none is finite. */
export function finiteExtent(values: ArrayLike<number>): Range | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (v < lo && v > -Infinity) lo = v;
    if (v > hi && v < Infinity) hi = v;
  }
  return lo <= hi ? [lo, hi] : null;
}

/** [lo, hi], or a range of exactly `minSpan` about its middle when it is narrower than that. */
function widenRange(lo: number, hi: number, minSpan: number): Range {
  if (hi - lo >= minSpan) return [lo, hi];
  const mid = (lo + hi) / 2;
  return [mid - minSpan / 2, mid + minSpan / 2];
}

/** [lo, hi] widened to at least `minSpan` about its middle and rounded outwards to nice tick steps. */
export function niceRange(lo: number, hi: number, minSpan: number, ticks = 5): Range {
  const [a, b] = widenRange(lo, hi, minSpan);
  return niceDomain(a, b, ticks);
}

/**
 * The part of a magnitude curve (dB) worth showing: from the highest finite level down to the deepest, but
 * never more than DB_FLOOR_BELOW_PEAK below the highest (−∞ at an exact zero on the circle counts as deep).
 */
export function dbExtent(magnitudeDb: ArrayLike<number>): Range {
  const ext = finiteExtent(magnitudeDb);
  if (!ext) return [-DB_FLOOR_BELOW_PEAK, 0];
  const tens = Math.floor(ext[1] / 10) * 10;
  const top = ext[1] - tens < DB_TOP_SNAP ? tens : ext[1];
  let bottom = Math.min(top, Math.max(ext[0], top - DB_FLOOR_BELOW_PEAK));
  for (let i = 0; i < magnitudeDb.length; i++) {
    if (magnitudeDb[i] === -Infinity) {
      bottom = top - DB_FLOOR_BELOW_PEAK;
      break;
    }
  }
  return [bottom, top];
}

/** The dB axis for a magnitude curve: dbExtent rounded to nice steps, at least DB_MIN_SPAN tall. */
export function dbRange(magnitudeDb: ArrayLike<number>): Range {
  const [bottom, top] = dbExtent(magnitudeDb);
  return niceRange(bottom, top, DB_MIN_SPAN);
}

/**
 * The range to show next, given the one shown now, the data's own extent and the nice range the data asks
 * for: `wanted` when the data no longer fits in the current range or `wanted` is under SHRINK_BELOW_FRACTION
 * of it; otherwise the current range unchanged (the same object, so callers can tell nothing moved).
 * `hold` keeps the current range always.
 */
export function settleRange(current: Range | null, data: Range, wanted: Range, hold = false): Range {
  if (!current) return wanted;
  if (hold) return current;
  const [c0, c1] = current;
  const [d0, d1] = data;
  const [w0, w1] = wanted;
  if (w0 === c0 && w1 === c1) return current;
  if (d0 < c0 || d1 > c1) return wanted;
  if (w1 - w0 < SHRINK_BELOW_FRACTION * (c1 - c0)) return wanted;
  return current;
}

/**
 * [lo, hi] widened to at least minSpan and rounded outwards to the smallest step from `steps` that cuts it
 * into at most `count` parts (e.g. multiples of 90° for a phase axis); niceRange beyond the largest step.
 */
export function steppedRange(
  lo: number,
  hi: number,
  minSpan: number,
  steps: readonly number[],
  count = 4,
): Range {
  const [a, b] = widenRange(lo, hi, minSpan);
  for (const s of steps) {
    const r0 = Math.floor(a / s) * s;
    const r1 = Math.ceil(b / s) * s;
    if ((r1 - r0) / s <= count) return [r0, r1];
  }
  return niceRange(a, b, 0, count);
}

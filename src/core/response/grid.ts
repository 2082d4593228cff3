/** Frequency grids on [0, pi] radians per sample, or on a band of it. */

/** Lowest frequency of a logarithmic grid when none is given: pi/1000 rad/sample (three decades below Nyquist). */
export const DEFAULT_LOG_GRID_MIN = Math.PI / 1000;

/**
 * n frequencies in radians per sample from fMin (default 0, or DEFAULT_LOG_GRID_MIN for a log grid) to fMax
 * (default pi) inclusive, evenly or geometrically spaced. A band narrower than the whole axis (a zoomed
 * view) gets all n points, so its response is evaluated there rather than interpolated.
 */
export function frequencyGrid(
  n: number,
  opts: { log?: boolean; fMin?: number; fMax?: number } = {},
): Float64Array {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`grid size ${n} must be a whole number >= 0`);
  const out = new Float64Array(n);
  if (n === 0) return out;
  const hi = opts.fMax ?? Math.PI;
  if (!(hi > 0 && hi <= Math.PI)) throw new RangeError(`grid end ${hi} must lie in (0, pi] rad/sample`);
  if (n === 1) {
    out[0] = opts.log || opts.fMax !== undefined ? hi : (opts.fMin ?? 0);
    return out;
  }
  if (!opts.log) {
    const lo = opts.fMin ?? 0;
    if (!(lo >= 0 && lo < hi)) throw new RangeError(`grid start ${lo} must lie in [0, ${hi}) rad/sample`);
    // lo + (hi − lo)·i/(n − 1): the end points are exact, the steps even to the last bit of the span.
    for (let i = 0; i < n; i++) out[i] = lo + ((hi - lo) * i) / (n - 1);
    out[n - 1] = hi;
    return out;
  }
  const lo = opts.fMin ?? DEFAULT_LOG_GRID_MIN;
  if (!(lo > 0 && lo < hi)) throw new RangeError(`log grid start ${lo} must lie in (0, ${hi}) rad/sample`);
  const ratio = Math.log(hi / lo) / (n - 1);
  for (let i = 0; i < n; i++) out[i] = lo * Math.exp(ratio * i);
  out[n - 1] = hi;
  return out;
}

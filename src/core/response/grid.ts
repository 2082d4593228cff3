/** Frequency grids on [0, pi] radians per sample. */

/** Lowest frequency of a logarithmic grid when none is given: pi/1000 rad/sample (three decades below Nyquist). */
export const DEFAULT_LOG_GRID_MIN = Math.PI / 1000;

/**
 * n frequencies in radians per sample from 0 (or fMin, rad/sample, for a log grid) to pi inclusive, evenly
 * spaced or geometrically spaced.
 */
export function frequencyGrid(n: number, opts: { log?: boolean; fMin?: number } = {}): Float64Array {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`grid size ${n} must be a whole number >= 0`);
  const out = new Float64Array(n);
  if (n === 0) return out;
  if (n === 1) {
    out[0] = opts.log ? Math.PI : 0;
    return out;
  }
  if (!opts.log) {
    for (let i = 0; i < n; i++) out[i] = (Math.PI * i) / (n - 1);
    out[n - 1] = Math.PI;
    return out;
  }
  const lo = opts.fMin ?? DEFAULT_LOG_GRID_MIN;
  if (!(lo > 0 && lo < Math.PI)) throw new RangeError(`log grid start ${lo} must lie in (0, pi) rad/sample`);
  const ratio = Math.log(Math.PI / lo) / (n - 1);
  for (let i = 0; i < n; i++) out[i] = lo * Math.exp(ratio * i);
  out[n - 1] = Math.PI;
  return out;
}

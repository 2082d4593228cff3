/**
 * The zoomed bands of the response plots, read against the design: a band kept in the view (or a link) is
 * clipped to what the axis can show at the current sample rate, and a band too narrow, empty or the whole
 * axis shows the whole axis.
 */
import type { DocumentView } from '../core/model/view.ts';

/** Lowest frequency of a log frequency axis, as a fraction of the sample rate (5e-4: three decades below Nyquist). */
export const LOG_AXIS_MIN_FRACTION = 5e-4;
/**
 * Narrowest frequency band shown, as a fraction of the Nyquist frequency: 1e-7 is 0.1 mHz on a 0–1 kHz axis,
 * far below the ±0.01 Hz a mains notch is inspected at, and far above where float64 angles lose digits.
 */
export const MIN_BAND_FRACTION = 1e-7;
/** Fewest samples the time plot shows. */
export const MIN_SAMPLE_SPAN = 4;

/** The whole frequency axis, Hz: [0, fs/2] linear, from LOG_AXIS_MIN_FRACTION·fs on a log axis. */
export function wholeBandHz(fs: number, axis: DocumentView['frequencyAxis']): [number, number] {
  return [axis === 'log' ? LOG_AXIS_MIN_FRACTION * fs : 0, fs / 2];
}

/** The band the frequency plots show (Hz), or null for the whole axis. */
export function shownBandHz(
  span: DocumentView['frequencySpan'],
  fs: number,
  axis: DocumentView['frequencyAxis'],
): [number, number] | null {
  if (!span) return null;
  const [w0, w1] = wholeBandHz(fs, axis);
  const lo = Math.max(w0, span[0]);
  const hi = Math.min(w1, span[1]);
  if (!(hi - lo >= MIN_BAND_FRACTION * w1 * (1 - 1e-9))) return null;
  if (lo <= w0 && hi >= w1) return null;
  return [lo, hi];
}

/**
 * A span clipped to [w0, w1] and widened to `min` about its middle if narrower; a span pushed past an end
 * keeps its width (a pan stops at the edge rather than shrinking). Null when it covers everything.
 */
function clampSpan(
  span: readonly [number, number],
  w0: number,
  w1: number,
  min: number,
): [number, number] | null {
  let [lo, hi] = span[0] <= span[1] ? span : [span[1], span[0]];
  if (hi - lo < min) [lo, hi] = [(lo + hi - min) / 2, (lo + hi + min) / 2];
  if (lo < w0) [lo, hi] = [w0, Math.min(w1, hi + (w0 - lo))];
  if (hi > w1) [lo, hi] = [Math.max(w0, lo - (hi - w1)), w1];
  return lo <= w0 && hi >= w1 ? null : [lo, hi];
}

/** A band (Hz) clipped to the axis and at least MIN_BAND_FRACTION of it wide. */
export function clampBandHz(
  band: readonly [number, number],
  fs: number,
  axis: DocumentView['frequencyAxis'],
): [number, number] | null {
  const [w0, w1] = wholeBandHz(fs, axis);
  return clampSpan(band, w0, w1, MIN_BAND_FRACTION * w1);
}

/** The samples the time plot shows (fractional indices), or null for all n. */
export function shownSamples(span: DocumentView['timeSpan'], n: number): [number, number] | null {
  if (!span) return null;
  const lo = Math.max(-0.5, span[0]);
  const hi = Math.min(n - 0.5, span[1]);
  if (!(hi - lo >= MIN_SAMPLE_SPAN * (1 - 1e-9))) return null;
  if (lo <= -0.5 && hi >= n - 0.5) return null;
  return [lo, hi];
}

/** A sample span clipped to [−0.5, n − 0.5] and at least MIN_SAMPLE_SPAN wide. */
export function clampSamples(span: readonly [number, number], n: number): [number, number] | null {
  return clampSpan(span, -0.5, n - 0.5, MIN_SAMPLE_SPAN);
}

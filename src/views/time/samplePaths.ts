/** Path strings for a sampled signal drawn as stems (with dots while they are far apart) or as a line. */
import { dotsPath, linePath, stemsPath } from '../chart/paths.ts';

/** Dots on stem tops only while samples are at least this many pixels apart (else they merge into a blot). */
export const DOTS_MIN_SPACING_PX = 6;

/** The line (or stems) path, and the dots path or '' for the samples at pixel (px[i], py[i]). */
export function samplePaths(
  px: Float64Array,
  py: Float64Array,
  baseline: number,
  rect: { top: number; bottom: number; left: number; right: number },
  style: 'stems' | 'line',
): { line: string; dots: string } {
  if (style === 'line')
    return { line: linePath(px, py, { top: rect.top, bottom: rect.bottom, thin: true }), dots: '' };
  const spacing = px.length > 1 ? (rect.right - rect.left) / px.length : Infinity;
  return {
    line: stemsPath(px, py, baseline, rect.top, rect.bottom, spacing < 1),
    dots: spacing >= DOTS_MIN_SPACING_PX ? dotsPath(px, py, 2, rect.top, rect.bottom) : '',
  };
}

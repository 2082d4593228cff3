/** Peak magnitude of a cascade's frequency response, on a dense grid with the pole angles added. */
import type { Section } from '../types.ts';
import { responseSections } from '../response/index.ts';
import { sectionsToZpk } from '../system/index.ts';

/**
 * Evenly spaced points on [0, π] used to find a response peak. Peaks of sharp resonances sit at (or within a
 * bandwidth of) their pole angles, which are added to the grid and refined locally, so 4096 points suffice
 * even for pole radii of 0.999.
 */
export const PEAK_GRID_POINTS = 4096;

/** Golden-section steps used to refine the best grid point; each shrinks the bracket by 0.618. */
export const PEAK_REFINE_STEPS = 40;

/** Every ω (radians per sample) the peak search starts from: an even grid plus the angles of all poles. */
function searchGrid(sections: readonly Section[]): Float64Array {
  const angles: number[] = [];
  for (let i = 0; i < PEAK_GRID_POINTS; i++) angles.push((Math.PI * i) / (PEAK_GRID_POINTS - 1));
  for (const p of sectionsToZpk(sections).poles) angles.push(Math.abs(Math.atan2(p.im, p.re)));
  angles.sort((a, b) => a - b);
  return Float64Array.from(angles);
}

const magAt = (sections: readonly Section[], w: number) =>
  responseSections(sections, Float64Array.of(w)).magnitude[0]!;

/** Largest |H(e^{iω})| of the cascade (linear) and the ω (radians per sample) where it occurs. */
export function peakMagnitude(sections: readonly Section[]): { peak: number; omega: number } {
  if (sections.length === 0) return { peak: 1, omega: 0 };
  const grid = searchGrid(sections);
  const mag = responseSections(sections, grid).magnitude;
  let best = 0;
  for (let i = 1; i < mag.length; i++) if (mag[i]! > mag[best]!) best = i;
  let lo = grid[Math.max(0, best - 1)]!;
  let hi = grid[Math.min(grid.length - 1, best + 1)]!;
  let peak = mag[best]!;
  let omega = grid[best]!;
  // Golden-section search (Kiefer 1953) on the bracket around the best grid point.
  const g = (Math.sqrt(5) - 1) / 2;
  let c = hi - g * (hi - lo);
  let d = lo + g * (hi - lo);
  let fc = magAt(sections, c);
  let fd = magAt(sections, d);
  for (let k = 0; k < PEAK_REFINE_STEPS && hi - lo > 1e-15; k++) {
    if (fc > fd) {
      [hi, d, fd] = [d, c, fc];
      c = hi - g * (hi - lo);
      fc = magAt(sections, c);
    } else {
      [lo, c, fc] = [c, d, fd];
      d = lo + g * (hi - lo);
      fd = magAt(sections, d);
    }
  }
  for (const [w, f] of [
    [c, fc],
    [d, fd],
  ] as const) {
    if (f > peak) [peak, omega] = [f, w];
  }
  return { peak, omega };
}

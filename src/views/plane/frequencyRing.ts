/** The ring of frequency ticks round the unit circle: round values in Hz from DC to Nyquist. */
import { ticks } from 'd3-array';
import { hzToOmega } from '../../core/units.ts';

export interface RingTick {
  hz: number;
  /** Angle on the upper half of the circle, radians (0 = DC, π = Nyquist). */
  angle: number;
}

/** Ticks nearer than this fraction of a step to Nyquist are dropped, so the Nyquist label has room. */
const NYQUIST_CLEARANCE = 0.45;

/**
 * About `count` round frequencies between 0 and fs/2 (Hz), always including 0 and fs/2 itself, with the
 * angle each sits at on the upper half of the unit circle.
 */
export function frequencyRingTicks(fs: number, count: number): RingTick[] {
  if (!(fs > 0)) return [];
  const nyquist = fs / 2;
  const values = ticks(0, nyquist, Math.max(2, Math.round(count)));
  const step = values.length > 1 ? values[1]! - values[0]! : nyquist;
  const kept = values.filter((hz) => nyquist - hz > NYQUIST_CLEARANCE * step);
  kept.push(nyquist);
  return kept.map((hz) => ({ hz, angle: hzToOmega(hz, fs) }));
}

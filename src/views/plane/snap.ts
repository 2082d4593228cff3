/**
 * Snapping of a dragged root: each mode constrains the position the pointer gives. Pure functions on
 * z coordinates; the store then keeps a real root real and a pair above the axis.
 */
import type { Complex } from '../../core/types.ts';
import { rootFrequencyHz } from '../../core/readouts.ts';
import type { SnapMode } from '../../store/view.ts';
import { hzToOmega } from '../../core/units.ts';

export interface SnapSettings {
  mode: SnapMode;
  /** Radius for the 'radius' mode, z units (≥ 0). */
  radius: number;
  /** Grid step for the 'frequency' mode, Hz (> 0). */
  frequencyHz: number;
  /** Design sample rate, Hz. */
  sampleRate: number;
}

/** z scaled to radius r (the angle kept); the origin goes to r on the positive real axis. */
export function snapToRadius(z: Complex, r: number): Complex {
  const m = Math.hypot(z.re, z.im);
  if (m === 0) return { re: r, im: 0 };
  return { re: (z.re / m) * r, im: (z.im / m) * r };
}

/** z with its angle moved to the nearest multiple of stepHz (or to fs/2) at sample rate fs, radius kept. */
export function snapToFrequencyGrid(z: Complex, stepHz: number, fs: number): Complex {
  const r = Math.hypot(z.re, z.im);
  if (!(stepHz > 0) || !(fs > 0) || r === 0) return z;
  const hz = rootFrequencyHz(z, fs);
  const nyquist = fs / 2;
  const onGrid = Math.min(nyquist, Math.round(hz / stepHz) * stepHz);
  const snapped = nyquist - hz < Math.abs(hz - onGrid) ? nyquist : onGrid;
  const w = hzToOmega(snapped, fs);
  return { re: r * Math.cos(w), im: Math.sign(z.im || 1) * r * Math.sin(w) };
}

/**
 * The snapped position for a pointer at z. A real root (`real`) is first put on the real axis; the circle
 * and radius modes then send it to ±radius, and the frequency grid leaves it alone (only 0 and fs/2 exist
 * on the axis).
 */
export function snapPoint(z: Complex, s: SnapSettings, real = false): Complex {
  const p = real ? { re: z.re, im: 0 } : z;
  switch (s.mode) {
    case 'none':
      return p;
    case 'real-axis':
      return { re: p.re, im: 0 };
    case 'circle':
      return snapToRadius(p, 1);
    case 'radius':
      return snapToRadius(p, Math.max(0, s.radius));
    case 'frequency':
      return real ? p : snapToFrequencyGrid(p, s.frequencyHz, s.sampleRate);
  }
}

/**
 * Peaking and shelving equaliser biquads from Robert Bristow-Johnson's "Cookbook formulae for audio EQ biquad
 * filter coefficients" (the audio EQ cookbook, widely published), with A = 10^(gain/40), ω0 = 2π·f0/fs and
 * α from Q, from a bandwidth in octaves, or from a shelf slope S.
 */
import type { Zpk } from '../types.ts';
import { biquadToZpk } from './biquad.ts';
import { hzToOmega } from '../units.ts';
import type { Hertz } from '../units.ts';

/** How the width of an equaliser section is given. */
export type EqWidth = { q: number } | { bandwidthOctaves: number } | { slope: number };

/** The cookbook's α = sin ω0 / (2Q), or its octave-bandwidth or shelf-slope forms. */
function alphaOf(width: EqWidth, w0: number, a: number): number {
  const s = Math.sin(w0);
  if ('q' in width) return s / (2 * width.q);
  if ('bandwidthOctaves' in width) return s * Math.sinh(((Math.LN2 / 2) * width.bandwidthOctaves * w0) / s);
  return (s / 2) * Math.sqrt((a + 1 / a) * (1 / width.slope - 1) + 2);
}

/** Peaking section: gain gainDb at f0 Hz, 0 dB far from it; width as Q or octaves. */
export function designPeakingEq(f0: Hertz, gainDb: number, width: EqWidth, fs: Hertz): Zpk {
  const a = 10 ** (gainDb / 40);
  const w0 = hzToOmega(f0, fs);
  const alpha = alphaOf(width, w0, a);
  const c = -2 * Math.cos(w0);
  return biquadToZpk([1 + alpha * a, c, 1 - alpha * a], [1 + alpha / a, c, 1 - alpha / a]);
}

/** Low shelf (lowShelf = true) or high shelf: gainDb below (above) f0 Hz, half of it in dB at f0. */
export function designShelf(lowShelf: boolean, f0: Hertz, gainDb: number, width: EqWidth, fs: Hertz): Zpk {
  const a = 10 ** (gainDb / 40);
  const w0 = hzToOmega(f0, fs);
  const cos = Math.cos(w0);
  const t = 2 * Math.sqrt(a) * alphaOf(width, w0, a);
  // The high shelf is the low shelf with cos ω0 → −cos ω0 and z⁻¹ → −z⁻¹ (odd coefficients negated).
  const sg = lowShelf ? 1 : -1;
  const c = sg * cos;
  const b: [number, number, number] = [
    a * (a + 1 - (a - 1) * c + t),
    sg * 2 * a * (a - 1 - (a + 1) * c),
    a * (a + 1 - (a - 1) * c - t),
  ];
  const den: [number, number, number] = [
    a + 1 + (a - 1) * c + t,
    sg * -2 * (a - 1 + (a + 1) * c),
    a + 1 + (a - 1) * c - t,
  ];
  return biquadToZpk(b, den);
}

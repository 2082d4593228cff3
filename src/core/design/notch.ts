/**
 * Second-order notch and resonator (peak) at f0 with a −3 dB bandwidth B: zeros on the unit circle at ±ω0
 * (notch) or at z = ±1 (peak), poles at the same angle inside the circle. Both are the bilinear transforms of
 * the analog second-order notch/band-pass, so the −3 dB points lie exactly B apart:
 *   β = tan(πB/fs), g = 1/(1 + β),
 *   notch  H(z) = g·(1 − 2cos ω0 z⁻¹ + z⁻²) / (1 − 2g·cos ω0 z⁻¹ + (2g − 1) z⁻²)
 *   peak   H(z) = (1 − g)·(1 − z⁻²)        / (same denominator)
 * (Mitra, Digital Signal Processing: A Computer-Based Approach, second-order notch and band-pass sections,
 * from memory; matches scipy.signal.iirnotch / iirpeak with Q = f0/B).
 */
import type { Zpk } from '../types.ts';
import { quadraticRoots } from '../system/index.ts';
import { root } from './prototype.ts';
import { prewarp } from './bilinear.ts';
import { hzToOmega } from '../units.ts';
import type { Hertz } from '../units.ts';

/** Shared denominator roots and the gain g for centre f0 and −3 dB width B, both in Hz at sample rate fs. */
function resonance(f0: Hertz, bandwidthHz: Hertz, fs: Hertz) {
  const w0 = hzToOmega(f0, fs);
  const g = 1 / (1 + prewarp(bandwidthHz, fs));
  return { w0, g, poles: quadraticRoots(1, -2 * g * Math.cos(w0), 2 * g - 1) };
}

/** Notch at f0 Hz with −3 dB width bandwidthHz (Q = f0/bandwidth), unit gain at DC and Nyquist. */
export function designNotch(f0: Hertz, bandwidthHz: Hertz, fs: Hertz): Zpk {
  const { w0, g, poles } = resonance(f0, bandwidthHz, fs);
  return { zeros: [root(Math.cos(w0), Math.sin(w0))], poles, gain: g };
}

/** Resonator (peak) at f0 Hz with −3 dB width bandwidthHz, unit gain at f0 and zeros at DC and Nyquist. */
export function designPeak(f0: Hertz, bandwidthHz: Hertz, fs: Hertz): Zpk {
  const { g, poles } = resonance(f0, bandwidthHz, fs);
  return { zeros: [root(1), root(-1)], poles, gain: 1 - g };
}

/**
 * DC blocker: zero at z = 1, pole at R = (1 − tan(π·fc/fs))/(1 + tan(π·fc/fs)), gain (1 + R)/2. This is the
 * bilinear transform of the first-order analog high-pass s/(s + ωc) prewarped to fc, so the response is −3 dB
 * exactly at fc and 0 dB at Nyquist.
 */
export function designDcBlocker(cutoffHz: Hertz, fs: Hertz): Zpk {
  const t = prewarp(cutoffHz, fs);
  const r = (1 - t) / (1 + t);
  return { zeros: [root(1)], poles: [root(r)], gain: (1 + r) / 2 };
}

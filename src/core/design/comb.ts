/** Notches (or peaks) at several harmonics of a fundamental: a cascade of notches, or the N-th-order comb. */
import type { Root, Zpk } from '../types.ts';
import { designNotch } from './notch.ts';
import { root } from './prototype.ts';
import { prewarp } from './bilinear.ts';
import type { Hertz } from '../units.ts';

/** Cascade of second-order notches at h·f0 for each harmonic number h, each with −3 dB width bandwidthHz(h). */
export function designHarmonicNotches(
  f0: number,
  harmonics: readonly number[],
  bandwidthHz: (harmonic: number) => number,
  fs: number,
): Zpk {
  const zeros: Root[] = [];
  const poles: Root[] = [];
  let gain = 1;
  for (const h of harmonics) {
    const n = designNotch(h * f0, bandwidthHz(h), fs);
    zeros.push(...n.zeros);
    poles.push(...n.poles);
    gain *= n.gain;
  }
  return { zeros, poles, gain };
}

/** The roots z with z^n = c for real c (stored form): radius |c|^(1/n), angles 2πk/n (c > 0) or (2k+1)π/n (c < 0). */
function rootsOfPower(n: number, c: number): Root[] {
  const r = Math.abs(c) ** (1 / n);
  const offset = c < 0 ? 1 : 0;
  const out: Root[] = [];
  for (let j = offset; j <= n; j += 2) {
    const theta = (Math.PI * j) / n;
    if (j === 0) out.push(root(r));
    else if (j === n) out.push(root(-r));
    else out.push(root(r * Math.cos(theta), r * Math.sin(theta)));
  }
  return out;
}

/**
 * Comb of order N = fs/f0 (an integer): H(z) = b·(1 ∓ z⁻ᴺ)/(1 − a·z⁻ᴺ) with β = tan(N·πB/(2fs)),
 * a = (1 − β)/(1 + β), so every tooth has −3 dB width B Hz. 'notch' puts zeros at every multiple of f0
 * including DC (b = 1/(1 + β)); 'peak' puts unit-gain peaks at every multiple of f0 including DC and zeros
 * half-way between (b = β/(1 + β)). This is the second-order notch/peak with z replaced by z^N; it matches
 * scipy.signal.iircomb with pass_zero=False for 'notch' and pass_zero=True for 'peak'.
 */
export function designComb(f0: Hertz, bandwidthHz: Hertz, type: 'notch' | 'peak', fs: Hertz): Zpk {
  const n = Math.round(fs / f0);
  const beta = prewarp((n * bandwidthHz) / 2, fs);
  const a = (1 - beta) / (1 + beta);
  return {
    zeros: rootsOfPower(n, type === 'notch' ? 1 : -1),
    poles: rootsOfPower(n, a),
    gain: (type === 'notch' ? 1 : beta) / (1 + beta),
  };
}

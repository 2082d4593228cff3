/**
 * A conjugate pair's radius in the figures engineers set it by.
 *
 * Width and Q of a pole pair: the second-order notch and resonator of design/notch.ts (the bilinear
 * transforms of the analog second-order notch and band-pass, as scipy.signal.iirnotch/iirpeak) have their
 * poles at radius r with r² = 2g − 1 = (1 − β)/(1 + β), β = tan(πB/fs), for a −3 dB width of exactly B Hz.
 * Inverted: B = (fs/π)·atan((1 − r²)/(1 + r²)), which for r near 1 is the familiar (1 − r)·fs/π. Q = f0/B.
 *
 * Depth of a notch: a zero pair at radius ρ and a pole pair at radius r, both at angle ω0, give at ω0
 *   |H(ω0)| = (1 − ρ)·|1 − ρ·e^{−2jω0}| / ((1 − r)·|1 − r·e^{−2jω0}|)
 * (the two factors of each pair evaluated at e^{jω0}), a ratio that tends to 1 away from ω0; the zeros on
 * the circle (ρ = 1) give an exact zero, and for ρ, r near 1 it is close to (1 − ρ)/(1 − r).
 */
import { hzToOmega, omegaToHz, type Hertz, type RadPerSample } from './units.ts';

/** Widest −3 dB width a pole pair can have in this form: fs/4 (β = 1, the poles meet at the origin). */
export const maxPairWidthHz = (fs: Hertz): Hertz => fs / 4;

/** Pole radius for a −3 dB width of widthHz at sample rate fs (Hz); null outside (0, fs/4]. */
export function poleRadiusForWidth(widthHz: Hertz, fs: Hertz): number | null {
  if (!(widthHz > 0 && widthHz <= maxPairWidthHz(fs))) return null;
  const beta = Math.tan(hzToOmega(widthHz, fs) / 2);
  // (1 − β)/(1 + β) written so that a tiny width keeps its digits (1 − β loses none; β ≤ 1 here).
  return Math.sqrt(Math.max(0, (1 - beta) / (1 + beta)));
}

/** −3 dB width (Hz) of the second-order section whose poles sit at radius r; null unless 0 ≤ r < 1. */
export function widthForPoleRadius(r: number, fs: Hertz): Hertz | null {
  if (!(r >= 0 && r < 1)) return null;
  // 1 − r² as (1 − r)(1 + r): no cancellation for r near 1.
  const beta = ((1 - r) * (1 + r)) / (1 + r * r);
  return omegaToHz(2 * Math.atan(beta), fs);
}

/** |H(ω0)| (linear) of a zero pair at radius rho over a pole pair at radius r, both at angle w0. */
export function notchDepth(rho: number, r: number, w0: RadPerSample): number {
  const pairAt = (radius: number) =>
    Math.abs(1 - radius) * Math.hypot(1 - radius * Math.cos(2 * w0), radius * Math.sin(2 * w0));
  return pairAt(rho) / pairAt(r);
}

/**
 * Zero radius ρ in [r, 1] that gives the notch depth `depth` (linear, 0 ≤ depth ≤ 1; 0 puts the zeros on
 * the circle) with the pole pair at radius r < 1, both at angle w0; null when depth is outside [0, 1].
 * Bisection: the depth is 1 at ρ = r and 0 at ρ = 1, so a root lies between.
 */
export function zeroRadiusForDepth(depth: number, r: number, w0: RadPerSample): number | null {
  if (!(depth >= 0 && depth <= 1) || !(r >= 0 && r < 1)) return null;
  if (depth === 0) return 1;
  let lo = r;
  let hi = 1;
  for (let i = 0; i < 200 && hi - lo > 4 * Number.EPSILON; i++) {
    const mid = (lo + hi) / 2;
    if (notchDepth(mid, r, w0) > depth) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

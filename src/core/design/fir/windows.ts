/**
 * Symmetric windows for the window method of FIR design (Hann, Hamming, Blackman, Kaiser), Kaiser's β from a
 * stop-band attenuation and Kaiser's length estimate. The windows are the symmetric ("filter design") forms:
 * w[0] = w[N−1], the peak at the middle.
 */

/** The windows the window method offers. */
export type FirWindow = 'hann' | 'hamming' | 'blackman' | 'kaiser';

/** Modified Bessel function of the first kind, order 0, by its power series (converges for every x). */
export function besselI0(x: number): number {
  const q = (x * x) / 4;
  let term = 1;
  let sum = 1;
  for (let k = 1; k < 500; k++) {
    term *= q / (k * k);
    sum += term;
    if (term < sum * 1e-17) break;
  }
  return sum;
}

/** A sum of cosines a0 − a1·cos(2πn/(N−1)) + a2·cos(4πn/(N−1)) over n = 0..N−1. */
function cosineSum(n: number, a: readonly number[]): Float64Array {
  const w = new Float64Array(n);
  if (n === 1) {
    w[0] = 1;
    return w;
  }
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / (n - 1);
    let v = 0;
    for (let k = 0; k < a.length; k++) v += (k % 2 === 0 ? 1 : -1) * a[k]! * Math.cos(k * t);
    w[i] = v;
  }
  return w;
}

/** Kaiser window of n points with shape β: I0(β·√(1 − (2i/(n−1) − 1)²)) / I0(β). */
export function kaiserWindow(n: number, beta: number): Float64Array {
  const w = new Float64Array(n);
  if (n === 1) {
    w[0] = 1;
    return w;
  }
  const i0b = besselI0(beta);
  for (let i = 0; i < n; i++) {
    const r = (2 * i) / (n - 1) - 1;
    w[i] = besselI0(beta * Math.sqrt(Math.max(0, 1 - r * r))) / i0b;
  }
  return w;
}

/** The symmetric window of n points (β is used by Kaiser only). */
export function firWindow(kind: FirWindow, n: number, beta = 0): Float64Array {
  switch (kind) {
    case 'hann':
      return cosineSum(n, [0.5, 0.5]);
    case 'hamming':
      return cosineSum(n, [0.54, 0.46]);
    case 'blackman':
      return cosineSum(n, [0.42, 0.5, 0.08]);
    case 'kaiser':
      return kaiserWindow(n, beta);
  }
}

/**
 * Kaiser's β for a stop-band attenuation of a dB (Kaiser's empirical formula, from memory):
 * 0.1102(a − 8.7) above 50 dB, 0.5842(a − 21)^0.4 + 0.07886(a − 21) from 21 to 50 dB, 0 below.
 */
export function kaiserBeta(attenuationDb: number): number {
  const a = attenuationDb;
  if (a > 50) return 0.1102 * (a - 8.7);
  if (a > 21) return 0.5842 * (a - 21) ** 0.4 + 0.07886 * (a - 21);
  return 0;
}

/**
 * Kaiser's estimate of the taps a Kaiser-window design needs (from memory): N − 1 = (a − 7.95) / (2.285·Δω),
 * Δω the transition width in rad/sample; rounded up. Asks at least 8 dB (the formula's range).
 */
export function kaiserTaps(attenuationDb: number, transitionRadPerSample: number): number {
  return Math.ceil((attenuationDb - 7.95) / (2.285 * transitionRadPerSample) + 1);
}

/**
 * Stop-band attenuation (dB) a fixed window reaches in the window method, and its transition width as
 * taps × Δf (Δf in cycles per sample): Hann 44 dB and 3.1, Hamming 53 dB and 3.3, Blackman 74 dB and 5.5
 * (common practice). Kaiser has none: its β is chosen for the attenuation asked.
 */
export const WINDOW_FIGURES: Record<
  Exclude<FirWindow, 'kaiser'>,
  { attenuationDb: number; width: number }
> = {
  hann: { attenuationDb: 44, width: 3.1 },
  hamming: { attenuationDb: 53, width: 3.3 },
  blackman: { attenuationDb: 74, width: 5.5 },
};

/**
 * The window method: the ideal band shape's impulse response (a sum of sincs), centred on (taps − 1)/2,
 * times a symmetric window, scaled to exactly 1 at the centre of the first pass band (0 Hz for a low-pass
 * or band-stop, fs/2 for a high-pass, the band's middle for a band-pass).
 */
import type { BandShape } from '../iir.ts';
import { firWindow, type FirWindow } from './windows.ts';

const sinc = (x: number) => (x === 0 ? 1 : Math.sin(Math.PI * x) / (Math.PI * x));

/** The pass bands of a band shape as [lo, hi] in cycles per sample, from its cut-offs. */
export function passBands(shape: BandShape, cutoffs: readonly number[]): [number, number][] {
  const [c0, c1 = 0.5] = cutoffs as [number, number?];
  switch (shape) {
    case 'lowpass':
      return [[0, c0]];
    case 'highpass':
      return [[c0, 0.5]];
    case 'bandpass':
      return [[c0, c1]];
    case 'bandstop':
      return [
        [0, c0],
        [c1, 0.5],
      ];
  }
}

/**
 * Taps of a window-method design: `taps` coefficients, cut-offs in cycles per sample (0, 0.5), ideal gain 1
 * in the pass bands and 0 elsewhere. A high-pass or band-stop needs an odd number of taps (an even one puts
 * a zero at fs/2); the caller checks.
 */
export function windowMethodTaps(
  taps: number,
  shape: BandShape,
  cutoffs: readonly number[],
  window: FirWindow,
  beta = 0,
): Float64Array {
  const bands = passBands(shape, cutoffs);
  const centre = (taps - 1) / 2;
  const w = firWindow(window, taps, beta);
  const h = new Float64Array(taps);
  for (let n = 0; n < taps; n++) {
    const m = n - centre;
    let v = 0;
    // a band [lo, hi] in cycles per sample is 2·hi·sinc(2·hi·m) − 2·lo·sinc(2·lo·m)
    for (const [lo, hi] of bands) v += 2 * hi * sinc(2 * hi * m) - 2 * lo * sinc(2 * lo * m);
    h[n] = v * w[n]!;
  }
  const [lo, hi] = bands[0]!;
  const f = lo === 0 ? 0 : hi === 0.5 ? 0.5 : (lo + hi) / 2;
  let s = 0;
  for (let n = 0; n < taps; n++) s += h[n]! * Math.cos(2 * Math.PI * (n - centre) * f);
  for (let n = 0; n < taps; n++) h[n] = h[n]! / s;
  return h;
}

/**
 * Spectral windows and their figures of merit. Windows are periodic ("DFT-even") by default, as
 * scipy.signal.get_window makes them for spectral analysis: the symmetric window of length n + 1 with its
 * last sample dropped. Each is a sum of cosines w[k] = Σ_j (−1)^j a_j cos(2πjk/L), L = n (periodic) or
 * n − 1 (symmetric).
 */

/** The windows the spectrum offers. */
export type WindowName = 'rectangular' | 'hann' | 'hamming' | 'blackman' | 'flattop';

/** Every window name, in menu order. */
export const WINDOW_NAMES: readonly WindowName[] = ['rectangular', 'hann', 'hamming', 'blackman', 'flattop'];

/** Cosine-sum coefficients a_j. Flat-top: the five terms scipy.signal.windows.flattop uses. */
const COSINE_TERMS: Record<WindowName, readonly number[]> = {
  rectangular: [1],
  hann: [0.5, 0.5],
  hamming: [0.54, 0.46],
  blackman: [0.42, 0.5, 0.08],
  flattop: [0.21557895, 0.41663158, 0.277263158, 0.083578947, 0.006947368],
};

/**
 * Published figures per window: coherent gain (mean of the window), equivalent noise bandwidth in bins and
 * scalloping loss in dB (the worst drop of a tone's peak reading, halfway between bins). From F. J. Harris,
 * "On the use of windows for harmonic analysis with the discrete Fourier transform", Proc. IEEE 66(1), 1978,
 * Table I, from memory. Harris has no entry for this flat-top window: its row is null, and the figures
 * windowFigures computes from the samples stand in (scalloping under 0.01 dB, ENBW about 3.77 bins).
 */
export const PUBLISHED_WINDOW_FIGURES: Record<
  WindowName,
  { coherentGain: number; enbwBins: number; scallopingLossDb: number } | null
> = {
  rectangular: { coherentGain: 1, enbwBins: 1, scallopingLossDb: 3.92 },
  hann: { coherentGain: 0.5, enbwBins: 1.5, scallopingLossDb: 1.42 },
  hamming: { coherentGain: 0.54, enbwBins: 1.36, scallopingLossDb: 1.78 },
  blackman: { coherentGain: 0.42, enbwBins: 1.73, scallopingLossDb: 1.1 },
  flattop: null,
};

/** Reads a window name as typed (case-insensitive; "rect"/"boxcar" and "hanning" accepted); null if unknown. */
export function parseWindowName(text: string): WindowName | null {
  const t = text.trim().toLowerCase().replace(/[-_ ]/g, '');
  if (t === 'rect' || t === 'boxcar' || t === 'none') return 'rectangular';
  if (t === 'hanning') return 'hann';
  return (WINDOW_NAMES as readonly string[]).includes(t) ? (t as WindowName) : null;
}

/** The window's n samples; periodic unless `symmetric`. */
export function makeWindow(name: WindowName, n: number, symmetric = false): Float64Array {
  const w = new Float64Array(n);
  if (n === 1) {
    w[0] = 1;
    return w;
  }
  const terms = COSINE_TERMS[name];
  const period = symmetric ? n - 1 : n;
  for (let k = 0; k < n; k++) {
    let v = 0;
    for (let j = 0; j < terms.length; j++) {
      v += (j % 2 === 0 ? 1 : -1) * terms[j]! * Math.cos((2 * Math.PI * j * k) / period);
    }
    w[k] = v;
  }
  return w;
}

/** Figures of merit computed from a window's samples. */
export interface WindowFigures {
  /** Σw / n: the factor by which a bin-centred tone's peak reading is scaled. */
  coherentGain: number;
  /** n·Σw² / (Σw)²: the width, in bins, of the rectangle that passes the same white-noise power. */
  enbwBins: number;
  /** −20·log10(|Σ w[k]·e^{−iπk/n}| / Σw): the drop of a tone's reading halfway between bins, in dB. */
  scallopingLossDb: number;
}

/** Coherent gain, ENBW and scalloping loss of the given window samples. */
export function windowFigures(w: ArrayLike<number>): WindowFigures {
  const n = w.length;
  let sum = 0;
  let sumSq = 0;
  let halfRe = 0;
  let halfIm = 0;
  for (let k = 0; k < n; k++) {
    const v = w[k]!;
    sum += v;
    sumSq += v * v;
    halfRe += v * Math.cos((Math.PI * k) / n);
    halfIm -= v * Math.sin((Math.PI * k) / n);
  }
  return {
    coherentGain: sum / n,
    enbwBins: (n * sumSq) / (sum * sum),
    scallopingLossDb: -20 * Math.log10(Math.hypot(halfRe, halfIm) / Math.abs(sum)),
  };
}

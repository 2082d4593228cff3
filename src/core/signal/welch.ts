/**
 * Averaged, windowed power spectrum by Welch's method (P. D. Welch, IEEE Trans. Audio Electroacoust. 15(2),
 * 1967), one-sided, with the segment, overlap, window, detrending and both scalings of
 * scipy.signal.welch: 'density' in units²/Hz (scale 1/(fs·Σw²)) and 'spectrum' in units² (scale 1/(Σw)²,
 * so a sinusoid of amplitude A centred on a bin reads A²/2). The accumulator takes the signal in pieces of
 * any size and gives the same numbers as one call on the whole signal.
 */
import { RealPowerTransform, nextPowerOfTwo } from './fft.ts';
import { makeWindow, windowFigures, type WindowName } from './windows.ts';

/** 'density': power spectral density in units²/Hz; 'spectrum': power per bin in units² (sinusoid → A²/2). */
export type SpectrumScaling = 'density' | 'spectrum';

/** Options as scipy.signal.welch names them; defaults are scipy's. */
export interface WelchOptions {
  /** Samples per segment (default 256). */
  nperseg?: number;
  /** Samples shared by consecutive segments (default floor(nperseg / 2)). */
  noverlap?: number;
  /** Transform length, at least nperseg; zero-pads each segment (default nperseg). Any length works. */
  nfft?: number;
  /** Window (default 'hann', periodic). */
  window?: WindowName;
  /** Default 'density'. */
  scaling?: SpectrumScaling;
  /** Subtract each segment's mean ('constant', the default) or not ('none'). */
  detrend?: 'constant' | 'none';
}

/** A one-sided averaged spectrum. */
export interface WelchResult {
  /** Bin frequencies in Hz, 0 to fs/2. */
  frequencies: Float64Array;
  /** Power per bin in units²/Hz ('density') or units² ('spectrum'). */
  power: Float64Array;
  scaling: SpectrumScaling;
  sampleRate: number;
  window: WindowName;
  nperseg: number;
  noverlap: number;
  nfft: number;
  /** Segments averaged (0 when the signal was shorter than one segment). */
  segments: number;
  /** fs / nfft, in Hz. */
  binWidthHz: number;
  /** Equivalent noise bandwidth of the window, in Hz. */
  enbwHz: number;
}

/** Settled options, with everything checked. */
function settle(sampleRate: number, o: WelchOptions): Required<WelchOptions> {
  const nperseg = o.nperseg ?? 256;
  if (!(Number.isInteger(nperseg) && nperseg >= 1))
    throw new Error(`welch: nperseg ${nperseg}; a whole number ≥ 1`);
  const noverlap = o.noverlap ?? Math.floor(nperseg / 2);
  if (!(Number.isInteger(noverlap) && noverlap >= 0 && noverlap < nperseg)) {
    throw new Error(`welch: noverlap ${noverlap}; a whole number from 0 to nperseg − 1 = ${nperseg - 1}`);
  }
  const nfft = o.nfft ?? nperseg;
  if (!(Number.isInteger(nfft) && nfft >= nperseg)) throw new Error(`welch: nfft ${nfft}; at least nperseg`);
  if (!(sampleRate > 0)) throw new Error(`welch: sample rate ${sampleRate} Hz; it must be positive`);
  return {
    nperseg,
    noverlap,
    nfft,
    window: o.window ?? 'hann',
    scaling: o.scaling ?? 'density',
    detrend: o.detrend ?? 'constant',
  };
}

/** Welch's average fed piece by piece: push the signal in any split, then read the result. */
export class WelchAccumulator {
  private readonly o: Required<WelchOptions>;
  private readonly sampleRate: number;
  private readonly win: Float64Array;
  private readonly segment: Float64Array;
  private readonly transform: RealPowerTransform;
  private readonly sum: Float64Array;
  private fill = 0;
  private segments = 0;

  constructor(sampleRate: number, options: WelchOptions = {}) {
    this.o = settle(sampleRate, options);
    this.sampleRate = sampleRate;
    this.win = makeWindow(this.o.window, this.o.nperseg);
    this.segment = new Float64Array(this.o.nperseg);
    this.transform = new RealPowerTransform(this.o.nfft);
    this.sum = new Float64Array((this.o.nfft >> 1) + 1);
  }

  /** Adds samples; every completed segment is transformed at once, so memory stays one segment. */
  push(x: ArrayLike<number>): void {
    const { nperseg, noverlap } = this.o;
    const seg = this.segment;
    let i = 0;
    // Whole segments inside x are read where they are (no copy); only a partial one is kept between pushes.
    if (this.fill === 0) {
      const step = nperseg - noverlap;
      for (; i + nperseg <= x.length; i += step) this.addSegment(x, i);
    }
    while (i < x.length) {
      const take = Math.min(nperseg - this.fill, x.length - i);
      for (let k = 0; k < take; k++) seg[this.fill + k] = x[i + k]!;
      this.fill += take;
      i += take;
      if (this.fill === nperseg) {
        this.addSegment(seg, 0);
        seg.copyWithin(0, nperseg - noverlap, nperseg);
        this.fill = noverlap;
      }
    }
  }

  /** Transforms the segment x[start .. start + nperseg) and adds its power. */
  private addSegment(x: ArrayLike<number>, start: number): void {
    const { nperseg, detrend } = this.o;
    let mean = 0;
    if (detrend === 'constant') {
      // Four running sums: one sum waits for each addition to finish before the next (about four times
      // slower on long segments); the order of the additions changes the mean only by rounding.
      let s0 = 0;
      let s1 = 0;
      let s2 = 0;
      let s3 = 0;
      let k = 0;
      for (; k + 4 <= nperseg; k += 4) {
        s0 += x[start + k]!;
        s1 += x[start + k + 1]!;
        s2 += x[start + k + 2]!;
        s3 += x[start + k + 3]!;
      }
      for (; k < nperseg; k++) s0 += x[start + k]!;
      mean = (s0 + s1 + (s2 + s3)) / nperseg;
    }
    // The transform's input beyond nperseg (zero padding up to nfft) is never written, so stays zero.
    const work = this.transform.input;
    const win = this.win;
    for (let k = 0; k < nperseg; k++) work[k] = (x[start + k]! - mean) * win[k]!;
    this.transform.addPower(this.sum);
    this.segments++;
  }

  /** The averaged one-sided spectrum of everything pushed so far (zeros when no segment is complete). */
  result(): WelchResult {
    const { nfft, nperseg, noverlap, window, scaling } = this.o;
    const fs = this.sampleRate;
    this.transform.flush(this.sum);
    let sw = 0;
    let sw2 = 0;
    for (let k = 0; k < nperseg; k++) {
      sw += this.win[k]!;
      sw2 += this.win[k]! ** 2;
    }
    const scale = scaling === 'density' ? 1 / (fs * sw2) : 1 / (sw * sw);
    const bins = this.sum.length;
    const power = new Float64Array(bins);
    const frequencies = new Float64Array(bins);
    // One-sided: every bin but DC (and Nyquist, when nfft is even) folds in its negative-frequency twin.
    const lastDoubled = nfft % 2 === 0 ? bins - 2 : bins - 1;
    for (let k = 0; k < bins; k++) {
      const fold = k >= 1 && k <= lastDoubled ? 2 : 1;
      power[k] = this.segments ? (fold * scale * this.sum[k]!) / this.segments : 0;
      frequencies[k] = (k * fs) / nfft;
    }
    const binWidthHz = fs / nfft;
    return {
      frequencies,
      power,
      scaling,
      sampleRate: fs,
      window,
      nperseg,
      noverlap,
      nfft,
      segments: this.segments,
      binWidthHz,
      enbwHz: (windowFigures(this.win).enbwBins * fs) / nperseg,
    };
  }
}

/** The options welch uses for a signal of n samples: as scipy does, one segment of its own length if shorter. */
export function welchOptionsFor(n: number, options: WelchOptions = {}): WelchOptions {
  const nperseg = options.nperseg ?? 256;
  if (n >= nperseg || n === 0) return options;
  const noverlap = Math.min(options.noverlap ?? Math.floor(n / 2), n - 1);
  return { ...options, nperseg: n, noverlap, nfft: Math.max(options.nfft ?? n, n) };
}

/**
 * Welch's averaged spectrum of x at sample rate fs (Hz). As scipy does, a signal shorter than nperseg is
 * taken as one segment of its own length.
 */
export function welch(x: ArrayLike<number>, sampleRate: number, options: WelchOptions = {}): WelchResult {
  const acc = new WelchAccumulator(sampleRate, welchOptionsFor(x.length, options));
  acc.push(x);
  return acc.result();
}

/** 10·log10 of a power, floored at floorDb (default −300 dB) so zeros stay finite on a plot. */
export function powerToDb(power: Float64Array, floorDb = -300): Float64Array {
  const out = new Float64Array(power.length);
  for (let k = 0; k < power.length; k++)
    out[k] = power[k]! > 0 ? Math.max(floorDb, 10 * Math.log10(power[k]!)) : floorDb;
  return out;
}

/** Bin width the automatic segment length aims for, Hz: fine enough to separate a drifting hum's harmonics. */
export const AUTO_BIN_HZ = 1;
/** The automatic segment keeps at least this many segments in the average, when the signal allows. */
export const AUTO_MIN_SEGMENTS = 4;
/** Shortest automatic segment, samples. */
export const AUTO_MIN_SEGMENT = 256;

/**
 * The automatic Welch segment for n samples at fs (Hz): a power of two near fs / AUTO_BIN_HZ, halved while
 * that leaves fewer than AUTO_MIN_SEGMENTS segments (down to AUTO_MIN_SEGMENT).
 */
export function autoSegmentLength(sampleRate: number, n: number): number {
  let seg = nextPowerOfTwo(Math.ceil(sampleRate / AUTO_BIN_HZ));
  while (seg > AUTO_MIN_SEGMENT && seg * AUTO_MIN_SEGMENTS > n) seg /= 2;
  return seg;
}

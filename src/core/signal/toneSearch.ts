/**
 * Where exactly a tone sits near an expected frequency: mains hum drifts by a fraction of a hertz, and over a
 * long record a fit at the nominal frequency would average a drifting tone away. The record is demodulated at
 * the expected frequency f (x[n]·e^{−iωn}) and summed in blocks of L samples, which keeps everything within a
 * few search widths of f at a rate fs/L; the periodogram of those block sums, zero-padded four times, is the
 * whole record's periodogram near f (a tone at f + δ turns each block sum by e^{i2πδL/fs}), and its peak within
 * ±width, refined by a parabola through the three highest points, is the tone's frequency.
 */
import { dropLargePlans, fftInterleaved, nextPowerOfTwo } from './fft.ts';
import { hzToOmega } from '../units.ts';

/** Samples between exact re-evaluations of the demodulating phasor. */
const RESYNC = 1024;
/** Blocks are short enough that the search band spans at most this fraction of the decimated band. */
const BAND_FRACTION = 1 / 8;

interface Search {
  omega: number;
  widthHz: number;
  block: number;
  re: number[];
  im: number[];
  /** Running sum of the current block. */
  accRe: number;
  accIm: number;
  fill: number;
}

/** Looks for the strongest component within ±width of each expected frequency, fed in blocks. */
export class ToneSearchAccumulator {
  private readonly searches: (Search | null)[];
  private n = 0;

  /**
   * `frequenciesHz` and the half-widths of the search around each (Hz; 0, or a frequency at 0 or fs/2, is
   * not searched). The whole record is pushed, in order, in pieces of any size.
   */
  constructor(
    readonly sampleRate: number,
    readonly frequenciesHz: readonly number[],
    widthsHz: readonly number[],
  ) {
    this.searches = frequenciesHz.map((f, k) => {
      const width = widthsHz[k] ?? 0;
      if (!(width > 0 && f > 0 && f < sampleRate / 2)) return null;
      return {
        omega: hzToOmega(f, sampleRate),
        widthHz: width,
        block: Math.max(1, Math.floor((BAND_FRACTION * sampleRate) / width)),
        re: [],
        im: [],
        accRe: 0,
        accIm: 0,
        fill: 0,
      };
    });
  }

  /** Adds the next samples. */
  push(x: ArrayLike<number>): void {
    const n0 = this.n;
    for (const s of this.searches) {
      if (!s) continue;
      const cr = Math.cos(s.omega);
      const sr = Math.sin(s.omega);
      let c = 0;
      let sn = 0;
      let { accRe, accIm, fill } = s;
      for (let i = 0; i < x.length; i++) {
        if (i % RESYNC === 0) {
          c = Math.cos(s.omega * (n0 + i));
          sn = Math.sin(s.omega * (n0 + i));
        }
        const v = x[i]!;
        accRe += v * c;
        accIm -= v * sn;
        if (++fill === s.block) {
          s.re.push(accRe);
          s.im.push(accIm);
          accRe = 0;
          accIm = 0;
          fill = 0;
        }
        const t = c * cr - sn * sr;
        sn = sn * cr + c * sr;
        c = t;
      }
      Object.assign(s, { accRe, accIm, fill });
    }
    this.n += x.length;
  }

  /** The frequency found near each expected one (the expected one itself where nothing was searched). */
  result(): number[] {
    return this.searches.map((s, k) => {
      if (!s) return this.frequenciesHz[k]!;
      const f = this.peak(s);
      // The zero-padded transforms of a long record are millions of points: not worth keeping for the next.
      dropLargePlans();
      return f;
    });
  }

  private peak(s: Search): number {
    const f0 = this.frequenciesHz[this.searches.indexOf(s)]!;
    const blocks = s.re.length + (s.fill > 0 ? 1 : 0);
    if (blocks < 2) return f0;
    const size = nextPowerOfTwo(4 * blocks);
    // Interleaved, transformed without copies (an hour-long record needs millions of points here).
    const z = new Float64Array(2 * size);
    for (let j = 0; j < s.re.length; j++) {
      z[2 * j] = s.re[j]!;
      z[2 * j + 1] = s.im[j]!;
    }
    if (s.fill > 0) {
      z[2 * s.re.length] = s.accRe;
      z[2 * s.re.length + 1] = s.accIm;
    }
    // X[j] = Σ Z_s e^{−2πijs/P}: a tone at f + δ turns Z_s by e^{i2πδsL/fs}, so it peaks at j/P = δL/fs.
    const X = fftInterleaved(z);
    const hzPerBin = this.sampleRate / (s.block * size);
    const reach = Math.min(size / 2 - 1, Math.floor(s.widthHz / hzPerBin));
    const mag = (j: number) => Math.hypot(X[2 * ((j + size) % size)]!, X[2 * ((j + size) % size) + 1]!);
    let best = 0;
    for (let j = -reach; j <= reach; j++) if (mag(j) > mag(best)) best = j;
    let offset = 0;
    if (Math.abs(best) < reach) {
      const [a, b, c] = [mag(best - 1), mag(best), mag(best + 1)];
      const den = a - 2 * b + c;
      if (den < 0) offset = Math.max(-0.5, Math.min(0.5, (0.5 * (a - c)) / den));
    }
    const delta = (best + offset) * hzPerBin;
    return Math.min(this.sampleRate / 2, Math.max(0, f0 + delta));
  }
}

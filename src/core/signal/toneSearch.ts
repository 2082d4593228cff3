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
  /** The finished block sums (the first `count`), grown by doubling unless the length was given. */
  re: Float64Array;
  im: Float64Array;
  count: number;
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
    /** The record's length when known: the block sums are then allocated once, at their size. */
    expectedLength?: number,
  ) {
    this.searches = frequenciesHz.map((f, k) => {
      const width = widthsHz[k] ?? 0;
      if (!(width > 0 && f > 0 && f < sampleRate / 2)) return null;
      const block = Math.max(1, Math.floor((BAND_FRACTION * sampleRate) / width));
      const capacity = expectedLength ? Math.max(1, Math.floor(expectedLength / block)) : 1024;
      return {
        omega: hzToOmega(f, sampleRate),
        widthHz: width,
        block,
        re: new Float64Array(capacity),
        im: new Float64Array(capacity),
        count: 0,
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
          if (s.count === s.re.length) grow(s);
          s.re[s.count] = accRe;
          s.im[s.count++] = accIm;
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
    const blocks = s.count + (s.fill > 0 ? 1 : 0);
    if (blocks < 2) return f0;
    const size = nextPowerOfTwo(4 * blocks);
    const hzPerBin = this.sampleRate / (s.block * size);
    const reach = Math.min(size / 2 - 1, Math.floor(s.widthHz / hzPerBin));
    const mags = paddedMagnitudes(
      blocks,
      (k) => (k < s.count ? s.re[k]! : s.accRe),
      (k) => (k < s.count ? s.im[k]! : s.accIm),
      size,
      reach,
    );
    const mag = (j: number) => mags[j + reach]!;
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

/** Doubles the room for block sums. */
function grow(s: Search): void {
  const re = new Float64Array(2 * s.re.length);
  const im = new Float64Array(2 * s.im.length);
  re.set(s.re);
  im.set(s.im);
  s.re = re;
  s.im = im;
}

/** Longest transform the tone search makes (larger padded lengths are folded into several of these). */
export const TONE_SEARCH_PART = 1 << 18;
/** Steps between exact re-evaluations of the folding's rotating phasor. */
const FOLD_RESYNC = 256;

/**
 * |X[j]| for −reach ≤ j ≤ reach (at index j + reach), X the `size`-point DFT of the `count` block sums Z_s
 * zero-padded (X[j] = Σ Z_s e^{−2πijs/size}: a tone at f + δ turns Z_s by e^{i2πδsL/fs}, so it peaks at
 * j/size = δL/fs). Computed as R = size/P transforms of P ≤ `part` points, one after the other in one
 * buffer: X[Rm + r] = Σ_{t<P} y_t e^{−2πimt/P} with y_t = Σ_q Z_{t+qP} e^{−2πir(t+qP)/size} (the sums folded
 * modulo P). An hour-long record needs a padded length of millions of points here; one transform at that
 * length, with its plan's work buffers, took 256 MB for 4 M points, and these take 16 MB.
 */
export function paddedMagnitudes(
  count: number,
  re: (k: number) => number,
  im: (k: number) => number,
  size: number,
  reach: number,
  part = TONE_SEARCH_PART,
): Float64Array {
  if (!(Number.isInteger(size) && size >= 1 && count <= size && reach < size / 2 && part >= 1))
    throw new Error(`paddedMagnitudes: ${count} sums, size ${size}, reach ${reach}`);
  let p = size;
  while (p > part && p % 2 === 0) p /= 2;
  const parts = size / p;
  const mags = new Float64Array(2 * reach + 1);
  const z = new Float64Array(2 * p);
  for (let r = 0; r < parts; r++) {
    z.fill(0);
    // (c, sn) = e^{−2πi·r·k/size}, turned by e^{−2πir/size} per step and re-evaluated exactly every
    // FOLD_RESYNC steps from the exact residue of r·k.
    const cr = Math.cos((-2 * Math.PI * r) / size);
    const sr = Math.sin((-2 * Math.PI * r) / size);
    let c = 1;
    let sn = 0;
    for (let k = 0, t = 0; k < count; k++, t = t + 1 === p ? 0 : t + 1) {
      if (k % FOLD_RESYNC === 0) {
        const angle = (-2 * Math.PI * ((r * k) % size)) / size;
        c = Math.cos(angle);
        sn = Math.sin(angle);
      }
      const a = re(k);
      const b = im(k);
      z[2 * t] = z[2 * t]! + a * c - b * sn;
      z[2 * t + 1] = z[2 * t + 1]! + a * sn + b * c;
      const next = c * cr - sn * sr;
      sn = sn * cr + c * sr;
      c = next;
    }
    const X = p > 1 ? fftInterleaved(z) : z;
    // Bins j = R·m + r within ±reach; bins above size/2 are the negative ones, j − size.
    for (let m = 0; m < p; m++) {
      let j = parts * m + r;
      if (j > size / 2) j -= size;
      if (j < -reach || j > reach) continue;
      mags[j + reach] = Math.hypot(X[2 * m]!, X[2 * m + 1]!);
    }
  }
  return mags;
}

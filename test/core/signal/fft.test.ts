import { describe, it, expect } from 'vitest';
import {
  factorize,
  fft,
  ifft,
  realFft,
  RealPowerTransform,
  convolutionLength,
  isPowerOfTwo,
  nextPowerOfTwo,
  smoothLength,
} from '../../../src/core/signal/index.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';

type C = { re: number; im: number };
const fx = loadFixture<{ cases: { n: number; x: C[]; X: C[] }[] }>('signal_fft');
const long = loadFixture<{ cases: { n: number; bins: number[]; X: C[]; energy: number }[] }>(
  'signal_fft_long',
);

/** The long-transform test signal, as test/reference/gen_signal.py fft_test_signal builds it. */
function fftTestSignal(n: number): { re: Float64Array; im: Float64Array } {
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    re[j] = Math.sin(0.37 * j) + 0.25 * Math.cos(1.3 * j + 1e-3 * (j % 97) ** 2) + (j < n / 3 ? 1 : 0);
    im[j] = Math.cos(0.21 * j) - 0.5 * Math.sin(2.9 * j);
  }
  return { re, im };
}

/** The DFT straight from its definition, O(n²), as an independent check. */
function naiveDft(re: Float64Array, im: Float64Array): [Float64Array, Float64Array] {
  const n = re.length;
  const R = new Float64Array(n);
  const I = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    for (let j = 0; j < n; j++) {
      const a = (-2 * Math.PI * ((j * k) % n)) / n;
      R[k] = R[k]! + re[j]! * Math.cos(a) - im[j]! * Math.sin(a);
      I[k] = I[k]! + re[j]! * Math.sin(a) + im[j]! * Math.cos(a);
    }
  }
  return [R, I];
}

describe('fft', () => {
  for (const c of fx.cases) {
    it(`length ${c.n} matches numpy.fft.fft`, () => {
      const re = Float64Array.from(c.x, (v) => v.re);
      const im = Float64Array.from(c.x, (v) => v.im);
      fft(re, im);
      const scale = Math.sqrt(c.n) * 4;
      expectClose(
        re,
        c.X.map((v) => v.re),
        { abs: 1e-13 * scale },
        're',
      ); // numpy.fft.fft 2.4
      expectClose(
        im,
        c.X.map((v) => v.im),
        { abs: 1e-13 * scale },
        'im',
      );
    });
  }

  it('agrees with the definition on seeded random signals of many lengths, and ifft inverts it', () => {
    const next = mulberry32(5);
    // 7, 14, 49, 77, 196, 343, 1470: the written-out radix-7 pass first, last, between others and repeated.
    for (const n of [4, 6, 7, 14, 16, 31, 49, 64, 77, 100, 196, 243, 256, 257, 343, 1470]) {
      const re = Float64Array.from({ length: n }, () => next() - 0.5);
      const im = Float64Array.from({ length: n }, () => next() - 0.5);
      const [R, I] = naiveDft(re, im);
      const a = re.slice();
      const b = im.slice();
      fft(a, b);
      expectClose(a, R, { abs: 1e-12 * n }, `re n=${n}`);
      expectClose(b, I, { abs: 1e-12 * n }, `im n=${n}`);
      ifft(a, b);
      expectClose(a, re, { abs: 1e-14 * n }, `inverse n=${n}`);
      expectClose(b, im, { abs: 1e-14 * n }, `inverse im n=${n}`);
    }
  });

  it('realFft gives the first half of the complex transform for even and odd lengths', () => {
    const next = mulberry32(9);
    for (const n of [1, 2, 3, 4, 10, 15, 64, 200]) {
      const x = Float64Array.from({ length: n }, () => next() - 0.5);
      const [R, I] = naiveDft(x, new Float64Array(n));
      const bins = (n >> 1) + 1;
      const re = new Float64Array(bins);
      const im = new Float64Array(bins);
      realFft(x, re, im);
      expectClose(re, R.subarray(0, bins), { abs: 1e-13 * n }, `re n=${n}`);
      expectClose(im, I.subarray(0, bins), { abs: 1e-13 * n }, `im n=${n}`);
    }
  });

  it('long transforms of every kind of length match numpy.fft.fft at spread bins and in energy', () => {
    for (const c of long.cases) {
      const { re, im } = fftTestSignal(c.n);
      const a = re.slice();
      const b = im.slice();
      fft(a, b);
      // Rounding grows like log n; the signal's peak bins are about n in size.
      const tol = 1e-14 * c.n * Math.log2(c.n);
      expectClose(
        c.bins.map((k) => a[k]!),
        c.X.map((v) => v.re),
        { abs: tol },
        `re n=${c.n}`,
      ); // numpy.fft.fft 2.4
      expectClose(
        c.bins.map((k) => b[k]!),
        c.X.map((v) => v.im),
        { abs: tol },
        `im n=${c.n}`,
      );
      let energy = 0;
      for (let k = 0; k < c.n; k++) energy += a[k]! ** 2 + b[k]! ** 2;
      expectClose(energy, c.energy, { rel: 1e-12 }, `energy n=${c.n}`);
      ifft(a, b);
      expectClose(a, re, { abs: 1e-15 * c.n }, `inverse n=${c.n}`);
    }
  });

  it('realFft of long signals equals the complex transform of the same real signal', () => {
    for (const n of [65536, 6000, 48000, 44100, 20014, 8191]) {
      const { re } = fftTestSignal(n);
      const a = re.slice();
      const b = new Float64Array(n);
      fft(a, b);
      const bins = (n >> 1) + 1;
      const outRe = new Float64Array(bins);
      const outIm = new Float64Array(bins);
      realFft(re, outRe, outIm);
      expectClose(outRe, a.subarray(0, bins), { abs: 1e-14 * n }, `re n=${n}`);
      expectClose(outIm, b.subarray(0, bins), { abs: 1e-14 * n }, `im n=${n}`);
    }
  });

  it('RealPowerTransform adds |X_k|² of the real transform and leaves its input as it was', () => {
    for (const n of [1, 2, 3, 8, 15, 6000, 4096]) {
      const { re } = fftTestSignal(n);
      const t = new RealPowerTransform(n);
      t.input.set(re);
      const sum = new Float64Array((n >> 1) + 1).fill(1);
      t.addPower(sum);
      t.addPower(sum);
      t.flush(sum);
      const outRe = new Float64Array(sum.length);
      const outIm = new Float64Array(sum.length);
      realFft(re, outRe, outIm);
      const want = Array.from(sum, (_, k) => 1 + 2 * (outRe[k]! ** 2 + outIm[k]! ** 2));
      expectClose(sum, want, { rel: 1e-12, abs: 1e-9 }, `n=${n}`);
      expect(Array.from(t.input)).toEqual(Array.from(re));
    }
  });

  it('RealPowerTransform of an odd length pairs its inputs in one transform, and flush adds the last alone', () => {
    const next = mulberry32(21);
    for (const n of [3, 15, 1001, 10007]) {
      for (const count of [1, 2, 3, 4, 5]) {
        const t = new RealPowerTransform(n);
        const bins = (n >> 1) + 1;
        const sum = new Float64Array(bins);
        const want = new Float64Array(bins);
        const outRe = new Float64Array(bins);
        const outIm = new Float64Array(bins);
        for (let c = 0; c < count; c++) {
          const x = Float64Array.from({ length: n }, () => next() - 0.5);
          t.input.set(x);
          t.addPower(sum);
          // Each input's own power from the real transform (checked against the definition above).
          realFft(x, outRe, outIm);
          for (let k = 0; k < bins; k++) want[k] = want[k]! + outRe[k]! ** 2 + outIm[k]! ** 2;
        }
        t.flush(sum);
        t.flush(sum); // a second flush adds nothing
        const top = Math.max(...want);
        expectClose(sum, want, { abs: 1e-12 * top }, `n=${n}, ${count} inputs`);
      }
    }
  });

  it('factorize and smoothLength', () => {
    expect(factorize(65536)).toEqual([4, 4, 4, 4, 4, 4, 4, 4]);
    expect(factorize(6000)).toEqual([4, 4, 3, 5, 5, 5]);
    expect(factorize(2 * 7 * 7 * 11)).toEqual([2, 7, 7, 11]);
    expect(factorize(10007)).toEqual([10007]);
    expect([1, 7, 11, 49, 97, 101, 20013].map(smoothLength)).toEqual([1, 8, 12, 50, 100, 108, 20250]);
  });

  it('convolutionLength: long enough for the circular convolution, only factors up to 7', () => {
    for (const n of [11, 97, 101, 1009, 4099, 10007, 30011, 65537]) {
      const m = convolutionLength(n);
      expect(m).toBeGreaterThanOrEqual(2 * n - 1);
      expect(m).toBeLessThan(2 * nextPowerOfTwo(2 * n - 1));
      expect(Math.max(...factorize(m))).toBeLessThanOrEqual(7);
    }
  });

  it('power-of-two helpers', () => {
    expect([1, 2, 3, 64, 96].map(isPowerOfTwo)).toEqual([true, true, false, true, false]);
    expect([1, 3, 64, 65].map(nextPowerOfTwo)).toEqual([1, 4, 64, 128]);
  });
});

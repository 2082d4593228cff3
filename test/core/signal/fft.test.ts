import { describe, it, expect } from 'vitest';
import { fft, ifft, realFft, isPowerOfTwo, nextPowerOfTwo } from '../../../src/core/signal/index.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';

type C = { re: number; im: number };
const fx = loadFixture<{ cases: { n: number; x: C[]; X: C[] }[] }>('signal_fft');

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
    for (const n of [4, 6, 7, 16, 31, 64, 100, 243, 256, 257]) {
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

  it('power-of-two helpers', () => {
    expect([1, 2, 3, 64, 96].map(isPowerOfTwo)).toEqual([true, true, false, true, false]);
    expect([1, 3, 64, 65].map(nextPowerOfTwo)).toEqual([1, 4, 64, 128]);
  });
});

import { describe, expect, it } from 'vitest';
import { ToneSearchAccumulator, paddedMagnitudes } from '../../../src/core/signal/toneSearch.ts';

/** |X[j]| of the zero-padded DFT straight from its definition, X[j] = Σ_s Z_s e^{−2πijs/size} (summed in order). */
function definition(re: number[], im: number[], size: number, j: number): number {
  let xr = 0;
  let xi = 0;
  for (let s = 0; s < re.length; s++) {
    const t = (-2 * Math.PI * ((((j * s) % size) + size) % size)) / size;
    xr += re[s]! * Math.cos(t) - im[s]! * Math.sin(t);
    xi += re[s]! * Math.sin(t) + im[s]! * Math.cos(t);
  }
  return Math.hypot(xr, xi);
}

describe('the tone search: zero-padded DFT of the block sums, folded into short transforms', () => {
  for (const [count, size, reach, part] of [
    [3, 16, 2, 4],
    [250, 1024, 127, 1 << 18],
    [250, 1024, 127, 64],
    [1000, 4096, 512, 256],
    [1025, 8192, 4095, 1024],
    [4000, 4096, 2047, 16],
    [999, 1000, 499, 8],
  ] as const) {
    it(`${count} sums padded to ${size}, bins ±${reach}, transforms of ≤ ${part}: |X[j]| equals the DFT's definition`, () => {
      // A drifting tone plus a second one and a deterministic wobble: nothing symmetric to hide an error.
      const re: number[] = [];
      const im: number[] = [];
      for (let s = 0; s < count; s++) {
        const ph = 0.37 * s + 1e-4 * s * s;
        re.push(Math.cos(ph) + 0.3 * Math.cos(-1.1 * s) + 0.01 * Math.sin(s * s));
        im.push(Math.sin(ph) + 0.3 * Math.sin(-1.1 * s));
      }
      const got = paddedMagnitudes(
        count,
        (k) => re[k]!,
        (k) => im[k]!,
        size,
        reach,
        part,
      );
      expect(got.length).toBe(2 * reach + 1);
      const scale = re.length * 1.5;
      const step = Math.max(1, Math.floor(reach / 200));
      for (let j = -reach; j <= reach; j += j === -reach || j >= reach - step ? 1 : step) {
        expect(Math.abs(got[j + reach]! - definition(re, im, size, j))).toBeLessThan(1e-11 * scale);
      }
    });
  }

  it('refuses more sums than the padded length', () => {
    expect(() =>
      paddedMagnitudes(
        17,
        () => 1,
        () => 0,
        16,
        2,
      ),
    ).toThrow(/17 sums, size 16/);
  });
});

describe('ToneSearchAccumulator block sums', () => {
  it('grown as fed or allocated from the known length: the same frequency, and the tone found', () => {
    // 6 kHz asked (±30 Hz searched, blocks of 200 samples): 2000 blocks, beyond the first allocation of 1024.
    const fs = 48000;
    const n = 400_000;
    const x = new Float64Array(n);
    for (let i = 0; i < n; i++)
      x[i] = 0.5 * Math.cos((2 * Math.PI * 6012.3 * i) / fs) + 0.01 * Math.sin(i * i);
    const grown = new ToneSearchAccumulator(fs, [6000], [30]);
    for (let i = 0; i < n; i += 77_777) grown.push(x.subarray(i, i + 77_777));
    const sized = new ToneSearchAccumulator(fs, [6000], [30], n);
    sized.push(x);
    const [f] = grown.result();
    expect(sized.result()).toEqual([f]);
    // The padded bins are fs/(200·8192) = 0.029 Hz apart; the parabola lands well within one.
    expect(Math.abs(f! - 6012.3)).toBeLessThan(0.03);
  });
});

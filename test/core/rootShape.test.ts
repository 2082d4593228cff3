import { describe, expect, it } from 'vitest';
import {
  maxPairWidthHz,
  notchDepth,
  poleRadiusForWidth,
  widthForPoleRadius,
  zeroRadiusForDepth,
} from '../../src/core/rootShape.ts';
import { responseZpk } from '../../src/core/response/index.ts';
import type { Zpk } from '../../src/core/types.ts';
import { hzToOmega } from '../../src/core/units.ts';
import { loadFixture } from '../helpers/fixtures.ts';
import { expectClose } from '../helpers/expectClose.ts';

interface NotchCase {
  kind: 'notch' | 'peak';
  fs: number;
  f0: number;
  q: number;
  a: number[];
}
const notches = loadFixture<{ notches: NotchCase[] }>('design_notch').notches;

const pair = (r: number, w: number) => ({ re: r * Math.cos(w), im: r * Math.sin(w), multiplicity: 1 });

describe('pole radius and −3 dB width', () => {
  it.each(notches.map((c) => [`${c.kind} ${c.f0} Hz Q ${c.q} fs ${c.fs}`, c] as const))(
    'agrees with scipy.signal.iirnotch/iirpeak 1.17: %s',
    (_, c) => {
      // scipy.signal.iirnotch/iirpeak 1.17: the denominator's z⁻² coefficient is the poles' radius squared.
      const r = Math.sqrt(c.a[2]!);
      const width = c.f0 / c.q;
      expectClose(poleRadiusForWidth(width, c.fs)!, r, { rel: 1e-12 });
      expectClose(widthForPoleRadius(r, c.fs)!, width, { rel: 1e-9 });
    },
  );

  it('the width is the measured −3 dB width of the notch whose poles sit at that radius', () => {
    const fs = 2000;
    for (const [f0, width] of [
      [500, 0.01],
      [50, 4],
      [500, 120],
      [300, 400],
    ] as const) {
      const w0 = hzToOmega(f0, fs);
      const r = poleRadiusForWidth(width, fs)!;
      // The notch as the sum of 1 and a second-order allpass (Regalia & Mitra's form, from memory): poles
      // 1 − (1 + r²)cos ω0 z⁻¹ + r² z⁻², zeros on the circle at ω0, gain (1 + r²)/2.
      const pole = { re: ((1 + r * r) / 2) * Math.cos(w0), multiplicity: 1 } as const;
      const zpk: Zpk = {
        zeros: [pair(1, w0)],
        poles: [{ ...pole, im: Math.sqrt(r * r - pole.re * pole.re) }],
        gain: (1 + r * r) / 2,
      };
      const db = (f: number) => responseZpk(zpk, Float64Array.of(hzToOmega(f, fs))).magnitudeDb[0]!;
      const half = -10 * Math.log10(2);
      const edge = (lo: number, hi: number, risingAbove: boolean) => {
        for (let i = 0; i < 200; i++) {
          const mid = (lo + hi) / 2;
          if (db(mid) < half === risingAbove) lo = mid;
          else hi = mid;
        }
        return (lo + hi) / 2;
      };
      const measured = edge(f0, fs / 2, true) - edge(0, f0, false);
      expectClose(measured, width, { rel: 1e-7 }, `${width} Hz at ${f0} Hz`);
    }
  });

  it('near the circle the width is (1 − r)·fs/π (common practice), and the limits are refused', () => {
    const fs = 48000;
    for (const r of [0.999, 0.9999, 0.999999]) {
      expectClose(widthForPoleRadius(r, fs)!, ((1 - r) * fs) / Math.PI, { rel: 2 * (1 - r) });
    }
    expect(widthForPoleRadius(1, fs)).toBeNull();
    expect(widthForPoleRadius(1.2, fs)).toBeNull();
    expect(widthForPoleRadius(0, fs)).toBe(maxPairWidthHz(fs));
    expect(poleRadiusForWidth(0, fs)).toBeNull();
    expect(poleRadiusForWidth(-1, fs)).toBeNull();
    expect(poleRadiusForWidth(fs / 4 + 1, fs)).toBeNull();
    expectClose(poleRadiusForWidth(fs / 4, fs)!, 0, { abs: 1e-7 });
    // A width of a thousandth of a hertz keeps its digits: 1 − r is about π·B/fs.
    expectClose(1 - poleRadiusForWidth(0.001, fs)!, (Math.PI * 0.001) / fs, { rel: 1e-6 });
  });
});

describe('notch depth', () => {
  it('is the magnitude of the two pairs at ω0, and the inverse finds the zero radius', () => {
    const fs = 2000;
    const w0 = hzToOmega(50, fs);
    const r = poleRadiusForWidth(4, fs)!;
    for (const db of [-3, -20, -40, -60, -120]) {
      const depth = 10 ** (db / 20);
      const rho = zeroRadiusForDepth(depth, r, w0)!;
      expect(rho).toBeGreaterThan(r);
      expect(rho).toBeLessThan(1);
      // Checked against the response computed from the roots themselves.
      const h = responseZpk({ zeros: [pair(rho, w0)], poles: [pair(r, w0)], gain: 1 }, Float64Array.of(w0));
      // The bisection holds ρ to a few ulps; at −120 dB, 1 − ρ is 1e-8, so a few 1e-7 dB.
      expectClose(h.magnitudeDb[0]!, db, { abs: 1e-6 });
      expectClose(notchDepth(rho, r, w0), depth, { rel: 1e-7 });
      // Close to the small-distance rule (1 − ρ)/(1 − r) (common practice).
      expectClose((1 - rho) / (1 - r), depth, { rel: 0.01 });
    }
    expect(zeroRadiusForDepth(0, r, w0)).toBe(1);
    expectClose(zeroRadiusForDepth(1, r, w0)!, r, { abs: 1e-12 });
    expect(zeroRadiusForDepth(1.5, r, w0)).toBeNull();
    expect(zeroRadiusForDepth(-0.1, r, w0)).toBeNull();
  });
});

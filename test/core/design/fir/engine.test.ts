import { describe, expect, it } from 'vitest';
import {
  firWindow,
  kaiserBeta,
  kaiserTaps,
  type FirWindow,
} from '../../../../src/core/design/fir/windows.ts';
import { windowMethodTaps } from '../../../../src/core/design/fir/windowMethod.ts';
import { leastSquaresTaps } from '../../../../src/core/design/fir/leastSquares.ts';
import { remezGridError, remezTaps } from '../../../../src/core/design/fir/remez.ts';
import type { FirBand } from '../../../../src/core/design/fir/bands.ts';
import { firOrderGuess } from '../../../../src/core/design/fir/estimate.ts';
import type { BandShape } from '../../../../src/core/design/index.ts';
import { loadFixture } from '../../../helpers/fixtures.ts';
import { expectClose } from '../../../helpers/expectClose.ts';

const maxAbs = (h: ArrayLike<number>) => Math.max(...Array.from(h, Math.abs));

describe('windows against scipy.signal.get_window (symmetric)', () => {
  const cases = loadFixture<{ window: FirWindow; beta: number; n: number; w: number[] }[]>('fir_windows');
  it.each(cases.map((c) => [`${c.window} β ${c.beta}, ${c.n} points`, c] as const))('%s', (_, c) => {
    // scipy.signal.get_window(…, fftbins=False) 1.17
    expectClose(firWindow(c.window, c.n, c.beta), c.w, { rel: 1e-13, abs: 1e-15 }, 'w');
  });
});

describe("Kaiser's formulas against scipy.signal.kaiser_beta and kaiserord", () => {
  const k = loadFixture<{
    beta: { attenuationDb: number; beta: number }[];
    order: { attenuationDb: number; widthHz: number; fs: number; taps: number; beta: number }[];
  }>('fir_kaiser');
  it('β from the attenuation', () => {
    // scipy.signal.kaiser_beta 1.17; Kaiser's β formula, from memory
    for (const c of k.beta)
      expectClose(kaiserBeta(c.attenuationDb), c.beta, { rel: 1e-13, abs: 1e-15 }, `β(${c.attenuationDb})`);
  });
  it('taps from the attenuation and transition width', () => {
    for (const c of k.order) {
      const width = (2 * Math.PI * c.widthHz) / c.fs;
      // scipy.signal.kaiserord 1.17; Kaiser's length formula, from memory
      expect(kaiserTaps(c.attenuationDb, width), `${c.attenuationDb} dB over ${c.widthHz} Hz`).toBe(c.taps);
      // a pass-band loss of 3 dB allows more than the stop band, so the attenuation sets the window
      expect(firOrderGuess('kaiser', c.widthHz / c.fs, 3, c.attenuationDb)).toBe(c.taps - 1);
    }
  });
  it('a hand-worked case of each formula', () => {
    // Kaiser's formulas, from memory: a = 60 dB → β = 0.1102·(60 − 8.7) = 5.65326;
    // Δω = 0.1π → N − 1 = (60 − 7.95) / (2.285·0.1π) = 72.5 → 74 taps
    expect(kaiserBeta(60)).toBeCloseTo(5.65326, 12);
    expect(kaiserTaps(60, 0.1 * Math.PI)).toBe(74);
    // Kaiser's equiripple estimate, from memory: δp = 0.01, δs = 0.001, Δf = 0.05:
    // (−20·log10 √(1e−5) − 13) / (14.6·0.05) = 37 / 0.73 = 50.7 → 51. Here δp = 1 − 10^(−r/20) = 0.01.
    const rippleDb = -20 * Math.log10(0.99);
    expect(firOrderGuess('equiripple', 0.05, rippleDb, 60)).toBe(51);
    // common practice: a Hamming window needs about 3.3/Δf taps → Δf = 0.05: 66 taps, order 65
    expect(firOrderGuess('hamming', 0.05, 0.1, 50)).toBe(65);
  });
});

describe('window method against scipy.signal.firwin', () => {
  const cases = loadFixture<
    {
      window: FirWindow;
      beta: number;
      response: BandShape;
      cutoffsHz: number[];
      fs: number;
      taps: number;
      h: number[];
    }[]
  >('fir_firwin');
  it.each(
    cases.map(
      (c) => [`${c.window} ${c.response} ${c.cutoffsHz.join(',')} Hz at ${c.fs}, ${c.taps} taps`, c] as const,
    ),
  )('%s', (_, c) => {
    const h = windowMethodTaps(
      c.taps,
      c.response,
      c.cutoffsHz.map((f) => f / c.fs),
      c.window,
      c.beta,
    );
    // scipy.signal.firwin 1.17 (scale=True)
    expectClose(h, c.h, { abs: 1e-14 * maxAbs(c.h) }, 'h');
  });
});

/** Bands of scipy's edge/desired/weight lists. */
function bandsOf(
  edgesHz: number[],
  fs: number,
  desired: (i: number) => [number, number],
  weights: number[],
): FirBand[] {
  const out: FirBand[] = [];
  for (let i = 0; i < edgesHz.length / 2; i++) {
    const [from, to] = desired(i);
    out.push({ lo: edgesHz[2 * i]! / fs, hi: edgesHz[2 * i + 1]! / fs, from, to, weight: weights[i]! });
  }
  return out;
}

describe('least squares against scipy.signal.firls', () => {
  const cases = loadFixture<
    {
      taps: number;
      edgesHz: number[];
      desired: number[];
      weights: number[];
      fs: number;
      condition: number;
      h: number[];
    }[]
  >('fir_firls');
  it.each(cases.map((c) => [`${c.taps} taps, bands ${c.edgesHz.join(',')} Hz at ${c.fs}`, c] as const))(
    '%s',
    (_, c) => {
      const bands = bandsOf(c.edgesHz, c.fs, (i) => [c.desired[2 * i]!, c.desired[2 * i + 1]!], c.weights);
      // scipy.signal.firls 1.17: both solve the normal equations; rounding grows with their condition
      expectClose(leastSquaresTaps(c.taps, bands), c.h, { abs: 1e-13 * c.condition * maxAbs(c.h) }, 'h');
    },
  );
});

describe('equiripple against scipy.signal.remez', () => {
  const cases = loadFixture<
    {
      kind: 'bands' | 'differentiator' | 'hilbert';
      taps: number;
      edgesHz: number[];
      desired: number[];
      weights: number[];
      fs: number;
      h: number[];
      gridError: number;
    }[]
  >('fir_remez');
  it.each(
    cases.map((c) => [`${c.kind}, ${c.taps} taps, bands ${c.edgesHz.join(',')} Hz at ${c.fs}`, c] as const),
  )('%s', (_, c) => {
    const bands = bandsOf(c.edgesHz, c.fs, (i) => [c.desired[i]!, c.desired[i]!], c.weights);
    const r = remezTaps(c.taps, bands, c.kind);
    expect(r.converged).toBe(true);
    // scipy.signal.remez 1.17 (same grid density 16): the same discrete minimax problem. The program stops
    // its exchange when the extremal set repeats, which can be short of the optimum by ~1e-8 of the taps,
    // so the taps agree to 1e-7 and ours are at least as near the optimum (their grid error no larger).
    expectClose(r.taps, c.h, { abs: 1e-7 * maxAbs(c.h) }, 'h');
    const ours = remezGridError(r.taps, bands, c.kind);
    // slack: the amplitude's rounding (1e-15 of Σ|h|) times the weights (a differentiator's 1/f reaches 500)
    expect(ours).toBeLessThanOrEqual(c.gridError * (1 + 1e-9) + 1e-12);
    expectClose(ours, r.deviation, { rel: 1e-9, abs: 1e-12 }, 'grid error vs δ');
  });

  it('keeps the taps symmetric or antisymmetric exactly', () => {
    for (const [taps, kind] of [
      [31, 'bands'],
      [30, 'bands'],
      [31, 'hilbert'],
      [30, 'differentiator'],
    ] as const) {
      const h = remezTaps(
        taps,
        [
          { lo: 0.02, hi: 0.2, from: 1, to: 1, weight: 1 },
          { lo: 0.25, hi: 0.48, from: 0, to: 0, weight: 1 },
        ].slice(0, kind === 'bands' ? 2 : 1),
        kind,
      ).taps;
      const s = kind === 'bands' ? 1 : -1;
      for (let n = 0; n < taps; n++) expect(h[n] === s * h[taps - 1 - n]!, `tap ${n}`).toBe(true);
    }
  });

  it('an order-128 band-pass ripples by the same δ in every band (equal weights)', () => {
    const r = remezTaps(129, [
      { lo: 0, hi: 0.125, from: 0, to: 0, weight: 1 },
      { lo: 0.1375, hi: 0.25, from: 1, to: 1, weight: 1 },
      { lo: 0.2625, hi: 0.5, from: 0, to: 0, weight: 1 },
    ]);
    expect(r.converged).toBe(true);
    // alternation theorem (Chebyshev): the best approximation's error reaches ±δ in every band; between the
    // grid's points (16 per coefficient) it may pass δ by a little
    const worst = [0, 0, 0];
    for (let i = 0; i <= 4000; i++) {
      const f = (0.5 * i) / 4000;
      if ((f > 0.125 && f < 0.1375) || (f > 0.25 && f < 0.2625)) continue;
      let re = 0;
      let im = 0;
      for (let n = 0; n < 129; n++) {
        re += r.taps[n]! * Math.cos(2 * Math.PI * f * n);
        im -= r.taps[n]! * Math.sin(2 * Math.PI * f * n);
      }
      const band = f <= 0.125 ? 0 : f <= 0.25 ? 1 : 2;
      worst[band] = Math.max(worst[band]!, Math.abs(Math.hypot(re, im) - (band === 1 ? 1 : 0)));
    }
    for (const w of worst) {
      expect(w).toBeLessThan(r.deviation * 1.01);
      expect(w).toBeGreaterThan(r.deviation * 0.9999);
    }
  });
});

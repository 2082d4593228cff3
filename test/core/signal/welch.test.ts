import { describe, it, expect } from 'vitest';
import {
  WelchAccumulator,
  makeTones,
  makeWindow,
  powerToDb,
  welch,
  windowFigures,
  PUBLISHED_WINDOW_FIGURES,
  WINDOW_NAMES,
  type SpectrumScaling,
  type WindowName,
} from '../../../src/core/signal/index.ts';
import { makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';

interface WelchCase {
  window: WindowName;
  nperseg: number;
  noverlap: number | null;
  scaling: SpectrumScaling;
  detrend: 'constant' | 'none';
  nfft: number | null;
  short?: boolean;
  f: number[];
  p: number[];
}
const fx = loadFixture<{ fs: number; x: number[]; cases: WelchCase[] }>('signal_welch');

function optionsOf(c: WelchCase) {
  return {
    window: c.window,
    nperseg: c.nperseg,
    scaling: c.scaling,
    detrend: c.detrend,
    ...(c.noverlap === null ? {} : { noverlap: c.noverlap }),
    ...(c.nfft === null ? {} : { nfft: c.nfft }),
  };
}

describe('welch', () => {
  for (const c of fx.cases) {
    const label = `${c.window}, nperseg ${c.nperseg}, overlap ${c.noverlap}, nfft ${c.nfft}, ${c.scaling}, detrend ${c.detrend}${c.short ? ', signal shorter than a segment' : ''}`;
    it(`${label}: matches scipy.signal.welch`, () => {
      const x = c.short ? fx.x.slice(0, 100) : fx.x;
      const r = welch(x, fx.fs, optionsOf(c));
      const peak = Math.max(...c.p);
      expectClose(r.frequencies, c.f, { rel: 1e-14, abs: 1e-12 }, 'frequencies'); // scipy.signal.welch 1.17
      expectClose(r.power, c.p, { rel: 1e-9, abs: 1e-12 * peak }, 'power'); // scipy.signal.welch 1.17
    });
  }

  it('pushing the signal in pieces gives the one-call numbers', () => {
    const c = fx.cases[1]!;
    const acc = new WelchAccumulator(fx.fs, optionsOf(c));
    for (let p = 0; p < fx.x.length; p += 37) acc.push(fx.x.slice(p, p + 37));
    const whole = welch(fx.x, fx.fs, optionsOf(c));
    expect(Array.from(acc.result().power)).toEqual(Array.from(whole.power));
    expect(acc.result().segments).toBe(whole.segments);
  });

  it('white noise of variance σ² has density σ²/(fs/2) one-sided (Parseval)', () => {
    const fs = 8000;
    const x = makeWhiteNoise(1 << 18, 3, 0.5);
    const r = welch(x, fs, { nperseg: 1024 });
    const inner = r.power.subarray(5, r.power.length - 5);
    const mean = inner.reduce((s, v) => s + v, 0) / inner.length;
    expectClose(mean, 0.25 / (fs / 2), { rel: 0.02 }, 'mean density'); // common practice: flat one-sided PSD
    expect(powerToDb(Float64Array.of(0, 1e-3))[0]).toBe(-300);
  });
});

describe('scalloping of a bin reading', () => {
  const fs = 48000;
  const nperseg = 4096;
  for (const window of WINDOW_NAMES) {
    it(`${window}: a tone's peak bin reads its level, low by no more than the scalloping loss`, () => {
      const scallop =
        PUBLISHED_WINDOW_FIGURES[window]?.scallopingLossDb ??
        windowFigures(makeWindow(window, nperseg)).scallopingLossDb;
      const bin = fs / nperseg;
      // From on-bin to half a bin off: the peak bin falls from the true level by at most the scalloping loss.
      for (const offset of [0, 0.25, 0.5]) {
        const f = 1000 * bin + offset * bin;
        const amplitude = 10 ** (-20 / 20);
        const x = makeTones(nperseg * 8, fs, [{ frequencyHz: f, amplitude, phase: 0.3 }]);
        const r = welch(x, fs, { window, nperseg, scaling: 'spectrum' });
        // 'spectrum' scaling: a sinusoid of amplitude A reads A²/2 in its bin
        const level = 10 * Math.log10(2 * Math.max(r.power[1000]!, r.power[1001]!));
        // Harris 1978 scalloping loss (from memory; 0.035 dB slack for the printed rounding)
        expect(level).toBeLessThanOrEqual(-20 + 0.01);
        expect(level).toBeGreaterThanOrEqual(-20 - scallop - 0.035);
        if (offset === 0) expectClose(level, -20, { abs: 0.01 }, 'on-bin level');
        if (offset === 0.5 && window !== 'flattop')
          expectClose(-20 - level, scallop, { abs: 0.035 }, 'half-bin loss');
      }
    });
  }
});

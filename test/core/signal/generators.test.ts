import { describe, it, expect } from 'vitest';
import {
  generateSignal,
  makeHum,
  makeImpulseTrain,
  makePinkNoise,
  makeStepAt,
  makeTones,
  welch,
} from '../../../src/core/signal/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('makeTones', () => {
  it('sums a·cos(2πft + φ) sample by sample', () => {
    const x = makeTones(5, 8, [
      { frequencyHz: 1, amplitude: 2, phase: 0 },
      { frequencyHz: 2, amplitude: 1, phase: Math.PI / 2 },
    ]);
    // By hand: 2cos(πk/4) + cos(πk/2 + π/2) = 2cos(πk/4) − sin(πk/2)
    const expected = [0, 1, 2, 3, 4].map(
      (k) => 2 * Math.cos((Math.PI * k) / 4) - Math.sin((Math.PI * k) / 2),
    );
    expectClose(x, expected, { abs: 1e-15 }, 'tones');
  });
});

describe('makeStepAt and makeImpulseTrain', () => {
  it('a step at 0.25 s at 8 Hz starts at sample 2', () => {
    expect(Array.from(makeStepAt(5, 8, 0.25, 3))).toEqual([0, 0, 3, 3, 3]);
  });
  it('impulses every period, rounded to the nearest sample', () => {
    expect(Array.from(makeImpulseTrain(10, 10, 0.25))).toEqual([1, 0, 0, 1, 0, 1, 0, 0, 1, 0]); // 0, 2.5→3, 5, 7.5→8
    expect(() => makeImpulseTrain(10, 10, 0.05)).toThrow(/under one sample/);
  });
});

describe('makeHum', () => {
  it('puts the fundamental and harmonics at their levels and drifts by the given deviation', () => {
    const fs = 4000;
    const x = makeHum(fs * 40, fs, {
      fundamentalHz: 50,
      harmonicAmplitudes: [0.1, 0.03, 0.02],
      driftHz: 0.2,
      driftPeriodSeconds: 20,
    });
    const r = welch(x, fs, { window: 'hann', nperseg: 1 << 14, scaling: 'spectrum' });
    // Drift smears each line over ±h·0.2 Hz, so read the power of the whole line: with 'spectrum' scaling
    // the bins of a tone sum to (A²/2)·ENBW (in bins) whatever its spread (Parseval, common practice).
    const enbwBins = r.enbwHz / r.binWidthHz;
    const lineDb = (centre: number, halfWidth: number) => {
      let s = 0;
      for (let k = 0; k < r.frequencies.length; k++)
        if (Math.abs(r.frequencies[k]! - centre) <= halfWidth) s += r.power[k]!;
      return 10 * Math.log10((2 * s) / enbwBins);
    };
    const levels = [1, 2, 3].map((h) => lineDb(50 * h, 0.2 * h + 2));
    expectClose(levels, [-20, 20 * Math.log10(0.03), 20 * Math.log10(0.02)], { abs: 0.05 }, 'levels');
    // Instantaneous frequency from the phase: zero crossings in the first and the quarter-period seconds.
    const crossings = (from: number) => {
      let n = 0;
      for (let k = from + 1; k < from + fs; k++) if (Math.sign(x[k]!) !== Math.sign(x[k - 1]!)) n++;
      return n;
    };
    const slow = makeHum(fs * 6, fs, { harmonicAmplitudes: [1], driftHz: 0.2, driftPeriodSeconds: 20 });
    expect(slow[0]).toBe(1);
    const at5 = (() => {
      let n = 0;
      for (let k = 5 * fs - fs / 2 + 1; k < 5 * fs + fs / 2; k++)
        if (Math.sign(slow[k]!) !== Math.sign(slow[k - 1]!)) n++;
      return n;
    })();
    expect(crossings(0)).toBeGreaterThanOrEqual(99);
    expect(at5).toBeGreaterThanOrEqual(100); // 50.2 Hz at t = T/4: 100.4 crossings per second
  });
});

describe('makePinkNoise', () => {
  it('is seeded, has the asked RMS, and falls about 3 dB per octave', () => {
    const fs = 48000;
    const x = makePinkNoise(1 << 20, 42, 0.1);
    expect(Array.from(makePinkNoise(8, 42, 0.1))).toEqual(Array.from(x.subarray(0, 8)));
    expect(makePinkNoise(8, 43, 0.1)[3]).not.toBe(x[3]);
    const rms = Math.sqrt(x.reduce((s, v) => s + v * v, 0) / x.length);
    expectClose(rms, 0.1, { rel: 0.05 }, 'rms');
    const r = welch(x, fs, { nperseg: 8192 });
    const bandDb = (lo: number) => {
      let s = 0;
      let n = 0;
      for (let k = 0; k < r.frequencies.length; k++) {
        if (r.frequencies[k]! >= lo && r.frequencies[k]! < lo * 1.5) {
          s += r.power[k]!;
          n++;
        }
      }
      return 10 * Math.log10(s / n);
    };
    // Density of 1/f noise drops 10·log10(2) = 3.01 dB per octave (common practice); the Voss–McCartney
    // sum ripples by about a dB around that line.
    const slope = (bandDb(8000) - bandDb(125)) / 6;
    expectClose(slope, -3.01, { abs: 0.5 }, 'dB per octave');
  });
});

describe('generateSignal', () => {
  it('dispatches every kind', () => {
    const kinds = [
      { kind: 'tones', tones: [{ frequencyHz: 1, amplitude: 1 }] },
      { kind: 'step', atSeconds: 0.5 },
      { kind: 'impulse-train', periodSeconds: 0.5 },
      { kind: 'white-noise', seed: 1 },
      { kind: 'pink-noise', seed: 1 },
      { kind: 'hum' },
    ] as const;
    for (const spec of kinds) expect(generateSignal(spec, 16, 8).length).toBe(16);
    expect(Array.from(generateSignal({ kind: 'step', atSeconds: 0.5 }, 6, 4))).toEqual([0, 0, 1, 1, 1, 1]);
  });
});

/**
 * Tone levels by a least-squares fit at the tone's frequency: against scipy.linalg.lstsq and numpy's exact
 * DFT (fixture signal_levels), against the true amplitude of tones anywhere between bins (within 0.1 dB),
 * with the frequency search for a drifting tone, before and after a filter, and against the noise floor.
 */
import { describe, it, expect } from 'vitest';
import {
  fitTones,
  levelFloorDb,
  levelMethod,
  makeTones,
  measureLevels,
  ToneFitAccumulator,
  welch,
} from '../../../src/core/signal/index.ts';
import { makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import { filterSections } from '../../../src/core/time/filter.ts';
import { zpkToSections } from '../../../src/core/system/index.ts';
import { responseZpk } from '../../../src/core/response/index.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { hum } from '../../helpers/fixedDesigns.ts';

interface LevelCase {
  name: string;
  fs: number;
  n: number;
  offset: number;
  ramp: number;
  chirp: number;
  chirpRate: number;
  tones: { frequencyHz: number; amplitude: number; phase: number }[];
  lstsq: number[];
  lstsqHann: number[];
  exactDft: (number | null)[];
}

/** The fixture's record, by the same formula as gen_levels.py. */
function record(c: LevelCase): Float64Array {
  const x = new Float64Array(c.n);
  for (let n = 0; n < c.n; n++) {
    let v = c.offset + (c.ramp * n) / c.n + c.chirp * Math.sin(c.chirpRate * n * n);
    for (const t of c.tones) v += t.amplitude * Math.cos((2 * Math.PI * t.frequencyHz * n) / c.fs + t.phase);
    x[n] = v;
  }
  return x;
}

const db = (a: number) => 20 * Math.log10(a);

describe('fitTones against scipy and numpy (fixture signal_levels)', () => {
  const { cases } = loadFixture<{ cases: LevelCase[] }>('signal_levels');
  for (const c of cases) {
    const x = record(c);
    const freqs = c.tones.map((t) => t.frequencyHz);
    it(`${c.name}: ordinary and Hann-weighted fits equal scipy.linalg.lstsq`, () => {
      const rect = fitTones(x, c.fs, freqs, { weighting: 'rectangular' }).tones.map((t) => t.amplitude);
      const hann = fitTones(x, c.fs, freqs, { weighting: 'hann' }).tones.map((t) => t.amplitude);
      expectClose(rect, c.lstsq, { rel: 1e-7 }, 'rectangular'); // scipy.linalg.lstsq 1.17
      expectClose(hann, c.lstsqHann, { rel: 1e-7 }, 'hann'); // scipy.linalg.lstsq, get_window('hann') weights
    });

    it(`${c.name}: within 0.1 dB of each tone's true amplitude`, () => {
      const hann = fitTones(x, c.fs, freqs).tones;
      hann.forEach((t, i) => expect(Math.abs(t.levelDb - db(c.tones[i]!.amplitude))).toBeLessThan(0.1));
    });

    if (c.exactDft.every((v) => v !== null)) {
      it(`${c.name}: the ordinary fit is the exact DFT, the Hann fit within 0.1 dB of it`, () => {
        const dft = c.exactDft as number[];
        const rect = fitTones(x, c.fs, freqs, { weighting: 'rectangular' }).tones.map((t) => t.amplitude);
        expectClose(rect, dft, { rel: 1e-9 }, 'exact DFT'); // numpy.fft.rfft 2.4: 2|X[k]|/N
        const hann = fitTones(x, c.fs, freqs).tones;
        hann.forEach((t, i) => expect(Math.abs(t.levelDb - db(dft[i]!))).toBeLessThan(0.1));
      });
    }
  }
});

describe('between bins', () => {
  const fs = 48000;
  const n = 48000; // 1 s: bins of 1 Hz
  const noise = makeWhiteNoise(n, 21, 1e-3);
  for (const offset of [0, 0.1, 0.25, 0.37, 0.5, 0.75]) {
    it(`a −27.96 dB tone ${offset} bin off a 1 Hz bin, beside a loud one and noise, reads within 0.1 dB`, () => {
      const f = 1000 + offset;
      const amplitude = 10 ** (-27.96 / 20);
      const x = makeTones(n, fs, [
        { frequencyHz: f, amplitude, phase: 0.4 },
        { frequencyHz: 1210.3, amplitude: 0.5, phase: 1 },
      ]).map((v, i) => v + noise[i]!);
      for (const search of [0, 0.005]) {
        const r = measureLevels(x, null, fs, [f], { search });
        expect(Math.abs(r.readings[0]!.beforeDb - -27.96), `search ${search}`).toBeLessThan(0.1);
      }
      // The Hann-windowed spectrum's peak bin, for contrast: low by up to 1.42 dB half a bin off (Harris 1978).
      const w = welch(x, fs, { nperseg: n, window: 'hann', scaling: 'spectrum' });
      const peak = 10 * Math.log10(2 * Math.max(w.power[1000]!, w.power[1001]!));
      if (offset === 0.5) expect(-27.96 - peak).toBeGreaterThan(1.3);
    });
  }
});

describe('measureLevels', () => {
  it('finds a tone that drifted off the asked frequency; a fit at the asked one would lose it', () => {
    const fs = 2000;
    const n = 120000; // 60 s
    const x = makeTones(n, fs, [
      { frequencyHz: 50.07, amplitude: 0.1, phase: 1 },
      { frequencyHz: 150.21, amplitude: 0.05, phase: 0 },
    ]).map((v, i) => v + 0.3 + 0.02 * Math.sin(i * 1e-4));
    const r = measureLevels(x, null, fs, [50, 150]);
    expectClose(
      r.readings.map((x) => x.fittedHz),
      [50.07, 150.21],
      { abs: 0.002 },
      'found',
    );
    expectClose(
      r.readings.map((x) => x.beforeDb),
      [db(0.1), db(0.05)],
      { abs: 0.1 },
      'levels',
    );
    const exact = measureLevels(x, null, fs, [50, 150], { search: 0 });
    expect(exact.readings[0]!.beforeDb).toBeLessThan(db(0.1) - 30);
  });

  it('reads the change a filter makes: half the amplitude is −6.02 dB at every frequency', () => {
    const fs = 1000;
    const x = makeTones(10000, fs, [
      { frequencyHz: 50, amplitude: 0.2 },
      { frequencyHz: 123.4, amplitude: 0.01 },
    ]);
    const r = measureLevels(
      x,
      x.map((v) => v / 2),
      fs,
      [50, 123.4],
    );
    for (const row of r.readings) expect(row.changeDb!).toBeCloseTo(20 * Math.log10(0.5), 9);
    expect(levelMethod(r)).toMatch(
      /Hann-weighted least-squares fit .* over 0 s–10 s \(10000 samples\), each frequency first searched within ±0\.5 %/,
    );
  });

  it("hum just off the notches, in noise: the remains read within 0.1 dB of |H(f)|·A; the spectrum's peak bin reads the noise", () => {
    // 60 s at 2 kHz of hum a little off the notch frequencies (whole periods in the record) over noise, through
    // the hum notches: the situation where a spectrum's ±2-bin peak read −51 dB for remains near −57 dB.
    const fs = 2000;
    const n = 120000;
    const tones = [
      { frequencyHz: 50.05, amplitude: 0.2 },
      { frequencyHz: 150.05, amplitude: 0.05 },
      { frequencyHz: 249.95, amplitude: 0.02 },
    ];
    const x = makeTones(n, fs, tones);
    const noise = makeWhiteNoise(n, 5, 0.02);
    for (let i = 0; i < n; i++) x[i] = x[i]! + noise[i]!;
    const y = filterSections(zpkToSections(hum), x);
    const freqs = tones.map((t) => t.frequencyHz);
    const r = measureLevels(x, y, fs, freqs, { search: 0 });
    const h = responseZpk(
      hum,
      Float64Array.from(freqs, (f) => (2 * Math.PI * f) / fs),
    ).magnitude;
    const exact = fitTones(y, fs, freqs, { weighting: 'rectangular' }).tones; // = the exact DFT bins
    const spec = welch(y, fs, { nperseg: 2048, window: 'hann', scaling: 'spectrum' });
    r.readings.forEach((row, i) => {
      const truth = db(tones[i]!.amplitude * h[i]!); // steady state, common practice
      expect(truth).toBeLessThan(-45);
      expect(Math.abs(row.afterDb! - truth), `${row.frequencyHz} Hz`).toBeLessThan(0.1);
      expect(Math.abs(exact[i]!.levelDb - truth), 'exact DFT').toBeLessThan(0.2);
      const bin = Math.round(row.frequencyHz / spec.binWidthHz);
      let peak = 0;
      for (let k = bin - 2; k <= bin + 2; k++) peak = Math.max(peak, spec.power[k]!);
      if (i === 2)
        expect(10 * Math.log10(2 * peak), 'the spectrum bin reads the noise').toBeGreaterThan(truth + 3);
    });
  });
});

describe('ToneFitAccumulator', () => {
  it('any split of the span gives the one-shot fit; an unfilled span and frequencies too close are errors', () => {
    const fs = 1000;
    const x = makeTones(5000, fs, [{ frequencyHz: 77.7, amplitude: 0.3 }]);
    const acc = new ToneFitAccumulator(fs, [77.7, 200], 5000);
    for (let i = 0; i < 5000; i += 333) acc.push(x.subarray(i, i + 333));
    expectClose(acc.result().tones[0]!.amplitude, fitTones(x, fs, [77.7, 200]).tones[0]!.amplitude, {
      rel: 1e-12,
    });
    const short = new ToneFitAccumulator(fs, [50], 100);
    short.push(new Float64Array(50));
    expect(() => short.result()).toThrow(/only 50 were given/);
    expect(() => fitTones(x, fs, [50, 50.001])).toThrow(/cannot be told apart/);
    expect(() => fitTones(x, fs, [600])).toThrow(/outside 0 to 500 Hz/);
  });
});

describe('levelFloorDb', () => {
  it('predicts what a fit reads on noise alone (mean over many frequencies, within 1 dB)', () => {
    const fs = 8000;
    const n = 80000;
    const x = makeWhiteNoise(n, 8, 0.05);
    const spec = welch(x, fs, { nperseg: 4096, scaling: 'spectrum' });
    const freqs = Array.from({ length: 60 }, (_, k) => 200 + 50.3 * k);
    let ms = 0;
    for (const f of freqs) ms += fitTones(x, fs, [f]).tones[0]!.amplitude ** 2 / freqs.length;
    const floor = levelFloorDb(spec, 1000, [], n, 'hann');
    expect(Math.abs(10 * Math.log10(ms) - floor)).toBeLessThan(1);
  });
});

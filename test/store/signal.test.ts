import { describe, expect, it } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { clampZoom, type LoadedSignal } from '../../src/store/signal.ts';
import {
  levelTableOf,
  notchFrequencies,
  segmentLength,
  selectLevelPlan,
  shapedLevels,
  shapedSpectrum,
} from '../../src/store/signalDerived.ts';
import { selectDisplayResponse, selectSections, selectZpk } from '../../src/store/derived.ts';
import { responseZpk } from '../../src/core/response/index.ts';
import { filterSections } from '../../src/core/time/filter.ts';
import { makeTones, measureLevels, welch } from '../../src/core/signal/index.ts';
import { expectClose } from '../helpers/expectClose.ts';

/** What the store knows of a signal of `seconds` at fs (its samples live in the recording worker). */
function signalInfo(fs: number, seconds: number): LoadedSignal {
  return {
    id: 1,
    name: 't',
    source: 'generated',
    sampleRate: fs,
    length: Math.round(fs * seconds),
    channel: 0,
    channelCount: 1,
    format: null,
    startTime: 0,
    notes: [],
  };
}

describe('clampZoom', () => {
  it('keeps a span inside the signal and at least the minimum long; the whole signal is null', () => {
    expect(clampZoom([2, 3], 10, 0.01)).toEqual([2, 3]);
    expect(clampZoom([-1, 1], 10, 0.01)).toEqual([0, 2]);
    expect(clampZoom([9.5, 11], 10, 0.01)).toEqual([8.5, 10]);
    expect(clampZoom([3, 3], 10, 0.5)).toEqual([3, 3.5]);
    expect(clampZoom([5, 2], 10, 0.01)).toEqual([2, 5]);
    expect(clampZoom([-5, 20], 10, 0.01)).toBeNull();
  });
});

describe('setSignal', () => {
  it('shows the signal in the time region without touching the design or its history', () => {
    const store = createWorkbenchStore();
    const design = store.getState().design;
    store.getState().setSignal(signalInfo(2000, 1));
    const s = store.getState();
    expect(s.signal.region).toBe('recording');
    expect(s.design).toBe(design);
    expect(s.history.past).toHaveLength(0);
    s.setSignalZoom([0.2, 0.4]);
    expect(store.getState().signal.zoom).toEqual([0.2, 0.4]);
    s.clearSignal();
    expect(store.getState().signal.current).toBeNull();
    expect(store.getState().signal.region).toBe('test');
  });
});

describe('level read-out', () => {
  it("defaults to the demo's notches (50, 150, 250 Hz)", () => {
    const store = createWorkbenchStore();
    store.getState().setSignal(signalInfo(2000, 20));
    expectClose(selectLevelPlan(store.getState())!.frequenciesHz, [50, 150, 250], { abs: 1e-9 });
  });

  it('while a root is dragged, after is before + |H| at each fitted frequency', () => {
    const store = createWorkbenchStore();
    const fs = 2000;
    const x = makeTones(4 * fs, fs, [{ frequencyHz: 100, amplitude: 0.1 }]);
    const report = measureLevels(x, null, fs, [100]);
    const zpk = selectZpk(store.getState());
    const after = shapedLevels(report, zpk);
    const spectrum = welch(x, fs, { nperseg: 1024, scaling: 'spectrum' });
    const table = levelTableOf(report, after, spectrum, null, true);
    expect(table.shaped).toBe(true);
    const omega = Float64Array.of((2 * Math.PI * report.readings[0]!.fittedHz) / fs);
    const h = responseZpk(zpk, omega).magnitude[0]!;
    expect(table.report!.readings[0]!.changeDb!).toBeCloseTo(20 * Math.log10(h), 9);
  });

  it('a mains choice lists the harmonics below half the sample rate', () => {
    const store = createWorkbenchStore();
    store.getState().setSignal(signalInfo(400, 4));
    store.getState().setLevelChoice({ kind: 'mains', fundamentalHz: 60 });
    expect(selectLevelPlan(store.getState())!.frequenciesHz).toEqual([60, 120, 180]);
  });

  it('notch frequencies follow the recording rate, not the design rate (same angle)', () => {
    const zpk = {
      zeros: [{ re: Math.cos(Math.PI / 20), im: Math.sin(Math.PI / 20), multiplicity: 1 }],
      poles: [],
      gain: 1,
    };
    expectClose(notchFrequencies(zpk, 2000, 2000), [50], { abs: 1e-9 });
    expectClose(notchFrequencies(zpk, 2000, 48000), [1200], { abs: 1e-6 });
  });
});

describe('spectra', () => {
  it('auto segment aims at 1 Hz bins and keeps several segments', () => {
    expect(segmentLength({ window: 'hann', segment: 'auto' }, 48000, 480000)).toBe(65536);
    expect(segmentLength({ window: 'hann', segment: 'auto' }, 2000, 20000)).toBe(2048);
    expect(segmentLength({ window: 'hann', segment: 'auto' }, 48000, 48000)).toBe(8192);
    expect(segmentLength({ window: 'hann', segment: 1024 }, 48000, 480000)).toBe(1024);
  });

  it('the input shaped by |H|² (read off the display response) is close to the filtered signal’s own Welch estimate', () => {
    const store = createWorkbenchStore();
    const fs = 2000;
    const x = makeTones(20 * fs, fs, [
      { frequencyHz: 100, amplitude: 0.1 },
      { frequencyHz: 400, amplitude: 0.1 },
    ]);
    const options = { nperseg: 2048, scaling: 'spectrum' as const };
    const input = welch(x, fs, options);
    const exact = welch(filterSections(selectSections(store.getState()), x), fs, options);
    const shaped = shapedSpectrum(input, selectDisplayResponse(store.getState()));
    for (const hz of [100, 400]) {
      const k = Math.round(hz / exact.binWidthHz);
      // Steady tones: the filter scales each by |H| at its frequency, so both estimates agree (common practice).
      expectClose(10 * Math.log10(shaped.power[k]!), 10 * Math.log10(exact.power[k]!), { abs: 0.1 });
    }
  });
});

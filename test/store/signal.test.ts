import { describe, expect, it } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { clampZoom, type LoadedSignal } from '../../src/store/signal.ts';
import {
  notchFrequencies,
  segmentLength,
  selectInputSpectrum,
  selectLevelTable,
  selectLevelPlan,
  selectOutputSpectrum,
  selectSignalOutput,
  shapedSpectrum,
  selectSignalResponse,
} from '../../src/store/signalDerived.ts';
import { selectSections, selectZpk } from '../../src/store/derived.ts';
import { responseZpk } from '../../src/core/response/index.ts';
import { filterSections } from '../../src/core/time/filter.ts';
import { makeTones } from '../../src/core/signal/index.ts';
import { expectClose } from '../helpers/expectClose.ts';

function toneSignal(
  fs: number,
  seconds: number,
  tones: { frequencyHz: number; amplitude: number }[],
): LoadedSignal {
  const samples = makeTones(Math.round(fs * seconds), fs, tones);
  return {
    name: 't',
    source: 'generated',
    sampleRate: fs,
    samples,
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
    store.getState().setSignal(toneSignal(2000, 1, [{ frequencyHz: 50, amplitude: 0.1 }]));
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

describe('selectSignalOutput', () => {
  it('is the design cascade on the samples (filterSections, the time view path) and memoised', () => {
    const store = createWorkbenchStore();
    store.getState().setSignal(
      toneSignal(2000, 2, [
        { frequencyHz: 50, amplitude: 0.1 },
        { frequencyHz: 7, amplitude: 0.3 },
      ]),
    );
    const s = store.getState();
    const y = selectSignalOutput(s)!;
    const expected = filterSections(selectSections(s), s.signal.current!.samples);
    expect(Array.from(y)).toEqual(Array.from(expected)); // same arithmetic, bit for bit
    expect(selectSignalOutput(store.getState())).toBe(y);
  });
});

describe('level read-out', () => {
  it("defaults to the demo's notches (50, 150, 250 Hz) and reads the drop as |H| at each", () => {
    const store = createWorkbenchStore();
    store.getState().setSignal(
      toneSignal(2000, 20, [
        { frequencyHz: 50, amplitude: 0.1 },
        { frequencyHz: 150, amplitude: 0.05 },
        { frequencyHz: 7, amplitude: 0.3 },
      ]),
    );
    const s = store.getState();
    const plan = selectLevelPlan(s)!;
    expectClose(plan.frequenciesHz, [50, 150, 250], { abs: 1e-9 });
    const table = selectLevelTable(s)!;
    const changes = table.report!.readings;
    // A 0.1-amplitude tone reads −20 dB: a fit at the tone's frequency has no scalloping loss.
    expect(Math.abs(changes[0]!.beforeDb - -20)).toBeLessThan(0.01);
    expect(table.report!.count).toBe(40000);
    // Zeros on the circle remove the steady tones entirely; the Hann-weighted fit hardly sees the notch's
    // start-up ringing (τ ≈ 79 ms) at the record's start: far beyond the scenario's 40 dB.
    expect(changes[0]!.changeDb!).toBeLessThan(-40);
    expect(changes[1]!.changeDb!).toBeLessThan(-40);
    // No tone sits under the 250 Hz notch: the read-out finds nothing there, far below the tones.
    expect(changes[2]!.beforeDb).toBeLessThan(-100);
  });

  it('while a root is dragged, after is before + |H| at each frequency', () => {
    const store = createWorkbenchStore();
    store.getState().setSignal(toneSignal(2000, 4, [{ frequencyHz: 100, amplitude: 0.1 }]));
    store.getState().setLevelChoice({ kind: 'list', frequenciesHz: [100] });
    const settled = selectLevelTable(store.getState())!;
    store.setState({ dragging: true });
    const shaped = selectLevelTable(store.getState())!;
    expect(shaped.shaped).toBe(true);
    const omega = Float64Array.of((2 * Math.PI * 100) / 2000);
    const h = responseZpk(selectZpk(store.getState()), omega).magnitude[0]!;
    expect(shaped.report!.readings[0]!.changeDb!).toBeCloseTo(20 * Math.log10(h), 9);
    // a steady tone: the measured change agrees with |H| once the notch's ringing is past
    expect(settled.report!.readings[0]!.changeDb!).toBeCloseTo(20 * Math.log10(h), 2);
  });

  it('a mains choice lists the harmonics below half the sample rate', () => {
    const store = createWorkbenchStore();
    store.getState().setSignal(toneSignal(400, 4, [{ frequencyHz: 60, amplitude: 0.1 }]));
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

  it('during a drag the output spectrum is the input shaped by |H|², close to its own Welch estimate off the notches', () => {
    const store = createWorkbenchStore();
    store.getState().setSignal(
      toneSignal(2000, 20, [
        { frequencyHz: 100, amplitude: 0.1 },
        { frequencyHz: 400, amplitude: 0.1 },
      ]),
    );
    const exact = selectOutputSpectrum(store.getState())!;
    store.getState().setDragging(true);
    const dragging = store.getState();
    const shaped = selectOutputSpectrum(dragging)!;
    expect(shaped).toEqual(shapedSpectrum(selectInputSpectrum(dragging)!, selectSignalResponse(dragging)!));
    for (const hz of [100, 400]) {
      const k = Math.round(hz / exact.binWidthHz);
      // Steady tones: the filter scales each by |H| at its frequency, so both estimates agree (common practice).
      expectClose(10 * Math.log10(shaped.power[k]!), 10 * Math.log10(exact.power[k]!), { abs: 0.1 });
    }
  });
});

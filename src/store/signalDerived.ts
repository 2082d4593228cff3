/**
 * Derived data of the recording slice: the filtered signal, the Welch spectra before and after, the
 * design's response on the spectrum's bins and the levels at chosen frequencies. All computed by the
 * engine and memoised on the identity of their inputs, so a root drag refilters once per frame and the
 * input's spectrum is computed once per signal and setting.
 */
import type { Section, Zpk } from '../core/types.ts';
import { responseZpk, type FrequencyResponse } from '../core/response.ts';
import { rootReadouts } from '../core/readouts.ts';
import {
  createSectionFilter,
  levelChanges,
  nextPowerOfTwo,
  runSectionFilter,
  welch,
  type LevelChange,
  type WelchResult,
  type WindowName,
} from '../core/signal/index.ts';
import { selectSections, selectZpk } from './derived.ts';
import { memoLast } from './memo.ts';
import type { LevelChoice, LoadedSignal, SpectrumSettings } from './signal.ts';
import type { WorkbenchState } from './store.ts';

/** Bin width the automatic segment length aims for, Hz: fine enough to separate a drifting hum's harmonics. */
export const AUTO_BIN_HZ = 1;
/** The automatic segment keeps at least this many segments in the average, when the signal allows. */
export const AUTO_MIN_SEGMENTS = 4;
/** Shortest automatic segment, samples. */
export const AUTO_MIN_SEGMENT = 256;
/** Harmonics of a mains frequency read by default (fundamental included). */
export const MAINS_HARMONICS = 5;
/** Performance-mark names: the filter pass, and its start (a frame's stopwatch starts there). */
export const FILTER_MARK = 'pw-signal-filter';

/** The Welch segment length for the settings: as set, or a power of two near fs / AUTO_BIN_HZ. */
export function segmentLength(settings: SpectrumSettings, sampleRate: number, n: number): number {
  if (settings.segment !== 'auto') return settings.segment;
  const ideal = nextPowerOfTwo(Math.ceil(sampleRate / AUTO_BIN_HZ));
  let seg = ideal;
  while (seg > AUTO_MIN_SEGMENT && seg * AUTO_MIN_SEGMENTS > n) seg /= 2;
  return seg;
}

/** The signal filtered by the cascade from zero state (marks the pass for the page's timing). */
export function filterSignal(sections: readonly Section[], samples: Float64Array): Float64Array {
  const mark = typeof performance !== 'undefined' && typeof performance.mark === 'function';
  if (mark) performance.mark(`${FILTER_MARK}:start`);
  const out = runSectionFilter(createSectionFilter(sections), samples);
  if (mark) performance.measure(FILTER_MARK, `${FILTER_MARK}:start`);
  return out;
}

const outputOf = memoLast((sections: Section[], samples: Float64Array) => filterSignal(sections, samples));

const spectrumOf = (x: Float64Array, fs: number, window: WindowName, nperseg: number): WelchResult =>
  welch(x, fs, { window, nperseg, scaling: 'spectrum' });
const inputSpectrumOf = memoLast(spectrumOf);
const outputSpectrumOf = memoLast(spectrumOf);

/** The filtered recording, or null without one. */
export const selectSignalOutput = (s: WorkbenchState): Float64Array | null => {
  const cur = s.signal.current;
  return cur ? outputOf(selectSections(s), cur.samples) : null;
};

const segmentOf = (s: WorkbenchState, cur: LoadedSignal) =>
  segmentLength(s.signal.spectrum, cur.sampleRate, cur.samples.length);

/** Welch spectrum ('spectrum' scaling: a tone of amplitude A reads A²/2) of the recording before filtering. */
export const selectInputSpectrum = (s: WorkbenchState): WelchResult | null => {
  const cur = s.signal.current;
  if (!cur) return null;
  return inputSpectrumOf(cur.samples, cur.sampleRate, s.signal.spectrum.window, segmentOf(s, cur));
};

/**
 * The input's estimate times |H|² bin by bin: what the filtered spectrum tends to for a stationary signal
 * and segments long against the filter's memory. Used while a root is dragged, when a fresh Welch pass
 * per frame would be too slow on a long recording; the exact estimate follows on release.
 */
export function shapedSpectrum(input: WelchResult, response: FrequencyResponse): WelchResult {
  const power = new Float64Array(input.power.length);
  for (let k = 0; k < power.length; k++) power[k] = input.power[k]! * response.magnitude[k]! ** 2;
  return { ...input, power };
}
const shapedOf = memoLast(shapedSpectrum);

/**
 * The same estimate of the filtered recording; during a drag (`dragging`), the input's estimate shaped by
 * |H|² instead (see shapedSpectrum).
 */
export const selectOutputSpectrum = (s: WorkbenchState): WelchResult | null => {
  const cur = s.signal.current;
  if (!cur) return null;
  if (s.dragging) {
    const input = selectInputSpectrum(s);
    const response = selectSignalResponse(s);
    return input && response ? shapedOf(input, response) : null;
  }
  const y = selectSignalOutput(s);
  if (!y) return null;
  return outputSpectrumOf(y, cur.sampleRate, s.signal.spectrum.window, segmentOf(s, cur));
};

/** True while the output spectrum is the shaped approximation rather than its own Welch estimate. */
export const selectSpectrumIsShaped = (s: WorkbenchState): boolean => s.dragging && s.signal.current !== null;

const responseOnBins = memoLast((zpk: Zpk, frequencies: Float64Array, fs: number) => {
  const omega = new Float64Array(frequencies.length);
  for (let k = 0; k < omega.length; k++) omega[k] = (2 * Math.PI * frequencies[k]!) / fs;
  return responseZpk(zpk, omega);
});

/**
 * The design's response at the spectrum's bin frequencies, taken at the recording's sample rate (the
 * filter acts on samples, so a design at another rate acts at the same angles, other hertz).
 */
export const selectSignalResponse = (s: WorkbenchState): FrequencyResponse | null => {
  const spec = selectInputSpectrum(s);
  return spec ? responseOnBins(selectZpk(s), spec.frequencies, spec.sampleRate) : null;
};

/** Frequencies of the zeros on (or near) the unit circle, in Hz at sample rate fs, ascending, without 0 and fs/2. */
export function notchFrequencies(zpk: Zpk, designRate: number, fs: number): number[] {
  const found = rootReadouts(zpk, designRate)
    .filter((r) => r.kind === 'zero' && r.notchFrequencyHz !== undefined)
    .map((r) => (r.angleRad / (2 * Math.PI)) * fs)
    .filter((f) => f > 0 && f < fs / 2);
  return [...new Set(found)].sort((a, b) => a - b);
}

/** Harmonics 1..count of f0 below fs/2. */
export function mainsFrequencies(f0: number, fs: number, count = MAINS_HARMONICS): number[] {
  const out: number[] = [];
  for (let h = 1; h <= count && h * f0 < fs / 2; h++) out.push(h * f0);
  return out;
}

/** Where the read-out looks and why: the notches of the design, a mains series, or a typed list. */
export interface LevelPlan {
  frequenciesHz: number[];
  /** How the frequencies were chosen, for the read-out's caption. */
  reason: string;
}

const levelPlanOf = memoLast((choice: LevelChoice, zpk: Zpk, designRate: number, fs: number): LevelPlan => {
  if (choice.kind === 'list') {
    return {
      frequenciesHz: choice.frequenciesHz.filter((f) => f >= 0 && f <= fs / 2),
      reason: 'typed frequencies',
    };
  }
  if (choice.kind === 'mains') {
    return {
      frequenciesHz: mainsFrequencies(choice.fundamentalHz, fs),
      reason: `${choice.fundamentalHz} Hz and its harmonics`,
    };
  }
  const notches = notchFrequencies(zpk, designRate, fs);
  if (notches.length > 0) return { frequenciesHz: notches, reason: "the design's notches" };
  return {
    frequenciesHz: mainsFrequencies(50, fs),
    reason: '50 Hz and its harmonics (no notch in the design)',
  };
});

/** The frequencies the level read-out shows. */
export const selectLevelPlan = (s: WorkbenchState): LevelPlan | null => {
  const cur = s.signal.current;
  return cur ? levelPlanOf(s.signal.levels, selectZpk(s), s.design.sampleRate, cur.sampleRate) : null;
};

const changesOf = memoLast((before: WelchResult, after: WelchResult, plan: LevelPlan): LevelChange[] =>
  levelChanges(before, after, plan.frequenciesHz),
);

/** Levels (dB re amplitude 1, i.e. dBFS for audio) at the read-out frequencies before and after, with the change. */
export const selectLevelChanges = (s: WorkbenchState): LevelChange[] | null => {
  const before = selectInputSpectrum(s);
  const after = selectOutputSpectrum(s);
  const plan = selectLevelPlan(s);
  return before && after && plan ? changesOf(before, after, plan) : null;
};

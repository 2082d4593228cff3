/**
 * Derived data of the recording slice: the filtered signal, the Welch spectra before and after, the
 * design's response on the spectrum's bins and the levels at chosen frequencies. All computed by the
 * engine and memoised on the identity of their inputs, so a root drag refilters once per frame and the
 * input's spectrum is computed once per signal and setting.
 */
import type { Section, Zpk } from '../core/types.ts';
import { responseZpk, type FrequencyResponse } from '../core/response/index.ts';
import { rootFrequencyHz, rootReadouts } from '../core/readouts.ts';
import {
  createSectionFilter,
  fitTones,
  levelFloorDb,
  levelReadings,
  measureLevels,
  autoSegmentLength,
  runSectionFilter,
  welch,
  type LevelReading,
  type LevelReport,
  type ToneEstimate,
  type WelchResult,
  type WindowName,
} from '../core/signal/index.ts';
import { selectSections, selectZpk } from './derived.ts';
import { memoLast } from './memo.ts';
import type { LevelChoice, LoadedSignal, SpectrumSettings } from './signal.ts';
import type { WorkbenchState } from './store.ts';
import { hzGridToOmega } from '../core/units.ts';

/** Harmonics of a mains frequency read by default (fundamental included). */
export const MAINS_HARMONICS = 5;
/** Performance-mark names: the filter pass, and its start (a frame's stopwatch starts there). */
export const FILTER_MARK = 'pw-signal-filter';

/** The Welch segment length for the settings: as set, or the automatic one (autoSegmentLength). */
export function segmentLength(settings: SpectrumSettings, sampleRate: number, n: number): number {
  return settings.segment === 'auto' ? autoSegmentLength(sampleRate, n) : settings.segment;
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
  hzGridToOmega(frequencies, fs, omega);
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
    .map((r) => rootFrequencyHz(r.root, fs))
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

/** The level read-out: readings before and after, their noise floors, and how they were made. */
export interface LevelTableData {
  /** The readings and the method (null when they could not be made: see `error`). */
  report: LevelReport | null;
  error: string | null;
  /** Per reading, the level noise alone would read there (dB), before and after. */
  floors: { beforeDb: number; afterDb: number | null }[];
  /** True while a root is dragged: `after` is then before + 20·log10|H| at each frequency (steady state). */
  shaped: boolean;
}

type Before = { ok: true; report: LevelReport } | { ok: false; error: string };
const beforeLevelsOf = memoLast((samples: Float64Array, fs: number, plan: LevelPlan): Before => {
  try {
    return { ok: true, report: measureLevels(samples, null, fs, plan.frequenciesHz) };
  } catch (e) {
    return { ok: false, error: (e as Error).message };
  }
});
const fittedOf = memoLast((report: LevelReport) => report.readings.map((r) => r.fittedHz));
const afterLevelsOf = memoLast(
  (output: Float64Array, fs: number, fitted: number[]): ToneEstimate[] => fitTones(output, fs, fitted).tones,
);
const shapedLevelsOf = memoLast((report: LevelReport, zpk: Zpk): { levelDb: number }[] => {
  const omega = hzGridToOmega(
    report.readings.map((r) => r.fittedHz),
    report.sampleRate,
  );
  const h = responseZpk(zpk, omega).magnitude;
  return report.readings.map((r, i) => ({ levelDb: r.beforeDb + 20 * Math.log10(h[i]!) }));
});
const tableOf = memoLast(
  (
    report: LevelReport,
    after: readonly { levelDb: number }[] | null,
    inputSpectrum: WelchResult,
    outputSpectrum: WelchResult | null,
    shaped: boolean,
  ): LevelTableData => {
    const fitted = report.readings.map((r) => r.fittedHz);
    const readings: LevelReading[] = levelReadings(
      report.readings.map((r) => r.frequencyHz),
      fitted,
      report.readings.map((r) => ({ levelDb: r.beforeDb })),
      after,
    );
    const floor = (spec: WelchResult, f: number) =>
      levelFloorDb(
        spec,
        f,
        fitted.filter((g) => g !== f),
        report.count,
        report.weighting,
      );
    return {
      report: { ...report, readings },
      error: null,
      floors: fitted.map((f) => ({
        beforeDb: floor(inputSpectrum, f),
        afterDb: outputSpectrum ? floor(outputSpectrum, f) : null,
      })),
      shaped,
    };
  },
);

/**
 * Levels (dB re amplitude 1, i.e. dBFS for audio) at the read-out frequencies before and after, fitted over
 * the whole recording (see core/signal/levels.ts), with the noise floor at each; while a root is dragged the
 * after column is before + |H| (dB) at each frequency, measured again on release.
 */
export const selectLevelTable = (s: WorkbenchState): LevelTableData | null => {
  const cur = s.signal.current;
  const plan = selectLevelPlan(s);
  const input = selectInputSpectrum(s);
  if (!cur || !plan || !input) return null;
  const before = beforeLevelsOf(cur.samples, cur.sampleRate, plan);
  if (!before.ok) return { report: null, error: before.error, floors: [], shaped: false };
  const output = selectOutputSpectrum(s);
  if (s.dragging)
    return tableOf(before.report, shapedLevelsOf(before.report, selectZpk(s)), input, output, true);
  const y = selectSignalOutput(s);
  const after = y ? afterLevelsOf(y, cur.sampleRate, fittedOf(before.report)) : null;
  return tableOf(before.report, after, input, output, false);
};

/**
 * Derived data of the recording slice that the page computes itself: the Welch segment length the settings
 * give, where the level read-out looks, the filtered spectrum estimated from the recording's own (the input's
 * estimate times |H|², see shapedSpectrum), and the level read-out assembled from its parts. The recording's
 * samples, its filtered output, their Welch spectra and the tone fits over them are computed in the
 * recording worker (views/signal/recordingWorker.ts).
 */
import type { Zpk } from '../core/types.ts';
import { responseZpk, type FrequencyResponse } from '../core/response/index.ts';
import { rootFrequencyHz, rootReadouts } from '../core/readouts.ts';
import {
  autoSegmentLength,
  levelFloorDb,
  levelReadings,
  type LevelReading,
  type LevelReport,
  type WelchResult,
} from '../core/signal/index.ts';
import { selectZpk } from './derived.ts';
import { memoLast } from './memo.ts';
import type { LevelChoice, SpectrumSettings } from './signal.ts';
import type { WorkbenchState } from './store.ts';
import { hzGridToOmega } from '../core/units.ts';

/** Harmonics of a mains frequency read by default (fundamental included). */
export const MAINS_HARMONICS = 5;

/** The Welch segment length for the settings: as set, or the automatic one (autoSegmentLength). */
export function segmentLength(settings: SpectrumSettings, sampleRate: number, n: number): number {
  return settings.segment === 'auto' ? autoSegmentLength(sampleRate, n) : settings.segment;
}

/**
 * The input's estimate times |H|² bin by bin: what the filtered spectrum tends to for a stationary signal
 * and segments long against the filter's memory. |H| is read off `response` (any grid of angles in
 * increasing order, such as the display response refined at the roots, so a notch's depth is on it),
 * linearly between its points, at each bin's angle 2πf/fs: the filter acts on samples, so at the
 * recording's rate. Shown while a root is dragged and until the filtered recording's own estimate is in.
 */
export function shapedSpectrum(input: WelchResult, response: FrequencyResponse): WelchResult {
  const power = new Float64Array(input.power.length);
  const w = response.omega;
  const m = response.magnitude;
  const last = w.length - 1;
  const omegas = hzGridToOmega(input.frequencies, input.sampleRate);
  let j = 0;
  for (let k = 0; k < power.length; k++) {
    const omega = omegas[k]!;
    while (j < last && w[j + 1]! < omega) j++;
    let h: number;
    if (last < 0) h = 1;
    else if (omega <= w[0]!) h = m[0]!;
    else if (j >= last) h = m[last]!;
    else {
      const t = (omega - w[j]!) / (w[j + 1]! - w[j]!);
      h = m[j]! + t * (m[j + 1]! - m[j]!);
    }
    power[k] = input.power[k]! * h * h;
  }
  return { ...input, power };
}

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

/** After levels while a root is dragged: before + 20·log10|H| at each fitted frequency (steady state). */
export const shapedLevels = memoLast((report: LevelReport, zpk: Zpk): { levelDb: number }[] => {
  const omega = hzGridToOmega(
    report.readings.map((r) => r.fittedHz),
    report.sampleRate,
  );
  const h = responseZpk(zpk, omega).magnitude;
  return report.readings.map((r, i) => ({ levelDb: r.beforeDb + 20 * Math.log10(h[i]!) }));
});
/** The read-out from its parts (memoised on their identity). */
export const levelTableOf = memoLast(
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

/**
 * Level of a sinusoid read from a 'spectrum'-scaled Welch estimate. With that scaling a sinusoid of
 * amplitude A whose frequency sits on a bin reads A²/2 in that bin, so its amplitude in dB is
 * 10·log10(2·P_peak): dB re amplitude 1, which for normalised audio samples is dB re a full-scale sine
 * (dBFS). Off-bin tones read low by up to the window's scalloping loss (see windows.ts); the flat-top window
 * keeps that under 0.01 dB. The peak is searched within a few bins of the asked frequency, so a tone that
 * drifts (mains hum) is still found.
 */
import type { WelchResult } from './welch.ts';

/** Bins either side of the asked frequency searched for the peak, beyond the window's own half-width. */
export const LEVEL_SEARCH_BINS = 2;

/** The level found near one asked frequency. */
export interface ToneLevel {
  /** The frequency asked for, in Hz. */
  frequencyHz: number;
  /** Centre of the bin where the peak was found, in Hz. */
  peakHz: number;
  /** Index of that bin. */
  bin: number;
  /** Amplitude in dB re 1 (dBFS for normalised samples); −Infinity when the bins hold no power. */
  levelDb: number;
}

/** The level of each asked frequency before and after filtering, and the change in dB. */
export interface LevelChange {
  frequencyHz: number;
  beforeDb: number;
  afterDb: number;
  /** afterDb − beforeDb: negative when the filter took level away. */
  changeDb: number;
}

/**
 * Reads the amplitude, in dB re 1, of the strongest component within searchBins bins of each frequency
 * (Hz) in a 'spectrum'-scaled estimate. Frequencies outside 0..fs/2 are an error.
 */
export function toneLevels(
  spectrum: WelchResult,
  frequenciesHz: readonly number[],
  searchBins = LEVEL_SEARCH_BINS,
): ToneLevel[] {
  if (spectrum.scaling !== 'spectrum') {
    throw new Error(`toneLevels: needs a 'spectrum'-scaled estimate; got '${spectrum.scaling}'`);
  }
  const { power, binWidthHz, sampleRate } = spectrum;
  const last = power.length - 1;
  return frequenciesHz.map((f) => {
    if (!(f >= 0 && f <= sampleRate / 2)) {
      throw new Error(`toneLevels: ${f} Hz is outside 0 to ${sampleRate / 2} Hz (half the sample rate)`);
    }
    const centre = Math.round(f / binWidthHz);
    let best = Math.max(0, centre - searchBins);
    for (let k = best + 1; k <= Math.min(last, centre + searchBins); k++)
      if (power[k]! > power[best]!) best = k;
    return { frequencyHz: f, peakHz: best * binWidthHz, bin: best, levelDb: binLevelDb(spectrum, best) };
  });
}

/** Amplitude in dB re 1 of a sinusoid read from one bin of a 'spectrum'-scaled estimate. */
export function binLevelDb(spectrum: WelchResult, bin: number): number {
  const p = spectrum.power[bin] ?? 0;
  // DC and (for even nfft) Nyquist have no negative-frequency twin: the sinusoid reads A² there, not A²/2.
  const edge = bin === 0 || (bin === spectrum.power.length - 1 && spectrum.nfft % 2 === 0);
  return p > 0 ? 10 * Math.log10(edge ? p : 2 * p) : -Infinity;
}

/**
 * Levels at the same frequencies in two 'spectrum'-scaled estimates with the same bins (before and after a
 * filter), in dB. The peak is found in `before`; `after` is read in that same bin, so a notched tone reads
 * its own remains rather than the strongest neighbour.
 */
export function levelChanges(
  before: WelchResult,
  after: WelchResult,
  frequenciesHz: readonly number[],
  searchBins = LEVEL_SEARCH_BINS,
): LevelChange[] {
  if (before.nfft !== after.nfft || before.sampleRate !== after.sampleRate) {
    throw new Error('levelChanges: the two estimates must share the sample rate and transform length');
  }
  return toneLevels(before, frequenciesHz, searchBins).map((x) => {
    const afterDb = binLevelDb(after, x.bin);
    return { frequencyHz: x.frequencyHz, beforeDb: x.levelDb, afterDb, changeDb: afterDb - x.levelDb };
  });
}

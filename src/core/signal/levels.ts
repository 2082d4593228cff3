/**
 * Levels of tones at chosen frequencies, before and after a filter: the frequency is first looked for near
 * the asked one in the record before filtering (toneSearch.ts; hum drifts), then sinusoids at the found
 * frequencies are fitted jointly by least squares over the whole span (toneFit.ts) in both records. Such a
 * reading has no scalloping loss wherever the tone falls between the spectrum's bins, and its bandwidth is
 * that of the whole span (about 1.5/T Hz with the Hann weight), far narrower than a spectrum bin, so a notched
 * tone's remains stand out of the noise a spectrum bin would add to them. Levels are in dB re amplitude 1:
 * for samples with full scale 1, dB re a full-scale sine (dBFS).
 */
import { ToneFitAccumulator, type FitWeighting } from './toneFit.ts';
import { ToneSearchAccumulator } from './toneSearch.ts';
import type { WelchResult } from './welch.ts';

/** Default search half-width around each asked frequency, as a fraction of it (±0.5 %: ±0.25 Hz at 50 Hz). */
export const LEVEL_SEARCH_FRACTION = 0.005;
/** A reading closer than this to the local noise floor is marked uncertain, dB. */
export const LEVEL_FLOOR_MARGIN_DB = 10;

/** How the levels are read. */
export interface LevelOptions {
  /** Weight of the fit over the span (default 'hann'). */
  weighting?: FitWeighting;
  /** Search half-width as a fraction of each frequency; 0 fits exactly at the asked frequencies. */
  search?: number;
  /** First sample and sample count of the span (default: the whole record). */
  start?: number;
  count?: number;
}

/** One frequency's levels. */
export interface LevelReading {
  /** The frequency asked for, Hz. */
  frequencyHz: number;
  /** The frequency the tone was found at and fitted at, Hz. */
  fittedHz: number;
  /** Amplitude before and after, dB re 1 (after: null when there is no filtered record). */
  beforeDb: number;
  afterDb: number | null;
  /** afterDb − beforeDb: negative when the filter took level away. */
  changeDb: number | null;
}

/** The readings and how they were made. */
export interface LevelReport {
  readings: LevelReading[];
  sampleRate: number;
  weighting: FitWeighting;
  search: number;
  /** The span fitted: first sample and sample count. */
  start: number;
  count: number;
}

/** The search half-widths (Hz) for the asked frequencies. */
export function searchWidths(frequenciesHz: readonly number[], fraction: number): number[] {
  return frequenciesHz.map((f) => f * fraction);
}

/**
 * The found frequencies, made safe to fit jointly: where two found frequencies came closer than twice the
 * span's resolution (both searches landed on one tone), the asked ones are kept for those two.
 */
export function settleFound(
  asked: readonly number[],
  found: readonly number[],
  resolutionHz: number,
): number[] {
  return found.map((f, i) =>
    found.some((g, j) => j !== i && Math.abs(g - f) < 2 * resolutionHz) ? asked[i]! : f,
  );
}

/** Adds the readings' fitted amplitudes from before/after fits at the same frequencies. */
export function levelReadings(
  asked: readonly number[],
  fitted: readonly number[],
  before: readonly { levelDb: number }[],
  after: readonly { levelDb: number }[] | null,
): LevelReading[] {
  return asked.map((f, i) => {
    const b = before[i]!.levelDb;
    const a = after ? after[i]!.levelDb : null;
    return {
      frequencyHz: f,
      fittedHz: fitted[i]!,
      beforeDb: b,
      afterDb: a,
      changeDb: a === null ? null : a - b,
    };
  });
}

/**
 * Levels at the frequencies (0..fs/2) in the record `before` and, when given, the same span of `after`
 * (the record filtered), at sample rate fs. Throws a RangeError for frequencies outside 0..fs/2, an empty
 * span, or frequencies too close to tell apart in the span.
 */
export function measureLevels(
  before: Float64Array,
  after: Float64Array | null,
  sampleRate: number,
  frequenciesHz: readonly number[],
  options: LevelOptions = {},
): LevelReport {
  const start = options.start ?? 0;
  const count = options.count ?? before.length - start;
  if (!(count >= 1 && start >= 0 && start + count <= before.length))
    throw new RangeError(
      `the span ${start}..${start + count} is not inside the ${before.length}-sample record`,
    );
  const weighting = options.weighting ?? 'hann';
  const search = options.search ?? LEVEL_SEARCH_FRACTION;
  const span = before.subarray(start, start + count);
  let fitted = [...frequenciesHz];
  if (search > 0) {
    const s = new ToneSearchAccumulator(sampleRate, frequenciesHz, searchWidths(frequenciesHz, search));
    s.push(span);
    fitted = settleFound(frequenciesHz, s.result(), sampleRate / count);
  }
  const fit = (x: Float64Array) => {
    const acc = new ToneFitAccumulator(sampleRate, fitted, count, weighting);
    acc.push(x);
    return acc.result().tones;
  };
  const b = fit(span);
  const a = after ? fit(after.subarray(start, start + count)) : null;
  return {
    readings: levelReadings(frequenciesHz, fitted, b, a),
    sampleRate,
    weighting,
    search,
    start,
    count,
  };
}

/** The method and span of a report in words, for captions. */
export function levelMethod(
  r: Pick<LevelReport, 'sampleRate' | 'weighting' | 'search' | 'start' | 'count'>,
): string {
  const t0 = r.start / r.sampleRate;
  const t1 = (r.start + r.count) / r.sampleRate;
  const secs = (t: number) => `${Number(t.toPrecision(4))} s`;
  const weight = r.weighting === 'hann' ? 'Hann-weighted ' : '';
  const search =
    r.search > 0
      ? `, each frequency first searched within ±${Number((100 * r.search).toPrecision(3))} %`
      : ', exactly at the asked frequencies';
  return (
    `${weight}least-squares fit of sinusoids (jointly, with a constant) over ${secs(t0)}–${secs(t1)} ` +
    `(${r.count} samples)${search}`
  );
}

/**
 * The level, dB re amplitude 1, that noise alone would read at f in a fit over `count` samples, from the
 * local density of a 'spectrum'-scaled Welch estimate: E[A²] = 2·S·B with S the one-sided density near f
 * (the median of the bins within ±10 of f, leaving out ±3 bins around f and around the other frequencies,
 * each bin being S times the window's noise bandwidth) and B the fit's noise bandwidth, fs·Σw²/(Σw)² (fs/N
 * unweighted, 1.5·fs/N Hann-weighted). −Infinity when the neighbourhood holds no power.
 */
export function levelFloorDb(
  spectrum: WelchResult,
  frequencyHz: number,
  others: readonly number[],
  count: number,
  weighting: FitWeighting,
): number {
  const { power, binWidthHz, enbwHz, sampleRate } = spectrum;
  const centre = Math.round(frequencyHz / binWidthHz);
  const near = (k: number, f: number) => Math.abs(k - f / binWidthHz) <= 3;
  const bins: number[] = [];
  for (let k = Math.max(1, centre - 10); k <= Math.min(power.length - 2, centre + 10); k++)
    if (!near(k, frequencyHz) && !others.some((g) => near(k, g))) bins.push(power[k]!);
  if (bins.length === 0) return -Infinity;
  bins.sort((x, y) => x - y);
  const density = bins[Math.floor(bins.length / 2)]! / enbwHz;
  const bandwidth = ((weighting === 'hann' ? 1.5 : 1) * sampleRate) / count;
  const ms = 2 * density * bandwidth;
  return ms > 0 ? 10 * Math.log10(ms) : -Infinity;
}

/**
 * What a mask can judge: anything whose magnitude in dB can be read at frequencies in Hz. A zeros/poles/gain
 * system or a cascade of sections can be read anywhere (so worst points are refined between grid points);
 * a sampled response only at its samples (between them the mask reads straight lines in dB).
 */
import type { Section, Zpk } from '../types.ts';
import { sectionsToZpk } from '../system/index.ts';
import { rootFrequencyHz } from '../readouts.ts';
import { magnitudeDbReader, magnitudeDbZpk } from '../response/magnitude.ts';
import { hzGridToOmega, hzToOmega, omegaGridToHz } from '../units.ts';

/** A magnitude response readable at frequencies in Hz. */
export interface MagnitudeSource {
  /** Writes the response in dB at each frequency of `hz` into `out`. */
  readDb(hz: Float64Array, out: Float64Array): void;
  /** The response in dB at one frequency, Hz; absent when the source cannot be read between its samples. */
  readDbAt?: (hz: number) => number;
  /**
   * Frequencies (Hz) where narrow features sit: the angles of the roots, or every sample of a sampled
   * response. Each one inside a region is added to that region's grid.
   */
  featuresHz: readonly number[];
  /** True when the grid may be spread evenly over a region (the source is defined between features). */
  continuous: boolean;
}

/** Frequencies of the roots in Hz at sample rate fs, in [0, fs/2]. */
function rootAnglesHz(zpk: Zpk, fs: number): number[] {
  return [...zpk.zeros, ...zpk.poles].map((r) => rootFrequencyHz(r, fs));
}

/** A zeros/poles/gain system at sample rate fs (Hz), read from its product form. */
export function zpkSource(zpk: Zpk, fs: number): MagnitudeSource {
  let omega = new Float64Array(0);
  const at = magnitudeDbReader(zpk);
  return {
    readDb(hz, out) {
      if (omega.length < hz.length) omega = new Float64Array(hz.length);
      magnitudeDbZpk(zpk, hzGridToOmega(hz, fs, omega.subarray(0, hz.length)), out);
    },
    readDbAt: (hz) => at(hzToOmega(hz, fs)),
    featuresHz: rootAnglesHz(zpk, fs),
    continuous: true,
  };
}

/** A cascade of second-order sections (e.g. with quantized coefficients) at sample rate fs (Hz). */
export function sectionsSource(sections: readonly Section[], fs: number): MagnitudeSource {
  return zpkSource(sectionsToZpk(sections), fs);
}

/** Any magnitude function of frequency: `db(hz)` in dB at hz in Hz (featuresHz: where to look closely). */
export function functionSource(
  db: (hz: number) => number,
  featuresHz: readonly number[] = [],
): MagnitudeSource {
  return {
    readDb(hz, out) {
      for (let i = 0; i < hz.length; i++) out[i] = db(hz[i]!);
    },
    readDbAt: db,
    featuresHz,
    continuous: true,
  };
}

/**
 * A response known only at samples: magnitude in dB at frequencies omega (radians per sample, increasing),
 * e.g. a FrequencyResponse's omega and magnitudeDb. Between samples it reads a straight line in dB, so
 * every sample in a region is judged and the edges are interpolated; nothing finer is seen.
 */
export function sampledSource(
  omega: ArrayLike<number>,
  magnitudeDb: ArrayLike<number>,
  fs: number,
): MagnitudeSource {
  const n = Math.min(omega.length, magnitudeDb.length);
  const hzOf = omegaGridToHz(omega, fs).subarray(0, n);
  const at = (f: number): number => {
    if (n === 0) return NaN;
    if (f <= hzOf[0]!) return magnitudeDb[0]!;
    if (f >= hzOf[n - 1]!) return magnitudeDb[n - 1]!;
    let lo = 0;
    let hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (hzOf[mid]! <= f) lo = mid;
      else hi = mid;
    }
    const a = magnitudeDb[lo]!;
    const b = magnitudeDb[hi]!;
    if (f === hzOf[lo]) return a;
    const t = (f - hzOf[lo]!) / (hzOf[hi]! - hzOf[lo]!);
    // A non-finite sample (−Infinity at a zero on the circle) cannot be interpolated: take the nearer sample.
    if (!Number.isFinite(a) || !Number.isFinite(b)) return t < 0.5 ? a : b;
    return a + t * (b - a);
  };
  return {
    readDb(hz, out) {
      for (let i = 0; i < hz.length; i++) out[i] = at(hz[i]!);
    },
    featuresHz: Array.from(hzOf),
    continuous: false,
  };
}

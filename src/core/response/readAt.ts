/** Exact read-outs at one frequency: the engine evaluates the current system there, not the nearest grid point. */
import type { Zpk } from '../types.ts';
import { responseZpk } from './zpkResponse.ts';
import { hzToOmega, type Hertz } from '../units.ts';

export interface FrequencyReading {
  hz: number;
  /** |H|, linear. */
  magnitude: number;
  /** 20·log10|H|, −∞ exactly at a zero on the circle. */
  magnitudeDb: number;
  /** Phase wrapped to (−π, π], radians. */
  phase: number;
  /** Phase on the same continuous branch the unwrapped plot uses, radians. */
  phaseUnwrapped: number;
  /** Group delay, samples. */
  groupDelay: number;
  /** Group delay, milliseconds at the design's sample rate. */
  groupDelayMs: number;
}

/** Every read-out at frequency hz (Hz) for system zpk sampled at fs (Hz). */
export function readAt(zpk: Zpk, fs: Hertz, hz: Hertz): FrequencyReading {
  const r = responseZpk(zpk, Float64Array.of(hzToOmega(hz, fs)));
  const gd = r.groupDelay[0]!;
  return {
    hz,
    magnitude: r.magnitude[0]!,
    magnitudeDb: r.magnitudeDb[0]!,
    phase: r.phase[0]!,
    phaseUnwrapped: r.phaseUnwrapped[0]!,
    groupDelay: gd,
    groupDelayMs: (gd * 1000) / fs,
  };
}

/** A frequency-domain requirement: pass-band and stop-band edges in Hz with ripple and attenuation in dB. */
import type { BandShape } from './iir.ts';

/** What a filter must meet; band shapes take two edges per band, low-/high-pass one. */
export interface Requirement {
  response: BandShape;
  /** Pass-band edge(s), Hz: one for low-/high-pass, [low, high] for band-pass/-stop. */
  passbandHz: readonly number[];
  /** Stop-band edge(s), Hz, likewise. */
  stopbandHz: readonly number[];
  /** Largest loss allowed in the pass band, dB (> 0). */
  rippleDb: number;
  /** Smallest attenuation required in the stop band, dB (> rippleDb). */
  attenuationDb: number;
  /** Sample rate, Hz. */
  fs: number;
}

/** The frequency intervals [lo, hi] in Hz covered by the pass band(s) and stop band(s) of a requirement. */
export function requirementRegions(req: Requirement): { pass: [number, number][]; stop: [number, number][] } {
  const nyq = req.fs / 2;
  const p = req.passbandHz;
  const s = req.stopbandHz;
  switch (req.response) {
    case 'lowpass':
      return { pass: [[0, p[0]!]], stop: [[s[0]!, nyq]] };
    case 'highpass':
      return { pass: [[p[0]!, nyq]], stop: [[0, s[0]!]] };
    case 'bandpass':
      return {
        pass: [[p[0]!, p[1]!]],
        stop: [
          [0, s[0]!],
          [s[1]!, nyq],
        ],
      };
    case 'bandstop':
      return {
        pass: [
          [0, p[0]!],
          [p[1]!, nyq],
        ],
        stop: [[s[0]!, s[1]!]],
      };
  }
}

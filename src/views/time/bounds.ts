/** The rules of the time view's number fields (read by the one reader of typed numbers), and their messages. */
import { TIME_SAMPLES_MAX, TIME_SAMPLES_MIN } from '../../core/model/limits.ts';
import type { NumberFieldRule } from '../shared/fieldReading.ts';

/** A whole number of samples in [TIME_SAMPLES_MIN, TIME_SAMPLES_MAX]. */
export const samplesRule: NumberFieldRule = {
  typedUnit: 'samples',
  check: (v) => {
    if (!Number.isInteger(v)) return 'Use a whole number of samples';
    if (v < TIME_SAMPLES_MIN || v > TIME_SAMPLES_MAX)
      return `Samples must be ${TIME_SAMPLES_MIN} … ${TIME_SAMPLES_MAX}`;
    return null;
  },
};

/** A sinusoid frequency in Hz in [0, fs/2] (Nyquist). */
export function sineHzRule(fs: number): NumberFieldRule {
  return {
    typedUnit: 'Hz',
    check: (v) =>
      v >= 0 && v <= fs / 2 ? null : `Frequency must be 0 … ${fs / 2} Hz (half the sample rate)`,
  };
}

/** Accepted values of the time view's number fields, and the messages shown for anything else. */
import { TIME_SAMPLES_MAX, TIME_SAMPLES_MIN } from '../../core/model/limits.ts';

export type Checked = { ok: true; value: number } | { ok: false; message: string };

/** A whole number of samples in [TIME_SAMPLES_MIN, TIME_SAMPLES_MAX], from what the user typed. */
export function checkSamples(text: string): Checked {
  const v = Number(text.trim());
  if (text.trim() === '' || !Number.isFinite(v))
    return { ok: false, message: `“${text}” is not a number of samples` };
  if (!Number.isInteger(v)) return { ok: false, message: 'Use a whole number of samples' };
  if (v < TIME_SAMPLES_MIN || v > TIME_SAMPLES_MAX) {
    return { ok: false, message: `Samples must be ${TIME_SAMPLES_MIN} … ${TIME_SAMPLES_MAX}` };
  }
  return { ok: true, value: v };
}

/** A sinusoid frequency in Hz in [0, fs/2] (Nyquist), from what the user typed. */
export function checkSineHz(text: string, fs: number): Checked {
  const v = Number(text.trim());
  if (text.trim() === '' || !Number.isFinite(v))
    return { ok: false, message: `“${text}” is not a frequency in Hz` };
  if (v < 0 || v > fs / 2)
    return { ok: false, message: `Frequency must be 0 … ${fs / 2} Hz (half the sample rate)` };
  return { ok: true, value: v };
}

/**
 * The bit-exact run's inputs as the Target page reads them: samples typed or pasted (a list of typed numbers:
 * commas, spaces or lines between), and the rules of its number fields.
 */
import { readNumberList } from '../../../core/parse/typedNumber.ts';
import { formatNumber } from '../../shared/format.ts';
import type { NumberFieldRule } from '../../shared/fieldReading.ts';

/** Most samples accepted from the box. */
export const MAX_TYPED_SAMPLES = 65536;
/** Longest run offered, samples (the run is repeated on every change of the design). */
export const MAX_RUN_SAMPLES = 65536;

export type TypedSamples = { ok: true; values: number[] } | { ok: false; message: string };

/** The numbers in the text, or what was wrong (which item, what is accepted). */
export function readTypedSamples(text: string): TypedSamples {
  const r = readNumberList(text);
  if (!r.ok)
    return {
      ok: false,
      message:
        r.index < 0
          ? 'Type or paste at least one sample, e.g. 0.5, 0, -0.25.'
          : `I${r.message.slice(1)}; use numbers with a point for decimals (full scale is ±1).`,
    };
  if (r.values.length > MAX_TYPED_SAMPLES)
    return {
      ok: false,
      message: `${r.values.length} samples is too many; at most ${MAX_TYPED_SAMPLES} are run.`,
    };
  return { ok: true, values: r.values };
}

/** The run's length: a whole number of samples. */
export const runLengthRule: NumberFieldRule = {
  typedUnit: 'samples',
  check: (x) =>
    Number.isInteger(x) && x >= 1 && x <= MAX_RUN_SAMPLES
      ? null
      : `Type a whole number of samples from 1 to ${MAX_RUN_SAMPLES}.`,
};

/** The input's level (amplitude, or standard deviation for noise) in full scales. */
export const runLevelRule: NumberFieldRule = {
  check: (x) => (x > 0 && x <= 2 ? null : 'Type a level above 0 and at most 2 (1 is full scale).'),
};

/** The sine input's frequency, Hz, up to Nyquist at sample rate fs. */
export function runSineRule(fs: number): NumberFieldRule {
  return {
    typedUnit: 'Hz',
    check: (x) =>
      x >= 0 && x <= fs / 2 ? null : `Type a frequency from 0 to ${formatNumber(fs / 2)} Hz (Nyquist).`,
  };
}

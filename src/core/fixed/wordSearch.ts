/** Search for the smallest coefficient word length that keeps the quantized filter stable and acceptable. */
import type { Section, Zpk } from '../types.ts';
import { buildImplementation, cascadeFor, type Implementation } from './implementation.ts';
import { MAX_WORD_LENGTH, MIN_WORD_LENGTH, type ImplementationSettings } from './settings.ts';

/** A requirement on the quantized filter, e.g. "inside the mask"; gets the zpk with the output gain restored. */
export type QuantizedCheck = (quantized: {
  zpk: Zpk;
  sections: Section[];
  implementation: Implementation;
}) => boolean;

/** One word length tried. */
export interface WordLengthTrial {
  wordLength: number;
  fractionBits: number;
  stable: boolean;
  /** The requirement's verdict (true when no requirement was given); false when not stable, unchecked. */
  accepted: boolean;
  maxPoleRadius: number;
}

/** The outcome of the search. */
export interface WordLengthSearch {
  /** Smallest word length that is stable and accepted, or null when none in the range is. */
  wordLength: number | null;
  /** Whether every longer word in the range passes too (quantization effects need not shrink monotonically). */
  longerAllPass: boolean;
  trials: WordLengthTrial[];
}

/**
 * Tries every coefficient word length from `min` to `max` bits (default 8..32) with the other settings kept
 * (a fixed fraction-bit count keeps its integer bits: F = W − 1 − (W₀ − 1 − F₀)); the accumulator widens when
 * a product would not fit it. Reports the smallest that gives a stable filter the check accepts.
 */
export function smallestWordLength(
  zpk: Zpk,
  sampleRate: number,
  settings: ImplementationSettings,
  check?: QuantizedCheck,
  range: { min?: number; max?: number } = {},
): WordLengthSearch {
  const min = range.min ?? MIN_WORD_LENGTH;
  const max = range.max ?? MAX_WORD_LENGTH;
  const intBits = settings.fractionBits === 'auto' ? null : settings.wordLength - 1 - settings.fractionBits;
  const trials: WordLengthTrial[] = [];
  const cascade = cascadeFor(zpk, settings);
  for (let w = min; w <= max; w++) {
    const fractionBits = intBits === null ? 'auto' : Math.max(0, w - 1 - intBits);
    const accumulatorBits = Math.min(64, Math.max(settings.accumulatorBits, settings.dataWordLength + w - 1));
    const built = buildImplementation(
      zpk,
      sampleRate,
      { ...settings, wordLength: w, fractionBits, accumulatorBits },
      cascade,
    );
    if (!built.ok) throw new RangeError(built.error.message);
    const impl = built.value;
    const stable = impl.stability.verdict === 'stable';
    const accepted =
      stable &&
      (check
        ? check({ zpk: impl.quantizedZpk, sections: impl.quantized.sections, implementation: impl })
        : true);
    trials.push({
      wordLength: w,
      fractionBits: impl.quantized.format.fractionBits,
      stable,
      accepted,
      maxPoleRadius: impl.stability.maxPoleRadius,
    });
  }
  const first = trials.findIndex((t) => t.accepted);
  return {
    wordLength: first < 0 ? null : trials[first]!.wordLength,
    longerAllPass: first >= 0 && trials.slice(first).every((t) => t.accepted),
    trials,
  };
}

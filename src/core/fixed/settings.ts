/** How a design is implemented on the target: structure, word lengths, Q format, rounding, overflow, scaling. */
import type { GainDistribution, ScalingNorm, SectionOrdering } from '../sections/index.ts';
import type { SectionPairing } from '../system/index.ts';
import type { InputError, Result } from '../types.ts';

/** Direct form I (x and y delay lines per section) or transposed direct form II (two wide states per section). */
export type Structure = 'df1' | 'df2t';
/** 'nearest': round half an LSB up (ties toward +∞); 'truncate': drop the low bits (toward −∞, two's complement). */
export type Rounding = 'nearest' | 'truncate';
/** 'saturate': clamp to the largest code of the right sign; 'wrap': two's-complement wraparound. */
export type Overflow = 'saturate' | 'wrap';
/** Sign of the stored a1, a2: as in the denominator A(z) (subtracted), or negated (added). */
export type FeedbackSign = 'denominator' | 'negated';

/** Everything that decides the fixed-point filter. */
export interface ImplementationSettings {
  structure: Structure;
  /** Coefficient word length W in bits, sign included (8..32). */
  wordLength: number;
  /** Coefficient fraction bits F (0..W−1), or 'auto': the most that let the largest coefficient fit. */
  fractionBits: 'auto' | number;
  /** Data word D in bits (8..32): samples between sections are Q0.(D−1), values in [−1, 1). */
  dataWordLength: number;
  /** Accumulator width in bits (D+W−1..64): products and sums are held and wrapped/saturated at this width. */
  accumulatorBits: number;
  rounding: Rounding;
  overflow: Overflow;
  scaling: ScalingNorm;
  ordering: SectionOrdering;
  gainDistribution: GainDistribution;
  pairing: SectionPairing;
  feedbackSign: FeedbackSign;
  /**
   * For an FIR design (every pole at the origin), which FIR form runs its taps (core/fixed/fir.ts); absent:
   * the symmetric form when the taps allow it, the direct form otherwise. Sections ignore it.
   */
  firForm?: 'direct' | 'symmetric';
}

/** A 16-bit target: 16-bit coefficients and data, 32-bit accumulator, rounding, saturation, L∞ scaling. */
export const DEFAULT_IMPLEMENTATION: ImplementationSettings = {
  structure: 'df2t',
  wordLength: 16,
  fractionBits: 'auto',
  dataWordLength: 16,
  accumulatorBits: 40,
  rounding: 'nearest',
  overflow: 'saturate',
  scaling: 'linf',
  ordering: 'ascending',
  gainDistribution: 'first',
  pairing: 'nearest',
  feedbackSign: 'denominator',
};

export const MIN_WORD_LENGTH = 8;
export const MAX_WORD_LENGTH = 32;
export const MAX_ACCUMULATOR_BITS = 64;

const isInt = (v: number, lo: number, hi: number) => Number.isInteger(v) && v >= lo && v <= hi;

/** Checks the settings; the error says which field was wrong and what is accepted. */
export function validateSettings(s: ImplementationSettings): Result<ImplementationSettings> {
  const fail = (message: string, expected: string): Result<ImplementationSettings> => {
    const error: InputError = { message, expected };
    return { ok: false, error };
  };
  const words = `a whole number from ${MIN_WORD_LENGTH} to ${MAX_WORD_LENGTH}`;
  if (!isInt(s.wordLength, MIN_WORD_LENGTH, MAX_WORD_LENGTH))
    return fail(`coefficient word length ${s.wordLength} is out of range`, words);
  if (!isInt(s.dataWordLength, MIN_WORD_LENGTH, MAX_WORD_LENGTH))
    return fail(`data word length ${s.dataWordLength} is out of range`, words);
  if (s.fractionBits !== 'auto' && !isInt(s.fractionBits, 0, s.wordLength - 1))
    return fail(
      `fraction bits ${s.fractionBits} do not fit a ${s.wordLength}-bit word`,
      `'auto' or a whole number from 0 to ${s.wordLength - 1}`,
    );
  if (s.firForm !== undefined && s.firForm !== 'direct' && s.firForm !== 'symmetric')
    return fail(`unknown FIR form "${String(s.firForm)}"`, "'direct' or 'symmetric'");
  const product = s.dataWordLength + s.wordLength - 1;
  if (!isInt(s.accumulatorBits, product, MAX_ACCUMULATOR_BITS))
    return fail(
      `a ${s.accumulatorBits}-bit accumulator cannot hold a ${s.dataWordLength}×${s.wordLength}-bit product (${product} bits)`,
      `a whole number from ${product} to ${MAX_ACCUMULATOR_BITS}`,
    );
  return { ok: true, value: s };
}

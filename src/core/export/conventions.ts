/** The conventions of an export, stated in words; every format prints these lines. */
import { designHash } from './hash.ts';
import { qName, type Implementation } from '../fixed/index.ts';

/** The structure's name in words. */
export function structureName(impl: Implementation): string {
  return impl.settings.structure === 'df1' ? 'direct form I' : 'transposed direct form II';
}

const ROUNDING_WORDS = {
  nearest: 'round to nearest, ties toward +infinity (add bit n-1 of the accumulator after the shift)',
  truncate: 'truncate toward -infinity (arithmetic right shift, low bits dropped)',
} as const;

const OVERFLOW_WORDS = {
  saturate: 'saturate to the largest code of the same sign',
  wrap: "wrap around (two's complement)",
} as const;

/** Sentences describing coefficient order, feedback sign, structure, Q formats, post-shift and number format. */
export function conventionLines(impl: Implementation): string[] {
  const s = impl.settings;
  const q = impl.quantized.format;
  const n = q.fractionBits;
  const d = s.dataWordLength;
  const negated = s.feedbackSign === 'negated';
  const fb = negated ? '+' : '-';
  const lines = [
    `design hash: ${designHash(impl)} (FNV-1a 64 of the canonical JSON of zeros, poles, gain, sample rate and settings)`,
    `sample rate: ${impl.sampleRate} Hz`,
    `structure: ${structureName(impl)} (${s.structure}), ${impl.cascade.sections.length} second-order section(s) in cascade, run in the order listed`,
    `section k: H_k(z) = (b0 + b1 z^-1 + b2 z^-2) / (1 + a1 z^-1 + a2 z^-2); each row lists b0, b1, b2, ${negated ? '-a1, -a2' : 'a1, a2'} (a0 = 1 is not stored)`,
    negated
      ? 'feedback sign: negated - the stored feedback coefficients are -a1 and -a2 of the denominator, and the recursion ADDS their products'
      : 'feedback sign: as in the denominator - the stored feedback coefficients are a1 and a2, and the recursion SUBTRACTS their products',
    s.structure === 'df1'
      ? `direct form I: y[n] = b0 x[n] + b1 x[n-1] + b2 x[n-2] ${fb} c1 y[n-1] ${fb} c2 y[n-2], with c1, c2 the stored feedback values; x and y delay lines per section`
      : `transposed direct form II: y[n] = b0 x[n] + s1; s1 = b1 x[n] + s2 ${fb} c1 y[n]; s2 = b2 x[n] ${fb} c2 y[n], with c1, c2 the stored feedback values`,
    `scaling: ${s.scaling === 'none' ? 'none' : `${s.scaling.toUpperCase()} norm of each partial cascade made 1`}; ordering by pole radius ${s.ordering}; gain distribution ${s.gainDistribution}`,
    `output gain: the cascade computes H(z) / G with G = ${impl.cascade.outputGain.toPrecision(17)}; multiply its output by G for the design's gain`,
    `coefficients: ${q.wordLength}-bit two's-complement codes in ${qName(q)} (${n} fraction bits): value = code / 2^${n}, quantized by ${ROUNDING_WORDS[s.rounding].split(' (')[0]}, clamped to the word`,
    `data: ${d}-bit samples in Q0.${d - 1} (value = code / 2^${d - 1}) at every section input and output`,
    `accumulator: ${s.accumulatorBits} bits holding products with ${d - 1 + n} fraction bits; every addition is fitted to ${s.accumulatorBits} bits (${OVERFLOW_WORDS[s.overflow]})${s.structure === 'df2t' ? '; the states s1, s2 are accumulator values' : ''}`,
    `post-shift: ${n} bits right from the accumulator to the data word, ${ROUNDING_WORDS[s.rounding]}, then ${OVERFLOW_WORDS[s.overflow]} to ${d} bits`,
    'floating-point values are printed with 17 significant digits, so they read back exactly',
  ];
  return lines;
}

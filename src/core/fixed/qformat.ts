/**
 * Q formats and coefficient quantization. Qm.n has m integer bits and n fraction bits besides the sign bit
 * (m + n + 1 = word length); a code c stands for c·2^−n, and codes run from −2^(W−1) to 2^(W−1) − 1.
 */
import type { Rounding } from './settings.ts';

/** A two's-complement fixed-point format. */
export interface QFormat {
  wordLength: number;
  fractionBits: number;
}

/** "Q1.14" for a 16-bit word with 14 fraction bits. */
export function qName(q: QFormat): string {
  return `Q${q.wordLength - 1 - q.fractionBits}.${q.fractionBits}`;
}

/** Largest and smallest codes of a W-bit word. */
export function codeRange(wordLength: number): { min: number; max: number } {
  const half = 2 ** (wordLength - 1);
  return { min: -half, max: half - 1 };
}

/**
 * The code nearest x·2^F by the rounding rule ('nearest' rounds ties up, as adding half an LSB and flooring
 * does; 'truncate' floors), clamped to the word; `saturated` says whether the clamp changed it.
 */
export function quantizeValue(
  x: number,
  q: QFormat,
  rounding: Rounding,
): { code: number; saturated: boolean } {
  const scaled = x * 2 ** q.fractionBits;
  // floor, then compare the (exact) remainder with one half: floor(scaled + 0.5) would round the sum first.
  const low = Math.floor(scaled);
  const raw = rounding === 'nearest' && scaled - low >= 0.5 ? low + 1 : low;
  const { min, max } = codeRange(q.wordLength);
  const code = Math.min(max, Math.max(min, raw));
  return { code, saturated: code !== raw };
}

/** The value a code stands for: code·2^−F. */
export function codeValue(code: number, q: QFormat): number {
  return code * 2 ** -q.fractionBits;
}

/**
 * Most fraction bits (0..W−1) with which every value quantizes without saturating, i.e. the Q format whose
 * integer part just holds the largest coefficient (|a1| up to 2 needs one integer bit). When even F = 0
 * saturates, returns 0 and `fits: false`.
 */
export function autoFractionBits(
  values: readonly number[],
  wordLength: number,
  rounding: Rounding,
): { fractionBits: number; fits: boolean } {
  for (let f = wordLength - 1; f >= 0; f--) {
    const q = { wordLength, fractionBits: f };
    if (values.every((v) => !quantizeValue(v, q, rounding).saturated)) return { fractionBits: f, fits: true };
  }
  return { fractionBits: 0, fits: false };
}

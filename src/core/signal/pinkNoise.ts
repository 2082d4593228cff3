/**
 * Seeded pink (1/f) noise by the Voss–McCartney method: R. F. Voss and J. Clarke's summed random rows
 * ("1/f noise in music", J. Acoust. Soc. Am. 63, 1978, as described by M. Gardner, Scientific American,
 * 1978), with J. McCartney's refinement of updating exactly one row per sample, chosen by the number of
 * trailing zeros of the sample counter, plus one fresh white value per sample (music-dsp list, 1999) —
 * from memory. Row r changes every 2^(r+1) samples, so each row adds power one octave lower; the sum falls
 * at about 3 dB per octave over PINK_ROWS octaves below fs/2.
 */
import { mulberry32 } from '../random.ts';

/** Rows summed: 16 octaves of 1/f slope, down to fs/2^17 (0.37 Hz at 48 kHz). */
export const PINK_ROWS = 16;

/** n samples of pink noise with the given RMS (default 1), deterministic in the 32-bit seed. */
export function makePinkNoise(n: number, seed: number, rms = 1): Float64Array {
  const next = mulberry32(seed);
  const rows = new Float64Array(PINK_ROWS);
  let sum = 0;
  for (let r = 0; r < PINK_ROWS; r++) {
    rows[r] = 2 * next() - 1;
    sum += rows[r]!;
  }
  // Each term is uniform on [-1, 1) with variance 1/3, and PINK_ROWS + 1 independent terms are summed.
  const scale = rms * Math.sqrt(3 / (PINK_ROWS + 1));
  const x = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const counter = k + 1;
    const row = 31 - Math.clz32(counter & -counter); // trailing zeros of the counter
    if (row < PINK_ROWS) {
      const v = 2 * next() - 1;
      sum += v - rows[row]!;
      rows[row] = v;
    }
    x[k] = (sum + 2 * next() - 1) * scale;
  }
  return x;
}

/**
 * A min/max pyramid of a long signal: the smallest and largest sample of every block of PYRAMID_BASE
 * samples, then of every PYRAMID_FACTOR blocks of that, and so on up to one block. Drawing a stretch of the
 * signal as one band per pixel column then costs a few block reads per column, whatever the number of
 * samples (the min/max part of M4 aggregation, Jugel et al., VLDB 2014, served from precomputed levels).
 * Extremes are kept as float32 (to halve the memory; they are for drawing and axis ranges).
 */

/** Samples per block of the finest level. */
export const PYRAMID_BASE = 32;
/** Blocks of one level per block of the next. */
export const PYRAMID_FACTOR = 4;

/** One level: per block, the smallest and largest value (NaN ignored; +∞/−∞ for a block of NaN only). */
export interface PyramidLevel {
  min: Float32Array;
  max: Float32Array;
}

/** The levels, finest first; level L's blocks hold PYRAMID_BASE · PYRAMID_FACTOR^L samples. */
export interface MinMaxPyramid {
  length: number;
  levels: PyramidLevel[];
}

/** The raw samples beside a pyramid: an array, or a function giving sample i. */
export type RawSamples = ArrayLike<number> | ((i: number) => number);

/** Builds a pyramid from samples pushed in order, in pieces of any size, for a signal of known length. */
export class PyramidBuilder {
  private readonly base: PyramidLevel;
  private filled = 0;

  constructor(private readonly length: number) {
    const blocks = Math.ceil(length / PYRAMID_BASE);
    this.base = {
      min: new Float32Array(blocks).fill(Infinity),
      max: new Float32Array(blocks).fill(-Infinity),
    };
  }

  /** Adds the next samples of the signal. */
  push(x: ArrayLike<number>): void {
    const { min, max } = this.base;
    const n = Math.min(x.length, this.length - this.filled);
    let i = 0;
    while (i < n) {
      const at = this.filled + i;
      const block = (at / PYRAMID_BASE) | 0;
      const end = Math.min(n, i + (block + 1) * PYRAMID_BASE - at);
      let lo = min[block]!;
      let hi = max[block]!;
      for (; i < end; i++) {
        const v = x[i]!;
        if (v < lo) lo = v;
        if (v > hi) hi = v;
      }
      min[block] = lo;
      max[block] = hi;
    }
    this.filled += n;
  }

  /** The pyramid (the upper levels are built from the finest one here). */
  finish(): MinMaxPyramid {
    const levels = [this.base];
    for (let prev = this.base; prev.min.length > 1;) {
      const blocks = Math.ceil(prev.min.length / PYRAMID_FACTOR);
      const next = { min: new Float32Array(blocks), max: new Float32Array(blocks) };
      for (let b = 0; b < blocks; b++) {
        let lo = Infinity;
        let hi = -Infinity;
        const end = Math.min(prev.min.length, (b + 1) * PYRAMID_FACTOR);
        for (let k = b * PYRAMID_FACTOR; k < end; k++) {
          if (prev.min[k]! < lo) lo = prev.min[k]!;
          if (prev.max[k]! > hi) hi = prev.max[k]!;
        }
        next.min[b] = lo;
        next.max[b] = hi;
      }
      levels.push(next);
      prev = next;
    }
    return { length: this.length, levels };
  }
}

/** The pyramid of a whole signal. */
export function pyramidOf(x: ArrayLike<number>): MinMaxPyramid {
  const b = new PyramidBuilder(x.length);
  b.push(x);
  return b.finish();
}

/**
 * Smallest and largest sample over [a, b): exact when the raw samples are given (the partial blocks at the
 * ends are read from them), otherwise over the whole finest blocks that [a, b) touches (at most
 * PYRAMID_BASE − 1 samples beyond each end). Whole blocks are read at the coarsest level that fits, so the
 * cost is a few reads per level. [+∞, −∞] for an empty range. The raw values are raw[i]·rawScale (integer
 * codes with a power-of-two scale).
 */
export function rangeExtremes(
  p: MinMaxPyramid,
  a: number,
  b: number,
  raw: RawSamples | null = null,
  rawScale = 1,
): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  a = Math.max(0, a);
  b = Math.min(p.length, b);
  if (b <= a) return [lo, hi];
  let ka: number;
  let kb: number;
  if (raw) {
    const read = typeof raw === 'function' ? raw : (i: number) => raw[i]!;
    const aa = Math.min(b, Math.ceil(a / PYRAMID_BASE) * PYRAMID_BASE);
    const bb = Math.max(aa, Math.floor(b / PYRAMID_BASE) * PYRAMID_BASE);
    for (let i = a; i < aa; i++) {
      const v = read(i);
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    for (let i = bb; i < b; i++) {
      const v = read(i);
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    // A power-of-two scale (integer codes read as values) is exact and keeps the order.
    if (lo <= hi) {
      lo *= rawScale;
      hi *= rawScale;
    }
    ka = aa / PYRAMID_BASE;
    kb = bb / PYRAMID_BASE;
  } else {
    ka = Math.floor(a / PYRAMID_BASE);
    kb = Math.ceil(b / PYRAMID_BASE);
  }
  for (let level = 0; ka < kb; level++) {
    const { min, max } = p.levels[level]!;
    const climb = level + 1 < p.levels.length && kb - ka >= 2 * PYRAMID_FACTOR;
    const take = (k: number) => {
      if (min[k]! < lo) lo = min[k]!;
      if (max[k]! > hi) hi = max[k]!;
    };
    if (!climb) {
      for (let k = ka; k < kb; k++) take(k);
      break;
    }
    while (ka % PYRAMID_FACTOR !== 0) take(ka++);
    while (kb % PYRAMID_FACTOR !== 0) take(--kb);
    ka /= PYRAMID_FACTOR;
    kb /= PYRAMID_FACTOR;
  }
  return [lo, hi];
}

/** Per-column extremes of samples [i0, i1) spread evenly over `columns` columns (at least one sample each). */
export interface ColumnExtremes {
  min: Float32Array;
  max: Float32Array;
}

/** Column c covers [i0 + ⌊c·per⌋, i0 + ⌊(c+1)·per⌋), per = (i1 − i0)/columns; see rangeExtremes for exactness. */
export function columnExtremes(
  p: MinMaxPyramid,
  i0: number,
  i1: number,
  columns: number,
  raw: RawSamples | null = null,
  rawScale = 1,
): ColumnExtremes {
  const min = new Float32Array(columns);
  const max = new Float32Array(columns);
  const per = (i1 - i0) / columns;
  for (let c = 0; c < columns; c++) {
    const a = i0 + Math.floor(c * per);
    const b = Math.max(a + 1, Math.min(i1, i0 + Math.floor((c + 1) * per)));
    const [lo, hi] = rangeExtremes(p, a, b, raw, rawScale);
    min[c] = lo;
    max[c] = hi;
  }
  return { min, max };
}

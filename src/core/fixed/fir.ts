/**
 * A fixed-point FIR filter, bit exact, in two forms:
 *
 * - 'direct': acc = 0; acc += c[k]·x[n−k] for k = 0 … L−1 (in that order); y = data(acc).
 * - 'symmetric' (linear-phase taps only, c[k] = ±c[L−1−k]): the mirrored samples are added (subtracted for
 *   antisymmetric taps) before the multiply, halving the multiplies: acc = 0; acc += c[k]·(x[n−k] ±
 *   x[n−L+1+k]) for k = 0 … ⌊L/2⌋−1; for odd L then acc += c[M]·x[n−M] with M = (L−1)/2. The pre-add of two
 *   D-bit samples needs D+1 bits (one bit of headroom): it is exact, never fitted.
 *
 * Every addition into the accumulator is fitted to its A bits (saturated or wrapped, core/fixed/arith.ts),
 * and the result goes back to the D-bit data word by the same rule as the IIR sections (shift right by the
 * coefficient fraction bits F, rounding or truncating, then saturate or wrap). The exported C
 * (core/export/firC.ts) repeats these steps in the same order, so its output is the same, bit for bit.
 *
 * The taps are quantized with one Q format; for the symmetric form the first half is quantized and mirrored,
 * so the codes are exactly symmetric. The direct form uses the same codes, so both forms compute the same
 * filter, and give identical outputs whenever no sum overflows (the order of additions then does not matter).
 */
import type { InputError, Result, Root, TransferFunction, Zpk } from '../types.ts';
import { zpkToTf } from '../system/transferFunction.ts';
import { makeArith, makeBigArith, type Arith } from './arith.ts';
import type { OverflowEvent } from './kernel.ts';
import { autoFractionBits, codeRange, quantizeValue, type QFormat } from './qformat.ts';
import {
  MAX_ACCUMULATOR_BITS,
  MAX_WORD_LENGTH,
  MIN_WORD_LENGTH,
  type Overflow,
  type Rounding,
} from './settings.ts';

/** 'direct': one multiply per tap; 'symmetric': mirrored samples pre-added, one multiply per pair. */
export type FirForm = 'direct' | 'symmetric';

export interface FirSettings {
  form: FirForm;
  /** Coefficient word W, sign included. */
  wordLength: number;
  /** Coefficient fraction bits, or 'auto': the most that let the largest tap fit. */
  fractionBits: 'auto' | number;
  /** Data word D: samples are Q0.(D−1), values in [−1, 1). */
  dataWordLength: number;
  /** Accumulator A in bits. */
  accumulatorBits: number;
  rounding: Rounding;
  overflow: Overflow;
}

/** 16-bit taps and data, a 40-bit accumulator, rounding, saturation; the symmetric form. */
export const DEFAULT_FIR_SETTINGS: FirSettings = {
  form: 'symmetric',
  wordLength: 16,
  fractionBits: 'auto',
  dataWordLength: 16,
  accumulatorBits: 40,
  rounding: 'nearest',
  overflow: 'saturate',
};

/** 'even': c[k] = c[L−1−k]; 'odd': c[k] = −c[L−1−k]; 'none': neither (only the direct form applies). */
export type TapSymmetry = 'even' | 'odd' | 'none';

export interface FirImplementation {
  settings: FirSettings;
  sampleRate: number;
  /** The taps implemented (made exactly symmetric or antisymmetric when they are so to 1e-9). */
  taps: number[];
  symmetry: TapSymmetry;
  format: QFormat;
  /** The tap codes, value = code / 2^F. */
  codes: number[];
  /** Whether the largest tap did not fit the word even with no fraction bits (codes clamped). */
  saturatedTaps: boolean;
  dataFormat: QFormat;
  /** Right shift from the accumulator to the data word: F. */
  postShift: number;
  /** Multiplies per output sample in this form. */
  multiplies: number;
  /** Bits of the pre-add in the symmetric form (D+1), or 0 for the direct form. */
  preAddBits: number;
  /**
   * Accumulator bits that no input can overflow: sign plus the bits of Σ|c_k|·2^(D−1) (every sample at full
   * scale with the taps' signs); `accumulatorSafe` compares it with the chosen A.
   */
  accumulatorNeeded: number;
  accumulatorSafe: boolean;
  /**
   * Largest |output| for any input in [−1, 1): Σ|taps| (the L1 norm). Above 1 the output word can overflow
   * for some input (then saturated or wrapped, and counted).
   */
  worstGain: number;
}

/** How far taps are from symmetric/antisymmetric, relative to the largest, below which they are taken as so. */
export const TAP_SYMMETRY_TOLERANCE = 1e-9;

/** Whether taps are symmetric, antisymmetric or neither (within TAP_SYMMETRY_TOLERANCE of the largest). */
export function tapSymmetry(taps: readonly number[]): TapSymmetry {
  const big = Math.max(0, ...taps.map(Math.abs));
  if (big === 0) return 'even';
  let even = 0;
  let odd = 0;
  const L = taps.length;
  for (let k = 0; k < L; k++) {
    even = Math.max(even, Math.abs(taps[k]! - taps[L - 1 - k]!));
    odd = Math.max(odd, Math.abs(taps[k]! + taps[L - 1 - k]!));
  }
  if (even <= TAP_SYMMETRY_TOLERANCE * big) return 'even';
  if (odd <= TAP_SYMMETRY_TOLERANCE * big) return 'odd';
  return 'none';
}

const bad = (message: string, expected: string, parameter: string): Result<never> => ({
  ok: false,
  error: { message, expected, parameter } satisfies InputError,
});

/** Checks FIR settings; the error names the setting at fault. */
export function validateFirSettings(s: FirSettings): Result<FirSettings> {
  const int = (v: number, lo: number, hi: number) => Number.isInteger(v) && v >= lo && v <= hi;
  if (s.form !== 'direct' && s.form !== 'symmetric')
    return bad(`unknown FIR form "${String(s.form)}"`, 'direct or symmetric', 'form');
  if (!int(s.wordLength, MIN_WORD_LENGTH, MAX_WORD_LENGTH))
    return bad(
      `coefficient word ${s.wordLength} bits`,
      `${MIN_WORD_LENGTH} to ${MAX_WORD_LENGTH} bits`,
      'wordLength',
    );
  if (!int(s.dataWordLength, MIN_WORD_LENGTH, MAX_WORD_LENGTH))
    return bad(
      `data word ${s.dataWordLength} bits`,
      `${MIN_WORD_LENGTH} to ${MAX_WORD_LENGTH} bits`,
      'dataWordLength',
    );
  if (s.fractionBits !== 'auto' && !int(s.fractionBits, 0, s.wordLength - 1))
    return bad(
      `${s.fractionBits} fraction bits in a ${s.wordLength}-bit word`,
      `0 to ${s.wordLength - 1}, or auto`,
      'fractionBits',
    );
  // Any width from one bit above the data word is well defined (every sum is fitted); accumulatorNeeded says
  // what no input overflows.
  const lo = s.dataWordLength + 1;
  if (!int(s.accumulatorBits, lo, MAX_ACCUMULATOR_BITS))
    return bad(
      `a ${s.accumulatorBits}-bit accumulator for ${s.dataWordLength}-bit data`,
      `${lo} to ${MAX_ACCUMULATOR_BITS} bits`,
      'accumulatorBits',
    );
  if (s.form === 'symmetric' && s.dataWordLength + s.wordLength > 63)
    return bad(
      'the symmetric form with 32-bit data and 32-bit taps: a pre-added sample times a tap needs 64 bits',
      'the direct form, or a word of 31 bits',
      'form',
    );
  return { ok: true, value: s };
}

/** Quantizes the taps and states what the implementation needs; refuses the symmetric form for other taps. */
export function buildFirImplementation(
  taps: readonly number[],
  sampleRate: number,
  settings: FirSettings,
): Result<FirImplementation> {
  const v = validateFirSettings(settings);
  if (!v.ok) return v;
  if (taps.length === 0 || taps.some((t) => !Number.isFinite(t)))
    return bad('the FIR has no finite taps', 'a design with poles only at the origin', 'taps');
  const symmetry = tapSymmetry(taps);
  if (settings.form === 'symmetric' && symmetry === 'none')
    return bad(
      'the taps are neither symmetric nor antisymmetric (the filter is not linear phase), so mirrored samples cannot share a multiply',
      'the direct form, or restore linear phase first',
      'form',
    );
  const L = taps.length;
  const sign = symmetry === 'odd' ? -1 : 1;
  // exactly symmetric taps: the mean of each mirrored pair (the middle tap of odd taps is 0)
  const used =
    symmetry === 'none'
      ? taps.slice()
      : taps.map((t, k) =>
          k === L - 1 - k ? (symmetry === 'odd' ? 0 : t) : (t + sign * taps[L - 1 - k]!) / 2,
        );
  for (let k = 0; k < L; k++) if (L - 1 - k < k) used[k] = sign * used[L - 1 - k]!;
  const auto = autoFractionBits(used, settings.wordLength, settings.rounding);
  const F = settings.fractionBits === 'auto' ? auto.fractionBits : settings.fractionBits;
  const format = { wordLength: settings.wordLength, fractionBits: F };
  let saturatedTaps = false;
  const codes = new Array<number>(L);
  for (let k = 0; k < L; k++) {
    if (symmetry !== 'none' && L - 1 - k < k) {
      const mirrored = sign * codes[L - 1 - k]!;
      codes[k] = mirrored === 0 ? 0 : mirrored; // never −0
      continue;
    }
    const q = quantizeValue(used[k]!, format, settings.rounding);
    codes[k] = q.code;
    if (q.saturated) saturatedTaps = true;
  }
  // −c of the most negative code is one above the word: keep the mirror in the word
  const { min, max } = codeRange(settings.wordLength);
  for (let k = 0; k < L; k++) {
    if (codes[k]! > max || codes[k]! < min) {
      codes[k] = Math.min(max, Math.max(min, codes[k]!));
      saturatedTaps = true;
    }
  }
  const D = settings.dataWordLength;
  const sumAbs = codes.reduce((s, c) => s + Math.abs(c), 0);
  const accumulatorNeeded = sumAbs === 0 ? 1 : Math.ceil(Math.log2(sumAbs * 2 ** (D - 1) + 1)) + 1;
  const half = Math.floor(L / 2);
  return {
    ok: true,
    value: {
      settings,
      sampleRate,
      taps: used,
      symmetry,
      format,
      codes,
      saturatedTaps,
      dataFormat: { wordLength: D, fractionBits: D - 1 },
      postShift: F,
      multiplies: settings.form === 'symmetric' ? half + (L % 2) : L,
      preAddBits: settings.form === 'symmetric' ? D + 1 : 0,
      accumulatorNeeded,
      accumulatorSafe: accumulatorNeeded <= settings.accumulatorBits,
      worstGain: used.reduce((s, t) => s + Math.abs(t), 0),
    },
  };
}

/** The exact arithmetic for the FIR: doubles while every sum of products stays below 2^53, BigInt otherwise. */
function firArith(impl: FirImplementation): Arith<number> | Arith<bigint> {
  const s = impl.settings;
  const path = {
    dataBits: s.dataWordLength,
    accumulatorBits: s.accumulatorBits,
    postShift: impl.postShift,
    rounding: s.rounding,
    overflow: s.overflow,
  };
  // |each product| ≤ 2^(D+W−1) with the pre-add; at most L of them: below 2^(D+W+log2 L)
  const bits = s.dataWordLength + s.wordLength + Math.ceil(Math.log2(impl.codes.length + 1));
  return bits <= 52 && s.accumulatorBits <= 52 ? makeArith(path, s.wordLength) : makeBigArith(path);
}

/**
 * The taps of an FIR design: typed coefficients as given (when the denominator is a0 alone), else the roots
 * multiplied out when every pole sits at the origin, delayed by the poles beyond the zeros; null for any
 * other design (a pole elsewhere, or more zeros than poles: not causal).
 */
export function firTapsOf(zpk: Zpk, typed: TransferFunction | null = null): number[] | null {
  if (typed) {
    const { b, a } = typed;
    if (a.length === 0 || a[0] === 0 || a.slice(1).some((v) => v !== 0)) return null;
    return b.map((v) => v / a[0]!);
  }
  if (zpk.poles.length === 0 || zpk.poles.some((p) => p.re !== 0 || p.im !== 0)) return null;
  const count = (rs: readonly Root[]) => rs.reduce((n, r) => n + (r.im > 0 ? 2 : 1) * r.multiplicity, 0);
  const extra = count(zpk.poles) - count(zpk.zeros);
  if (extra < 0) return null;
  return [...new Array<number>(extra).fill(0), ...zpkToTf(zpk).b];
}

/** The form an FIR takes: the one asked for, else symmetric when the taps allow it, direct otherwise. */
export function firFormFor(taps: readonly number[], asked?: FirForm): FirForm {
  return asked ?? (tapSymmetry(taps) === 'none' ? 'direct' : 'symmetric');
}

/** A running fixed-point FIR with its delay line (the last L input codes). */
export class FixedFir {
  private readonly ar: Arith<number> | Arith<bigint>;
  private readonly c: number[];
  private readonly L: number;
  /** The delay line as a ring: line[(head + j) % L] is x[n − j]. */
  private readonly line: Int32Array | Float64Array;
  private head = 0;
  private readonly sign: number;
  private readonly symmetric: boolean;

  constructor(
    readonly impl: FirImplementation,
    private readonly onOverflow: (e: OverflowEvent) => void,
  ) {
    this.ar = firArith(impl);
    this.c = impl.codes;
    this.L = impl.codes.length;
    this.line = new Float64Array(this.L);
    this.sign = impl.symmetry === 'odd' ? -1 : 1;
    this.symmetric = impl.settings.form === 'symmetric';
  }

  private x(j: number): number {
    return this.line[(this.head + j) % this.L]!;
  }

  /** Filters one input code (sample index n, for overflow reports) and returns the output code. */
  step(x: number, n: number): number {
    const ar = this.ar as Arith<number | bigint>;
    const L = this.L;
    this.head = (this.head + L - 1) % L;
    this.line[this.head] = x;
    let acc: number | bigint = ar.zero;
    if (!this.symmetric) {
      for (let k = 0; k < L; k++) acc = ar.add(acc, ar.product(this.c[k]!, this.x(k)));
    } else {
      const half = Math.floor(L / 2);
      for (let k = 0; k < half; k++) {
        const pre = this.x(k) + this.sign * this.x(L - 1 - k); // exact: D+1 bits
        acc = ar.add(acc, ar.product(this.c[k]!, pre));
      }
      if (L % 2 === 1) acc = ar.add(acc, ar.product(this.c[half]!, this.x(half)));
    }
    const y = ar.toData(acc);
    if (ar.accOverflow) this.onOverflow({ sample: n, section: 0, place: 'accumulator' });
    if (ar.dataOverflow) this.onOverflow({ sample: n, section: 0, place: 'output' });
    ar.accOverflow = false;
    ar.dataOverflow = false;
    return y;
  }
}

/** Input values in [−1, 1) as data codes (rounded as the settings say, clamped); `clipped` counts clamps. */
export function quantizeFirInput(
  impl: FirImplementation,
  x: ArrayLike<number>,
): { codes: Int32Array; clipped: number } {
  const codes = new Int32Array(x.length);
  let clipped = 0;
  for (let i = 0; i < x.length; i++) {
    const q = quantizeValue(x[i]!, impl.dataFormat, impl.settings.rounding);
    codes[i] = q.code;
    if (q.saturated) clipped++;
  }
  return { codes, clipped };
}

/** Most overflow events kept in a run's list (all are counted). */
export const MAX_FIR_OVERFLOW_EVENTS = 1000;

/** Runs the fixed-point FIR from rest on input codes: output codes, the first overflows and their count. */
export function runFirCodes(
  impl: FirImplementation,
  input: ArrayLike<number>,
): { output: Int32Array; overflows: OverflowEvent[]; overflowCount: number } {
  const overflows: OverflowEvent[] = [];
  let overflowCount = 0;
  const f = new FixedFir(impl, (e) => {
    overflowCount++;
    if (overflows.length < MAX_FIR_OVERFLOW_EVENTS) overflows.push(e);
  });
  const output = new Int32Array(input.length);
  for (let i = 0; i < input.length; i++) output[i] = f.step(input[i]!, i);
  return { output, overflows, overflowCount };
}

/** A fixed-point FIR run block by block (state kept between blocks), counting clipped inputs and overflows. */
export class FirStream {
  private readonly fir: FixedFir;
  private n = 0;
  inputClipped = 0;
  overflowCount = 0;
  readonly overflows: OverflowEvent[] = [];

  constructor(readonly impl: FirImplementation) {
    this.fir = new FixedFir(impl, (e) => {
      this.overflowCount++;
      if (this.overflows.length < MAX_FIR_OVERFLOW_EVENTS) this.overflows.push(e);
    });
  }

  /** Input values (full scale ±1) as data codes, rounded by the settings and saturated (counted). */
  quantize(x: ArrayLike<number>): Int32Array {
    const q = quantizeFirInput(this.impl, x);
    this.inputClipped += q.clipped;
    return q.codes;
  }

  /** Filters a block of input codes; returns the output codes. */
  pushCodes(codes: ArrayLike<number>): Int32Array {
    const out = new Int32Array(codes.length);
    for (let i = 0; i < codes.length; i++) out[i] = this.fir.step(codes[i]!, this.n++);
    return out;
  }

  /** Samples run so far. */
  get samples(): number {
    return this.n;
  }
}

/**
 * The largest |H_q(e^jω) − H(e^jω)| between the quantized taps (codes / 2^F) and the taps implemented, over
 * `points` frequencies from 0 to π, and where it is (ω in rad/sample).
 */
export function firQuantizationError(
  impl: FirImplementation,
  points = 512,
): { largest: number; omega: number } {
  const scale = 2 ** -impl.format.fractionBits;
  let largest = 0;
  let at = 0;
  for (let i = 0; i < points; i++) {
    const w = (Math.PI * i) / (points - 1);
    let re = 0;
    let im = 0;
    for (let k = 0; k < impl.taps.length; k++) {
      const d = impl.codes[k]! * scale - impl.taps[k]!;
      re += d * Math.cos(w * k);
      im -= d * Math.sin(w * k);
    }
    const m = Math.hypot(re, im);
    if (m > largest) {
      largest = m;
      at = w;
    }
  }
  return { largest, omega: at };
}

/**
 * The input that drives the accumulator furthest: every sample at full scale against the sign of the tap it
 * meets at samples 2L−1 and 3L−1, where the sum reaches about −Σ|c|·2^(D−1).
 */
export function firWorstInput(impl: FirImplementation): Int32Array {
  const L = impl.codes.length;
  const { min, max } = codeRange(impl.settings.dataWordLength);
  const x = new Int32Array(3 * L);
  // at t = 2L − 1 (and L later) tap k meets x[t − k]: give it the opposite sign of c[k] (the negative full
  // scale is the larger), so the sum is −Σ|c|·2^(D−1) up to the taps met by the positive full scale
  for (let n = 0; n < x.length; n++) x[n] = impl.codes[(((2 * L - 1 - n) % L) + L) % L]! >= 0 ? min : max;
  return x;
}

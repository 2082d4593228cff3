/**
 * A bit-exact fixed-point run fed in blocks of any size, for signals too long to hold twice (a recording
 * streamed from a file, or filtered in a worker in slices). Beside the integer cascade it runs two float64
 * cascades on the same quantized input, and keeps running statistics of the differences:
 * - from the ideal filter (the scaled cascade with the design's own coefficients): everything fixed point
 *   changes — coefficient quantization, rounding, overflow;
 * - from the quantized filter in float64 (the stored coefficient values, no rounding of results): the
 *   round-off noise alone (and overflow), the quantity roundoffNoise() predicts.
 * Any split of a signal into blocks gives the same codes and the same statistics.
 */
import { createSectionFilter, runSectionFilter, type SectionFilterState } from '../signal/sectionFilter.ts';
import type { Implementation } from './implementation.ts';
import type { FixedCascade, OverflowEvent } from './kernel.ts';
import { LIMIT_CYCLE_MAX_SAMPLES, zeroInputVerdict, type LimitCycleReport } from './limitCycle.ts';
import { codeRange } from './qformat.ts';
import { fixedCascadeOf, MAX_OVERFLOW_EVENTS } from './simulate.ts';

/** Running statistics of fixed-point output codes minus a float64 reference, in data-word LSBs. */
export interface DifferenceStats {
  /** Samples compared. */
  samples: number;
  /** Largest |code − reference| in LSBs (0 for no samples). */
  maxLsb: number;
  /** Mean and root-mean-square of code − reference, in LSBs. */
  meanLsb: number;
  rmsLsb: number;
  /** Mean square of the difference in dB re a full-scale sine (power 1/2): 10·log10(2·ms); −Infinity for 0. */
  powerDbfs: number;
  /** Mean square of the reference itself, same scale: the level the difference is measured against. */
  referenceDbfs: number;
}

/** Everything a run reports once its input is over. */
export interface FixedRunReport {
  samples: number;
  /** Input values beyond the data word that were saturated (or codes outside it that were clamped). */
  inputClipped: number;
  overflowCount: number;
  /** The first MAX_OVERFLOW_EVENTS overflows, in order. */
  overflows: OverflowEvent[];
  /** Against the float cascade with the design's coefficients. */
  ideal: DifferenceStats;
  /** Against the float cascade with the quantized coefficients: the round-off noise actually added. */
  roundoff: DifferenceStats;
}

/** dB re a full-scale sine of a mean square in value units (full scale 1). */
export function meanSquareDbfs(meanSquare: number): number {
  return meanSquare > 0 ? 10 * Math.log10(2 * meanSquare) : -Infinity;
}

class DifferenceAccumulator {
  private n = 0;
  private max = 0;
  private sum = 0;
  private sumSq = 0;
  private refSq = 0;
  constructor(private readonly lsb: number) {}

  add(codes: Int32Array, reference: Float64Array): void {
    const scale = 1 / this.lsb;
    let { max, sum, sumSq, refSq } = this;
    for (let i = 0; i < codes.length; i++) {
      const r = reference[i]!;
      const d = codes[i]! - r * scale;
      const a = d < 0 ? -d : d;
      if (a > max) max = a;
      sum += d;
      sumSq += d * d;
      refSq += r * r;
    }
    Object.assign(this, { max, sum, sumSq, refSq });
    this.n += codes.length;
  }

  stats(): DifferenceStats {
    const n = Math.max(1, this.n);
    const ms = this.sumSq / n;
    return {
      samples: this.n,
      maxLsb: this.max,
      meanLsb: this.sum / n,
      rmsLsb: Math.sqrt(ms),
      powerDbfs: meanSquareDbfs(ms * this.lsb * this.lsb),
      referenceDbfs: meanSquareDbfs(this.refSq / n),
    };
  }
}

/** A fixed-point cascade run block by block from rest, with its float64 comparisons. */
export class FixedRun {
  /** One data LSB as a value: 2^−(D−1). */
  readonly lsb: number;
  private readonly cascade: FixedCascade<number> | FixedCascade<bigint>;
  private readonly ideal: SectionFilterState;
  private readonly exact: SectionFilterState;
  private readonly idealDiff: DifferenceAccumulator;
  private readonly roundoffDiff: DifferenceAccumulator;
  private readonly counter = { counting: false, count: 0 };
  private readonly min: number;
  private readonly max: number;
  private n = 0;
  private clipped = 0;
  private overflowCount = 0;
  private readonly overflows: OverflowEvent[] = [];
  private finished = false;

  constructor(readonly impl: Implementation) {
    const d = impl.settings.dataWordLength;
    this.lsb = 2 ** -(d - 1);
    ({ min: this.min, max: this.max } = codeRange(d));
    this.cascade = fixedCascadeOf(impl, (e) => {
      if (this.counter.counting) {
        this.counter.count++;
        return;
      }
      this.overflowCount++;
      if (this.overflows.length < MAX_OVERFLOW_EVENTS) this.overflows.push(e);
    });
    this.ideal = createSectionFilter(impl.cascade.sections.map((s) => s.coefficients));
    this.exact = createSectionFilter(impl.quantized.sections);
    this.idealDiff = new DifferenceAccumulator(this.lsb);
    this.roundoffDiff = new DifferenceAccumulator(this.lsb);
  }

  /** Samples run so far. */
  get samples(): number {
    return this.n;
  }

  /**
   * Input values (full scale ±1) quantized to the data word by the settings' rounding, saturated: the same
   * codes as quantizeValue gives (floor, then compare the exact remainder with one half), without an object
   * per sample.
   */
  quantize(x: ArrayLike<number>): Int32Array {
    const codes = new Int32Array(x.length);
    const scale = 2 ** (this.impl.settings.dataWordLength - 1);
    const nearest = this.impl.settings.rounding === 'nearest';
    const { min, max } = this;
    let clipped = 0;
    for (let i = 0; i < x.length; i++) {
      const v = x[i]! * scale;
      const low = Math.floor(v);
      let c = nearest && v - low >= 0.5 ? low + 1 : low;
      if (!(c >= min && c <= max)) {
        // NaN stores 0, as quantizeValue's code does in an Int32Array.
        c = c > max ? max : c < min ? min : 0;
        clipped++;
      }
      codes[i] = c;
    }
    this.clipped += clipped;
    return codes;
  }

  /** Quantizes and runs input values; returns the input codes and the output codes. */
  pushValues(x: ArrayLike<number>): { input: Int32Array; output: Int32Array } {
    const input = this.quantize(x);
    return { input, output: this.pushCodes(input) };
  }

  /**
   * Runs input codes (clamped to the data word, counted as clipped when that changed one) and returns the
   * output codes, in `out` when given; `ideal`, when given, receives the ideal cascade's output values.
   */
  pushCodes(codes: Int32Array, out = new Int32Array(codes.length), ideal?: Float64Array): Int32Array {
    if (this.finished) throw new Error('FixedRun: the run was finished; start a new one');
    const f = this.cascade;
    const x = new Float64Array(codes.length);
    for (let i = 0; i < codes.length; i++) {
      let c = codes[i]!;
      if (c < this.min || c > this.max) {
        c = c < this.min ? this.min : this.max;
        codes[i] = c;
        this.clipped++;
      }
      x[i] = c * this.lsb;
      out[i] = f.step(c, this.n + i);
    }
    this.n += codes.length;
    const reference = runSectionFilter(this.ideal, x);
    if (ideal) ideal.set(reference);
    this.idealDiff.add(out, reference);
    this.roundoffDiff.add(out, runSectionFilter(this.exact, x));
    return out;
  }

  /** The figures so far. */
  report(): FixedRunReport {
    return {
      samples: this.n,
      inputClipped: this.clipped,
      overflowCount: this.overflowCount,
      overflows: [...this.overflows],
      ideal: this.idealDiff.stats(),
      roundoff: this.roundoffDiff.stats(),
    };
  }

  /**
   * Ends the input and looks at what the cascade does afterwards with zero input (rest, a limit cycle, or
   * undecided within maxSamples). No further input is accepted.
   */
  finish(maxSamples = LIMIT_CYCLE_MAX_SAMPLES): FixedRunReport & { afterInput: LimitCycleReport } {
    const report = this.report();
    this.finished = true;
    const afterInput = zeroInputVerdict(
      this.cascade,
      this.n,
      this.impl.settings.dataWordLength,
      this.counter,
      maxSamples,
    );
    return { ...report, afterInput };
  }
}

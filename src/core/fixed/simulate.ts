/**
 * Bit-exact simulation of an implementation on an input signal. Samples are Q0.(D−1) codes: an input value
 * v in [−1, 1) becomes round(v·2^(D−1)) by the settings' rounding, always saturated to the data word.
 */
import type { Implementation } from './implementation.ts';
import { makeArith } from './arith.ts';
import { FixedCascade, type OverflowEvent } from './kernel.ts';
import { quantizeValue } from './qformat.ts';
import { filterSections } from '../time/filter.ts';

/** At most this many overflow events are listed (all are counted). */
export const MAX_OVERFLOW_EVENTS = 1000;

/** The outcome of one fixed-point run. */
export interface FixedSimulation {
  /** Input and output codes (Q0.(D−1)). */
  input: Int32Array;
  output: Int32Array;
  /** The same as values in [−1, 1): code·2^−(D−1). */
  inputValues: Float64Array;
  outputValues: Float64Array;
  /** The unquantized (float64) scaled cascade on the same quantized input: what fixed point approximates. */
  reference: Float64Array;
  /** The first MAX_OVERFLOW_EVENTS overflows, in order, and how many there were. */
  overflows: OverflowEvent[];
  overflowCount: number;
  /** Input samples outside [−1, 1 − 2^−(D−1)] that were saturated. */
  inputClipped: number;
}

/** A running cascade for the implementation, reporting overflows to the callback. */
export function fixedCascadeOf(
  impl: Implementation,
  onOverflow: (e: OverflowEvent) => void,
): FixedCascade<number> | FixedCascade<bigint> {
  const s = impl.settings;
  const ar = makeArith(
    {
      dataBits: s.dataWordLength,
      accumulatorBits: s.accumulatorBits,
      postShift: impl.postShift,
      rounding: s.rounding,
      overflow: s.overflow,
    },
    s.wordLength,
  );
  // The two arithmetic types share one kernel; the union is only split here for the type checker.
  return new FixedCascade(ar as never, impl.quantized.codes, s.structure, s.feedbackSign, onOverflow) as
    FixedCascade<number> | FixedCascade<bigint>;
}

/** Input values (nominally in [−1, 1)) as data codes, and how many were clipped. */
export function quantizeInput(
  impl: Implementation,
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

/** Runs the fixed-point cascade from rest on input codes; returns output codes and overflows. */
export function runFixedCodes(
  impl: Implementation,
  input: Int32Array,
): { output: Int32Array; overflows: OverflowEvent[]; overflowCount: number } {
  const overflows: OverflowEvent[] = [];
  let overflowCount = 0;
  const f = fixedCascadeOf(impl, (e) => {
    overflowCount++;
    if (overflows.length < MAX_OVERFLOW_EVENTS) overflows.push(e);
  });
  const output = new Int32Array(input.length);
  for (let n = 0; n < input.length; n++) output[n] = f.step(input[n]!, n);
  return { output, overflows, overflowCount };
}

/** Quantizes the input values, runs the fixed-point cascade, and runs the float cascade beside it. */
export function simulateFixed(impl: Implementation, x: ArrayLike<number>): FixedSimulation {
  const { codes, clipped } = quantizeInput(impl, x);
  const run = runFixedCodes(impl, codes);
  const lsb = 2 ** -(impl.settings.dataWordLength - 1);
  const inputValues = Float64Array.from(codes, (c) => c * lsb);
  return {
    input: codes,
    output: run.output,
    inputValues,
    outputValues: Float64Array.from(run.output, (c) => c * lsb),
    reference: filterSections(
      impl.cascade.sections.map((s) => s.coefficients),
      inputValues,
    ),
    overflows: run.overflows,
    overflowCount: run.overflowCount,
    inputClipped: clipped,
  };
}

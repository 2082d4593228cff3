/**
 * Inputs of a fixed-point run on the command line: the built-in test inputs (the same signals the page's
 * bit-exact run offers, so both give the same codes) and recordings read block by block, as fractions of full
 * scale or, for CSV, as integer data-word codes.
 */
import type { SignalSpec } from '../core/fixed/index.ts';
import { UsageError, sineInputHz } from './args.ts';
import { readNumber } from '../core/parse/typedNumber.ts';
import type { SignalSource, SourceBlock, SourceSummary } from './stream/sources.ts';

/** Samples per block when a generated input is fed to the run. */
export const GENERATED_BLOCK = 1 << 16;

/** Matches the names of the built-in inputs. */
export const GENERATED_INPUT = /^(impulse|step|sine:.*|noise(:.*)?)$/;

/** The signal spec of a built-in input name ("impulse", "step", "sine:<Hz>", "noise" or "noise:<seed>"). */
export function generatedSpec(
  name: string,
  length: number,
  amplitude: number,
  sampleRate: number,
): SignalSpec {
  if (name === 'impulse' || name === 'step') return { kind: name, length, amplitude };
  const hz = sineInputHz(name, sampleRate / 2);
  if (hz !== null) return { kind: 'sine', length, frequencyHz: hz, amplitude };
  const noise = /^noise(?::(.*))?$/.exec(name);
  const seedText = noise?.[1] ?? '1';
  const read = readNumber(seedText);
  const seed = read.ok ? read.value : NaN;
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff)
    throw new UsageError(
      `--input noise:<seed> needs a whole-number seed from 0 to 4294967295; got "${seedText}".`,
    );
  return { kind: 'noise', length, seed, amplitude };
}

/** A generated signal served in blocks, like a file. */
export class GeneratedSource implements SignalSource {
  constructor(private readonly samples: Float64Array) {}

  async *blocks(): AsyncGenerator<SourceBlock> {
    for (let i = 0; i < this.samples.length; i += GENERATED_BLOCK)
      yield { channels: [this.samples.subarray(i, i + GENERATED_BLOCK)], times: null };
  }

  summary(): SourceSummary {
    return { sampleRate: null, startTime: 0, notes: [] };
  }
}

/**
 * Values read from a CSV file as data-word codes: each must be a whole number within the D-bit word. The
 * message names the file, the sample (1-based) and what is accepted. `first` is the block's first sample index.
 */
export function codesOf(values: Float64Array, first: number, dataBits: number, path: string): Int32Array {
  const hi = 2 ** (dataBits - 1) - 1;
  const lo = -hi - 1;
  const out = new Int32Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (!Number.isInteger(v) || v < lo || v > hi) {
      const what = Number.isInteger(v) ? `outside the ${dataBits}-bit data word` : 'not a whole number';
      throw new UsageError(
        `${path}: sample ${first + i + 1} is ${v}, ${what}. With --input-units codes every value is a ` +
          `${dataBits}-bit code from ${lo} to ${hi}; for values with full scale ±1 use --input-units full-scale.`,
      );
    }
    out[i] = v;
  }
  return out;
}

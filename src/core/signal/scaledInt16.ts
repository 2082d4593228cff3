/**
 * A recording of 8- or 16-bit integers kept as its Int16 codes (2 bytes a sample, half of float32), read as
 * float32 values code/32768 slice by slice. code/32768 is a float32 value exactly (a 16-bit integer times a
 * power of two), so a job given `subarray(a, b)` sees bit for bit the numbers a Float32Array of the same
 * recording would give it; an hour at 48 kHz takes 0.35 GB instead of 0.7 GB.
 */

import { ScaledInt24Samples } from './scaledInt24.ts';
import { ScaledInt32Samples } from './scaledInt32.ts';

/** Full scale of the codes: the value is code / INT16_FULL_SCALE. */
export const INT16_FULL_SCALE = 32768;

export class ScaledInt16Samples {
  constructor(
    /** The codes, value × 32768 (8-bit WAV samples as (byte − 128) × 256). */
    readonly codes: Int16Array,
  ) {}

  get length(): number {
    return this.codes.length;
  }

  get buffer(): ArrayBufferLike {
    return this.codes.buffer;
  }

  /** The buffers holding the codes (to transfer them). */
  get buffers(): ArrayBufferLike[] {
    return [this.codes.buffer];
  }

  /**
   * The values [a, b) (clamped like TypedArray.subarray, negative ends not supported) as a fresh
   * Float32Array, or written into the start of `into` (its length at least b − a) and that part returned.
   */
  subarray(a: number, b: number = this.length, into?: Float32Array): Float32Array {
    const from = Math.max(0, Math.min(a, this.length));
    const to = Math.max(from, Math.min(b, this.length));
    const out = into ? into.subarray(0, to - from) : new Float32Array(to - from);
    const c = this.codes;
    const s = 1 / INT16_FULL_SCALE;
    for (let i = 0; i < out.length; i++) out[i] = c[from + i]! * s;
    return out;
  }
}

/** Any of the forms a recording is kept in (values at full scale 1). */
export type RecordingSamples =
  Float32Array | Float64Array | ScaledInt16Samples | ScaledInt24Samples | ScaledInt32Samples;

/** Samples kept as integer codes (read as float32 slices, or float64 for 32-bit codes), not as a float array. */
export type ScaledIntSamples = ScaledInt16Samples | ScaledInt24Samples | ScaledInt32Samples;

/** Whether the recording is kept as integer codes. */
export function isScaledInt(x: RecordingSamples): x is ScaledIntSamples {
  return (
    x instanceof ScaledInt16Samples || x instanceof ScaledInt24Samples || x instanceof ScaledInt32Samples
  );
}

/** The buffers holding a recording's samples (to transfer them). */
export function sampleBuffers(x: RecordingSamples): ArrayBufferLike[] {
  return isScaledInt(x) ? x.buffers : [x.buffer];
}

/**
 * A scratch array of n values for samplesSlice on this recording: float64 for 32-bit codes (float32 cannot
 * hold them), float32 otherwise.
 */
export function sliceScratch(x: RecordingSamples, n: number): Float32Array | Float64Array {
  return x instanceof ScaledInt32Samples ? new Float64Array(n) : new Float32Array(n);
}

/**
 * The values [a, b) of a recording as a typed array: a view for float storage, converted for integer
 * storage (into `scratch` when given, long enough and of the slice's type — see sliceScratch — so repeated
 * reads make no garbage).
 */
export function samplesSlice(
  x: RecordingSamples,
  a: number,
  b: number,
  scratch?: Float32Array | Float64Array,
): Float32Array | Float64Array {
  if (!isScaledInt(x)) return x.subarray(a, b);
  const n = Math.max(0, Math.min(b, x.length) - Math.max(0, a));
  const room = scratch && scratch.length >= n ? scratch : undefined;
  if (x instanceof ScaledInt32Samples)
    return x.subarray(a, b, room instanceof Float64Array ? room : undefined);
  return x.subarray(a, b, room instanceof Float32Array ? room : undefined);
}

/**
 * Samples whose count is known only at the end (or only from a header): stored as float32 when the source
 * holds nothing float32 cannot represent exactly (8-, 16- and 24-bit integers, 32-bit float), else float64.
 * With an expected count the array is allocated once at that size; beyond it, it grows by doubling.
 */
import type { SampleFormat } from '../core/signal/index.ts';

/** The array type a recording is kept in. */
export type StoredSamples = Float32Array | Float64Array;

/** True when every sample of the format is a float32 value exactly (WAV integers scaled by 2^(bits−1)). */
export function fitsFloat32(format: SampleFormat | null): boolean {
  return format === 'u8' || format === 'i16' || format === 'i24' || format === 'f32';
}

export class GrowableSamples {
  private data: StoredSamples;
  length = 0;

  constructor(
    private readonly single: boolean,
    capacity = 1 << 16,
  ) {
    this.data = this.make(Math.max(1, capacity));
  }

  private make(n: number): StoredSamples {
    return this.single ? new Float32Array(n) : new Float64Array(n);
  }

  /** Appends the values. */
  push(values: ArrayLike<number>): void {
    const need = this.length + values.length;
    if (need > this.data.length) {
      const next = this.make(Math.max(need, 2 * this.data.length));
      next.set(this.data.subarray(0, this.length));
      this.data = next;
    }
    this.data.set(values, this.length);
    this.length = need;
  }

  /** The samples, in an array of exactly their length (its buffer can be transferred). */
  take(): StoredSamples {
    return this.length === this.data.length ? this.data : this.data.slice(0, this.length);
  }
}

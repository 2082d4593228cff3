/**
 * Samples whose count is known only at the end (or only from a header), kept in the smallest form that holds
 * the source exactly: 8- and 16-bit integers as Int16 codes (ScaledInt16Samples), 24-bit integers as 3-byte
 * codes (ScaledInt24Samples), 32-bit integers as Int32 codes (ScaledInt32Samples), 32-bit float as float32,
 * anything else (64-bit float, CSV) as float64. With an expected count the array is allocated once at that
 * size; beyond it, it grows by doubling.
 */
import {
  INT16_FULL_SCALE,
  INT24_FULL_SCALE,
  INT32_FULL_SCALE,
  ScaledInt16Samples,
  ScaledInt24Samples,
  ScaledInt32Samples,
  type RecordingSamples,
  type SampleFormat,
} from '../core/signal/index.ts';

/** The forms a recording is kept in. */
export type StoredSamples = RecordingSamples;

/** How samples are stored. */
export type Storage = 'int16' | 'int24' | 'int32' | 'float32' | 'float64';

/** The smallest storage that holds every sample of the format exactly (WAV integers scaled by 2^(bits−1)). */
export function storageFor(format: SampleFormat | null): Storage {
  if (format === 'u8' || format === 'i16') return 'int16';
  if (format === 'i24') return 'int24';
  if (format === 'i32') return 'int32';
  if (format === 'f32') return 'float32';
  return 'float64';
}

type Backing = Int16Array | Int32Array | Float32Array | Float64Array;

export class GrowableSamples {
  private data: Backing;
  /** The lowest 8 bits of each code, for int24 storage (`data` then holds the upper 16). */
  private low: Uint8Array | null;
  length = 0;

  constructor(
    private readonly storage: Storage,
    capacity = 1 << 16,
  ) {
    this.data = this.make(Math.max(1, capacity));
    this.low = storage === 'int24' ? new Uint8Array(this.data.length) : null;
  }

  private make(n: number): Backing {
    if (this.storage === 'int16' || this.storage === 'int24') return new Int16Array(n);
    if (this.storage === 'int32') return new Int32Array(n);
    return this.storage === 'float32' ? new Float32Array(n) : new Float64Array(n);
  }

  /**
   * Appends the values (for int16 storage, values v with v·32768 a 16-bit integer, as 8/16-bit WAV gives;
   * for int24, v·8388608 a 24-bit integer, as 24-bit WAV gives; for int32, v·2147483648 a 32-bit integer).
   */
  push(values: ArrayLike<number>): void {
    const need = this.length + values.length;
    if (need > this.data.length) {
      const next = this.make(Math.max(need, 2 * this.data.length));
      next.set(this.data.subarray(0, this.length));
      this.data = next;
      if (this.low) {
        const low = new Uint8Array(next.length);
        low.set(this.low.subarray(0, this.length));
        this.low = low;
      }
    }
    if (this.low) {
      const d = this.data;
      const l = this.low;
      for (let i = 0; i < values.length; i++) {
        const code = values[i]! * INT24_FULL_SCALE;
        d[this.length + i] = code >> 8;
        l[this.length + i] = code & 255;
      }
    } else if (this.data instanceof Int16Array) {
      const d = this.data;
      for (let i = 0; i < values.length; i++) d[this.length + i] = values[i]! * INT16_FULL_SCALE;
    } else if (this.data instanceof Int32Array) {
      const d = this.data;
      for (let i = 0; i < values.length; i++) d[this.length + i] = values[i]! * INT32_FULL_SCALE;
    } else {
      this.data.set(values, this.length);
    }
    this.length = need;
  }

  /** The samples, in an array of exactly their length (its buffer can be transferred). */
  take(): StoredSamples {
    const d = this.length === this.data.length ? this.data : this.data.slice(0, this.length);
    if (this.low) {
      const l = this.length === this.low.length ? this.low : this.low.slice(0, this.length);
      return new ScaledInt24Samples(d as Int16Array, l);
    }
    if (d instanceof Int16Array) return new ScaledInt16Samples(d);
    return d instanceof Int32Array ? new ScaledInt32Samples(d) : d;
  }
}

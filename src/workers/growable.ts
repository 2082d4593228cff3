/**
 * Samples whose count is known only at the end (or only from a header), kept in the smallest form that holds
 * the source exactly: 8- and 16-bit integers as Int16 codes (ScaledInt16Samples), 24-bit integers and 32-bit
 * float as float32, anything else as float64. With an expected count the array is allocated once at that
 * size; beyond it, it grows by doubling.
 */
import {
  INT16_FULL_SCALE,
  ScaledInt16Samples,
  type RecordingSamples,
  type SampleFormat,
} from '../core/signal/index.ts';

/** The forms a recording is kept in. */
export type StoredSamples = RecordingSamples;

/** How samples are stored. */
export type Storage = 'int16' | 'float32' | 'float64';

/** The smallest storage that holds every sample of the format exactly (WAV integers scaled by 2^(bits−1)). */
export function storageFor(format: SampleFormat | null): Storage {
  if (format === 'u8' || format === 'i16') return 'int16';
  if (format === 'i24' || format === 'f32') return 'float32';
  return 'float64';
}

type Backing = Int16Array | Float32Array | Float64Array;

export class GrowableSamples {
  private data: Backing;
  length = 0;

  constructor(
    private readonly storage: Storage,
    capacity = 1 << 16,
  ) {
    this.data = this.make(Math.max(1, capacity));
  }

  private make(n: number): Backing {
    if (this.storage === 'int16') return new Int16Array(n);
    return this.storage === 'float32' ? new Float32Array(n) : new Float64Array(n);
  }

  /** Appends the values (for int16 storage, values v with v·32768 a 16-bit integer, as 8/16-bit WAV gives). */
  push(values: ArrayLike<number>): void {
    const need = this.length + values.length;
    if (need > this.data.length) {
      const next = this.make(Math.max(need, 2 * this.data.length));
      next.set(this.data.subarray(0, this.length));
      this.data = next;
    }
    if (this.data instanceof Int16Array) {
      const d = this.data;
      for (let i = 0; i < values.length; i++) d[this.length + i] = values[i]! * INT16_FULL_SCALE;
    } else {
      this.data.set(values, this.length);
    }
    this.length = need;
  }

  /** The samples, in an array of exactly their length (its buffer can be transferred). */
  take(): StoredSamples {
    const d = this.length === this.data.length ? this.data : this.data.slice(0, this.length);
    return d instanceof Int16Array ? new ScaledInt16Samples(d) : d;
  }
}

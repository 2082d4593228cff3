/** Data-word codes as values and as integer WAV samples. */
import type { SampleFormat } from '../signal/sampleFormat.ts';

/** The smallest integer WAV format holding a D-bit code: u8, i16, i24 or i32. */
export function containerFormat(dataBits: number): 'u8' | 'i16' | 'i24' | 'i32' {
  return dataBits <= 8 ? 'u8' : dataBits <= 16 ? 'i16' : dataBits <= 24 ? 'i24' : 'i32';
}

/** Bits of a container format. */
export function containerBits(format: SampleFormat): number {
  return format === 'u8' ? 8 : format === 'i16' ? 16 : format === 'i24' ? 24 : 32;
}

/**
 * The values D-bit codes stand for, code·2^−(D−1) (full scale 1). Written to a B-bit integer WAV these store
 * exactly code·2^(B−D): the same fraction of full scale, the code in the top D bits.
 */
export function codesToValues(codes: ArrayLike<number>, dataBits: number): Float64Array {
  const lsb = 2 ** -(dataBits - 1);
  const out = new Float64Array(codes.length);
  for (let i = 0; i < codes.length; i++) out[i] = codes[i]! * lsb;
  return out;
}

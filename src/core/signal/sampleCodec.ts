/**
 * Little-endian sample codec for interleaved WAV frames: bytes to normalised float64 (and the stored
 * integers), and float64 back to bytes with clipping counted. Loops run over typed arrays with no object
 * per sample, since a 10-minute 48 kHz stereo file holds 57.6 million samples.
 */
import { bytesPerSample, integerScale, type SampleFormat } from './sampleFormat.ts';

/**
 * Decodes `frames` interleaved frames of `channelCount` samples from `bytes` (starting at byte 0) into
 * out[c][offset + i]. Integer samples are divided by integerScale(format); with `integers`, the stored
 * integer (8-bit as byte − 128) also lands in integers[c][offset + i].
 */
export function decodeFrames(
  bytes: Uint8Array,
  format: SampleFormat,
  channelCount: number,
  frames: number,
  out: readonly (Float64Array | null)[],
  offset: number,
  integers?: readonly (Int32Array | null)[],
): void {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const size = bytesPerSample(format);
  const frameBytes = size * channelCount;
  const scale = integerScale(format);
  for (let c = 0; c < channelCount; c++) {
    const dst = out[c] ?? null;
    const ints = integers?.[c] ?? null;
    if (dst === null && ints === null) continue;
    let p = c * size;
    for (let i = 0; i < frames; i++, p += frameBytes) {
      let v: number;
      switch (format) {
        case 'u8':
          v = bytes[p]! - 128;
          break;
        case 'i16':
          v = view.getInt16(p, true);
          break;
        case 'i24':
          // Sign-extend the 24-bit value by shifting it to the top of a 32-bit integer and back.
          v = ((bytes[p]! | (bytes[p + 1]! << 8) | (bytes[p + 2]! << 16)) << 8) >> 8;
          break;
        case 'i32':
          v = view.getInt32(p, true);
          break;
        case 'f32':
          v = view.getFloat32(p, true);
          break;
        case 'f64':
          v = view.getFloat64(p, true);
          break;
      }
      if (dst !== null) dst[offset + i] = v / scale;
      if (ints !== null) ints[offset + i] = v;
    }
  }
}

/**
 * Encodes frames [start, start + count) of the channels as interleaved little-endian bytes. Integer formats
 * store round(x · 2^(bits-1)) clipped to the format's range (NaN stores 0); the return value counts the
 * samples that were clipped or not finite. Float formats store the value as it is (f32 rounds to nearest)
 * and count nothing.
 */
export function encodeFrames(
  channels: readonly Float64Array[],
  format: SampleFormat,
  start: number,
  count: number,
  out: Uint8Array,
): number {
  const view = new DataView(out.buffer, out.byteOffset, out.byteLength);
  const size = bytesPerSample(format);
  const channelCount = channels.length;
  const frameBytes = size * channelCount;
  const scale = integerScale(format);
  const lo = -scale;
  const hi = scale - 1;
  let clipped = 0;
  for (let c = 0; c < channelCount; c++) {
    const src = channels[c]!;
    let p = c * size;
    for (let i = 0; i < count; i++, p += frameBytes) {
      const x = src[start + i]!;
      if (format === 'f32') {
        view.setFloat32(p, x, true);
        continue;
      }
      if (format === 'f64') {
        view.setFloat64(p, x, true);
        continue;
      }
      let v = Math.round(x * scale);
      if (!(v >= lo && v <= hi)) {
        clipped++;
        v = Number.isNaN(v) ? 0 : v < lo ? lo : hi;
      }
      writeInteger(view, out, p, format, v);
    }
  }
  return clipped;
}

/**
 * Encodes stored integers (as decodeFrames gives them: 8-bit as byte − 128) frames [start, start + count)
 * as interleaved bytes, for a bit-exact rewrite of an integer file. Integer formats only.
 */
export function encodeIntegerFrames(
  integers: readonly Int32Array[],
  format: SampleFormat,
  start: number,
  count: number,
  out: Uint8Array,
): void {
  if (format === 'f32' || format === 'f64') {
    throw new Error(`encodeIntegerFrames: ${format} is a float format; encode it with encodeFrames`);
  }
  const view = new DataView(out.buffer, out.byteOffset, out.byteLength);
  const size = bytesPerSample(format);
  const frameBytes = size * integers.length;
  for (let c = 0; c < integers.length; c++) {
    const src = integers[c]!;
    let p = c * size;
    for (let i = 0; i < count; i++, p += frameBytes) writeInteger(view, out, p, format, src[start + i]!);
  }
}

function writeInteger(view: DataView, out: Uint8Array, p: number, format: SampleFormat, v: number): void {
  switch (format) {
    case 'u8':
      out[p] = v + 128;
      break;
    case 'i16':
      view.setInt16(p, v, true);
      break;
    case 'i24':
      out[p] = v & 0xff;
      out[p + 1] = (v >> 8) & 0xff;
      out[p + 2] = (v >> 16) & 0xff;
      break;
    default:
      view.setInt32(p, v, true);
  }
}

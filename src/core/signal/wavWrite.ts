/**
 * WAV writing: the header for a known frame count (so a stream can write it up front, or rewrite it once
 * the count is known), and the samples in any of the six formats. Plain PCM/float files get the canonical
 * 44-byte header that most readers expect; more than two channels, or `extensible`, use
 * WAVE_FORMAT_EXTENSIBLE (68 bytes) as the Microsoft note asks for multichannel files.
 */
import { encodeFrames, encodeIntegerFrames } from './sampleCodec.ts';
import { bytesPerSample, isFloatFormat, type SampleFormat } from './sampleFormat.ts';

/** What a WAV header describes. */
export interface WavLayout {
  format: SampleFormat;
  channelCount: number;
  /** Samples per second per channel, in Hz (a positive integer). */
  sampleRate: number;
  frameCount: number;
  /** Use WAVE_FORMAT_EXTENSIBLE even for one or two channels. */
  extensible?: boolean;
}

/** Samples to write: normalised channels (or stored integers for a bit-exact integer rewrite). */
export interface WavWriteInput {
  format: SampleFormat;
  sampleRate: number;
  channels: readonly Float64Array[];
  /** Stored integers per channel; when given (integer formats), these are written instead of channels. */
  integers?: readonly Int32Array[] | null;
  extensible?: boolean;
}

/** The bytes of a written file and how many samples had to be clipped to fit an integer format. */
export interface WavWriteResult {
  bytes: Uint8Array;
  clipped: number;
}

/** Largest data chunk a RIFF size field can describe. */
const MAX_DATA_BYTES = 0xffffffff - 60;

/** Header bytes for the layout: RIFF, fmt (plain or extensible) and the data chunk's 8-byte preamble. */
export function wavHeaderBytes(layout: WavLayout): Uint8Array {
  const { format, channelCount, sampleRate, frameCount } = layout;
  if (!(Number.isInteger(channelCount) && channelCount >= 1 && channelCount <= 65535)) {
    throw new Error(`wavHeaderBytes: ${channelCount} channels; a WAV file holds 1 to 65535`);
  }
  if (!(Number.isInteger(sampleRate) && sampleRate >= 1 && sampleRate <= 0xffffffff)) {
    throw new Error(`wavHeaderBytes: sample rate ${sampleRate} Hz; WAV stores a positive whole number of Hz`);
  }
  const size = bytesPerSample(format);
  const blockAlign = size * channelCount;
  const dataBytes = frameCount * blockAlign;
  if (dataBytes > MAX_DATA_BYTES)
    throw new Error(`wavHeaderBytes: ${dataBytes} bytes exceed a RIFF file's 4 GiB`);
  const extensible = layout.extensible === true || channelCount > 2;
  const fmtSize = extensible ? 40 : 16;
  const headerBytes = 12 + 8 + fmtSize + 8;
  const out = new Uint8Array(headerBytes);
  const view = new DataView(out.buffer);
  const tag = (p: number, s: string) => [...s].forEach((ch, i) => (out[p + i] = ch.charCodeAt(0)));
  const code = isFloatFormat(format) ? 3 : 1;
  tag(0, 'RIFF');
  view.setUint32(4, headerBytes - 8 + dataBytes + (dataBytes & 1), true);
  tag(8, 'WAVE');
  tag(12, 'fmt ');
  view.setUint32(16, fmtSize, true);
  view.setUint16(20, extensible ? 0xfffe : code, true);
  view.setUint16(22, channelCount, true);
  view.setUint32(24, sampleRate, true);
  view.setUint32(28, sampleRate * blockAlign, true);
  view.setUint16(32, blockAlign, true);
  view.setUint16(34, size * 8, true);
  if (extensible) {
    view.setUint16(36, 22, true); // cbSize
    view.setUint16(38, size * 8, true); // valid bits
    view.setUint32(40, channelCount <= 2 ? (1 << channelCount) - 1 : 0, true); // speaker mask: FL, FR or none
    view.setUint16(44, code, true);
    out.set([0x00, 0x00, 0x00, 0x00, 0x10, 0x00, 0x80, 0x00, 0x00, 0xaa, 0x00, 0x38, 0x9b, 0x71], 46);
  }
  tag(headerBytes - 8, 'data');
  view.setUint32(headerBytes - 4, dataBytes, true);
  return out;
}

/** Bytes of `frames` frames of the channels in the format, with the clipped-sample count. */
export function encodeWavBlock(
  channels: readonly Float64Array[],
  format: SampleFormat,
  start = 0,
  frames = channels[0]?.length ?? 0,
): WavWriteResult {
  const bytes = new Uint8Array(frames * channels.length * bytesPerSample(format));
  const clipped = encodeFrames(channels, format, start, frames, bytes);
  return { bytes, clipped };
}

/** A whole WAV file in memory. An odd-length data chunk gets its pad byte. */
export function writeWav(input: WavWriteInput): WavWriteResult {
  const channelCount = input.channels.length || input.integers?.length || 0;
  const frames = input.channels[0]?.length ?? input.integers?.[0]?.length ?? 0;
  const layout: WavLayout = {
    format: input.format,
    channelCount,
    sampleRate: input.sampleRate,
    frameCount: frames,
  };
  if (input.extensible !== undefined) layout.extensible = input.extensible;
  const header = wavHeaderBytes(layout);
  const dataBytes = frames * channelCount * bytesPerSample(input.format);
  const out = new Uint8Array(header.length + dataBytes + (dataBytes & 1));
  out.set(header);
  const body = out.subarray(header.length, header.length + dataBytes);
  if (input.integers && !isFloatFormat(input.format)) {
    encodeIntegerFrames(input.integers, input.format, 0, frames, body);
    return { bytes: out, clipped: 0 };
  }
  const clipped = encodeFrames(input.channels, input.format, 0, frames, body);
  return { bytes: out, clipped };
}

/**
 * The header of a RIFF/WAVE file: walks the chunks up to the start of the 'data' chunk, reads 'fmt '
 * (plain PCM, IEEE float and WAVE_FORMAT_EXTENSIBLE) and skips every other chunk. Works on a prefix of the
 * file, so a chunked reader can call it again with more bytes until the header is complete.
 * Layout per the Microsoft/IBM RIFF specification (1991) and the WAVE_FORMAT_EXTENSIBLE note (Microsoft).
 */
import type { InputError } from '../types.ts';
import { bytesPerSample, describeFormat, type SampleFormat } from './sampleFormat.ts';

/** What the header says about the samples and where they are. */
export interface WavInfo {
  format: SampleFormat;
  /** The format code found: 1 (PCM), 3 (IEEE float) or 0xFFFE (extensible). */
  formatTag: number;
  channelCount: number;
  /** Samples per second per channel, in Hz. */
  sampleRate: number;
  /** Bits of each stored sample (the container). */
  bitsPerSample: number;
  /** Bits that carry signal (extensible files may say fewer than the container, e.g. 20 of 24). */
  validBits: number;
  /** Bytes per frame (one sample of every channel). */
  blockAlign: number;
  /** Byte offset of the first sample in the file. */
  dataOffset: number;
  /** Bytes of samples the data chunk declares; null when the size field is unset (0 or 0xFFFFFFFF). */
  dataBytes: number | null;
  /** Whole frames the data chunk declares; null when dataBytes is null. */
  frameCount: number | null;
  /** Things worth telling the user about how the file was read. */
  notes: string[];
}

/** The header read so far: complete, in need of more bytes, or broken. */
export type WavHeaderResult =
  | { status: 'ok'; info: WavInfo }
  | { status: 'need-more'; bytesNeeded: number }
  | { status: 'error'; error: InputError };

/** What the reader accepts, quoted in every format error. */
export const ACCEPTED_WAV =
  'integer PCM (format code 1) with 8, 16, 24 or 32 bits, IEEE float (code 3) with 32 or 64 bits, ' +
  'or WAVE_FORMAT_EXTENSIBLE (0xFFFE) with either of those subformats';

const FORMAT_NAMES: Record<number, string> = {
  2: 'Microsoft ADPCM',
  6: 'A-law',
  7: 'µ-law',
  0x11: 'IMA ADPCM',
  0x55: 'MPEG layer 3',
};

/** The 14 bytes that follow the format code in the KSDATAFORMAT_SUBTYPE_PCM / _IEEE_FLOAT GUIDs. */
const GUID_TAIL = [0x00, 0x00, 0x00, 0x00, 0x10, 0x00, 0x80, 0x00, 0x00, 0xaa, 0x00, 0x38, 0x9b, 0x71];

/** Unset data-chunk sizes written by recorders that never closed the file. */
const UNSET_SIZES = new Set([0, 0xffffffff]);

function fourCC(bytes: Uint8Array, p: number): string {
  return String.fromCharCode(bytes[p]!, bytes[p + 1]!, bytes[p + 2]!, bytes[p + 3]!);
}

function printable(tag: string): string {
  return /^[\x20-\x7e]{4}$/.test(tag)
    ? `"${tag}"`
    : `bytes ${[...tag].map((c) => c.charCodeAt(0)).join(' ')}`;
}

function fail(message: string, position: number, expected?: string): WavHeaderResult {
  return {
    status: 'error',
    error: expected === undefined ? { message, position } : { message, position, expected },
  };
}

/**
 * Reads the WAV header from the first bytes of a file. Returns 'need-more' (with the prefix length that
 * would help) until the 'fmt ' chunk and the start of the 'data' chunk are both in hand.
 */
export function readWavHeader(bytes: Uint8Array): WavHeaderResult {
  if (bytes.length < 12) return { status: 'need-more', bytesNeeded: 12 };
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const riff = fourCC(bytes, 0);
  if (riff !== 'RIFF') {
    const hint = riff === 'RF64' ? ' (RF64, the 64-bit variant, is not read)' : '';
    return fail(
      `Not a WAV file: it starts with ${printable(riff)}${hint}, not "RIFF".`,
      0,
      'a RIFF/WAVE file',
    );
  }
  const wave = fourCC(bytes, 8);
  if (wave !== 'WAVE') {
    return fail(`A RIFF file of type ${printable(wave)}, not "WAVE".`, 8, 'a RIFF/WAVE file');
  }
  let p = 12;
  let fmt: Omit<WavInfo, 'dataOffset' | 'dataBytes' | 'frameCount'> | null = null;
  for (;;) {
    if (p + 8 > bytes.length) return { status: 'need-more', bytesNeeded: p + 8 };
    const id = fourCC(bytes, p);
    const size = view.getUint32(p + 4, true);
    if (id === 'data') {
      if (fmt === null) return fail('The data chunk comes before the "fmt " chunk that describes it.', p);
      const unset = UNSET_SIZES.has(size);
      const notes = [...fmt.notes];
      if (unset) notes.push('The data chunk size is not set (a recording not closed); reading to the end.');
      const dataBytes = unset ? null : size;
      return {
        status: 'ok',
        info: {
          ...fmt,
          notes,
          dataOffset: p + 8,
          dataBytes,
          frameCount: dataBytes === null ? null : Math.floor(dataBytes / fmt.blockAlign),
        },
      };
    }
    const end = p + 8 + size + (size & 1); // chunks are padded to an even length
    if (id === 'fmt ') {
      if (p + 8 + size > bytes.length) return { status: 'need-more', bytesNeeded: p + 8 + size };
      const r = readFmt(bytes, view, p + 8, size);
      if ('status' in r) return r;
      fmt = r;
    }
    p = end;
  }
}

function readFmt(
  bytes: Uint8Array,
  view: DataView,
  p: number,
  size: number,
): Omit<WavInfo, 'dataOffset' | 'dataBytes' | 'frameCount'> | WavHeaderResult {
  if (size < 16) return fail(`The "fmt " chunk is ${size} bytes; it needs at least 16.`, p - 4);
  const formatTag = view.getUint16(p, true);
  const channelCount = view.getUint16(p + 2, true);
  const sampleRate = view.getUint32(p + 4, true);
  const blockAlign = view.getUint16(p + 12, true);
  const bitsPerSample = view.getUint16(p + 14, true);
  const notes: string[] = [];
  let code = formatTag;
  let validBits = bitsPerSample;
  if (formatTag === 0xfffe) {
    if (size < 40) return fail(`An extensible "fmt " chunk of ${size} bytes; it needs 40.`, p - 4);
    validBits = view.getUint16(p + 18, true) || bitsPerSample;
    code = view.getUint16(p + 24, true);
    const tailOk = GUID_TAIL.every((b, i) => bytes[p + 26 + i] === b);
    if (!tailOk || (code !== 1 && code !== 3)) {
      return fail(`An extensible WAV whose subformat GUID is not PCM or IEEE float.`, p + 24, ACCEPTED_WAV);
    }
  }
  const where = p;
  if (code !== 1 && code !== 3) {
    const name = FORMAT_NAMES[code];
    const hex = `0x${code.toString(16).padStart(4, '0')}`;
    return fail(`Unsupported WAV format code ${hex}${name ? ` (${name})` : ''}.`, where, ACCEPTED_WAV);
  }
  const format = sampleFormatOf(code, bitsPerSample);
  if (format === null) {
    const kind = code === 1 ? 'integer PCM' : 'IEEE float';
    return fail(`Unsupported WAV sample size: ${kind} with ${bitsPerSample} bits.`, where + 14, ACCEPTED_WAV);
  }
  if (channelCount === 0) return fail('The WAV header says the file has 0 channels.', where + 2);
  if (sampleRate === 0) return fail('The WAV header says the sample rate is 0 Hz.', where + 4);
  if (blockAlign !== channelCount * bytesPerSample(format)) {
    return fail(
      `The WAV header's frame size (${blockAlign} bytes) does not match ${channelCount} channel(s) of ` +
        `${describeFormat(format)} (${channelCount * bytesPerSample(format)} bytes).`,
      where + 12,
    );
  }
  if (validBits < bitsPerSample) {
    notes.push(
      `${validBits} of ${bitsPerSample} bits carry signal; samples are scaled by the full container.`,
    );
  }
  return { format, formatTag, channelCount, sampleRate, bitsPerSample, validBits, blockAlign, notes };
}

function sampleFormatOf(code: number, bits: number): SampleFormat | null {
  if (code === 3) return bits === 32 ? 'f32' : bits === 64 ? 'f64' : null;
  switch (bits) {
    case 8:
      return 'u8';
    case 16:
      return 'i16';
    case 24:
      return 'i24';
    case 32:
      return 'i32';
    default:
      return null;
  }
}

import { describe, it, expect } from 'vitest';
import {
  SAMPLE_FORMATS,
  WavDecoder,
  integerScale,
  readWav,
  readWavChunked,
  wavHeaderBytes,
  writeWav,
  type SampleFormat,
} from '../../../src/core/signal/index.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

interface WavCase {
  bytes: string;
  rate: number;
  format: SampleFormat;
  ints?: number[][];
  floats?: number[][];
}

function fromBase64(s: string): Uint8Array {
  return new Uint8Array(Buffer.from(s, 'base64'));
}

/** Random stored values covering the whole range of the format, extremes included. */
function randomSamples(format: SampleFormat, n: number, seed: number): Float64Array {
  const next = mulberry32(seed);
  const x = new Float64Array(n);
  const scale = integerScale(format);
  for (let i = 0; i < n; i++) {
    if (format === 'f32') x[i] = Math.fround(4 * next() - 2);
    else if (format === 'f64') x[i] = (4 * next() - 2) * (1 + next() * 1e-9);
    else x[i] = (Math.floor(next() * 2 * scale) - scale) / scale;
  }
  if (format !== 'f32' && format !== 'f64') {
    x[0] = -1;
    x[1] = (scale - 1) / scale;
  }
  return x;
}

function sameBits(a: Float64Array, b: Float64Array): boolean {
  return Buffer.from(a.buffer, a.byteOffset, a.byteLength).equals(
    Buffer.from(b.buffer, b.byteOffset, b.byteLength),
  );
}

describe('writeWav / readWav round trip', () => {
  for (const format of SAMPLE_FORMATS) {
    for (const channels of [1, 2, 3]) {
      it(`${format}, ${channels} channel(s): samples and bytes come back bit for bit`, () => {
        const input = Array.from({ length: channels }, (_, c) => randomSamples(format, 257, 11 * c + 1));
        const written = writeWav({ format, sampleRate: 44100, channels: input });
        expect(written.clipped).toBe(0);
        const back = readWav(written.bytes, { keepIntegers: true });
        if (!back.ok) throw new Error(back.error.message);
        expect(back.value.info.format).toBe(format);
        expect(back.value.info.formatTag).toBe(channels > 2 ? 0xfffe : format.startsWith('f') ? 3 : 1);
        expect(back.value.sampleRate).toBe(44100);
        back.value.channels.forEach((ch, c) => expect(sameBits(ch, input[c]!)).toBe(true));
        // The stored integers rewrite the identical file.
        const again = writeWav({ format, sampleRate: 44100, channels: back.value.channels });
        expect(Buffer.from(again.bytes).equals(Buffer.from(written.bytes))).toBe(true);
        if (format.startsWith('f')) {
          expect(back.value.integers).toBeNull();
        } else {
          const fromInts = writeWav({
            format,
            sampleRate: 44100,
            channels: [],
            integers: back.value.integers,
          });
          expect(Buffer.from(fromInts.bytes).equals(Buffer.from(written.bytes))).toBe(true);
        }
      });
    }
  }

  it('integer scaling is 2^(bits-1): full-scale negative reads exactly -1', () => {
    for (const format of ['u8', 'i16', 'i24', 'i32'] as const) {
      const { bytes } = writeWav({ format, sampleRate: 8000, channels: [Float64Array.of(-1, 0.5, 0)] });
      const r = readWav(bytes, { keepIntegers: true });
      if (!r.ok) throw new Error(r.error.message);
      expect(Array.from(r.value.channels[0]!)).toEqual([-1, 0.5, 0]);
      const s = integerScale(format);
      expect(Array.from(r.value.integers![0]!)).toEqual([-s, s / 2, 0]);
    }
  });

  it('extensible headers on one channel are read like plain ones', () => {
    const x = randomSamples('i24', 50, 3);
    const { bytes } = writeWav({ format: 'i24', sampleRate: 96000, channels: [x], extensible: true });
    expect(bytes.length).toBe(68 + 150);
    const r = readWav(bytes);
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.info.formatTag).toBe(0xfffe);
    expect(sameBits(r.value.channels[0]!, x)).toBe(true);
  });
});

describe('clipping when writing integers', () => {
  it('counts and clips samples beyond full scale; NaN stores 0', () => {
    const x = Float64Array.of(1, -1.5, 0.25, 2, NaN, 32767 / 32768);
    const { bytes, clipped } = writeWav({ format: 'i16', sampleRate: 8000, channels: [x] });
    expect(clipped).toBe(4); // 1.0 itself is one step beyond the largest 16-bit value 32767
    const r = readWav(bytes, { keepIntegers: true });
    if (!r.ok) throw new Error(r.error.message);
    expect(Array.from(r.value.integers![0]!)).toEqual([32767, -32768, 8192, 32767, 0, 32767]);
  });
  it('float formats keep values beyond ±1 and count nothing', () => {
    const x = Float64Array.of(1.5, -3);
    const r = writeWav({ format: 'f32', sampleRate: 8000, channels: [x] });
    expect(r.clipped).toBe(0);
    const back = readWav(r.bytes);
    expect(back.ok && Array.from(back.value.channels[0]!)).toEqual([1.5, -3]);
  });
});

describe('files written by Python', () => {
  const { cases } = loadFixture<{ cases: Record<string, WavCase> }>('signal_wav');
  for (const [name, c] of Object.entries(cases)) {
    it(`${name}: samples as the writer stored them`, () => {
      const bytes = fromBase64(c.bytes);
      const r = readWav(bytes, { keepIntegers: true });
      if (!r.ok) throw new Error(r.error.message);
      expect(r.value.info.format).toBe(c.format);
      expect(r.value.sampleRate).toBe(c.rate);
      if (c.ints) {
        // Python wave module / scipy.io.wavfile.write: the integers written
        r.value.integers!.forEach((ints, ch) => expect(Array.from(ints)).toEqual(c.ints![ch]));
        r.value.channels.forEach((x, ch) =>
          expect(Array.from(x)).toEqual(c.ints![ch]!.map((v) => v / integerScale(c.format))),
        );
      } else {
        // scipy.io.wavfile.write 1.17: the float values written
        r.value.channels.forEach((x, ch) => expect(Array.from(x)).toEqual(c.floats![ch]));
      }
    });
  }
  it('our 16-bit header and data are byte for byte what the wave module writes', () => {
    for (const name of ['i16_mono_wave', 'i16_stereo_wave', 'u8_mono_wave', 'i24_mono_wave']) {
      const c = cases[name]!;
      const python = fromBase64(c.bytes);
      const r = readWav(python, { keepIntegers: true });
      if (!r.ok) throw new Error(r.error.message);
      const ours = writeWav({ format: c.format, sampleRate: c.rate, channels: r.value.channels });
      expect(Buffer.from(ours.bytes).equals(Buffer.from(python)), name).toBe(true); // Python wave module
    }
  });
});

/** A 44-byte PCM header followed by a custom chunk list, for error cases. */
function riff(chunks: [string, Uint8Array][], kind = 'WAVE', magic = 'RIFF'): Uint8Array {
  const parts = chunks.map(([id, body]) => {
    const head = new Uint8Array(8);
    head.set([...id].map((ch) => ch.charCodeAt(0)));
    new DataView(head.buffer).setUint32(4, body.length, true);
    const pad = body.length & 1 ? new Uint8Array(1) : new Uint8Array(0);
    return Buffer.concat([head, body, pad]);
  });
  const body = Buffer.concat(parts);
  const out = Buffer.concat([Buffer.from(magic + '\0\0\0\0' + kind, 'latin1'), body]);
  out.writeUInt32LE(out.length - 8, 4);
  return new Uint8Array(out);
}

function fmt(code: number, channels: number, rate: number, bits: number): Uint8Array {
  const b = Buffer.alloc(16);
  b.writeUInt16LE(code, 0);
  b.writeUInt16LE(channels, 2);
  b.writeUInt32LE(rate, 4);
  b.writeUInt32LE((rate * channels * bits) / 8, 8);
  b.writeUInt16LE((channels * bits) / 8, 12);
  b.writeUInt16LE(bits, 14);
  return new Uint8Array(b);
}

describe('chunks and errors', () => {
  it('skips unknown chunks (odd-sized, padded) before and after the data', () => {
    const data = new Uint8Array(Buffer.from(Int16Array.of(100, -200, 300).buffer));
    const bytes = riff([
      ['LIST', new Uint8Array(5)],
      ['fmt ', fmt(1, 1, 8000, 16)],
      ['junk', new Uint8Array(3)],
      ['data', data],
      ['cue ', new Uint8Array(4)],
    ]);
    const r = readWav(bytes, { keepIntegers: true });
    if (!r.ok) throw new Error(r.error.message);
    expect(Array.from(r.value.integers![0]!)).toEqual([100, -200, 300]);
  });

  it('names what it found and what it accepts', () => {
    const cases: [Uint8Array, RegExp][] = [
      [
        new Uint8Array(Buffer.from('ID3\u0004 some mp3 bytes here')),
        /Not a WAV file: it starts with "ID3\\u0004"|Not a WAV file/,
      ],
      [riff([], 'AVI '), /type "AVI ", not "WAVE"/],
      [
        riff([
          ['fmt ', fmt(7, 1, 8000, 8)],
          ['data', new Uint8Array(4)],
        ]),
        /0x0007 \(µ-law\)/,
      ],
      [
        riff([
          ['fmt ', fmt(3, 1, 8000, 16)],
          ['data', new Uint8Array(4)],
        ]),
        /IEEE float with 16 bits/,
      ],
      [
        riff([
          ['fmt ', fmt(1, 1, 8000, 12)],
          ['data', new Uint8Array(4)],
        ]),
        /integer PCM with 12 bits/,
      ],
      [riff([['data', new Uint8Array(4)]]), /before the "fmt " chunk/],
      [new Uint8Array(0), /empty/],
      [riff([['fmt ', fmt(1, 1, 8000, 16)]]), /inside the header/],
    ];
    for (const [bytes, pattern] of cases) {
      const r = readWav(bytes);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.message).toMatch(pattern);
    }
    const unsupported = readWav(
      riff([
        ['fmt ', fmt(2, 1, 8000, 4)],
        ['data', new Uint8Array(4)],
      ]),
    );
    expect(!unsupported.ok && unsupported.error.expected).toMatch(/integer PCM.*IEEE float.*EXTENSIBLE/);
  });

  it('a truncated data chunk is an error that gives both sizes, or kept with a note when asked', () => {
    const full = writeWav({ format: 'i16', sampleRate: 8000, channels: [new Float64Array(100)] }).bytes;
    const cut = full.subarray(0, 44 + 61);
    const r = readWav(cut);
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.error.message).toMatch(/declares 200 bytes \(100 frames.*after 61 bytes of it \(30 frames\)/);
    const kept = readWav(cut, { acceptTruncated: true });
    if (!kept.ok) throw new Error(kept.error.message);
    expect(kept.value.channels[0]!.length).toBe(30);
    expect(kept.value.notes.join(' ')).toMatch(/30 complete frames were kept/);
  });

  it('an unset data size (a recording never closed) reads to the end of the file', () => {
    const bytes = writeWav({
      format: 'i16',
      sampleRate: 8000,
      channels: [Float64Array.of(0.5, -0.5)],
    }).bytes.slice();
    new DataView(bytes.buffer).setUint32(40, 0xffffffff, true);
    const r = readWav(bytes);
    if (!r.ok) throw new Error(r.error.message);
    expect(Array.from(r.value.channels[0]!)).toEqual([0.5, -0.5]);
    expect(r.value.notes.join(' ')).toMatch(/not set/);
  });

  it('a channel index beyond the file is refused with the range', () => {
    const bytes = writeWav({
      format: 'i16',
      sampleRate: 8000,
      channels: [new Float64Array(4), new Float64Array(4)],
    }).bytes;
    const r = readWav(bytes, { channel: 2 });
    expect(!r.ok && r.error.expected).toBe('a channel index from 0 to 1');
  });
});

describe('chunked reading', () => {
  const left = randomSamples('i24', 5003, 8);
  const right = randomSamples('i24', 5003, 9);
  const file = writeWav({ format: 'i24', sampleRate: 48000, channels: [left, right] }).bytes;

  it('chunks of odd sizes (1 byte up) give the one-shot samples, frames split across chunks', () => {
    for (const size of [1, 7, 13, 44, 45, 1001]) {
      const decoder = new WavDecoder({ channel: 1 });
      const got = new Float64Array(5003);
      for (let p = 0; p < file.length; p += size) {
        const r = decoder.push(file.subarray(p, p + size));
        if (!r.ok) throw new Error(r.error.message);
        if (r.value) got.set(r.value.channels[0]!, r.value.startFrame);
      }
      const end = decoder.finish();
      expect(end.ok && end.value.framesDecoded).toBe(5003);
      expect(sameBits(got, right)).toBe(true);
    }
  });

  it('reports progress up to 1 and stops when cancelled', async () => {
    const fractions: number[] = [];
    const r = await readWavChunked(file, {
      chunkBytes: 4099,
      onProgress: (p) => fractions.push(p.fraction ?? -1),
    });
    if (!r.ok) throw new Error(r.error.message);
    expect(sameBits(r.value.channels[0]!, left)).toBe(true);
    expect(fractions.at(-1)).toBe(1);
    for (let i = 1; i < fractions.length; i++)
      expect(fractions[i]!).toBeGreaterThanOrEqual(fractions[i - 1]!);

    const controller = new AbortController();
    let calls = 0;
    const cancelled = await readWavChunked(file, {
      chunkBytes: 1000,
      signal: controller.signal,
      onProgress: () => {
        if (++calls === 3) controller.abort();
      },
    });
    expect(cancelled.ok).toBe(false);
    if (!cancelled.ok) expect(cancelled.error.cancelled).toBe(true);
    expect(calls).toBe(3);
  });

  it('accepts an async stream of chunks', async () => {
    async function* stream() {
      for (let p = 0; p < file.length; p += 333) yield file.subarray(p, p + 333);
    }
    const r = await readWavChunked(stream(), { channel: 0 });
    expect(r.ok && sameBits(r.value.channels[0]!, left)).toBe(true);
  });

  it('writes a header for a known frame count that matches the whole-file header', () => {
    const header = wavHeaderBytes({ format: 'i24', channelCount: 2, sampleRate: 48000, frameCount: 5003 });
    expect(Buffer.from(header).equals(Buffer.from(file.subarray(0, 44)))).toBe(true);
  });
});

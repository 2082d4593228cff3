import { describe, expect, it } from 'vitest';
import {
  ScaledInt16Samples,
  ScaledInt24Samples,
  ScaledInt32Samples,
  makeTones,
  writeWav,
  type RecordingSamples,
} from '../../src/core/signal/index.ts';
import type { Section } from '../../src/core/types.ts';
import type { JobContext } from '../../src/workers/jobs.ts';
import { adoptPendingJob, loadFileJob } from '../../src/workers/loadJobs.ts';
import { outputJob } from '../../src/workers/outputJob.ts';
import { inputSpectrumJob } from '../../src/workers/spectrumJob.ts';
import { levelsJob } from '../../src/workers/levelsJob.ts';
import { viewJob } from '../../src/workers/viewJob.ts';
import { exportJob } from '../../src/workers/exportJob.ts';
import { PENDING_KEY, RECORDING_INFO_KEY, RECORDING_KEY } from '../../src/workers/recordingKeys.ts';

function context(): JobContext & { store: Map<string, unknown> } {
  const store = new Map<string, unknown>();
  return {
    store,
    get: <T>(k: string) => store.get(k) as T | undefined,
    set: (k, v) => void store.set(k, v),
    drop: (k) => void store.delete(k),
    checkpoint: async () => {},
  };
}

const FS = 8000;
const N = 30_001;
// A lowpass biquad and a resonator: enough to exercise state carried across slices.
const SECTIONS: Section[] = [
  [0.02, 0.04, 0.02, 1, -1.56, 0.64],
  [1, 0, -1, 1, -1.9, 0.95],
];

/**
 * The same integer recording stored twice: as read (Int16 codes, 3-byte codes for 24-bit, Int32 codes for
 * 32-bit) and as the float array of its values (how 24-bit recordings were kept before: Float32Array; for
 * 32-bit, whose codes float32 cannot hold, Float64Array, as they were kept before).
 */
async function twoStores(format: 'i16' | 'u8' | 'i24' | 'i32') {
  const x = makeTones(N, FS, [
    { frequencyHz: 440, amplitude: 0.4 },
    { frequencyHz: 1234.5, amplitude: 0.3 },
  ]);
  for (let i = 0; i < N; i++) x[i] = x[i]! + 0.1 * Math.sin(i * i * 1e-3);
  const { bytes } = writeWav({ format, sampleRate: FS, channels: [x] });
  const a = context();
  const loaded = await loadFileJob({ id: 7, file: new Blob([bytes as BlobPart]), name: 'r.wav' }, a);
  expect(loaded.value.kind).toBe('done');
  const stored = a.get<RecordingSamples>(RECORDING_KEY)!;
  expect(stored).toBeInstanceOf(
    format === 'i24' ? ScaledInt24Samples : format === 'i32' ? ScaledInt32Samples : ScaledInt16Samples,
  );
  const values = stored.subarray(0, stored.length);
  if (format === 'i32') {
    // The recording really uses 32-bit resolution: most of its values are not float32 numbers.
    let beyondFloat32 = 0;
    for (const v of values) if (Math.fround(v) !== v) beyondFloat32++;
    expect(beyondFloat32).toBeGreaterThan(N / 2);
  }
  const b = context();
  b.set(PENDING_KEY, values);
  await adoptPendingJob({ id: 7, sampleRate: FS }, b);
  expect(b.get(RECORDING_KEY)).toBeInstanceOf(format === 'i32' ? Float64Array : Float32Array);
  return { a, b };
}

describe('24-bit recordings kept as 3-byte codes', () => {
  it('read back as code/8388608 for every code, the extremes and the byte boundaries included', async () => {
    // Codes chosen by hand: full-scale ends, ±1, and values whose low byte is 0, 255, or carries into the high part.
    const codes = [-8388608, 8388607, -1, 1, 0, -256, 255, 256, -257, 0x7fff00, -0x7fff01, 123456, -654321];
    const x = Float64Array.from(codes, (c) => c / 8388608);
    const { bytes } = writeWav({ format: 'i24', sampleRate: FS, channels: [x] });
    const c = context();
    await loadFileJob({ id: 1, file: new Blob([bytes as BlobPart]), name: 'a.wav' }, c);
    const s = c.get<ScaledInt24Samples>(RECORDING_KEY)!;
    expect(s).toBeInstanceOf(ScaledInt24Samples);
    expect(s.high.BYTES_PER_ELEMENT + s.low.BYTES_PER_ELEMENT).toBe(3);
    const got = s.subarray(0);
    expect(got).toBeInstanceOf(Float32Array);
    for (let i = 0; i < codes.length; i++) {
      expect(s.code(i)).toBe(codes[i]);
      expect(got[i]! * 8388608).toBe(codes[i]);
    }
    expect(s.subarray(10, 5000).length).toBe(codes.length - 10);
    expect(s.subarray(5, 3).length).toBe(0);
  });
});

describe('32-bit integer recordings kept as Int32 codes', () => {
  it('read back as float64 code/2147483648 for every code, the full-scale ends and the low bits included', async () => {
    // Codes chosen by hand: full-scale ends, ±1, and codes whose low 8 bits a float32 would lose.
    const codes = [
      -2147483648, 2147483647, -1, 1, 0, 0x7fffff01, -0x7fffff01, 16777217, -123456789, 987654321,
    ];
    const x = Float64Array.from(codes, (c) => c / 2147483648);
    const { bytes } = writeWav({ format: 'i32', sampleRate: FS, channels: [x] });
    const c = context();
    await loadFileJob({ id: 1, file: new Blob([bytes as BlobPart]), name: 'a.wav' }, c);
    const s = c.get<ScaledInt32Samples>(RECORDING_KEY)!;
    expect(s).toBeInstanceOf(ScaledInt32Samples);
    expect(s.codes.BYTES_PER_ELEMENT).toBe(4);
    const got = s.subarray(0);
    expect(got).toBeInstanceOf(Float64Array);
    for (let i = 0; i < codes.length; i++) {
      expect(s.codes[i]).toBe(codes[i]);
      expect(got[i]! * 2147483648).toBe(codes[i]);
    }
    expect(s.subarray(8, 5000).length).toBe(codes.length - 8);
    expect(s.subarray(5, 3).length).toBe(0);
  });
});

describe('8- and 16-bit recordings kept as Int16 codes', () => {
  it('read back as code/32768, the values the WAV holds (8-bit as (byte − 128)/128)', async () => {
    // The codes written by the WAV writer are round(x·32768) (sampleFormat.ts); reading gives code/32768.
    const x = Float64Array.from({ length: 1000 }, (_, i) => Math.sin(i / 7) * 0.9);
    const { bytes } = writeWav({ format: 'i16', sampleRate: FS, channels: [x] });
    const c = context();
    await loadFileJob({ id: 1, file: new Blob([bytes as BlobPart]), name: 'a.wav' }, c);
    const s = c.get<ScaledInt16Samples>(RECORDING_KEY)!;
    expect(s.codes.BYTES_PER_ELEMENT).toBe(2);
    const got = s.subarray(0);
    for (let i = 0; i < x.length; i++) expect(got[i]! * 32768).toBe(Math.round(x[i]! * 32768));
    // Clamped ends, as TypedArray.subarray.
    expect(s.subarray(990, 5000).length).toBe(10);
    expect(s.subarray(5, 3).length).toBe(0);
  });

  for (const format of ['i16', 'u8', 'i24', 'i32'] as const) {
    it(`every recording job gives bit for bit the float store's answer (${format})`, async () => {
      const { a, b } = await twoStores(format);
      // The pyramid built while loading.
      expect(a.get(RECORDING_INFO_KEY)).toEqual(b.get(RECORDING_INFO_KEY));
      const both = async <T>(run: (c: JobContext) => Promise<{ value: T }>) => {
        const [p, q] = [await run(a), await run(b)];
        expect(p.value).toEqual(q.value);
        return p.value;
      };
      const spectrum = { window: 'hann' as const, nperseg: 1024 };
      await both((c) =>
        outputJob(
          {
            id: 7,
            version: 1,
            sections: SECTIONS,
            spectrum,
            tones: { frequenciesHz: [440, 1234.5], weighting: 'hann' },
          },
          c,
        ),
      );
      await both((c) => inputSpectrumJob({ id: 7, ...spectrum }, c));
      const levels = await both((c) => levelsJob({ id: 7, frequenciesHz: [440, 1234.5] }, c));
      expect(levels.ok).toBe(true);
      // Views: band (from the pyramids, partial blocks from the samples), line, and a drag preview.
      for (const [i0, i1, columns, line] of [
        [0, N, 300, false],
        [1001, 17_777, 333, false],
        [12_345, 12_700, 300, true],
        [29_000, N, 7, false],
      ] as const) {
        const answer = await both((c) =>
          viewJob(
            {
              id: 7,
              i0,
              i1,
              columns,
              line,
              preview: { version: 2, sections: SECTIONS.slice(0, 1) },
              have: { input: false, outputVersion: null },
            },
            c,
          ),
        );
        expect(answer.input).not.toBeNull();
        expect(answer.output).not.toBeNull();
        expect(answer.preview).not.toBeNull();
      }
      for (const kind of ['wav', 'csv'] as const) {
        const [p, q] = [a, b].map((c) =>
          exportJob({ id: 7, kind, sections: SECTIONS, format: 'f32', startTime: 0 }, c),
        );
        const [bp, bq] = [(await p!).value.blob, (await q!).value.blob];
        expect(new Uint8Array(await bp.arrayBuffer())).toEqual(new Uint8Array(await bq.arrayBuffer()));
      }
    });
  }
});

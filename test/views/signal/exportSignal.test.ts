/**
 * Downloads of the recording: the fixed-point run as an integer WAV of the codes (on the page) and CSV of
 * input and output codes, and the filtered CSV (both written by the recording worker's export job).
 */
import { describe, it, expect } from 'vitest';
import { buildImplementation, DEFAULT_IMPLEMENTATION, simulateFixed } from '../../../src/core/fixed/index.ts';
import { readWav } from '../../../src/core/signal/index.ts';
import { makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import { fixedWav } from '../../../src/views/signal/exportSignal.ts';
import { exportJob, type ExportRequest } from '../../../src/workers/exportJob.ts';
import type { JobContext } from '../../../src/workers/jobs.ts';
import { RECORDING_INFO_KEY, RECORDING_KEY } from '../../../src/workers/recordingKeys.ts';
import { pyramidOf } from '../../../src/core/signal/index.ts';

/** The export job's text for a recording held as the worker holds it. */
async function exported(x: Float64Array, sampleRate: number, request: ExportRequest): Promise<string> {
  const kept = new Map<string, unknown>([
    [RECORDING_KEY, x],
    [RECORDING_INFO_KEY, { id: request.id, sampleRate, length: x.length, pyramid: pyramidOf(x) }],
  ]);
  const ctx: JobContext = {
    get: <T>(k: string) => kept.get(k) as T | undefined,
    set: (k, v) => void kept.set(k, v),
    drop: (k) => void kept.delete(k),
    checkpoint: async () => undefined,
  };
  return (await exportJob(request, ctx)).value.blob.text();
}
import { hum } from '../../helpers/fixedDesigns.ts';

function implement(dataWordLength: number) {
  const r = buildImplementation(hum, 2000, {
    ...DEFAULT_IMPLEMENTATION,
    dataWordLength,
    accumulatorBits: 56,
  });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('fixed-point downloads', () => {
  const x = makeWhiteNoise(3000, 2, 0.2);
  for (const [bits, format] of [
    [8, 'u8'],
    [12, 'i16'],
    [16, 'i16'],
    [20, 'i24'],
    [32, 'i32'],
  ] as const) {
    it(`${bits}-bit codes go to ${format}, in its top bits, and read back as the codes`, async () => {
      const impl = implement(bits);
      const sim = simulateFixed(impl, x);
      const { blob } = fixedWav(sim.output, 2000, impl);
      const r = readWav(new Uint8Array(await blob.arrayBuffer()));
      if (!r.ok) throw new Error(r.error.message);
      expect(r.value.info.format).toBe(format);
      expect(Array.from(r.value.channels[0]!, (v) => v * 2 ** (bits - 1))).toEqual(Array.from(sim.output));
    });
  }

  it('CSV: time, input codes (quantized as the run does) and output codes', async () => {
    const impl = implement(16);
    const sim = simulateFixed(impl, x);
    const text = await exported(x, 2000, { id: 1, kind: 'fixed-csv', implementation: impl, startTime: 1.5 });
    const lines = text.trim().split('\n');
    expect(lines[0]).toBe('time_s,input_code,output_code');
    expect(lines).toHaveLength(3001);
    expect(lines[11]).toBe(`${1.5 + 10 / 2000},${sim.input[10]},${sim.output[10]}`);
  });

  it('the filtered CSV carries the input beside the output', async () => {
    const y = x.map((v) => v / 2);
    const text = await exported(x, 1000, {
      id: 1,
      kind: 'csv',
      sections: [[0.5, 0, 0, 1, 0, 0]],
      format: 'f32',
      startTime: 0,
    });
    const lines = text.trim().split('\n');
    expect(lines[0]).toBe('time_s,input,filtered');
    expect(lines[3]).toBe(`0.002,${x[2]},${y[2]}`);
  });
});

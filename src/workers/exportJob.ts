/**
 * The filtered recording as a file, built in the worker slice by slice: WAV in any sample format (header
 * first, then each slice's bytes), CSV with time, input and filtered columns, or the fixed-point run as CSV of
 * input and output codes (the implementation run again, bit for bit the run the page shows). The page gets a
 * Blob, never the samples.
 */
import {
  bytesPerSample,
  createSectionFilter,
  csvHeaderLine,
  csvRows,
  describeFormat,
  encodeWavBlock,
  runSectionFilter,
  sampleTimes,
  wavHeaderBytes,
  type SampleFormat,
} from '../core/signal/index.ts';
import { FixedRun, type Implementation } from '../core/fixed/index.ts';
import type { Section } from '../core/types.ts';
import type { JobContext } from './jobs.ts';
import { recordingOf } from './recordingKeys.ts';

export const EXPORT_JOB = 'export';
/** Samples per slice (and per CSV part). */
export const EXPORT_SLICE = 1 << 16;

export type ExportRequest =
  | {
      id: number;
      kind: 'wav' | 'csv';
      sections: Section[];
      /** WAV sample format. */
      format: SampleFormat;
      /** Time of the first sample for the CSV time column, s. */
      startTime: number;
    }
  | { id: number; kind: 'fixed-csv'; implementation: Implementation; startTime: number };

export interface ExportResult {
  blob: Blob;
  /** What a user should know (clipping, a rounded sample rate). */
  notes: string[];
}

export async function exportJob(req: ExportRequest, ctx: JobContext): Promise<{ value: ExportResult }> {
  const { samples: x, info } = recordingOf(ctx, req.id);
  const n = x.length;
  const fs = info.sampleRate;
  const parts: BlobPart[] = [];
  const notes: string[] = [];
  if (req.kind === 'fixed-csv') {
    const run = new FixedRun(req.implementation);
    parts.push(csvHeaderLine(['time_s', 'input_code', 'output_code']));
    for (let start = 0; start < n; start += EXPORT_SLICE) {
      const count = Math.min(EXPORT_SLICE, n - start);
      const { input, output } = run.pushValues(x.subarray(start, start + count));
      parts.push(csvRows([sampleTimes(start, count, fs, req.startTime), input, output], 0, count));
      await ctx.checkpoint((start + count) / n);
    }
    return { value: { blob: new Blob(parts, { type: 'text/csv' }), notes } };
  }
  const filter = createSectionFilter(req.sections);
  const y = new Float64Array(EXPORT_SLICE);
  let clipped = 0;
  const rate = Math.max(1, Math.round(fs));
  if (req.kind === 'wav') {
    if (rate !== fs)
      notes.push(`WAV stores whole hertz: the sample rate ${fs} Hz was written as ${rate} Hz.`);
    parts.push(
      wavHeaderBytes({ format: req.format, channelCount: 1, sampleRate: rate, frameCount: n }) as BlobPart,
    );
  } else {
    parts.push(csvHeaderLine(['time_s', 'input', 'filtered']));
  }
  for (let start = 0; start < n; start += EXPORT_SLICE) {
    const count = Math.min(EXPORT_SLICE, n - start);
    const input = x.subarray(start, start + count);
    const piece = runSectionFilter(filter, input, y.subarray(0, count));
    if (req.kind === 'wav') {
      const block = encodeWavBlock([piece], req.format);
      clipped += block.clipped;
      parts.push(block.bytes as BlobPart);
    } else {
      parts.push(csvRows([sampleTimes(start, count, fs, req.startTime), input, piece], 0, count));
    }
    await ctx.checkpoint((start + count) / n);
  }
  if (req.kind === 'wav') {
    // An odd-length data chunk gets its pad byte (as writeWav does).
    if ((n * bytesPerSample(req.format)) & 1) parts.push(new Uint8Array(1) as BlobPart);
    if (clipped > 0) {
      notes.push(
        `${clipped} sample(s) beyond ±1 were clipped to fit ${describeFormat(req.format)}; export as 32-bit float to keep them.`,
      );
    }
  }
  const type = req.kind === 'wav' ? 'audio/wav' : 'text/csv';
  return { value: { blob: new Blob(parts, { type }), notes } };
}

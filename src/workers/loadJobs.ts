/**
 * Jobs that put a recording into the recording worker: read a WAV/CSV file (in slices, with progress,
 * cancellable), take the sample rate for a text file that had none, or make a test signal. Each keeps the
 * samples in the worker with their min/max pyramid and forgets the previous recording and its output; the
 * page gets what it shows (name, rate, length, format, notes), never the samples.
 */
import {
  PyramidBuilder,
  generateSum,
  samplesSlice,
  sliceScratch,
  type GeneratorSpec,
  type ParsedSignal,
  type ParsedSignalInfo,
} from '../core/signal/index.ts';
import type { JobContext } from './jobs.ts';
import { parseSignalFile, type ParseError, type ParseMessage, type ParseRequest } from './parseSignal.ts';
import type { StoredSamples } from './growable.ts';
import {
  OUTPUT_KEY,
  PENDING_KEY,
  RECORDING_INFO_KEY,
  RECORDING_KEY,
  type RecordingInfo,
} from './recordingKeys.ts';

export const LOAD_FILE_JOB = 'load-file';
export const ADOPT_PENDING_JOB = 'adopt-pending';
export const GENERATE_JOB = 'generate';

/** Samples per pyramid slice between checks for cancellation. */
const PYRAMID_SLICE = 1 << 20;

/** What a load ends with: the signal shown, a question for the sample rate, or what was wrong. */
export type LoadOutcome =
  | { kind: 'done'; signal: ParsedSignalInfo }
  | { kind: 'needs-rate'; name: string; count: number; notes: string[] }
  | { kind: 'error'; error: ParseError };

/** Keeps samples as the recording on show, with their pyramid (built in slices: cancellable). */
async function keep(
  ctx: JobContext,
  id: number,
  sampleRate: number,
  samples: StoredSamples,
  from: number,
  to: number,
): Promise<void> {
  const builder = new PyramidBuilder(samples.length);
  const scratch = sliceScratch(samples, Math.min(samples.length, PYRAMID_SLICE));
  for (let i = 0; i < samples.length; i += PYRAMID_SLICE) {
    builder.push(samplesSlice(samples, i, i + PYRAMID_SLICE, scratch));
    await ctx.checkpoint(from + ((to - from) * Math.min(samples.length, i + PYRAMID_SLICE)) / samples.length);
  }
  const info: RecordingInfo = { id, sampleRate, length: samples.length, pyramid: builder.finish() };
  ctx.drop(OUTPUT_KEY);
  ctx.set(RECORDING_KEY, samples);
  ctx.set(RECORDING_INFO_KEY, info);
}

function infoOf(signal: ParsedSignal): ParsedSignalInfo {
  const { samples, ...rest } = signal;
  return { ...rest, length: samples.length };
}

/** Reads a file; the recording shown before stays until this one is complete. */
export async function loadFileJob(
  req: ParseRequest & { id: number },
  ctx: JobContext,
): Promise<{ value: LoadOutcome }> {
  let last: ParseMessage | null = null;
  const post = async (m: ParseMessage) => {
    if (m.type === 'progress') await ctx.checkpoint(0.95 * m.fraction);
    else last = m;
  };
  await parseSignalFile(req, post);
  const m = last as ParseMessage | null;
  if (m === null || m.type === 'progress') {
    return { value: { kind: 'error', error: { message: 'The file could not be read to its end.' } } };
  }
  if (m.type === 'error') return { value: { kind: 'error', error: m.error } };
  if (m.type === 'needs-sample-rate') {
    ctx.set(PENDING_KEY, m.samples);
    return { value: { kind: 'needs-rate', name: m.name, count: m.samples.length, notes: m.notes } };
  }
  await keep(ctx, req.id, m.signal.sampleRate, m.signal.samples, 0.95, 1);
  return { value: { kind: 'done', signal: infoOf(m.signal) } };
}

/** Shows the text file's samples that waited for a sample rate, at the rate given. */
export async function adoptPendingJob(
  req: { id: number; sampleRate: number },
  ctx: JobContext,
): Promise<{ value: { length: number } }> {
  const samples = ctx.get<StoredSamples>(PENDING_KEY);
  if (!samples) throw new Error('no text file is waiting for a sample rate');
  ctx.drop(PENDING_KEY);
  await keep(ctx, req.id, req.sampleRate, samples, 0, 1);
  return { value: { length: samples.length } };
}

/** Makes a test signal (the sum of the parts) and shows it. */
export async function generateJob(
  req: { id: number; specs: GeneratorSpec[]; n: number; sampleRate: number },
  ctx: JobContext,
): Promise<{ value: { length: number } }> {
  await ctx.checkpoint(0);
  const samples = generateSum(req.specs, req.n, req.sampleRate);
  await keep(ctx, req.id, req.sampleRate, samples, 0.5, 1);
  return { value: { length: samples.length } };
}

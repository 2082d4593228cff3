/**
 * What the recording worker keeps between jobs (see jobs.ts `set`/`get`): the one recording on show, read
 * or made in the worker and never copied to the page, its min/max pyramid, and the filtered output of the
 * last design it was run through (its pyramid and the cascade's state at regular points, from which any
 * stretch of the output is computed again in a moment; the output itself is not kept, so an hour-long
 * recording costs its samples plus a few per cent).
 */
import type { Section } from '../core/types.ts';
import type { MinMaxPyramid } from '../core/signal/index.ts';
import type { JobContext } from './jobs.ts';
import type { StoredSamples } from './growable.ts';

/**
 * The recording's samples (full scale 1: a float32 or float64 array, or Int16 or 24-bit codes read as
 * float32 slices, or Int32 codes read as float64 slices, through the same `subarray`): the key every
 * recording job reads.
 */
export const RECORDING_KEY = 'recording';
/** RecordingInfo of the samples under RECORDING_KEY. */
export const RECORDING_INFO_KEY = 'recording-info';
/** Samples of a text file waiting for the user to give their sample rate. */
export const PENDING_KEY = 'recording-pending';
/** StoredOutput: the recording through the last design run. */
export const OUTPUT_KEY = 'recording-output';

/** Samples between two kept cascade states of the output. */
export const OUTPUT_STATE_INTERVAL = 1 << 15;

export interface RecordingInfo {
  /** The page's number for this recording (a new one per load); jobs name it, so a stale job fails. */
  id: number;
  sampleRate: number;
  length: number;
  pyramid: MinMaxPyramid;
}

export interface StoredOutput {
  id: number;
  /** The page's number for the design's cascade this output belongs to. */
  version: number;
  sections: Section[];
  pyramid: MinMaxPyramid;
  /** The cascade's state (2 values per section) at the start of every OUTPUT_STATE_INTERVAL samples. */
  states: Float64Array;
}

/** The recording the job names, or an error saying it has been replaced. */
export function recordingOf(ctx: JobContext, id: number): { samples: StoredSamples; info: RecordingInfo } {
  const info = ctx.get<RecordingInfo>(RECORDING_INFO_KEY);
  const samples = ctx.get<StoredSamples>(RECORDING_KEY);
  if (!info || !samples || info.id !== id) throw new Error('the recording was closed or replaced');
  return { samples, info };
}

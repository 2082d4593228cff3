/**
 * The job that runs a recording through a fixed-point implementation in the recording worker: the
 * bit-exact cascade in slices (so it can be cancelled and reports progress), giving the output codes, the
 * difference from the ideal filter sample by sample in output LSBs, and the run's report (overflows,
 * differences, what happens after the recording ends).
 */
import {
  FixedRun,
  type FixedRunReport,
  type Implementation,
  type LimitCycleReport,
} from '../core/fixed/index.ts';
import type { JobContext } from './jobs.ts';
import type { StoredSamples } from './growable.ts';

/** The job's kind. */
export const FIXED_RUN_JOB = 'fixed-run';
/** Samples per slice: about a millisecond or two of work between checks for newer requests. */
export const FIXED_RUN_SLICE = 1 << 15;

/** What the page asks for. */
export interface FixedRecordingRequest {
  implementation: Implementation;
  /** The key the recording's samples (full scale 1) are kept under (recordingKeys.ts RECORDING_KEY). */
  recordingKey: string;
}

/** What the job gives back. */
export interface FixedRecordingResult {
  /** Output codes of the cascade (Q0.(D−1)), one per sample. */
  output: Int32Array;
  /** Output code − the ideal cascade's output, in output LSBs (on the same quantized input). */
  differenceLsb: Float32Array;
  report: FixedRunReport & { afterInput: LimitCycleReport };
}

/** Runs the recording through the implementation, slice by slice. */
export async function fixedRecordingJob(
  request: FixedRecordingRequest,
  ctx: JobContext,
): Promise<{ value: FixedRecordingResult; transfer: Transferable[] }> {
  const x = ctx.get<StoredSamples>(request.recordingKey);
  if (!x) throw new Error('no recording to run (it was closed)');
  const run = new FixedRun(request.implementation);
  const n = x.length;
  const output = new Int32Array(n);
  const differenceLsb = new Float32Array(n);
  const ideal = new Float64Array(FIXED_RUN_SLICE);
  const scale = 1 / run.lsb;
  for (let start = 0; start < n; start += FIXED_RUN_SLICE) {
    const end = Math.min(n, start + FIXED_RUN_SLICE);
    const out = output.subarray(start, end);
    const ref = ideal.subarray(0, end - start);
    run.pushCodes(run.quantize(x.subarray(start, end)), out, ref);
    for (let i = 0; i < out.length; i++) differenceLsb[start + i] = out[i]! - ref[i]! * scale;
    await ctx.checkpoint(end / n);
  }
  const report = run.finish();
  return {
    value: { output, differenceLsb, report },
    transfer: [output.buffer, differenceLsb.buffer],
  };
}

/**
 * The zeros of an FIR's quantized taps found off the page's thread (views/firQuantized/tapZerosFinder.ts):
 * the same tapZeros the page runs for short tap sets (core/fixed/firQuantized.ts), so both give the same
 * zeros. One root finding per request, not sliced; before it starts the job lets the messages already sent
 * in, so when the taps changed several times in a row (the word length stepped with the + button) only the
 * last set is solved, not every one in turn. A reply for taps that changed meanwhile is dropped on the page.
 */
import { tapZeros, type TapZeros } from '../core/fixed/firQuantized.ts';
import type { JobContext } from './jobs.ts';

export const TAP_ZEROS_JOB = 'tap-zeros';

/** The taps, c[0] … c[L−1]. */
export type TapZerosRequest = readonly number[];

export async function tapZerosJob(taps: TapZerosRequest, ctx: JobContext): Promise<{ value: TapZeros }> {
  await ctx.checkpoint(0); // ends here (JobCancelled) if a newer request has cancelled this one
  return { value: tapZeros(taps) };
}

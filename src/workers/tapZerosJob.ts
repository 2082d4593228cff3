/**
 * The zeros of an FIR's quantized taps found off the page's thread (views/firQuantized/tapZerosFinder.ts):
 * the same tapZeros the page runs for short tap sets (core/fixed/firQuantized.ts), so both give the same
 * zeros. One root finding per request, not sliced: the finder asks again only once the taps change, and a
 * reply for taps that changed meanwhile is dropped on the page.
 */
import { tapZeros, type TapZeros } from '../core/fixed/firQuantized.ts';

export const TAP_ZEROS_JOB = 'tap-zeros';

/** The taps, c[0] … c[L−1]. */
export type TapZerosRequest = readonly number[];

export function tapZerosJob(taps: TapZerosRequest): Promise<{ value: TapZeros }> {
  return Promise.resolve({ value: tapZeros(taps) });
}

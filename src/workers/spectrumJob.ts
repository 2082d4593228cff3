/** The recording's own Welch spectrum (before the filter), in slices with progress, once per setting. */
import { samplesSlice, sliceScratch, type WelchResult } from '../core/signal/index.ts';
import type { JobContext } from './jobs.ts';
import { spectrumAccumulator, type SpectrumRequest } from './outputJob.ts';
import { recordingOf } from './recordingKeys.ts';

export const INPUT_SPECTRUM_JOB = 'input-spectrum';
/** Samples per slice between checks for newer requests. */
const SLICE = 1 << 18;

export async function inputSpectrumJob(
  req: SpectrumRequest & { id: number },
  ctx: JobContext,
): Promise<{ value: WelchResult; transfer: Transferable[] }> {
  const { samples: x, info } = recordingOf(ctx, req.id);
  const acc = spectrumAccumulator(x.length, info.sampleRate, req);
  const scratch = sliceScratch(x, Math.min(x.length, SLICE));
  for (let i = 0; i < x.length; i += SLICE) {
    acc.push(samplesSlice(x, i, i + SLICE, scratch));
    await ctx.checkpoint(Math.min(1, (i + SLICE) / x.length));
  }
  const result = acc.result();
  return { value: result, transfer: [result.power.buffer, result.frequencies.buffer] };
}

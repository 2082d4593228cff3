/**
 * Levels of tones at chosen frequencies in the recording before the filter (core/signal/levels.ts: each
 * frequency looked for near the asked one, then the tones fitted jointly by least squares over the whole
 * record, Hann-weighted), read in the worker in two passes of slices with progress, as measureLevels reads
 * a record held in one array. The filtered record's fit at the same frequencies runs in the output job.
 */
import {
  LEVEL_SEARCH_FRACTION,
  ToneFitAccumulator,
  ToneSearchAccumulator,
  levelReadings,
  samplesSlice,
  sliceScratch,
  searchWidths,
  settleFound,
  type LevelReport,
} from '../core/signal/index.ts';
import type { JobContext } from './jobs.ts';
import { recordingOf } from './recordingKeys.ts';

export const LEVELS_JOB = 'levels';
/** Samples per slice between checks for newer requests. */
const SLICE = 1 << 18;

export interface LevelsRequest {
  id: number;
  frequenciesHz: number[];
}

/** The readings before the filter (afterDb null), or why they could not be made. */
export type LevelsOutcome = { ok: true; report: LevelReport } | { ok: false; error: string };

export async function levelsJob(req: LevelsRequest, ctx: JobContext): Promise<{ value: LevelsOutcome }> {
  const { samples: x, info } = recordingOf(ctx, req.id);
  const fs = info.sampleRate;
  const n = x.length;
  const asked = req.frequenciesHz;
  // Int16-kept samples are converted into this, slice by slice (float-kept ones are read in place).
  const scratch = sliceScratch(x, Math.min(n, SLICE));
  try {
    const search = new ToneSearchAccumulator(fs, asked, searchWidths(asked, LEVEL_SEARCH_FRACTION), n);
    for (let i = 0; i < n; i += SLICE) {
      search.push(samplesSlice(x, i, i + SLICE, scratch));
      await ctx.checkpoint(0.5 * Math.min(1, (i + SLICE) / n));
    }
    const fitted = settleFound(asked, search.result(), fs / n);
    const fit = new ToneFitAccumulator(fs, fitted, n, 'hann');
    for (let i = 0; i < n; i += SLICE) {
      fit.push(samplesSlice(x, i, i + SLICE, scratch));
      await ctx.checkpoint(0.5 + 0.5 * Math.min(1, (i + SLICE) / n));
    }
    const report: LevelReport = {
      readings: levelReadings(asked, fitted, fit.result().tones, null),
      sampleRate: fs,
      weighting: 'hann',
      search: LEVEL_SEARCH_FRACTION,
      start: 0,
      count: n,
    };
    return { value: { ok: true, report } };
  } catch (e) {
    if (e instanceof RangeError) return { value: { ok: false, error: e.message } };
    throw e;
  }
}

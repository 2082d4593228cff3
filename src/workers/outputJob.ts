/**
 * The recording through the design's cascade, once per design (after a drag is released): in slices, with
 * progress, cancelled by a newer design. One pass gives the output's min/max pyramid, the cascade's state
 * every OUTPUT_STATE_INTERVAL samples (any stretch of the output is then a short run away), and, when the
 * spectrum view wants it, the output's Welch spectrum.
 */
import {
  PyramidBuilder,
  ToneFitAccumulator,
  WelchAccumulator,
  createSectionFilter,
  runSectionFilter,
  samplesSlice,
  sliceScratch,
  welchOptionsFor,
  type FitWeighting,
  type ToneEstimate,
  type WelchResult,
  type WindowName,
} from '../core/signal/index.ts';
import type { Section } from '../core/types.ts';
import type { JobContext } from './jobs.ts';
import type { StoredSamples } from './growable.ts';
import { OUTPUT_KEY, OUTPUT_STATE_INTERVAL, recordingOf, type StoredOutput } from './recordingKeys.ts';

export const OUTPUT_JOB = 'output';
/** State intervals per slice between checks for newer requests (about 2–20 ms of work). */
const INTERVALS_PER_SLICE = 8;

/** Welch settings as the spectrum view sets them ('spectrum' scaling). */
export interface SpectrumRequest {
  window: WindowName;
  nperseg: number;
}

export interface OutputRequest {
  id: number;
  version: number;
  sections: Section[];
  /** Also the output's spectrum with these settings. */
  spectrum: SpectrumRequest | null;
  /** Also the output's tones fitted at these frequencies (those found in the recording), over the whole record. */
  tones?: { frequenciesHz: number[]; weighting: FitWeighting } | null;
}

export interface OutputResult {
  version: number;
  spectrum: WelchResult | null;
  /** The fitted tones, when asked for (null when the fit was refused: tones too close to tell apart). */
  tones: ToneEstimate[] | null;
}

/** The Welch accumulator for n samples and the view's settings. */
export function spectrumAccumulator(n: number, sampleRate: number, s: SpectrumRequest): WelchAccumulator {
  return new WelchAccumulator(
    sampleRate,
    welchOptionsFor(n, { window: s.window, nperseg: s.nperseg, scaling: 'spectrum' }),
  );
}

export async function outputJob(
  req: OutputRequest,
  ctx: JobContext,
): Promise<{ value: OutputResult; transfer: Transferable[] }> {
  const { samples: x, info } = recordingOf(ctx, req.id);
  const n = x.length;
  const filter = createSectionFilter(req.sections);
  const width = 2 * req.sections.length;
  // A run for the spectrum or the tones of the output already kept builds no second pyramid beside it.
  const kept = ctx.get<StoredOutput>(OUTPUT_KEY);
  const again = kept !== undefined && kept.id === req.id && kept.version === req.version;
  const states = again ? null : new Float64Array(Math.ceil(n / OUTPUT_STATE_INTERVAL) * width);
  const pyramid = again ? null : new PyramidBuilder(n);
  const welch = req.spectrum ? spectrumAccumulator(n, info.sampleRate, req.spectrum) : null;
  const fit = req.tones
    ? new ToneFitAccumulator(info.sampleRate, req.tones.frequenciesHz, n, req.tones.weighting)
    : null;
  const y = new Float64Array(OUTPUT_STATE_INTERVAL);
  const scratch = sliceScratch(x, OUTPUT_STATE_INTERVAL);
  for (let k = 0, start = 0; start < n; k++, start += OUTPUT_STATE_INTERVAL) {
    states?.set(filter.state, k * width);
    const end = Math.min(n, start + OUTPUT_STATE_INTERVAL);
    const piece = runSectionFilter(filter, samplesSlice(x, start, end, scratch), y.subarray(0, end - start));
    pyramid?.push(piece);
    welch?.push(piece);
    fit?.push(piece);
    if ((k + 1) % INTERVALS_PER_SLICE === 0) await ctx.checkpoint(end / n);
  }
  if (pyramid && states) {
    const stored: StoredOutput = {
      id: req.id,
      version: req.version,
      sections: req.sections,
      pyramid: pyramid.finish(),
      states,
    };
    ctx.set(OUTPUT_KEY, stored);
  }
  let tones: ToneEstimate[] | null = null;
  try {
    tones = fit ? fit.result().tones : null;
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
  }
  const spectrum = welch ? welch.result() : null;
  return {
    value: { version: req.version, spectrum, tones },
    transfer: spectrum ? [spectrum.power.buffer, spectrum.frequencies.buffer] : [],
  };
}

/** The stored output's samples [a, b), run again from the nearest kept state at or before a. */
export function outputStretch(out: StoredOutput, x: StoredSamples, a: number, b: number): Float64Array {
  const filter = createSectionFilter(out.sections);
  const k = Math.floor(a / OUTPUT_STATE_INTERVAL);
  const width = 2 * out.sections.length;
  filter.state.set(out.states.subarray(k * width, (k + 1) * width));
  const from = k * OUTPUT_STATE_INTERVAL;
  return runSectionFilter(filter, x.subarray(from, b)).subarray(a - from);
}

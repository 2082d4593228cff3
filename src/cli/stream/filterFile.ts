/**
 * Filters a signal file into another, streaming: blocks are read, filtered per channel by a stateful
 * cascade of second-order sections, or by the typed b, a in direct form II transposed (float64), and
 * written as they come, so memory stays a few blocks whatever the file's length.
 */
import { createSectionFilter, runSectionFilter, type SampleFormat } from '../../core/signal/index.ts';
import { filterTf } from '../../core/time/filter.ts';
import type { Section, TransferFunction } from '../../core/types.ts';
import type { SignalSink } from './sinks.ts';
import type { SignalSource, SourceSummary } from './sources.ts';

/** What a streaming run did. */
export interface StreamRunSummary {
  frames: number;
  channels: number;
  clipped: number;
  source: SourceSummary;
  outputFormat: SampleFormat | 'csv';
}

/** A stateful per-channel filter for a cascade of sections or for b, a as given. */
function channelFilter(system: readonly Section[] | TransferFunction): (x: Float64Array) => Float64Array {
  if (Array.isArray(system)) {
    const f = createSectionFilter(system as readonly Section[]);
    return (x) => runSectionFilter(f, x);
  }
  const tf = system as TransferFunction;
  const state = new Float64Array(Math.max(tf.b.length, tf.a.length) - 1);
  return (x) => filterTf(tf, x, state);
}

/**
 * Runs every block of the source through the sections or b, a (one state per channel) into the sink, up
 * to maxFrames frames; closes the sink with the source's sample rate, or fallbackRate when it has none.
 * The sink is made when the first block arrives, with the rate the source knows by then (a WAV header's).
 */
export async function filterStream(
  source: SignalSource,
  makeSink: (sampleRate: number) => Promise<SignalSink>,
  system: readonly Section[] | TransferFunction,
  options: { fallbackRate: number; maxFrames?: number; outputFormat: SampleFormat | 'csv' },
): Promise<StreamRunSummary> {
  let sink: SignalSink | null = null;
  const rate = () => source.summary().sampleRate ?? options.fallbackRate;
  const filters: ((x: Float64Array) => Float64Array)[] = [];
  const limit = options.maxFrames ?? Infinity;
  let frames = 0;
  let channels = 0;
  let closed = false;
  try {
    for await (const block of source.blocks()) {
      const take = Math.min(block.channels[0]!.length, limit - frames);
      if (take <= 0) break;
      channels = block.channels.length;
      while (filters.length < channels) filters.push(channelFilter(system));
      const out = block.channels.map((x, c) => filters[c]!(x.subarray(0, take)));
      sink ??= await makeSink(rate());
      await sink.write(out, block.times ? block.times.subarray(0, take) : null);
      frames += take;
    }
    const summary = source.summary();
    closed = true;
    sink ??= await makeSink(rate());
    await sink.close(summary.sampleRate ?? options.fallbackRate, summary.startTime);
    return { frames, channels, clipped: sink.clipped, source: summary, outputFormat: options.outputFormat };
  } finally {
    if (!closed && sink) await sink.close(options.fallbackRate, 0).catch(() => undefined);
  }
}

/**
 * Whole-file WAV reading, at once or chunk by chunk with progress and cancellation (for a worker that must
 * stay responsive while it parses ten minutes of audio). Both go through WavDecoder, so they agree exactly.
 */
import type { InputError, Result } from '../types.ts';
import { WavDecoder, type WavBlock, type WavDecodeOptions, type WavProgress } from './wavDecoder.ts';
import type { WavInfo } from './wavHeader.ts';

/** A decoded WAV file. */
export interface WavAudio {
  info: WavInfo;
  /** Samples per second per channel, in Hz. */
  sampleRate: number;
  /** Normalised samples, one array per kept channel (integers divided by 2^(bits-1); floats as stored). */
  channels: Float64Array[];
  /** Stored integers per kept channel when asked for (integer formats only), else null. */
  integers: Int32Array[] | null;
  notes: string[];
}

/** An error reading a WAV file; `cancelled` is set when the caller's signal stopped it. */
export interface WavReadError extends InputError {
  cancelled?: boolean;
}

/** Options of the chunked reader. */
export interface WavChunkedOptions extends WavDecodeOptions {
  /** Bytes per step when the source is one buffer (default 1 MiB). */
  chunkBytes?: number;
  /** Called after every chunk. */
  onProgress?: (progress: WavProgress) => void;
  /** Checked between chunks; when aborted, reading stops with a cancelled error. An AbortSignal fits. */
  signal?: { readonly aborted: boolean };
}

/** Default step of the chunked reader over a whole buffer: 1 MiB, about 5 ms of work per step. */
export const DEFAULT_WAV_CHUNK_BYTES = 1 << 20;

/** Collects blocks into whole-signal arrays, preallocated when the header gives the frame count. */
class Collector {
  channels: Float64Array[] = [];
  integers: Int32Array[] | null = null;
  length = 0;

  add(block: WavBlock, frameHint: number | null): void {
    if (this.channels.length === 0) {
      const cap = Math.max(frameHint ?? 0, block.frames, 1024);
      this.channels = block.channels.map(() => new Float64Array(cap));
      this.integers = block.integers ? block.integers.map(() => new Int32Array(cap)) : null;
    }
    const need = this.length + block.frames;
    if (need > this.channels[0]!.length) {
      const cap = Math.max(need, this.channels[0]!.length * 2);
      this.channels = this.channels.map((a) => grow(a, new Float64Array(cap)));
      if (this.integers) this.integers = this.integers.map((a) => grow(a, new Int32Array(cap)));
    }
    block.channels.forEach((a, c) => this.channels[c]!.set(a, this.length));
    block.integers?.forEach((a, c) => this.integers![c]!.set(a, this.length));
    this.length = need;
  }

  result(summary: { info: WavInfo; notes: string[] }, kept: number): WavAudio {
    const channels = this.channels.length
      ? this.channels.map((a) => a.subarray(0, this.length))
      : Array.from({ length: kept }, () => new Float64Array(0));
    const integers = this.integers ? this.integers.map((a) => a.subarray(0, this.length)) : null;
    return {
      info: summary.info,
      sampleRate: summary.info.sampleRate,
      channels,
      integers,
      notes: summary.notes,
    };
  }
}

function grow<T extends Float64Array | Int32Array>(a: T, b: T): T {
  b.set(a);
  return b;
}

function keptChannels(info: WavInfo, options: WavDecodeOptions): number {
  return options.channel === undefined ? info.channelCount : 1;
}

/** Reads a whole WAV file held in memory. */
export function readWav(bytes: Uint8Array | ArrayBuffer, options: WavDecodeOptions = {}): Result<WavAudio> {
  const all = bytes instanceof Uint8Array ? bytes : new Uint8Array(bytes);
  const decoder = new WavDecoder(options);
  const collector = new Collector();
  for (let p = 0; p < all.length || p === 0; p += DEFAULT_WAV_CHUNK_BYTES) {
    const r = decoder.push(all.subarray(p, p + DEFAULT_WAV_CHUNK_BYTES));
    if (!r.ok) return r;
    if (r.value) collector.add(r.value, decoder.info?.frameCount ?? null);
    if (all.length === 0) break;
  }
  const done = decoder.finish();
  if (!done.ok) return done;
  return { ok: true, value: collector.result(done.value, keptChannels(done.value.info, options)) };
}

/**
 * Reads a WAV file chunk by chunk, from one buffer (stepped through chunkBytes at a time) or from any
 * iterable of byte chunks (a file stream). Yields to the event loop between chunks, reports progress, and
 * stops with a cancelled error as soon as the signal is aborted.
 */
export async function readWavChunked(
  source: Uint8Array | ArrayBuffer | AsyncIterable<Uint8Array> | Iterable<Uint8Array>,
  options: WavChunkedOptions = {},
): Promise<Result<WavAudio, WavReadError>> {
  const decoder = new WavDecoder(options);
  const collector = new Collector();
  const cancelled = (): { ok: false; error: WavReadError } => ({
    ok: false,
    error: { message: 'Reading the WAV file was cancelled.', cancelled: true },
  });
  for await (const chunk of chunksOf(source, options.chunkBytes ?? DEFAULT_WAV_CHUNK_BYTES)) {
    if (options.signal?.aborted) return cancelled();
    const r = decoder.push(chunk);
    if (!r.ok) return r;
    if (r.value) collector.add(r.value, decoder.info?.frameCount ?? null);
    options.onProgress?.(decoder.progress());
    await nextTask();
  }
  if (options.signal?.aborted) return cancelled();
  const done = decoder.finish();
  if (!done.ok) return done;
  return { ok: true, value: collector.result(done.value, keptChannels(done.value.info, options)) };
}

async function* chunksOf(
  source: Uint8Array | ArrayBuffer | AsyncIterable<Uint8Array> | Iterable<Uint8Array>,
  step: number,
): AsyncGenerator<Uint8Array> {
  if (source instanceof ArrayBuffer || source instanceof Uint8Array) {
    const all = source instanceof Uint8Array ? source : new Uint8Array(source);
    for (let p = 0; p < all.length; p += step) yield all.subarray(p, p + step);
    return;
  }
  yield* source;
}

/** Lets queued messages (a cancel request, a progress repaint) run before the next chunk. */
function nextTask(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}

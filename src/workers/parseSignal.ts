/**
 * Reads a recording (WAV or CSV/TSV) from a Blob in slices, reporting progress after each, and keeps one
 * channel in the smallest exact form (growable.ts: 8/16-bit as Int16 codes, 24-bit as 3-byte codes, 32-bit integers as Int32 codes, float32 as float32),
 * allocated once from the WAV header's frame count, so a 16-bit hour at 48 kHz takes 0.35 GB, not 2.8 GB of
 * doubling float64 buffers. Runs in the recording worker's
 * load job (the progress callback is where a cancelled load stops); it has no DOM or worker dependency
 * itself, so tests call it directly.
 */
import type { InputError } from '../core/types.ts';
import {
  sampleBuffers,
  ACCEPTED_WAV,
  CsvSignalReader,
  WavDecoder,
  sampleRateOfStep,
  timingNote,
} from '../core/signal/index.ts';
import type { ParsedSignal } from '../core/signal/parsedSignal.ts';
import { GrowableSamples, storageFor, type StoredSamples } from './growable.ts';

/** Bytes read per step: large enough to keep the overhead small, small enough for a lively progress bar. */
export const PARSE_SLICE_BYTES = 4 << 20;

/** What to read. */
export interface ParseRequest {
  file: Blob;
  name: string;
  /** 0-based WAV channel to keep (default 0). */
  channel?: number;
  /** Sample rate in Hz for a CSV file without a time column. */
  sampleRate?: number;
}

/** A problem with the file, with the line (CSV) when there is one. */
export interface ParseError extends InputError {
  line?: number;
}

/** Messages from the reader, in order: progress any number of times, then exactly one of the others. */
export type ParseMessage =
  | { type: 'progress'; fraction: number; bytesRead: number }
  | { type: 'done'; signal: ParsedSignal }
  | { type: 'needs-sample-rate'; samples: StoredSamples; notes: string[]; name: string }
  | { type: 'error'; error: ParseError };

/** What the loader accepts, for messages. */
export const ACCEPTED_FILES =
  `a WAV file (${ACCEPTED_WAV}) or CSV/TSV text with one column of samples, or a time column in seconds ` +
  'and a value column';

const TEXT_EXTENSIONS = /\.(csv|tsv|txt|dat|tab)$/i;
const WAV_EXTENSIONS = /\.(wav|wave)$/i;
const OTHER_AUDIO = /\.(mp3|flac|ogg|oga|opus|m4a|aac|aif|aiff|wma|webm|mp4)$/i;

/** Which reader a file needs, from its first bytes and its name; an error for anything else. */
export function sniffKind(head: Uint8Array, name: string): 'wav' | 'csv' | ParseError {
  const tag = String.fromCharCode(...head.subarray(0, 4));
  if (tag === 'RIFF' || tag === 'RF64' || WAV_EXTENSIONS.test(name)) return 'wav';
  if (OTHER_AUDIO.test(name)) {
    const ext = name.slice(name.lastIndexOf('.') + 1).toUpperCase();
    return {
      message: `"${name}" is ${ext} audio, which is not read here; convert it to WAV first.`,
      expected: ACCEPTED_FILES,
    };
  }
  const binary = head.subarray(0, 4096).some((b) => b === 0);
  if (TEXT_EXTENSIONS.test(name) || !binary) return 'csv';
  return { message: `"${name}" is neither a WAV file nor text.`, expected: ACCEPTED_FILES };
}

async function* slices(file: Blob, step: number): AsyncGenerator<Uint8Array> {
  for (let p = 0; p < file.size; p += step) {
    yield new Uint8Array(await file.slice(p, p + step).arrayBuffer());
  }
}

/** Where messages go; a progress message may return a promise, awaited before the next slice is read. */
export type ParsePost = (m: ParseMessage, transfer?: Transferable[]) => void | Promise<void>;

/** Reads the file and posts progress and the outcome. */
export async function parseSignalFile(
  req: ParseRequest,
  post: ParsePost,
  step = PARSE_SLICE_BYTES,
): Promise<void> {
  if (req.file.size === 0) {
    post({ type: 'error', error: { message: `"${req.name}" is empty.`, expected: ACCEPTED_FILES } });
    return;
  }
  const head = new Uint8Array(await req.file.slice(0, 4096).arrayBuffer());
  const kind = sniffKind(head, req.name);
  if (typeof kind !== 'string') {
    post({ type: 'error', error: kind });
    return;
  }
  if (kind === 'wav') await parseWav(req, post, step);
  else await parseCsv(req, post, step);
}

async function parseWav(req: ParseRequest, post: ParsePost, step: number): Promise<void> {
  const channel = req.channel ?? 0;
  const decoder = new WavDecoder({ channel, acceptTruncated: true });
  let out: GrowableSamples | null = null;
  for await (const chunk of slices(req.file, step)) {
    const r = decoder.push(chunk);
    if (!r.ok) return post({ type: 'error', error: r.error });
    if (r.value) {
      const info = decoder.info!;
      out ??= new GrowableSamples(storageFor(info.format), info.frameCount ?? undefined);
      out.push(r.value.channels[0]!);
    }
    const p = decoder.progress();
    await post({
      type: 'progress',
      fraction: p.fraction ?? p.bytesRead / req.file.size,
      bytesRead: p.bytesRead,
    });
  }
  const done = decoder.finish();
  if (!done.ok) return post({ type: 'error', error: done.error });
  const { info, notes } = done.value;
  if (done.value.framesDecoded === 0) {
    return post({
      type: 'error',
      error: { message: `"${req.name}" holds no samples (its data chunk is empty).` },
    });
  }
  const samples = out!.take();
  const signal: ParsedSignal = {
    name: req.name,
    source: 'wav',
    sampleRate: info.sampleRate,
    samples,
    channel,
    channelCount: info.channelCount,
    format: info.format,
    startTime: 0,
    notes,
  };
  post({ type: 'done', signal }, sampleBuffers(samples) as Transferable[]);
}

async function parseCsv(req: ParseRequest, post: ParsePost, step: number): Promise<void> {
  const reader = new CsvSignalReader();
  const text = new TextDecoder('utf-8');
  // Text numbers are float64 values; keep them so.
  const out = new GrowableSamples('float64');
  let read = 0;
  for await (const chunk of slices(req.file, step)) {
    read += chunk.length;
    const r = reader.push(text.decode(chunk, { stream: true }));
    if (!r.ok) return post({ type: 'error', error: r.error });
    out.push(r.value.samples);
    await post({ type: 'progress', fraction: read / req.file.size, bytesRead: read });
  }
  const tail = reader.push(text.decode());
  if (!tail.ok) return post({ type: 'error', error: tail.error });
  out.push(tail.value.samples);
  const end = reader.finish();
  if (!end.ok) return post({ type: 'error', error: end.error });
  out.push(end.value.block.samples);
  const samples = out.take();
  const notes = [...reader.notes];
  const timing = end.value.timing;
  const note = timingNote(timing);
  if (note) notes.push(note);
  const rate = timing ? sampleRateOfStep(timing.meanStep) : req.sampleRate;
  if (rate === undefined) {
    return post(
      { type: 'needs-sample-rate', samples, notes, name: req.name },
      sampleBuffers(samples) as Transferable[],
    );
  }
  const signal: ParsedSignal = {
    name: req.name,
    source: 'csv',
    sampleRate: rate,
    samples,
    channel: 0,
    channelCount: 1,
    format: null,
    startTime: reader.hasTimeColumn ? reader.startTime : 0,
    notes,
  };
  post({ type: 'done', signal }, sampleBuffers(samples) as Transferable[]);
}

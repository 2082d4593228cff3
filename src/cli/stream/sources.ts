/**
 * Where samples come from, block by block: a WAV file through the engine's chunked decoder, or a CSV/TSV
 * file through its chunked text reader. Errors become usage errors that name the file.
 */
import {
  CsvSignalReader,
  WavDecoder,
  sampleRateOfStep,
  timingNote,
  type CsvError,
  type CsvReadOptions,
  type WavInfo,
} from '../../core/signal/index.ts';
import type { InputError } from '../../core/types.ts';
import { UsageError } from '../args.ts';
import { fileChunks, textChunks } from './fileChunks.ts';

/** One block of input: a Float64Array per channel, and the times when the file had a time column. */
export interface SourceBlock {
  channels: Float64Array[];
  times: Float64Array | null;
}

/** What is known about the input once it has been read to the end. */
export interface SourceSummary {
  /** Hz, or null for a CSV with no time column (the caller supplies one). */
  sampleRate: number | null;
  startTime: number;
  notes: string[];
}

/** A file read block by block. */
export interface SignalSource {
  blocks(): AsyncGenerator<SourceBlock>;
  summary(): SourceSummary;
}

function inputError(path: string, e: InputError): UsageError {
  const expected = e.expected ? ` Expected: ${e.expected}.` : '';
  return new UsageError(`${path}: ${e.message}${expected}`);
}

/** True when the path names a WAV file. */
export function isWavPath(path: string): boolean {
  return /\.(wav|wave)$/i.test(path);
}

/** A WAV file; `channel` (0-based) keeps one channel, otherwise every channel is read. */
export class WavFileSource implements SignalSource {
  info: WavInfo | null = null;
  private notes: string[] = [];
  private readonly decoder: WavDecoder;

  constructor(
    private readonly path: string,
    channel?: number,
  ) {
    this.decoder = new WavDecoder(channel === undefined ? {} : { channel });
  }

  async *blocks(): AsyncGenerator<SourceBlock> {
    for await (const chunk of fileChunks(this.path)) {
      const r = this.decoder.push(chunk);
      if (!r.ok) throw inputError(this.path, r.error);
      this.info = this.decoder.info;
      if (r.value && r.value.frames > 0) yield { channels: r.value.channels, times: null };
    }
    const end = this.decoder.finish();
    if (!end.ok) throw inputError(this.path, end.error);
    this.notes = end.value.notes;
  }

  summary(): SourceSummary {
    return { sampleRate: this.info?.sampleRate ?? null, startTime: 0, notes: this.notes };
  }
}

/** A CSV/TSV file of one sample column, or time and value columns. */
export class CsvFileSource implements SignalSource {
  private readonly reader: CsvSignalReader;
  private result: SourceSummary = { sampleRate: null, startTime: 0, notes: [] };

  constructor(
    private readonly path: string,
    options: CsvReadOptions = {},
  ) {
    this.reader = new CsvSignalReader(options);
  }

  private fail(e: CsvError): UsageError {
    return inputError(this.path, e);
  }

  async *blocks(): AsyncGenerator<SourceBlock> {
    for await (const text of textChunks(this.path)) {
      const r = this.reader.push(text);
      if (!r.ok) throw this.fail(r.error);
      if (r.value.samples.length > 0) yield { channels: [r.value.samples], times: r.value.times };
    }
    const end = this.reader.finish();
    if (!end.ok) throw this.fail(end.error);
    if (end.value.block.samples.length > 0) {
      yield { channels: [end.value.block.samples], times: end.value.block.times };
    }
    const notes = [...this.reader.notes];
    const note = timingNote(end.value.timing);
    if (note) notes.push(note);
    const timing = end.value.timing;
    this.result = {
      sampleRate: timing ? sampleRateOfStep(timing.meanStep) : null,
      startTime: this.reader.hasTimeColumn ? this.reader.startTime : 0,
      notes,
    };
  }

  summary(): SourceSummary {
    return this.result;
  }
}

/**
 * Where filtered samples go, block by block: a WAV file whose header is written as a placeholder first and
 * rewritten with the final sizes and sample rate at the end, or a CSV file written line by line.
 */
import type { FileHandle } from 'node:fs/promises';
import {
  csvHeaderLine,
  csvRows,
  encodeWavBlock,
  sampleTimes,
  wavHeaderBytes,
} from '../../core/signal/index.ts';
import type { SampleFormat } from '../../core/signal/index.ts';
import { openForWriting } from './fileChunks.ts';
import { UsageError } from '../args.ts';

/** Largest sample rate a WAV header stores: an unsigned 32-bit number of whole hertz. */
export const MAX_WAV_RATE = 0xffff_ffff;
/** Largest data a WAV (RIFF) file holds, bytes: its sizes are 32-bit, less the header. */
export const MAX_WAV_DATA_BYTES = 0xffff_ffff - 64;

/** The whole-hertz rate a WAV file stores for a rate in Hz, or a usage error when it cannot store it. */
export function wavRate(rate: number): number {
  const r = Math.round(rate);
  if (!(r >= 1 && r <= MAX_WAV_RATE))
    throw new UsageError(
      `a WAV file stores a sample rate of 1 to ${MAX_WAV_RATE} whole hertz; this output's rate is ${rate} Hz. ` +
        'Write CSV instead (--output <file.csv>), or give the rate with --input-rate.',
    );
  return r;
}

/** A destination for blocks of channels. */
export interface SignalSink {
  /** Writes the next frames; `times` (seconds) when the input carried its own time column. */
  write(channels: readonly Float64Array[], times: Float64Array | null): Promise<void>;
  /** Finishes the file once the sample rate and channel count are final. */
  close(sampleRate: number, startTime: number): Promise<void>;
  /** Samples clipped to fit an integer format so far. */
  readonly clipped: number;
  readonly frames: number;
}

/** A WAV file written as blocks arrive; the header is rewritten at close with the final sizes. */
export class WavFileSink implements SignalSink {
  clipped = 0;
  frames = 0;
  private channelCount = 0;
  private position = 0;
  private constructor(
    private readonly handle: FileHandle,
    private readonly format: SampleFormat,
  ) {}

  static async create(path: string, format: SampleFormat): Promise<WavFileSink> {
    return new WavFileSink(await openForWriting(path), format);
  }

  async write(channels: readonly Float64Array[]): Promise<void> {
    if (this.channelCount === 0) {
      this.channelCount = channels.length;
      const placeholder = this.header(1);
      await this.handle.write(placeholder, 0, placeholder.length, 0);
      this.position = placeholder.length;
    }
    const { bytes, clipped } = encodeWavBlock(channels, this.format);
    if (this.position + bytes.length > MAX_WAV_DATA_BYTES)
      throw new UsageError(
        `the output passes the 4 GiB a WAV file can hold; write CSV, a smaller --output-format, or fewer --samples.`,
      );
    this.clipped += clipped;
    this.frames += channels[0]?.length ?? 0;
    await this.handle.write(bytes, 0, bytes.length, this.position);
    this.position += bytes.length;
  }

  async close(sampleRate: number): Promise<void> {
    try {
      if (this.channelCount === 0) {
        this.channelCount = 1;
        this.position = this.header(1).length;
      }
      const header = this.header(wavRate(sampleRate));
      await this.handle.write(header, 0, header.length, 0);
      if ((this.position - header.length) & 1)
        await this.handle.write(new Uint8Array(1), 0, 1, this.position);
    } finally {
      await this.handle.close();
    }
  }

  private header(sampleRate: number): Uint8Array {
    return wavHeaderBytes({
      format: this.format,
      channelCount: this.channelCount,
      sampleRate,
      frameCount: this.frames,
    });
  }
}

/** A CSV file: a time column in seconds and one column per channel. */
export class CsvFileSink implements SignalSink {
  clipped = 0;
  frames = 0;
  private headerWritten = false;
  private constructor(
    private readonly handle: FileHandle,
    private readonly sampleRate: number,
    private readonly startTime: number,
    private readonly delimiter: ',' | '\t',
    private readonly names: readonly string[] | null,
  ) {}

  /**
   * A sink that computes times as startTime + k / sampleRate when the input brings none; `names` heads the
   * value columns (default "value", or channel_1, channel_2, ...).
   */
  static async create(
    path: string,
    sampleRate: number,
    startTime = 0,
    names: readonly string[] | null = null,
  ): Promise<CsvFileSink> {
    const delimiter = /\.(tsv|tab)$/i.test(path) ? '\t' : ',';
    return new CsvFileSink(await openForWriting(path), sampleRate, startTime, delimiter, names);
  }

  async write(channels: readonly Float64Array[], times: Float64Array | null): Promise<void> {
    if (!this.headerWritten) {
      const names =
        this.names ?? (channels.length === 1 ? ['value'] : channels.map((_, c) => `channel_${c + 1}`));
      await this.handle.write(csvHeaderLine(['time_s', ...names], this.delimiter));
      this.headerWritten = true;
    }
    const n = channels[0]?.length ?? 0;
    const t = times ?? sampleTimes(this.frames, n, this.sampleRate, this.startTime);
    await this.handle.write(csvRows([t, ...channels], 0, n, this.delimiter));
    this.frames += n;
  }

  async close(): Promise<void> {
    await this.handle.close();
  }
}

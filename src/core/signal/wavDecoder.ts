/**
 * Incremental WAV decoding: feed the file's bytes in chunks of any size, get each chunk's samples as soon
 * as they are complete. The header may span chunks and a frame may be split across chunks; nothing but
 * a partial frame (at most a few bytes) is carried between pushes, so memory stays bounded by the chunk.
 */
import type { InputError, Result } from '../types.ts';
import { decodeFrames } from './sampleCodec.ts';
import { describeFormat } from './sampleFormat.ts';
import { readWavHeader, type WavInfo } from './wavHeader.ts';

/** How to decode: which channel (0-based; all when absent), and whether to keep the stored integers. */
export interface WavDecodeOptions {
  /** 0-based channel to keep; every channel when absent. */
  channel?: number;
  /** Also return the stored integers (integer formats only), for a bit-exact rewrite. */
  keepIntegers?: boolean;
  /** Accept a data chunk that ends before its declared size, keeping the frames present, with a note. */
  acceptTruncated?: boolean;
}

/** Samples decoded from one pushed chunk: one array per kept channel, frames from startFrame on. */
export interface WavBlock {
  /** Normalised samples (see sampleFormat.ts for the scaling), one array per kept channel. */
  channels: Float64Array[];
  /** Stored integers per kept channel (8-bit as byte − 128), when asked for and the format is integer. */
  integers: Int32Array[] | null;
  /** Index of this block's first frame in the file. */
  startFrame: number;
  frames: number;
}

/** How far decoding has gone. */
export interface WavProgress {
  bytesRead: number;
  framesDecoded: number;
  /** Frames the header declares; null until the header is read or when its size is unset. */
  framesTotal: number | null;
  /** framesDecoded / framesTotal in [0, 1]; null while unknown. */
  fraction: number | null;
}

/** Summary once every chunk has been pushed. */
export interface WavDecodeSummary {
  info: WavInfo;
  framesDecoded: number;
  notes: string[];
}

/** A decoder that takes a WAV file's bytes chunk by chunk. */
export class WavDecoder {
  info: WavInfo | null = null;
  private head: Uint8Array = new Uint8Array(0);
  private carry: Uint8Array = new Uint8Array(0);
  private bytesRead = 0;
  private dataConsumed = 0;
  private framesDecoded = 0;
  private failure: InputError | null = null;
  private readonly options: WavDecodeOptions;

  constructor(options: WavDecodeOptions = {}) {
    this.options = options;
  }

  /** Decodes what this chunk completes: a block of samples, null while the header is still incomplete. */
  push(chunk: Uint8Array): Result<WavBlock | null> {
    if (this.failure) return { ok: false, error: this.failure };
    this.bytesRead += chunk.length;
    if (this.info === null) {
      this.head = concat(this.head, chunk);
      const h = readWavHeader(this.head);
      if (h.status === 'need-more') return { ok: true, value: null };
      if (h.status === 'error') return this.fail(h.error);
      const channel = this.options.channel;
      if (
        channel !== undefined &&
        !(Number.isInteger(channel) && channel >= 0 && channel < h.info.channelCount)
      ) {
        return this.fail({
          message: `Channel ${channel + 1} (index ${channel}) was asked for; the file has ${h.info.channelCount} channel(s).`,
          expected: `a channel index from 0 to ${h.info.channelCount - 1}`,
        });
      }
      this.info = h.info;
      const rest = this.head.subarray(Math.min(h.info.dataOffset, this.head.length));
      this.head = new Uint8Array(0);
      return { ok: true, value: this.decode(rest) };
    }
    return { ok: true, value: this.decode(chunk) };
  }

  /** Where decoding stands, for a progress bar. */
  progress(): WavProgress {
    const total = this.info?.frameCount ?? null;
    const fraction = total === null ? null : total === 0 ? 1 : Math.min(1, this.framesDecoded / total);
    return { bytesRead: this.bytesRead, framesDecoded: this.framesDecoded, framesTotal: total, fraction };
  }

  /** Call after the last chunk: checks the file was complete and returns the header and frame count. */
  finish(): Result<WavDecodeSummary> {
    if (this.failure) return { ok: false, error: this.failure };
    const info = this.info;
    if (info === null) {
      return this.fail({
        message:
          this.bytesRead === 0
            ? 'The file is empty.'
            : `The file ends after ${this.bytesRead} bytes, inside the header, before any "data" chunk.`,
        expected: 'a RIFF/WAVE file with "fmt " and "data" chunks',
      });
    }
    const notes = [...info.notes];
    const declared = info.dataBytes;
    if (declared !== null && this.dataConsumed < declared) {
      const frames = info.frameCount ?? 0;
      const message =
        `The data chunk declares ${declared} bytes (${frames} frames of ${info.channelCount} channel(s) of ` +
        `${describeFormat(info.format)}) but the file ends after ${this.dataConsumed} bytes of it ` +
        `(${this.framesDecoded} frames).`;
      if (!this.options.acceptTruncated) {
        return this.fail({
          message,
          expected: 'a complete data chunk, or the option to keep the frames present',
        });
      }
      notes.push(`${message} The ${this.framesDecoded} complete frames were kept.`);
    }
    if (this.carry.length > 0)
      notes.push(`${this.carry.length} byte(s) of an incomplete last frame were dropped.`);
    return { ok: true, value: { info, framesDecoded: this.framesDecoded, notes } };
  }

  private fail(error: InputError): { ok: false; error: InputError } {
    this.failure = error;
    return { ok: false, error };
  }

  private decode(chunk: Uint8Array): WavBlock {
    const info = this.info!;
    const left = info.dataBytes === null ? chunk.length : Math.max(0, info.dataBytes - this.dataConsumed);
    let data = chunk.subarray(0, Math.min(chunk.length, left));
    this.dataConsumed += data.length;
    if (this.carry.length > 0) data = concat(this.carry, data);
    const frames = Math.floor(data.length / info.blockAlign);
    this.carry = data.slice(frames * info.blockAlign);
    const keep = this.options.channel;
    const kept = keep === undefined ? info.channelCount : 1;
    const channels = Array.from({ length: kept }, () => new Float64Array(frames));
    const wantInts = this.options.keepIntegers === true && info.format !== 'f32' && info.format !== 'f64';
    const integers = wantInts ? Array.from({ length: kept }, () => new Int32Array(frames)) : null;
    const route = <T>(arrays: T[]): (T | null)[] =>
      keep === undefined
        ? arrays
        : Array.from({ length: info.channelCount }, (_, c) => (c === keep ? arrays[0]! : null));
    decodeFrames(
      data,
      info.format,
      info.channelCount,
      frames,
      route(channels),
      0,
      integers ? route(integers) : undefined,
    );
    const block = { channels, integers, startFrame: this.framesDecoded, frames };
    this.framesDecoded += frames;
    return block;
  }
}

function concat(a: Uint8Array, b: Uint8Array): Uint8Array {
  if (a.length === 0) return b.slice();
  const out = new Uint8Array(a.length + b.length);
  out.set(a);
  out.set(b, a.length);
  return out;
}

/** A recording read from a WAV or CSV file into the one channel that is filtered. */
import type { SampleFormat } from './sampleFormat.ts';
import type { RecordingSamples } from './scaledInt16.ts';

/** A file read into one channel of samples. */
export interface ParsedSignal {
  /** File name (or, for a signal made on the page, its description). */
  name: string;
  source: 'wav' | 'csv';
  /** Samples per second, Hz. */
  sampleRate: number;
  /**
   * The channel being filtered, as numbers (WAV integers scaled to [-1, 1)): 8- and 16-bit WAV as their
   * Int16 codes (scaledInt16.ts, a quarter of float64), 24-bit WAV as 3-byte codes (scaledInt24.ts), 32-bit
   * integer WAV as Int32 codes (scaledInt32.ts), float32 WAV as float32 (exact), the rest float64.
   */
  samples: RecordingSamples;
  /** 0-based channel kept and how many the file has (1 for CSV). */
  channel: number;
  channelCount: number;
  /** The WAV file's sample format (the export default), or null for text. */
  format: SampleFormat | null;
  /** Time of the first sample, s (a CSV time column may start anywhere). */
  startTime: number;
  /** What the reader noticed (a time column not quite even, a truncated file, ...). */
  notes: string[];
}

/** Everything about a parsed signal but its samples, and how many there are. */
export type ParsedSignalInfo = Omit<ParsedSignal, 'samples'> & { length: number };

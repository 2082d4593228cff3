/**
 * The filtered recording as files: WAV in the input's sample format (or another), and CSV with time, input
 * and output columns; the fixed-point run's output codes as an integer WAV and as CSV of input and output
 * codes. Built as Blobs (CSV in slices, so ten minutes of samples never become one giant string).
 */
import {
  csvHeaderLine,
  csvRows,
  describeFormat,
  sampleTimes,
  writeWav,
  type SampleFormat,
} from '../../core/signal/index.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import {
  containerBits,
  containerFormat,
  quantizeValue,
  type Implementation,
} from '../../core/fixed/index.ts';
import { fileStem } from '../shared/fileName.ts';

/** Rows per CSV slice. */
export const CSV_SLICE_ROWS = 1 << 16;

/** The format the WAV export uses unless told otherwise: the input file's, else 32-bit float. */
export function defaultExportFormat(signal: LoadedSignal): SampleFormat {
  return signal.format ?? 'f32';
}

/** A WAV file of the samples, with what a user should know (clipping, a rounded sample rate). */
export function filteredWav(
  samples: Float64Array,
  sampleRate: number,
  format: SampleFormat,
): { blob: Blob; notes: string[] } {
  const rate = Math.max(1, Math.round(sampleRate));
  const notes: string[] = [];
  if (rate !== sampleRate)
    notes.push(`WAV stores whole hertz: the sample rate ${sampleRate} Hz was written as ${rate} Hz.`);
  const { bytes, clipped } = writeWav({ format, sampleRate: rate, channels: [samples] });
  if (clipped > 0) {
    notes.push(
      `${clipped} sample(s) beyond ±1 were clipped to fit ${describeFormat(format)}; export as 32-bit float to keep them.`,
    );
  }
  return { blob: new Blob([bytes as BlobPart], { type: 'audio/wav' }), notes };
}

/** A CSV file: time in seconds, the recording and the filtered samples, one row per sample. */
export function filteredCsv(
  input: Float64Array,
  samples: Float64Array,
  sampleRate: number,
  startTime = 0,
): Blob {
  const parts: string[] = [csvHeaderLine(['time_s', 'input', 'filtered'])];
  for (let first = 0; first < samples.length; first += CSV_SLICE_ROWS) {
    const count = Math.min(CSV_SLICE_ROWS, samples.length - first);
    const t = sampleTimes(first, count, sampleRate, startTime);
    const end = first + count;
    parts.push(csvRows([t, input.subarray(first, end), samples.subarray(first, end)], 0, count));
  }
  return new Blob(parts, { type: 'text/csv' });
}

/**
 * The fixed-point output codes as an integer WAV file: D-bit codes in the smallest integer format that holds
 * them (8, 16, 24 or 32 bits), in its top D bits, so the file's samples are the same fractions of full scale.
 */
export function fixedWav(
  codes: Int32Array,
  sampleRate: number,
  impl: Implementation,
): { blob: Blob; notes: string[] } {
  const d = impl.settings.dataWordLength;
  const format = containerFormat(d);
  const shift = 2 ** (containerBits(format) - d);
  const rate = Math.max(1, Math.round(sampleRate));
  const notes =
    rate !== sampleRate
      ? [`WAV stores whole hertz: the sample rate ${sampleRate} Hz was written as ${rate} Hz.`]
      : [];
  if (shift !== 1)
    notes.push(
      `The ${d}-bit codes fill the top ${d} bits of ${describeFormat(format)} samples (code × ${shift}).`,
    );
  const integers = shift === 1 ? codes : Int32Array.from(codes, (c) => c * shift);
  const { bytes } = writeWav({ format, sampleRate: rate, channels: [], integers: [integers] });
  return { blob: new Blob([bytes as BlobPart], { type: 'audio/wav' }), notes };
}

/** A CSV file of the fixed-point run: time in seconds, the input codes and the output codes, one row per sample. */
export function fixedCsv(
  input: Float64Array,
  codes: Int32Array,
  sampleRate: number,
  impl: Implementation,
  startTime = 0,
): Blob {
  const parts: string[] = [csvHeaderLine(['time_s', 'input_code', 'output_code'])];
  const inCodes = new Int32Array(CSV_SLICE_ROWS);
  for (let first = 0; first < codes.length; first += CSV_SLICE_ROWS) {
    const count = Math.min(CSV_SLICE_ROWS, codes.length - first);
    for (let i = 0; i < count; i++)
      inCodes[i] = quantizeValue(input[first + i]!, impl.dataFormat, impl.settings.rounding).code;
    const t = sampleTimes(first, count, sampleRate, startTime);
    parts.push(csvRows([t, inCodes.subarray(0, count), codes.subarray(first, first + count)], 0, count));
  }
  return new Blob(parts, { type: 'text/csv' });
}

/** Name of a fixed-point export: the input's name without its extension, "-fixed", the new extension. */
export function fixedExportName(signal: LoadedSignal, extension: 'wav' | 'csv'): string {
  return exportName(signal, extension).replace(/-filtered\.(wav|csv)$/, `-fixed.${extension}`);
}

/** The export's file name: the input's name without its extension, "-filtered", the new extension. */
export function exportName(signal: LoadedSignal, extension: 'wav' | 'csv'): string {
  const base = signal.source === 'generated' ? 'generated' : signal.name.replace(/\.[^.]*$/, '');
  return `${fileStem(base, 'signal')}-filtered.${extension}`;
}

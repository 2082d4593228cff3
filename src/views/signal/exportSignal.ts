/**
 * The filtered recording as files: WAV in the input's sample format (or another), and CSV with a time
 * column. Built as Blobs (CSV in slices, so ten minutes of samples never become one giant string).
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

/** A CSV file: time in seconds and the filtered samples, one row per sample. */
export function filteredCsv(samples: Float64Array, sampleRate: number, startTime = 0): Blob {
  const parts: string[] = [csvHeaderLine(['time_s', 'filtered'])];
  for (let first = 0; first < samples.length; first += CSV_SLICE_ROWS) {
    const count = Math.min(CSV_SLICE_ROWS, samples.length - first);
    const t = sampleTimes(first, count, sampleRate, startTime);
    parts.push(csvRows([t, samples.subarray(first, first + count)], 0, count));
  }
  return new Blob(parts, { type: 'text/csv' });
}

/** The export's file name: the input's name without its extension, "-filtered", the new extension. */
export function exportName(signal: LoadedSignal, extension: 'wav' | 'csv'): string {
  const base = signal.source === 'generated' ? 'generated' : signal.name.replace(/\.[^.]*$/, '');
  return `${base.replace(/[^\w.-]+/g, '-') || 'signal'}-filtered.${extension}`;
}

/** Offers the blob as a download under the name. */
export function downloadBlob(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

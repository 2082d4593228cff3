/**
 * The filtered recording as files: WAV in the input's sample format (or another), CSV with time, input and
 * output columns, and the fixed-point run's output codes as an integer WAV and as CSV of input and output
 * codes. The recording worker builds the ones that need the samples slice by slice
 * (workers/exportJob.ts), so an hour of samples never becomes one array or one string on the page.
 */
import { describeFormat, writeWav, type SampleFormat } from '../../core/signal/index.ts';
import { containerBits, containerFormat, type Implementation } from '../../core/fixed/index.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import { selectSections } from '../../store/derived.ts';
import { workbenchStore } from '../../store/useWorkbench.ts';
import { EXPORT_JOB, type ExportRequest, type ExportResult } from '../../workers/exportJob.ts';
import type { JobOutcome } from '../../workers/jobs.ts';
import { fileStem } from '../shared/fileName.ts';
import { recordingClient } from './recordingWorker.ts';

/** The format the WAV export uses unless told otherwise: the input file's, else 32-bit float. */
export function defaultExportFormat(signal: LoadedSignal): SampleFormat {
  return signal.format ?? 'f32';
}

/** The recording through the design on show, as a WAV or CSV (time, input, filtered) file built in the worker. */
export function exportFiltered(
  signal: LoadedSignal,
  kind: 'wav' | 'csv',
  format: SampleFormat,
  onProgress: (fraction: number) => void,
): Promise<JobOutcome<ExportResult>> {
  const request: ExportRequest = {
    id: signal.id,
    kind,
    sections: selectSections(workbenchStore.getState()),
    format,
    startTime: signal.startTime,
  };
  return recordingClient().run<ExportResult>(EXPORT_JOB, request, onProgress);
}

/** The fixed-point run as CSV of time, input codes and output codes, built in the worker. */
export function exportFixedCsv(
  signal: LoadedSignal,
  implementation: Implementation,
  onProgress: (fraction: number) => void,
): Promise<JobOutcome<ExportResult>> {
  const request: ExportRequest = {
    id: signal.id,
    kind: 'fixed-csv',
    implementation,
    startTime: signal.startTime,
  };
  return recordingClient().run<ExportResult>(EXPORT_JOB, request, onProgress);
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

/** Name of a fixed-point export: the input's name without its extension, "-fixed", the new extension. */
export function fixedExportName(signal: LoadedSignal, extension: 'wav' | 'csv'): string {
  return exportName(signal, extension).replace(/-filtered\.(wav|csv)$/, `-fixed.${extension}`);
}

/** The export's file name: the input's name without its extension, "-filtered", the new extension. */
export function exportName(signal: LoadedSignal, extension: 'wav' | 'csv'): string {
  const base = signal.source === 'generated' ? 'generated' : signal.name.replace(/\.[^.]*$/, '');
  return `${fileStem(base, 'signal')}-filtered.${extension}`;
}

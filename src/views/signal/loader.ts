/**
 * Loading a recording: hands the file to the parsing worker, follows its progress, cancels by terminating
 * it, asks for a sample rate when a CSV file has no time column, and puts the result in the store. The
 * loader's own status (progress, the last error, a pending CSV) is page state shared by the recording
 * views, kept here rather than in the workbench store because nothing else needs it.
 */
import { createStore } from 'zustand/vanilla';
import { useStore } from 'zustand';
import { workbenchStore } from '../../store/useWorkbench.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import type { ParseError, ParseMessage, ParseRequest } from '../../workers/parseSignal.ts';

export type LoadStatus =
  | { kind: 'idle' }
  | { kind: 'loading'; name: string; fraction: number }
  | { kind: 'error'; name: string; error: ParseError }
  | { kind: 'needs-rate'; name: string; samples: Float64Array; notes: string[] };

interface LoaderState {
  status: LoadStatus;
  /** The file the current signal came from, kept to read another channel of it. */
  file: File | null;
}

export const loaderStore = createStore<LoaderState>()(() => ({ status: { kind: 'idle' }, file: null }));

/** Reads the loader's state in a component. */
export function useLoader<T>(selector: (s: LoaderState) => T): T {
  return useStore(loaderStore, selector);
}

let worker: Worker | null = null;

function stopWorker(): void {
  worker?.terminate();
  worker = null;
}

/** Starts reading a file (any previous read is abandoned). */
export function loadFile(file: File, options: { channel?: number; sampleRate?: number } = {}): void {
  stopWorker();
  const w = new Worker(new URL('../../workers/signalParse.worker.ts', import.meta.url), { type: 'module' });
  worker = w;
  loaderStore.setState({ status: { kind: 'loading', name: file.name, fraction: 0 } });
  w.onmessage = (e: MessageEvent<ParseMessage>) => {
    if (worker !== w) return;
    const m = e.data;
    if (m.type === 'progress') {
      loaderStore.setState({ status: { kind: 'loading', name: file.name, fraction: m.fraction } });
      return;
    }
    stopWorker();
    if (m.type === 'error') {
      loaderStore.setState({ status: { kind: 'error', name: file.name, error: m.error } });
    } else if (m.type === 'needs-sample-rate') {
      loaderStore.setState({
        status: { kind: 'needs-rate', name: file.name, samples: m.samples, notes: m.notes },
        file,
      });
    } else {
      loaderStore.setState({ status: { kind: 'idle' }, file });
      workbenchStore.getState().setSignal(m.signal);
    }
  };
  w.onerror = (e) => {
    if (worker !== w) return;
    stopWorker();
    loaderStore.setState({
      status: {
        kind: 'error',
        name: file.name,
        error: { message: `The file could not be read: ${e.message}` },
      },
    });
  };
  const request: ParseRequest = { file, name: file.name };
  if (options.channel !== undefined) request.channel = options.channel;
  if (options.sampleRate !== undefined) request.sampleRate = options.sampleRate;
  w.postMessage(request);
}

/** Stops the read in progress; the signal shown before stays. */
export function cancelLoad(): void {
  if (loaderStore.getState().status.kind !== 'loading') return;
  stopWorker();
  loaderStore.setState({ status: { kind: 'idle' } });
}

/** Forgets an error or a pending sample-rate question. */
export function dismissStatus(): void {
  loaderStore.setState({ status: { kind: 'idle' } });
}

/** Completes a CSV file without a time column with the sample rate the user gave (Hz). */
export function provideSampleRate(hz: number): void {
  const status = loaderStore.getState().status;
  if (status.kind !== 'needs-rate' || !(hz > 0)) return;
  const signal: LoadedSignal = {
    name: status.name,
    source: 'csv',
    sampleRate: hz,
    samples: status.samples,
    channel: 0,
    channelCount: 1,
    format: null,
    startTime: 0,
    notes: [...status.notes, `No time column: the sample rate ${hz} Hz was given by hand.`],
  };
  loaderStore.setState({ status: { kind: 'idle' } });
  workbenchStore.getState().setSignal(signal);
}

/** Reads another channel of the file the current signal came from. */
export function loadChannel(channel: number): void {
  const file = loaderStore.getState().file;
  if (file) loadFile(file, { channel });
}

/** Shows a generated signal (the file behind the previous one is forgotten). */
export function showGenerated(signal: LoadedSignal): void {
  stopWorker();
  loaderStore.setState({ status: { kind: 'idle' }, file: null });
  workbenchStore.getState().setSignal(signal);
}

/** True when a drag carries files (not text or a link). */
export function carriesFiles(types: readonly string[]): boolean {
  return types.includes('Files');
}

/**
 * Loading a recording: hands the file to the recording worker (which reads it and keeps it; the samples
 * never come to the page), follows its progress, cancels it, asks for a sample rate when a CSV file has no
 * time column, makes test signals there too, and puts what the signal is in the store. The loader's own
 * status (progress, the last error, a pending CSV) is page state shared by the recording views, kept here
 * rather than in the workbench store because nothing else needs it.
 */
import { createStore } from 'zustand/vanilla';
import { useStore } from 'zustand';
import { workbenchStore } from '../../store/useWorkbench.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import type { ParseError } from '../../workers/parseSignal.ts';
import { ADOPT_PENDING_JOB, GENERATE_JOB, LOAD_FILE_JOB, type LoadOutcome } from '../../workers/loadJobs.ts';
import type { JobOutcome } from '../../workers/jobs.ts';
import { ensureRecordingFollower, nextRecordingId, recordingClient } from './recordingWorker.ts';
import type { GeneratedSignal } from './recipe.ts';

export type LoadStatus =
  | { kind: 'idle' }
  | { kind: 'loading'; name: string; fraction: number }
  | { kind: 'error'; name: string; error: ParseError }
  | { kind: 'needs-rate'; name: string; count: number; notes: string[] };

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

/** The load in progress (each new one makes the older one's answers void). */
let current = 0;

function startLoad(name: string): number {
  ensureRecordingFollower();
  // Any other load or making of a signal still running stops: the newest wins.
  recordingClient().cancel(LOAD_FILE_JOB);
  recordingClient().cancel(GENERATE_JOB);
  const ticket = ++current;
  loaderStore.setState({ status: { kind: 'loading', name, fraction: 0 } });
  return ticket;
}

const progress = (ticket: number, name: string) => (fraction: number) => {
  if (ticket === current) loaderStore.setState({ status: { kind: 'loading', name, fraction } });
};

function failed(name: string, o: JobOutcome<unknown>): void {
  if (o.status === 'error') {
    loaderStore.setState({
      status: { kind: 'error', name, error: { message: `The file could not be read: ${o.message}` } },
    });
  } else loaderStore.setState({ status: { kind: 'idle' } });
}

/** Starts reading a file (any previous read is abandoned; the signal shown stays until this one is in). */
export function loadFile(file: File, options: { channel?: number; sampleRate?: number } = {}): void {
  const ticket = startLoad(file.name);
  const id = nextRecordingId();
  const request = { id, file, name: file.name, ...options };
  void recordingClient()
    .run<LoadOutcome>(LOAD_FILE_JOB, request, progress(ticket, file.name))
    .then((o) => {
      if (ticket !== current) return;
      if (o.status !== 'done') return failed(file.name, o);
      const r = o.value;
      if (r.kind === 'error') {
        loaderStore.setState({ status: { kind: 'error', name: file.name, error: r.error } });
      } else if (r.kind === 'needs-rate') {
        loaderStore.setState({
          status: { kind: 'needs-rate', name: file.name, count: r.count, notes: r.notes },
          file,
        });
      } else {
        loaderStore.setState({ status: { kind: 'idle' }, file });
        workbenchStore.getState().setSignal({ ...r.signal, id });
      }
    });
}

/** Stops the read in progress; the signal shown before stays. */
export function cancelLoad(): void {
  if (loaderStore.getState().status.kind !== 'loading') return;
  current++;
  recordingClient().cancel(LOAD_FILE_JOB);
  recordingClient().cancel(GENERATE_JOB);
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
  const ticket = startLoad(status.name);
  const id = nextRecordingId();
  void recordingClient()
    .run<{ length: number }>(ADOPT_PENDING_JOB, { id, sampleRate: hz }, progress(ticket, status.name))
    .then((o) => {
      if (ticket !== current) return;
      if (o.status !== 'done') return failed(status.name, o);
      const signal: LoadedSignal = {
        id,
        name: status.name,
        source: 'csv',
        sampleRate: hz,
        length: o.value.length,
        channel: 0,
        channelCount: 1,
        format: null,
        startTime: 0,
        notes: [...status.notes, `No time column: the sample rate ${hz} Hz was given by hand.`],
      };
      loaderStore.setState({ status: { kind: 'idle' } });
      workbenchStore.getState().setSignal(signal);
    });
}

/** Reads another channel of the file the current signal came from. */
export function loadChannel(channel: number): void {
  const file = loaderStore.getState().file;
  if (file) loadFile(file, { channel });
}

/** Makes a test signal in the worker and shows it (the file behind the previous one is forgotten). */
export function showGenerated(g: GeneratedSignal): void {
  const ticket = startLoad(g.name);
  const id = nextRecordingId();
  void recordingClient()
    .run<{ length: number }>(
      GENERATE_JOB,
      { id, specs: g.specs, n: g.n, sampleRate: g.sampleRate },
      progress(ticket, g.name),
    )
    .then((o) => {
      if (ticket !== current) return;
      if (o.status !== 'done') return failed(g.name, o);
      loaderStore.setState({ status: { kind: 'idle' }, file: null });
      workbenchStore.getState().setSignal({
        id,
        name: g.name,
        source: 'generated',
        sampleRate: g.sampleRate,
        length: o.value.length,
        channel: 0,
        channelCount: 1,
        format: null,
        startTime: 0,
        notes: [],
      });
    });
}

/** True when a drag carries files (not text or a link). */
export function carriesFiles(types: readonly string[]): boolean {
  return types.includes('Files');
}

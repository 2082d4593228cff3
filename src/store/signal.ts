/**
 * The recording slice: a loaded or generated signal to try the filter on, and how it is shown. This is view
 * state: it is not part of the design, never enters the undo history, links or autosave (a recording can
 * be hundreds of megabytes). The samples themselves live in the recording worker (views/signal/
 * recordingWorker.ts), which does every computation on them; the store knows what the signal is.
 */
import type { WindowName } from '../core/signal/index.ts';
import type { ParsedSignalInfo } from '../core/signal/parsedSignal.ts';

/** What the time region shows: the built-in test inputs, the recording before/after, or its spectrum. */
export type TimeRegion = 'test' | 'recording' | 'spectrum';

/**
 * A signal ready to filter: a file read by the worker, or one made on the page; `id` names it in the
 * recording worker (a new number per signal), `length` counts its samples.
 */
export type LoadedSignal = Omit<ParsedSignalInfo, 'source'> & {
  source: ParsedSignalInfo['source'] | 'generated';
  id: number;
};

/** Welch settings of the spectrum view. */
export interface SpectrumSettings {
  window: WindowName;
  /** Samples per segment; 'auto' picks a power of two giving bins of about AUTO_BIN_HZ. */
  segment: number | 'auto';
}

/** Where the level read-out looks. */
export type LevelChoice =
  { kind: 'auto' } | { kind: 'mains'; fundamentalHz: number } | { kind: 'list'; frequenciesHz: number[] };

export interface SignalView {
  current: LoadedSignal | null;
  region: TimeRegion;
  spectrum: SpectrumSettings;
  levels: LevelChoice;
  /** Visible stretch of the before/after plot in seconds from the first sample, or null for all of it. */
  zoom: readonly [number, number] | null;
}

export interface SignalState {
  signal: SignalView;
}

export interface SignalActions {
  /** Shows a new signal (replacing any other), resets the zoom and switches the time region to it. */
  setSignal(signal: LoadedSignal): void;
  clearSignal(): void;
  setTimeRegion(region: TimeRegion): void;
  setSpectrumSettings(patch: Partial<SpectrumSettings>): void;
  setLevelChoice(choice: LevelChoice): void;
  /** Visible time span in seconds (clamped to the signal), or null for the whole signal. */
  setSignalZoom(zoom: readonly [number, number] | null): void;
}

export const defaultSignalView: SignalView = {
  current: null,
  region: 'test',
  spectrum: { window: 'hann', segment: 'auto' },
  levels: { kind: 'auto' },
  zoom: null,
};

/** Duration of a signal in seconds. */
export function signalSeconds(s: LoadedSignal): number {
  return s.length / s.sampleRate;
}

/** A zoom span clamped to [0, duration] and at least minSpan long; null when it covers everything. */
export function clampZoom(
  zoom: readonly [number, number],
  duration: number,
  minSpan: number,
): readonly [number, number] | null {
  let [a, b] = zoom[0] <= zoom[1] ? zoom : [zoom[1], zoom[0]];
  if (!(Number.isFinite(a) && Number.isFinite(b))) return null;
  const span = Math.min(duration, Math.max(minSpan, b - a));
  if (a < 0) a = 0;
  b = a + span;
  if (b > duration) {
    b = duration;
    a = Math.max(0, b - span);
  }
  return a <= 0 && b >= duration ? null : [a, b];
}

/** Shortest visible span: a few samples. */
export const MIN_ZOOM_SAMPLES = 8;

type Set = (partial: Partial<SignalState>) => void;

/** The slice's actions over the store's set/get. */
export function signalActions(set: Set, get: () => SignalState): SignalActions {
  const patch = (p: Partial<SignalView>) => set({ signal: { ...get().signal, ...p } });
  return {
    setSignal: (signal) => patch({ current: signal, zoom: null, region: 'recording' }),
    clearSignal: () => patch({ current: null, zoom: null, region: 'test' }),
    setTimeRegion: (region) => patch({ region }),
    setSpectrumSettings: (p) => patch({ spectrum: { ...get().signal.spectrum, ...p } }),
    setLevelChoice: (levels) => patch({ levels }),
    setSignalZoom: (zoom) => {
      const s = get().signal.current;
      if (!s || zoom === null) return patch({ zoom: null });
      patch({ zoom: clampZoom(zoom, signalSeconds(s), MIN_ZOOM_SAMPLES / s.sampleRate) });
    },
  };
}

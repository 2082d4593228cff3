/**
 * The view settings that travel with a design in links, files and saved sessions: how its responses are
 * shown (scales, units, the zoomed bands of the response plots, the time view's input), never the plane's
 * panning, snapping or selection.
 */

export type TimeInput = 'impulse' | 'step' | 'sine' | 'noise';

export interface DocumentView {
  /** Frequency view. */
  magnitudeScale: 'db' | 'linear';
  phaseMode: 'wrapped' | 'unwrapped';
  delayUnit: 'samples' | 'ms';
  frequencyAxis: 'linear' | 'log';
  /** Number of frequency points on [0, fs/2] (or on the zoomed band). */
  responsePoints: number;
  /** The frequency band the plots show, Hz (low, high); null shows the whole axis. */
  frequencySpan: readonly [number, number] | null;
  /** Time view. */
  timeInput: TimeInput;
  /** Sinusoid frequency for the time view, Hz. */
  sineHz: number;
  timeSamples: number;
  /** The samples the time plot shows (first, last, fractional); null shows them all. */
  timeSpan: readonly [number, number] | null;
  timeStyle: 'stems' | 'line';
  noiseSeed: number;
}

/** Keys of the view settings that travel with a design. */
export const SHARED_VIEW_KEYS = [
  'magnitudeScale',
  'phaseMode',
  'delayUnit',
  'frequencyAxis',
  'responsePoints',
  'timeInput',
  'sineHz',
  'timeSamples',
  'timeStyle',
  'noiseSeed',
  'frequencySpan',
  'timeSpan',
] as const satisfies readonly (keyof DocumentView)[];

export type SharedViewKey = (typeof SHARED_VIEW_KEYS)[number];
/** The shared view settings; a missing key keeps the reader's own setting. */
export type SharedView = Partial<Pick<DocumentView, SharedViewKey>>;

/** The shared part of full view settings, keeping only values that differ from `defaults` (shorter links). */
export function pickSharedView(view: DocumentView, defaults?: DocumentView): SharedView {
  const out: Record<string, unknown> = {};
  for (const key of SHARED_VIEW_KEYS) {
    if (!defaults || !Object.is(view[key], defaults[key])) out[key] = view[key];
  }
  return out as SharedView;
}

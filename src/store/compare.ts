/**
 * The pinned reference design, drawn faintly under the current one for comparison. It is view state beside
 * the workbench store, never part of the design's undo history: pinning or unpinning changes no filter.
 * It is kept in browser storage (as a design file, through the share layer) so a reload keeps it.
 */
import { useStore } from 'zustand';
import { createStore, type StoreApi } from 'zustand/vanilla';
import { resolveGain } from '../core/gainRule.ts';
import { frequencyGrid, responseZpk, wrapPhase, type FrequencyResponse } from '../core/response/index.ts';
import { zpkToSections } from '../core/system/index.ts';
import { filterSections } from '../core/time/filter.ts';
import type { Zpk } from '../core/types.ts';
import { readDesignFile, writeDesignFile } from '../share/designFile.ts';
import { FullReaderPending, loadFullReader } from '../share/schema/reader.ts';
import { browserStorage, consoleWarn, type KeyValueStorage, type Warn } from '../share/storage.ts';
import type { Design } from '../core/model/design.ts';
import { LOG_AXIS_MIN_FRACTION, shownBandHz } from './zoom.ts';
import { memoLast } from './memo.ts';
import type { ViewSettings } from './view.ts';
// Pure engine calls that merge the root angles into a grid; it lives beside the design's own curve.
import { refineAtRoots } from '../core/response/index.ts';
import { readAt, type FrequencyReading } from '../core/response/readAt.ts';
import { hzToOmega, omegaGridToHz } from '../core/units.ts';

export const REFERENCE_KEY = 'polewright.reference';

export interface Reference {
  /** A snapshot of the design as it was when pinned (designs are immutable, so no copy is needed). */
  design: Design;
  /** When it was pinned, ISO 8601. */
  pinnedAt: string;
}

export interface CompareState {
  reference: Reference | null;
  pin(design: Design, now?: Date): void;
  unpin(): void;
}

export type CompareStore = StoreApi<CompareState>;

function parseKept(text: string): { pinnedAt?: unknown; file?: unknown } | null {
  try {
    const v: unknown = JSON.parse(text);
    return typeof v === 'object' && v !== null ? v : null;
  } catch {
    return null;
  }
}

function load(storage: KeyValueStorage, warn: Warn): Reference | null {
  let text: string | null = null;
  try {
    text = storage.getItem(REFERENCE_KEY);
  } catch {
    return null;
  }
  if (text === null) return null;
  const kept = parseKept(text);
  const r = typeof kept?.file === 'string' ? readDesignFile(kept.file) : null;
  if (!r?.ok || typeof kept?.pinnedAt !== 'string') {
    warn(`the pinned reference design in browser storage is damaged and was dropped.`);
    return null;
  }
  return { design: r.design, pinnedAt: kept.pinnedAt };
}

function save(storage: KeyValueStorage, ref: Reference | null, warn: Warn): void {
  try {
    if (!ref) storage.removeItem(REFERENCE_KEY);
    else
      // The design goes in as file text (a string), so its numbers keep the share layer's exact form.
      storage.setItem(
        REFERENCE_KEY,
        JSON.stringify({ pinnedAt: ref.pinnedAt, file: writeDesignFile(ref.design) }),
      );
  } catch {
    warn('the pinned reference could not be kept in browser storage; it lasts until the page closes.');
  }
}

/** A reference store over the given storage (null: kept in memory only). */
export function createCompareStore(storage: KeyValueStorage | null, warn: Warn = consoleWarn): CompareStore {
  let touched = false;
  let initial: Reference | null = null;
  let later = false;
  try {
    initial = storage ? load(storage, warn) : null;
  } catch (e) {
    // A reference only the full design reader can read: it appears once that reader has loaded, unless
    // the user pinned or unpinned in the meantime (nothing is written before).
    if (!(e instanceof FullReaderPending)) throw e;
    later = true;
  }
  const store = createStore<CompareState>()((set) => ({
    reference: initial,
    pin: (design, now = new Date()) => {
      touched = true;
      const reference = { design, pinnedAt: now.toISOString() };
      if (storage) save(storage, reference, warn);
      set({ reference });
    },
    unpin: () => {
      touched = true;
      if (storage) save(storage, null, warn);
      set({ reference: null });
    },
  }));
  if (later && storage)
    void loadFullReader().then(
      () => {
        if (!touched) store.setState({ reference: load(storage, warn) });
      },
      (e: unknown) => warn(`the pinned reference design could not be read: ${(e as Error).message}`),
    );
  return store;
}

/** The page's reference store. */
export const compareStore: CompareStore = createCompareStore(browserStorage());

/** Reads a slice of the page's reference store. */
export function useCompare<T>(selector: (s: CompareState) => T): T {
  return useStore(compareStore, selector);
}

const zpkOf = memoLast((d: Design): Zpk => ({
  zeros: d.zeros,
  poles: d.poles,
  gain: resolveGain(d.zeros, d.poles, d.gainRule, d.sampleRate).gain,
}));

/** The reference's zeros, poles and resolved gain. */
export const selectReferenceZpk = (ref: Reference): Zpk => zpkOf(ref.design);

/** The reference's response and the frequency of each point in Hz (at the reference's own sample rate). */
export interface ReferenceResponse {
  response: FrequencyResponse;
  hz: Float64Array;
}

const responseOf = memoLast(
  (
    d: Design,
    points: number,
    axis: ViewSettings['frequencyAxis'],
    span: ViewSettings['frequencySpan'],
  ): ReferenceResponse => {
    // The band the plots show, read at the reference's own rate (so evaluated there, not interpolated).
    const band = shownBandHz(span, d.sampleRate, axis);
    const omega = band
      ? frequencyGrid(points, {
          log: axis === 'log',
          fMin: hzToOmega(band[0], d.sampleRate),
          fMax: Math.min(Math.PI, hzToOmega(band[1], d.sampleRate)),
        })
      : frequencyGrid(points, axis === 'log' ? { log: true, fMin: 2 * Math.PI * LOG_AXIS_MIN_FRACTION } : {});
    const response = responseZpk(zpkOf(d), omega);
    const hz = omegaGridToHz(omega, d.sampleRate);
    return { response, hz };
  },
);

/** The reference's frequency response on the grid the frequency view uses (same point count and axis). */
export function selectReferenceResponse(ref: Reference, view: ViewSettings): ReferenceResponse {
  return responseOf(ref.design, view.responsePoints, view.frequencyAxis, view.frequencySpan);
}

const DEG_PER_RAD = 180 / Math.PI;

/** The reference's three frequency curves in the plots' axis units, at frequencies in Hz. */
export interface ReferenceCurves {
  /** Frequency of every point, Hz at the reference's own sample rate. */
  hz: Float64Array;
  /** dB or |H|, as the magnitude plot shows. */
  magnitude: Float64Array;
  /** Degrees, wrapped to (−180°, 180°] or unwrapped, as the phase plot shows. */
  phase: Float64Array;
  /** Group delay in samples or in milliseconds at the reference's rate, as the delay plot shows. */
  delay: Float64Array;
}

const curvesOf = memoLast(
  (
    d: Design,
    points: number,
    axis: ViewSettings['frequencyAxis'],
    span: ViewSettings['frequencySpan'],
    scale: ViewSettings['magnitudeScale'],
    phaseMode: ViewSettings['phaseMode'],
    delayUnit: ViewSettings['delayUnit'],
  ): ReferenceCurves => {
    // Refined at the roots like the design's own curve, so a notch or a resonance shows in full in both.
    const r = refineAtRoots(zpkOf(d), responseOf(d, points, axis, span).response);

    const perSample = delayUnit === 'ms' ? 1000 / d.sampleRate : 1;
    const phase = phaseMode === 'wrapped' ? r.phase : r.phaseUnwrapped;
    return {
      hz: omegaGridToHz(r.omega, d.sampleRate),
      magnitude: scale === 'db' ? r.magnitudeDb : r.magnitude,
      phase: phase.map((p) => p * DEG_PER_RAD),
      delay: r.groupDelay.map((g) => g * perSample),
    };
  },
);

/** The reference's magnitude, phase and group-delay curves for the frequency view's grid and units. */
export function selectReferenceCurves(ref: Reference, view: ViewSettings): ReferenceCurves {
  return curvesOf(
    ref.design,
    view.responsePoints,
    view.frequencyAxis,
    view.frequencySpan,
    view.magnitudeScale,
    view.phaseMode,
    view.delayUnit,
  );
}

const pointOf = memoLast((d: Design, hz: number): FrequencyReading | null =>
  hz >= 0 && hz <= d.sampleRate / 2 ? readAt(zpkOf(d), d.sampleRate, hz) : null,
);

/** The reference's level, phase and group delay at hz (Hz), or null above its Nyquist frequency. */
export const selectReferencePoint = (ref: Reference, hz: number): FrequencyReading | null =>
  pointOf(ref.design, hz);

/** Design minus reference phase, radians: wrapped to (−π, π] when the view shows wrapped phase. */
export function phaseDifference(design: number, reference: number, wrapped: boolean): number {
  const d = design - reference;
  return wrapped ? wrapPhase(d) : d;
}

const sectionsOf = memoLast((d: Design) => zpkToSections(zpkOf(d)));
const timeOutputOf = memoLast((d: Design, input: Float64Array) => filterSections(sectionsOf(d), input));

/** The reference's output for the time view's input signal (the same samples the design is fed). */
export const selectReferenceTimeOutput = (ref: Reference, input: Float64Array): Float64Array =>
  timeOutputOf(ref.design, input);

/** The reference's |H| in dB at hz (Hz), or null above its Nyquist frequency. */
export function referenceLevelDb(ref: Reference, hz: number): number | null {
  return selectReferencePoint(ref, hz)?.magnitudeDb ?? null;
}

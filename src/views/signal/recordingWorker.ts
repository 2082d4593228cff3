/**
 * The page's side of the recording worker (src/workers/recording.worker.ts), where the recording on show
 * lives. A follower watches the workbench store and keeps the worker's results in step with the design:
 * - after a design settles (never during a drag), the whole recording is filtered again (one job, in
 *   slices with progress; a newer design cancels it), and its spectrum too while the spectrum view is open;
 * - what the before/after plot draws is asked for at the plot's pixel width whenever the view, the output
 *   or (during a drag) the design changes, one request at a time, the latest winning; during a drag the
 *   answer carries a preview of the dragged design's output over the visible stretch;
 * - the recording's own spectrum is computed once per Welch setting, and the levels of the tones the level
 *   read-out looks at once per choice of frequencies (the filtered recording's levels at the frequencies
 *   found come with the filtering run).
 * Results are page state kept in a small store of their own (like the loader's), each tagged with what it
 * was computed for, so a view can tell current from stale and say so.
 */
import { createStore } from 'zustand/vanilla';
import { useStore } from 'zustand';
import type { Section } from '../../core/types.ts';
import type { ToneEstimate, WelchResult } from '../../core/signal/index.ts';
import type { SpectrumSettings, LoadedSignal } from '../../store/signal.ts';
import type { WorkbenchState, WorkbenchStore } from '../../store/store.ts';
import { selectSections } from '../../store/derived.ts';
import { segmentLength, selectLevelPlan } from '../../store/signalDerived.ts';
import { workbenchStore } from '../../store/useWorkbench.ts';
import { JobClient, type Endpoint, type JobRequest, type JobResponse } from '../../workers/jobs.ts';
import { OUTPUT_JOB, type OutputRequest, type OutputResult } from '../../workers/outputJob.ts';
import { VIEW_JOB, type ViewAnswer, type ViewRequest, type ViewResult } from '../../workers/viewJob.ts';
import { INPUT_SPECTRUM_JOB } from '../../workers/spectrumJob.ts';
import { LEVELS_JOB, type LevelsOutcome } from '../../workers/levelsJob.ts';
import { OUTPUT_KEY, PENDING_KEY, RECORDING_INFO_KEY, RECORDING_KEY } from '../../workers/recordingKeys.ts';

/** A job's progress as the page shows it. */
export type RunStatus =
  { kind: 'idle' } | { kind: 'running'; fraction: number } | { kind: 'error'; message: string };

/** A spectrum and the recording and settings it was computed for. */
export interface KeyedSpectrum {
  key: string;
  result: WelchResult;
}

export interface RecordingRunsState {
  /** The design version (a number per cascade) the page shows now. */
  wantedVersion: number;
  /** The filtering of the whole recording through the design. */
  outputRun: RunStatus & { version?: number };
  /** The version whose full output the worker holds, or null before the first has run. */
  outputVersion: number | null;
  /** What the before/after plot draws (the latest answer). */
  view: ViewResult | null;
  inputSpectrum: KeyedSpectrum | null;
  inputSpectrumRun: RunStatus;
  /** The output's spectrum, keyed by version and settings. */
  outputSpectrum: (KeyedSpectrum & { version: number }) | null;
  /** The tone levels before the filter, keyed by recording and frequencies asked. */
  inputLevels: { key: string; outcome: LevelsOutcome } | null;
  inputLevelsRun: RunStatus;
  /** The filtered recording's tones at the frequencies found, keyed by version and those frequencies. */
  outputTones: { key: string; version: number; tones: ToneEstimate[] | null } | null;
}

const initialRuns: RecordingRunsState = {
  wantedVersion: 0,
  outputRun: { kind: 'idle' },
  outputVersion: null,
  view: null,
  inputSpectrum: null,
  inputSpectrumRun: { kind: 'idle' },
  outputSpectrum: null,
  inputLevels: null,
  inputLevelsRun: { kind: 'idle' },
  outputTones: null,
};

export const recordingRuns = createStore<RecordingRunsState>()(() => initialRuns);

/** Reads the recording runs' state in a component. */
export function useRecordingRuns<T>(selector: (s: RecordingRunsState) => T): T {
  return useStore(recordingRuns, selector);
}

let client: JobClient | null = null;
let makeEndpoint = (): Endpoint<JobResponse, JobRequest> =>
  new Worker(new URL('../../workers/recording.worker.ts', import.meta.url), {
    type: 'module',
  }) as unknown as Endpoint<JobResponse, JobRequest>;

/** The client of the page's one recording worker (started on first use). */
export function recordingClient(): JobClient {
  client ??= new JobClient(makeEndpoint());
  return client;
}

/** Tests: serve the jobs from the given endpoint instead of a Worker (forgets any client made before). */
export function setRecordingEndpoint(make: () => Endpoint<JobResponse, JobRequest>): void {
  makeEndpoint = make;
  client = null;
}

let lastId = 0;
/** A new number for the next recording put into the worker. */
export function nextRecordingId(): number {
  return ++lastId;
}

/** The key of a spectrum: the recording and the Welch settings. */
export function spectrumKey(signal: LoadedSignal, settings: SpectrumSettings): string {
  return `${signal.id}:${settings.window}:${segmentLength(settings, signal.sampleRate, signal.length)}`;
}

/** The key of the level read-out's frequencies for a recording. */
export function levelsKey(signal: LoadedSignal, frequenciesHz: readonly number[]): string {
  return `${signal.id}:${frequenciesHz.join(',')}`;
}

/** The key of the filtered recording's tones: the design version and the frequencies fitted. */
export function tonesKey(version: number, frequenciesHz: readonly number[]): string {
  return `${version}:${frequenciesHz.join(',')}`;
}

/** The frequencies found in the recording for the read-out, when its levels have been read. */
function foundFrequencies(runs: RecordingRunsState, key: string | null): number[] | null {
  const l = runs.inputLevels;
  return l && l.key === key && l.outcome.ok ? l.outcome.report.readings.map((r) => r.fittedHz) : null;
}

/** The plot's request: samples [i0, i1) over `columns` columns, or the samples themselves (`line`). */
export type Viewport = Omit<ViewRequest, 'id' | 'preview'>;

/** How long a drag preview waits for the next pointer move before it is drawn on its own, ms. */
export const PREVIEW_HOLD_MS = 40;

let viewport: Viewport | null = null;
let follower: { requestView: () => void } | null = null;

/** The before/after plot says what it shows (null when it is not on screen). */
export function setRecordingViewport(v: Viewport | null): void {
  const same =
    v !== null &&
    viewport !== null &&
    v.i0 === viewport.i0 &&
    v.i1 === viewport.i1 &&
    v.columns === viewport.columns &&
    v.line === viewport.line;
  if (same || (v === null && viewport === null)) return;
  viewport = v;
  follower?.requestView();
}

function sameSpan(a: Viewport, b: Viewport): boolean {
  return a.i0 === b.i0 && a.i1 === b.i1 && a.columns === b.columns && a.line === b.line;
}

/** The worker's answer completed with what the page held (the same objects, so nothing is redrawn for them). */
function mergeAnswer(held: ViewResult | null, a: ViewAnswer): ViewResult | null {
  const keep = held !== null && held.request.id === a.request.id && sameSpan(held.request, a.request);
  const input = a.input ?? (keep ? held.input : null);
  if (!input) return null;
  const output = a.outputKept && keep ? held.output : a.output;
  return { request: keep ? held.request : a.request, input, output, preview: a.preview };
}

let pageFollower: (() => void) | null = null;
/** Starts following the page's store (once; the recording views and the loader call it). */
export function ensureRecordingFollower(): void {
  pageFollower ??= followRecording(workbenchStore);
}

/**
 * Keeps the worker's results in step with the store (see the file comment); returns a function that stops.
 * The page calls it once; tests call it on their own store.
 */
export function followRecording(store: WorkbenchStore): () => void {
  const versions = new WeakMap<Section[], number>();
  let nextVersion = 1;
  const versionOf = (sections: Section[]) => {
    let v = versions.get(sections);
    if (v === undefined) {
      v = nextVersion++;
      versions.set(sections, v);
    }
    return v;
  };
  let shownId: number | null = null;
  let viewInFlight = false;
  let viewPending = false;
  let outputWant: { version: number; spectrumKey: string | null; tonesKey: string | null } | null = null;
  let inputLevelsWant: string | null = null;
  let inputSpectrumWant: string | null = null;
  let stopped = false;
  const set = (patch: Partial<RecordingRunsState>) => recordingRuns.setState(patch);

  // During a drag a preview is drawn with the next pointer move, in the same frame (one frame per move, not
  // two), or after PREVIEW_HOLD_MS when the pointer rests.
  let heldPreview: ViewResult | null = null;
  let holdTimer: ReturnType<typeof setTimeout> | null = null;
  const showHeld = () => {
    if (holdTimer !== null) clearTimeout(holdTimer);
    holdTimer = null;
    const v = heldPreview;
    heldPreview = null;
    if (v) set({ view: v });
  };
  const holdPreview = (v: ViewResult) => {
    heldPreview = v;
    holdTimer ??= setTimeout(showHeld, PREVIEW_HOLD_MS);
  };

  const requestView = () => {
    const s = store.getState();
    const cur = s.signal.current;
    if (stopped || !cur || !viewport || s.signal.region !== 'recording') return;
    if (viewInFlight) {
      viewPending = true;
      return;
    }
    viewInFlight = true;
    viewPending = false;
    const sections = selectSections(s);
    // What the page already has for this very stretch is not computed or sent again (during a drag only the
    // preview changes).
    const held = recordingRuns.getState().view;
    const same = held !== null && held.request.id === cur.id && sameSpan(held.request, viewport);
    const request: ViewRequest = {
      id: cur.id,
      ...viewport,
      preview: s.dragging ? { version: versionOf(sections), sections } : null,
      have: { input: same, outputVersion: same && held.output ? held.output.version : null },
    };
    void recordingClient()
      .run<ViewAnswer>(VIEW_JOB, request)
      .then((outcome) => {
        viewInFlight = false;
        const now = store.getState().signal.current;
        if (outcome.status === 'done' && now && now.id === outcome.value.request.id) {
          const merged = mergeAnswer(recordingRuns.getState().view, outcome.value);
          if (merged && merged.preview && store.getState().dragging) holdPreview(merged);
          else if (merged) set({ view: merged });
        }
        if (viewPending) requestView();
      });
  };

  const runOutput = (s: WorkbenchState, cur: LoadedSignal, sections: Section[], version: number) => {
    const spectrum = s.signal.region === 'spectrum' ? s.signal.spectrum : null;
    const key = spectrum ? spectrumKey(cur, spectrum) : null;
    const runs = recordingRuns.getState();
    const plan = spectrum ? selectLevelPlan(s) : null;
    const found = plan ? foundFrequencies(runs, levelsKey(cur, plan.frequenciesHz)) : null;
    const tKey = found ? tonesKey(version, found) : null;
    const pyramidMissing = runs.outputVersion !== version;
    const spectrumMissing =
      key !== null && !(runs.outputSpectrum?.version === version && runs.outputSpectrum.key === key);
    const tonesMissing = tKey !== null && runs.outputTones?.key !== tKey;
    if (!pyramidMissing && !spectrumMissing && !tonesMissing) return;
    if (
      outputWant &&
      outputWant.version === version &&
      outputWant.spectrumKey === key &&
      outputWant.tonesKey === tKey
    )
      return;
    outputWant = { version, spectrumKey: key, tonesKey: tKey };
    const want = outputWant;
    const request: OutputRequest = {
      id: cur.id,
      version,
      sections,
      spectrum: spectrum
        ? { window: spectrum.window, nperseg: segmentLength(spectrum, cur.sampleRate, cur.length) }
        : null,
      tones: found ? { frequenciesHz: found, weighting: 'hann' } : null,
    };
    set({ outputRun: { kind: 'running', fraction: 0, version } });
    void recordingClient()
      .run<OutputResult>(OUTPUT_JOB, request, (fraction) => {
        if (outputWant === want) set({ outputRun: { kind: 'running', fraction, version } });
      })
      .then((outcome) => {
        if (outputWant !== want) return;
        outputWant = null;
        if (outcome.status === 'cancelled') return set({ outputRun: { kind: 'idle' } });
        if (outcome.status === 'error')
          return set({ outputRun: { kind: 'error', message: outcome.message } });
        const r = outcome.value;
        set({
          outputRun: { kind: 'idle' },
          outputVersion: r.version,
          ...(r.spectrum && key ? { outputSpectrum: { key, version: r.version, result: r.spectrum } } : {}),
        });
        // The level read-out's tones in a task of their own: the spectrum's drawing and the read-out's
        // together were the longest main-thread task of the switch to the spectra.
        if (tKey) {
          const tones = { key: tKey, version: r.version, tones: r.tones };
          setTimeout(() => {
            if (!stopped && store.getState().signal.current?.id === cur.id) set({ outputTones: tones });
          }, 0);
        }
        requestView();
      });
  };

  const runInputSpectrum = (cur: LoadedSignal, settings: SpectrumSettings) => {
    const key = spectrumKey(cur, settings);
    if (recordingRuns.getState().inputSpectrum?.key === key || inputSpectrumWant === key) return;
    inputSpectrumWant = key;
    set({ inputSpectrumRun: { kind: 'running', fraction: 0 } });
    const nperseg = segmentLength(settings, cur.sampleRate, cur.length);
    void recordingClient()
      .run<WelchResult>(INPUT_SPECTRUM_JOB, { id: cur.id, window: settings.window, nperseg }, (fraction) => {
        if (inputSpectrumWant === key) set({ inputSpectrumRun: { kind: 'running', fraction } });
      })
      .then((outcome) => {
        if (inputSpectrumWant !== key) return;
        inputSpectrumWant = null;
        if (outcome.status === 'done')
          set({ inputSpectrum: { key, result: outcome.value }, inputSpectrumRun: { kind: 'idle' } });
        else if (outcome.status === 'error')
          set({ inputSpectrumRun: { kind: 'error', message: outcome.message } });
        else set({ inputSpectrumRun: { kind: 'idle' } });
      });
  };

  const runInputLevels = (s: WorkbenchState, cur: LoadedSignal) => {
    const plan = selectLevelPlan(s);
    if (!plan) return;
    const key = levelsKey(cur, plan.frequenciesHz);
    if (recordingRuns.getState().inputLevels?.key === key || inputLevelsWant === key) return;
    inputLevelsWant = key;
    set({ inputLevelsRun: { kind: 'running', fraction: 0 } });
    void recordingClient()
      .run<LevelsOutcome>(LEVELS_JOB, { id: cur.id, frequenciesHz: plan.frequenciesHz }, (fraction) => {
        if (inputLevelsWant === key) set({ inputLevelsRun: { kind: 'running', fraction } });
      })
      .then((outcome) => {
        if (inputLevelsWant !== key) return;
        inputLevelsWant = null;
        if (outcome.status === 'done') {
          set({ inputLevels: { key, outcome: outcome.value }, inputLevelsRun: { kind: 'idle' } });
          // The filtered recording's tones can now be fitted at the frequencies found.
          refresh();
        } else if (outcome.status === 'error')
          set({ inputLevelsRun: { kind: 'error', message: outcome.message } });
        else set({ inputLevelsRun: { kind: 'idle' } });
      });
  };

  let last: {
    sections: Section[] | null;
    dragging: boolean;
    region: string;
    spectrum: SpectrumSettings | null;
    levels: unknown;
  } = {
    sections: null,
    dragging: false,
    region: '',
    spectrum: null,
    levels: null,
  };

  const update = (s: WorkbenchState) => {
    const cur = s.signal.current;
    if (!cur) {
      if (shownId !== null) {
        shownId = null;
        outputWant = null;
        inputSpectrumWant = null;
        inputLevelsWant = null;
        const c = recordingClient();
        c.cancel(OUTPUT_JOB);
        c.cancel(INPUT_SPECTRUM_JOB);
        c.cancel(LEVELS_JOB);
        for (const key of [RECORDING_KEY, RECORDING_INFO_KEY, OUTPUT_KEY, PENDING_KEY]) c.drop(key);
        set(initialRuns);
      }
      return;
    }
    const sections = selectSections(s);
    const changed =
      sections !== last.sections ||
      s.dragging !== last.dragging ||
      s.signal.region !== last.region ||
      s.signal.spectrum !== last.spectrum ||
      s.signal.levels !== last.levels ||
      cur.id !== shownId;
    if (!changed) return;
    const newRecording = cur.id !== shownId;
    if (newRecording) {
      shownId = cur.id;
      outputWant = null;
      inputSpectrumWant = null;
      inputLevelsWant = null;
      set({ ...initialRuns });
    }
    const version = versionOf(sections);
    showHeld();
    if (recordingRuns.getState().wantedVersion !== version) set({ wantedVersion: version });
    if (s.dragging) {
      if (outputWant) {
        outputWant = null;
        recordingClient().cancel(OUTPUT_JOB);
        set({ outputRun: { kind: 'idle' } });
      }
    } else {
      runOutput(s, cur, sections, version);
    }
    if (s.signal.region === 'spectrum') {
      runInputSpectrum(cur, s.signal.spectrum);
      // The automatic frequencies follow the design's notches: read them once the design settles.
      if (!s.dragging) runInputLevels(s, cur);
    }
    const viewChanged =
      newRecording || s.dragging || last.dragging !== s.dragging || last.region !== s.signal.region;
    last = {
      sections,
      dragging: s.dragging,
      region: s.signal.region,
      spectrum: s.signal.spectrum,
      levels: s.signal.levels,
    };
    if (viewChanged) requestView();
  };

  /** Looks again at what is missing, as if the store had changed (after a result others depend on). */
  const refresh = () => {
    if (stopped) return;
    last = { ...last, sections: null };
    update(store.getState());
  };

  follower = { requestView };
  const unsubscribe = store.subscribe(update);
  update(store.getState());
  return () => {
    stopped = true;
    if (holdTimer !== null) clearTimeout(holdTimer);
    unsubscribe();
    if (follower?.requestView === requestView) follower = null;
  };
}

/**
 * The recording run through the fixed-point implementation in force, in the recording worker (see
 * src/workers/jobs.ts; the recording is already there, read or made by the loader). While "fixed point" is on, every settled change of the implementation or the
 * recording starts a new run (the newest wins; nothing runs during a root drag). The status is page state
 * kept here, beside the loader's, because only the recording views use it.
 */
import { createStore } from 'zustand/vanilla';
import { useStore } from 'zustand';
import type { Implementation } from '../../core/fixed/index.ts';
import { selectImplementation } from '../../store/implementationDerived.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import type { WorkbenchState } from '../../store/store.ts';
import { FIXED_RUN_JOB, type FixedRecordingResult } from '../../workers/fixedRecordingJob.ts';
import { RECORDING_KEY } from '../../workers/recordingKeys.ts';
import { recordingClient } from './recordingWorker.ts';

/** Where the run stands. */
export type FixedRunStatus =
  | { kind: 'off' }
  | { kind: 'unavailable'; reason: string }
  | { kind: 'running'; fraction: number }
  | { kind: 'done'; result: FixedRecordingResult }
  | { kind: 'error'; message: string };

export interface FixedRunState {
  enabled: boolean;
  status: FixedRunStatus;
  /** What the shown status was computed for: the implementation and the recording (its number). */
  implementation: Implementation | null;
  recording: number | null;
}

export const fixedRunStore = createStore<FixedRunState>()(() => ({
  enabled: false,
  status: { kind: 'off' },
  implementation: null,
  recording: null,
}));

/** Reads the run's state in a component. */
export function useFixedRun<T>(selector: (s: FixedRunState) => T): T {
  return useStore(fixedRunStore, selector);
}

let unsubscribe: (() => void) | null = null;

/** Starts a run when the settled implementation or recording differs from the one last run. */
function follow(s: WorkbenchState): void {
  if (!fixedRunStore.getState().enabled || s.dragging) return;
  const recording = s.signal.current?.id ?? null;
  const built = selectImplementation(s);
  const implementation = built.ok ? built.value : null;
  const last = fixedRunStore.getState();
  if (last.recording === recording && last.implementation === implementation && last.status.kind !== 'off')
    return;
  if (recording === null) {
    recordingClient().cancel(FIXED_RUN_JOB);
    fixedRunStore.setState({
      status: { kind: 'unavailable', reason: 'No recording.' },
      implementation,
      recording,
    });
    return;
  }
  if (!built.ok) {
    recordingClient().cancel(FIXED_RUN_JOB);
    fixedRunStore.setState({
      status: {
        kind: 'unavailable',
        reason: `The fixed-point settings do not apply: ${built.error.message}.`,
      },
      implementation: null,
      recording,
    });
    return;
  }
  const c = recordingClient();
  fixedRunStore.setState({ status: { kind: 'running', fraction: 0 }, implementation, recording });
  const mine = () =>
    fixedRunStore.getState().implementation === implementation &&
    fixedRunStore.getState().recording === recording;
  void c
    .run<FixedRecordingResult>(
      FIXED_RUN_JOB,
      { implementation: built.value, recordingKey: RECORDING_KEY },
      (fraction) => {
        if (mine()) fixedRunStore.setState({ status: { kind: 'running', fraction } });
      },
    )
    .then((outcome) => {
      if (!mine() || outcome.status === 'cancelled') return;
      fixedRunStore.setState({
        status:
          outcome.status === 'done'
            ? { kind: 'done', result: outcome.value }
            : { kind: 'error', message: outcome.message },
      });
    });
}

/** Turns the fixed-point run of the recording on or off. */
export function setFixedRunEnabled(on: boolean): void {
  if (on === fixedRunStore.getState().enabled) return;
  if (!on) {
    unsubscribe?.();
    unsubscribe = null;
    recordingClient().cancel(FIXED_RUN_JOB);
    fixedRunStore.setState({
      enabled: false,
      status: { kind: 'off' },
      implementation: null,
      recording: null,
    });
    return;
  }
  fixedRunStore.setState({ enabled: true, status: { kind: 'off' } });
  unsubscribe = workbenchStore.subscribe(follow);
  follow(workbenchStore.getState());
}

/**
 * The finished run when it belongs to the recording shown and no drag is on. (A settled change of the
 * implementation starts a new run at once, so a finished run is always the implementation in force's, except
 * during a drag, when nothing runs.)
 */
export function currentResult(
  state: FixedRunState,
  recording: number | null,
  dragging: boolean,
): FixedRecordingResult | null {
  if (state.status.kind !== 'done' || dragging || state.recording !== recording) return null;
  return state.status.result;
}

/** The finished run for the recording shown and the implementation it ran, or null (see currentResult). */
export function useCurrentFixedRun(): {
  result: FixedRecordingResult;
  implementation: Implementation;
} | null {
  const state = useFixedRun((s) => s);
  const recording = useWorkbench((s) => s.signal.current?.id ?? null);
  const dragging = useWorkbench((s) => s.dragging);
  const result = currentResult(state, recording, dragging);
  return result && state.implementation ? { result, implementation: state.implementation } : null;
}

/**
 * The spectra the spectrum view and the level read-out show, and whether each is the real thing: the
 * recording's Welch estimate (from the worker, once per setting), and the filtered recording's — its own
 * estimate once the worker has filtered the recording through the design on show, otherwise (during a drag,
 * and until that run is in) the input's estimate shaped by |H|² from the display response, said so.
 */
import { useMemo } from 'react';
import type { FrequencyResponse } from '../../core/response/index.ts';
import type { WelchResult } from '../../core/signal/index.ts';
import { selectDisplayResponse, selectZpk } from '../../store/derived.ts';
import {
  levelTableOf,
  selectLevelPlan,
  shapedLevels,
  shapedSpectrum,
  type LevelTableData,
} from '../../store/signalDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { levelsKey, spectrumKey, tonesKey, useRecordingRuns, type RunStatus } from './recordingWorker.ts';

export interface Spectra {
  before: WelchResult | null;
  after: WelchResult | null;
  /** False while `after` is the shaped estimate (input × |H|²). */
  afterMeasured: boolean;
  /** |H| on the display grid (angles), for the trace on the right axis. */
  response: FrequencyResponse;
  /** Progress of the recording's spectrum and of the filtering run. */
  inputRun: RunStatus;
  outputRun: RunStatus;
}

export function useSpectra(): Spectra {
  const signal = useWorkbench((s) => s.signal.current);
  const settings = useWorkbench((s) => s.signal.spectrum);
  const dragging = useWorkbench((s) => s.dragging);
  const response = useWorkbench(selectDisplayResponse);
  const key = signal ? spectrumKey(signal, settings) : null;
  const input = useRecordingRuns((r) => r.inputSpectrum);
  const output = useRecordingRuns((r) => r.outputSpectrum);
  const wanted = useRecordingRuns((r) => r.wantedVersion);
  const inputRun = useRecordingRuns((r) => r.inputSpectrumRun);
  const outputRun = useRecordingRuns((r) => r.outputRun);
  const before = input && input.key === key ? input.result : null;
  const measured =
    !dragging && output !== null && output.key === key && output.version === wanted ? output.result : null;
  const shaped = useMemo(
    () => (before && !measured ? shapedSpectrum(before, response) : null),
    [before, measured, response],
  );
  return {
    before,
    after: measured ?? shaped,
    afterMeasured: measured !== null,
    response,
    inputRun,
    outputRun,
  };
}

/**
 * The level read-out: the recording's tone levels (read in the worker once per choice of frequencies), and
 * after the filter the filtered recording's own fit at the frequencies found once the worker has filtered it
 * through the design on show; until then (and while a root is dragged) before + |H| at each frequency, said
 * so (`shaped`). While a drag moves the design's notches, the last levels read stand in for the new ones.
 */
export function useLevelTable(): LevelTableData | null {
  const signal = useWorkbench((s) => s.signal.current);
  const plan = useWorkbench(selectLevelPlan);
  const dragging = useWorkbench((s) => s.dragging);
  const zpk = useWorkbench(selectZpk);
  const { before, after } = useSpectra();
  const levels = useRecordingRuns((r) => r.inputLevels);
  const tones = useRecordingRuns((r) => r.outputTones);
  const wanted = useRecordingRuns((r) => r.wantedVersion);
  const key = signal && plan ? levelsKey(signal, plan.frequenciesHz) : null;
  const usable =
    levels && (levels.key === key || (dragging && signal && levels.key.startsWith(`${signal.id}:`)));
  const report = usable && levels.outcome.ok ? levels.outcome.report : null;
  const found = report ? report.readings.map((r) => r.fittedHz) : null;
  const measured =
    !dragging && found && tones && tones.key === tonesKey(wanted, found) && tones.tones ? tones.tones : null;
  const shaped = useMemo(
    () => (report && !measured ? shapedLevels(report, zpk) : null),
    [report, measured, zpk],
  );
  if (!signal || !before) return null;
  if (usable && !levels.outcome.ok)
    return { report: null, error: levels.outcome.error, floors: [], shaped: false };
  if (!report) return null;
  return levelTableOf(report, measured ?? shaped, before, after, measured === null);
}

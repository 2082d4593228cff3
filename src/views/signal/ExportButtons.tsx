/**
 * Downloads of the filtered signal: WAV in the input's format (or another) and CSV with time, input and
 * filtered columns; and of the fixed-point run's output codes. The recording worker writes the files that
 * need the samples, with progress.
 */
import { useState } from 'react';
import { SAMPLE_FORMATS, describeFormat, type SampleFormat } from '../../core/signal/index.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import type { ExportResult } from '../../workers/exportJob.ts';
import type { JobOutcome } from '../../workers/jobs.ts';
import { downloadBlob } from '../shared/download.ts';
import {
  defaultExportFormat,
  exportFiltered,
  exportFixedCsv,
  exportName,
  fixedExportName,
  fixedWav,
} from './exportSignal.ts';
import { setFixedRunEnabled, useCurrentFixedRun, useFixedRun } from './fixedRecording.ts';
import { RunProgress } from './RunProgress.tsx';
import type { RunStatus } from './recordingWorker.ts';

/** Runs a worker export with its progress and downloads the file under `name`. */
function useExport(onNotes: (n: string[]) => void) {
  const [run, setRun] = useState<RunStatus>({ kind: 'idle' });
  const start = (
    make: (progress: (f: number) => void) => Promise<JobOutcome<ExportResult>>,
    name: string,
  ) => {
    onNotes([]);
    setRun({ kind: 'running', fraction: 0 });
    void make((fraction) => setRun({ kind: 'running', fraction })).then((o) => {
      if (o.status === 'done') {
        setRun({ kind: 'idle' });
        onNotes(o.value.notes);
        downloadBlob(o.value.blob, name);
      } else if (o.status === 'error') setRun({ kind: 'error', message: o.message });
      else setRun({ kind: 'idle' });
    });
  };
  return { run, start };
}

export function ExportButtons({ signal }: { signal: LoadedSignal }) {
  const [chosen, setChosen] = useState<SampleFormat | 'input'>('input');
  const [notes, setNotes] = useState<string[]>([]);
  const format = chosen === 'input' ? defaultExportFormat(signal) : chosen;
  const { run, start } = useExport(setNotes);
  const busy = run.kind === 'running';
  return (
    <div className="pw-signal-export">
      <label>
        WAV samples{' '}
        <select value={chosen} onChange={(e) => setChosen(e.target.value as SampleFormat | 'input')}>
          <option value="input">
            {signal.format ? `as the input (${describeFormat(signal.format)})` : `${describeFormat('f32')}`}
          </option>
          {SAMPLE_FORMATS.filter((f) => f !== signal.format && (signal.format !== null || f !== 'f32')).map(
            (f) => (
              <option key={f} value={f}>
                {describeFormat(f)}
              </option>
            ),
          )}
        </select>
      </label>
      <div className="pw-signal-export-buttons">
        <button
          type="button"
          disabled={busy}
          onClick={() => start((p) => exportFiltered(signal, 'wav', format, p), exportName(signal, 'wav'))}
        >
          Download filtered WAV
        </button>
        <button
          type="button"
          disabled={busy}
          onClick={() => start((p) => exportFiltered(signal, 'csv', format, p), exportName(signal, 'csv'))}
        >
          Download filtered CSV
        </button>
      </div>
      <FixedDownloads signal={signal} onNotes={setNotes} busy={busy} start={start} />
      <RunProgress run={run} what="Writing the file" testId="export-run" />
      {notes.map((n) => (
        <p key={n} className="pw-hint pw-block" role="status">
          {n}
        </p>
      ))}
    </div>
  );
}

/** Downloads of the fixed-point run's output codes, or the switch that starts the run. */
function FixedDownloads({
  signal,
  onNotes,
  busy,
  start,
}: {
  signal: LoadedSignal;
  onNotes: (n: string[]) => void;
  busy: boolean;
  start: ReturnType<typeof useExport>['start'];
}) {
  const fixed = useCurrentFixedRun();
  const enabled = useFixedRun((s) => s.enabled);
  const status = useFixedRun((s) => s.status);
  if (!fixed) {
    const words = !enabled
      ? 'The fixed-point output (the exported C’s codes) downloads once the recording has run through it.'
      : status.kind === 'running'
        ? `Fixed point: running… ${Math.round(100 * status.fraction)} %`
        : status.kind === 'error'
          ? `The fixed-point run failed: ${status.message}`
          : status.kind === 'unavailable'
            ? status.reason
            : 'Fixed point: waiting for the run.';
    return (
      <p className="pw-hint pw-block" data-testid="fixed-downloads-status">
        {words}{' '}
        {enabled ? null : (
          <button type="button" className="pw-small-button" onClick={() => setFixedRunEnabled(true)}>
            Run in fixed point
          </button>
        )}
      </p>
    );
  }
  const { result, implementation } = fixed;
  const wav = () => {
    const r = fixedWav(result.output, signal.sampleRate, implementation);
    onNotes(r.notes);
    downloadBlob(r.blob, fixedExportName(signal, 'wav'));
  };
  return (
    <div className="pw-signal-export-buttons">
      <button type="button" onClick={wav}>
        Download fixed-point WAV
      </button>
      <button
        type="button"
        disabled={busy}
        onClick={() =>
          start((p) => exportFixedCsv(signal, implementation, p), fixedExportName(signal, 'csv'))
        }
      >
        Download fixed-point CSV
      </button>
    </div>
  );
}

/** Downloads of the filtered signal: WAV in the input's format (or another) and CSV with a time column. */
import { useState } from 'react';
import { SAMPLE_FORMATS, describeFormat, type SampleFormat } from '../../core/signal/index.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import { selectSignalOutput } from '../../store/signalDerived.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { downloadBlob } from '../shared/download.ts';
import {
  defaultExportFormat,
  exportName,
  filteredCsv,
  filteredWav,
  fixedCsv,
  fixedExportName,
  fixedWav,
} from './exportSignal.ts';
import { setFixedRunEnabled, useCurrentFixedRun, useFixedRun } from './fixedRecording.ts';

export function ExportButtons({ signal }: { signal: LoadedSignal }) {
  const [chosen, setChosen] = useState<SampleFormat | 'input'>('input');
  const [notes, setNotes] = useState<string[]>([]);
  const hasOutput = useWorkbench((s) => s.signal.current !== null);
  const format = chosen === 'input' ? defaultExportFormat(signal) : chosen;
  const output = () => selectSignalOutput(workbenchStore.getState());
  const wav = () => {
    const y = output();
    if (!y) return;
    const r = filteredWav(y, signal.sampleRate, format);
    setNotes(r.notes);
    downloadBlob(r.blob, exportName(signal, 'wav'));
  };
  const csv = () => {
    const y = output();
    if (!y) return;
    setNotes([]);
    downloadBlob(
      filteredCsv(signal.samples, y, signal.sampleRate, signal.startTime),
      exportName(signal, 'csv'),
    );
  };
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
        <button type="button" disabled={!hasOutput} onClick={wav}>
          Download filtered WAV
        </button>
        <button type="button" disabled={!hasOutput} onClick={csv}>
          Download filtered CSV
        </button>
      </div>
      <FixedDownloads signal={signal} onNotes={setNotes} />
      {notes.map((n) => (
        <p key={n} className="pw-hint pw-block" role="status">
          {n}
        </p>
      ))}
    </div>
  );
}

/** Downloads of the fixed-point run's output codes, or the switch that starts the run. */
function FixedDownloads({ signal, onNotes }: { signal: LoadedSignal; onNotes: (n: string[]) => void }) {
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
  const csv = () => {
    onNotes([]);
    downloadBlob(
      fixedCsv(signal.samples, result.output, signal.sampleRate, implementation, signal.startTime),
      fixedExportName(signal, 'csv'),
    );
  };
  return (
    <div className="pw-signal-export-buttons">
      <button type="button" onClick={wav}>
        Download fixed-point WAV
      </button>
      <button type="button" onClick={csv}>
        Download fixed-point CSV
      </button>
    </div>
  );
}

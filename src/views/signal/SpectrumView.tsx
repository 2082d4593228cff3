/** The spectrum view: Welch settings, the before/after spectrum with |H| over it, and the level read-out. */
import { useRef, useState } from 'react';
import { WINDOW_NAMES, type WindowName } from '../../core/signal/index.ts';
import type { LoadedSignal } from '../../store/signal.ts';
import { segmentLength, selectLevelPlan } from '../../store/signalDerived.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { Segmented } from '../chart/Segmented.tsx';
import { useElementSize } from '../chart/useElementSize.ts';
import { formatHz } from '../shared/format.ts';
import { LevelTable } from './LevelTable.tsx';
import { SpectrumChart } from './SpectrumChart.tsx';
import { RunProgress } from './RunProgress.tsx';
import { useSpectra } from './useSpectra.ts';

/** Segment lengths offered besides 'auto'. */
export const SEGMENT_CHOICES = [256, 512, 1024, 2048, 4096, 8192, 16384, 32768, 65536] as const;
/** A sample rate from which the frequency axis starts out logarithmic (audio), Hz. */
export const LOG_AXIS_FROM_HZ = 8000;

export function SpectrumView({ signal }: { signal: LoadedSignal }) {
  const box = useRef<HTMLDivElement>(null);
  const { width, height } = useElementSize(box);
  const { before, after, afterMeasured, response, inputRun, outputRun } = useSpectra();
  const dragging = useWorkbench((s) => s.dragging);
  const plan = useWorkbench(selectLevelPlan);
  const settings = useWorkbench((s) => s.signal.spectrum);
  const [log, setLog] = useState(signal.sampleRate >= LOG_AXIS_FROM_HZ);
  const set = workbenchStore.getState().setSpectrumSettings;
  const n = signal.length;
  const seg = segmentLength(settings, signal.sampleRate, n);
  return (
    <div className="pw-signal-body">
      <div className="pw-signal-toolbar">
        <label>
          window{' '}
          <select value={settings.window} onChange={(e) => set({ window: e.target.value as WindowName })}>
            {WINDOW_NAMES.map((w) => (
              <option key={w} value={w}>
                {w}
              </option>
            ))}
          </select>
        </label>
        <label
          title={
            before
              ? `Bins ${formatHz(before.binWidthHz, 3)} wide; ${before.segments} segments averaged (half overlapping)`
              : undefined
          }
        >
          segment{' '}
          <select
            value={String(settings.segment)}
            onChange={(e) => set({ segment: e.target.value === 'auto' ? 'auto' : Number(e.target.value) })}
          >
            <option value="auto">auto ({seg})</option>
            {SEGMENT_CHOICES.filter((s) => s <= Math.max(256, n)).map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </label>
        <Segmented
          mini
          label="Frequency axis"
          caption="f axis"
          value={log ? 'log' : 'linear'}
          options={[
            { value: 'linear', label: 'linear' },
            { value: 'log', label: 'log' },
          ]}
          onChange={(v) => setLog(v === 'log')}
        />
      </div>
      <RunProgress
        run={inputRun}
        what="Computing the recording's spectrum"
        testId="spectrum-input-progress"
      />
      {!afterMeasured && before ? (
        <p className="pw-signal-note" role="status" data-testid="spectrum-estimate-note">
          {dragging
            ? 'While you drag, “after” is the recording’s spectrum × |H|²; it is measured on release.'
            : outputRun.kind === 'running'
              ? `“After” is the recording’s spectrum × |H|² until the filtered recording is measured (${Math.round(100 * outputRun.fraction)} %).`
              : '“After” is the recording’s spectrum × |H|².'}
        </p>
      ) : null}
      <div className="pw-signal-split">
        <div className="pw-chart-box" ref={box}>
          <span className="pw-signal-legend pw-signal-legend-over">
            <span className="pw-key pw-key-input" aria-hidden="true" /> before
            <span className="pw-key pw-key-output" aria-hidden="true" /> after
            <span className="pw-key pw-key-response" aria-hidden="true" /> |H| (right axis)
          </span>
          {before ? (
            <SpectrumChart
              width={width}
              height={height}
              before={before}
              after={after}
              response={response}
              markersHz={plan?.frequenciesHz ?? []}
              log={log}
              afterShaped={!afterMeasured}
            />
          ) : null}
        </div>
        <LevelTable />
      </div>
    </div>
  );
}

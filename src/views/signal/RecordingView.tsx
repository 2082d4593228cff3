/**
 * Before and after in time: zoom buttons over the plot of the recording and the filtered recording, the
 * switch for the fixed-point run, and (once it has run) its findings and its difference from the ideal filter.
 */
import { useRef } from 'react';
import type { LoadedSignal } from '../../store/signal.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { useElementSize } from '../chart/useElementSize.ts';
import { SignalChart } from './SignalChart.tsx';
import { RecordingStatus } from './RecordingStatus.tsx';
import { ZOOM_STEP, zoomSpan } from '../chart/zoom.ts';
import { FixedRunSummary, FixedRunSwitch } from './FixedRunBar.tsx';
import { DifferenceStrip } from './DifferenceStrip.tsx';
import { useCurrentFixedRun } from './fixedRecording.ts';

export function RecordingView({ signal }: { signal: LoadedSignal }) {
  const box = useRef<HTMLDivElement>(null);
  const { width, height } = useElementSize(box);
  const zoom = useWorkbench((s) => s.signal.zoom);
  const duration = signal.length / signal.sampleRate;
  const [t0, t1] = zoom ?? [0, duration];
  const set = (z: readonly [number, number] | null) => workbenchStore.getState().setSignalZoom(z);
  const mid = (t0 + t1) / 2;
  const fixed = useCurrentFixedRun();
  return (
    <div className="pw-signal-body">
      <div className="pw-signal-toolbar">
        <span className="pw-signal-legend">
          <span className="pw-key pw-key-input" aria-hidden="true" /> recording
          <span className="pw-key pw-key-output" aria-hidden="true" /> filtered
          {fixed ? (
            <>
              <span className="pw-key pw-key-fixed" aria-hidden="true" /> fixed point
            </>
          ) : null}
        </span>
        <FixedRunSwitch />
        <span className="pw-signal-zoom" role="group" aria-label="Time zoom">
          <button
            type="button"
            className="pw-small-button"
            onClick={() => set(zoomSpan([t0, t1], mid, ZOOM_STEP))}
          >
            Zoom in
          </button>
          <button
            type="button"
            className="pw-small-button"
            onClick={() => set(zoomSpan([t0, t1], mid, 1 / ZOOM_STEP))}
            disabled={zoom === null}
          >
            Zoom out
          </button>
          <button
            type="button"
            className="pw-small-button"
            onClick={() => set(null)}
            disabled={zoom === null}
          >
            Show all
          </button>
        </span>
      </div>
      <FixedRunSummary />
      <RecordingStatus signal={signal} />
      <div className="pw-chart-box" ref={box} title="Wheel zooms, drag pans, double-click shows all">
        <SignalChart width={width} height={height} signal={signal} />
      </div>
      {fixed ? <DifferenceStrip signal={signal} difference={fixed.result.differenceLsb} /> : null}
    </div>
  );
}

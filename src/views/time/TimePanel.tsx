/** The time view: input and output of the current system, the slowest pole's envelope and the closed form. */
import { useRef, useState } from 'react';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { selectTimeStructure } from '../../store/derived.ts';
import { clampSamples, shownSamples } from '../../store/zoom.ts';
import { LazyZoomControls as ZoomControls } from '../chart/LazyZoomControls.tsx';
import { Segmented } from '../chart/Segmented.tsx';
import { useElementSize } from '../chart/useElementSize.ts';
import { PictureMenu } from '../pictures/PictureMenu.tsx';
import { ClosedFormList } from './ClosedFormList.tsx';
import { TimeChart } from './TimeChart.tsx';
import { TimeControls } from './TimeControls.tsx';
import { TimeReadout } from './TimeReadout.tsx';
import { useEnvelope } from './useEnvelope.ts';
import { RegionSwitch } from '../signal/RegionSwitch.tsx';
import { lazyView } from '../shared/lazyView.tsx';
import '../chart/chart.css';
import './time.css';

/** The recording tools load when first shown; prefetched after the first paint (App). */
export const signalRegion = lazyView('recording view', () =>
  import('../signal/SignalPanel.tsx').then((m) => m.SignalPanel),
);

/** The time region: the test inputs below, or a recording and its spectrum (src/views/signal). */
export function TimePanel() {
  const region = useWorkbench((s) => s.signal.region);
  return region === 'test' ? <TestInputPanel /> : <signalRegion.View />;
}

function TestInputPanel() {
  const box = useRef<HTMLDivElement>(null);
  const { width, height } = useElementSize(box);
  const [cursor, setCursor] = useState<number | null>(null);
  // The first sample of an impulse response is often far larger than the rest: fit the rest by default.
  const [fitTail, setFitTail] = useState(true);
  const samples = useWorkbench((s) => s.view.timeSamples);
  const timeSpan = useWorkbench((s) => s.view.timeSpan);
  const zoomed = shownSamples(timeSpan, samples);
  const span = zoomed ?? ([-0.5, samples - 0.5] as const);
  const envelope = useEnvelope();
  const structure = useWorkbench(selectTimeStructure);
  const shown = cursor !== null && cursor < samples ? cursor : null;
  return (
    <section aria-label="time response" className="pw-panel pw-view pw-time">
      <header className="pw-view-head">
        <h2>Time</h2>
        <RegionSwitch />
        <span
          className="pw-hint pw-time-structure"
          data-testid="time-structure"
          title={
            structure === 'typed'
              ? 'The output is computed from b and a exactly as typed (direct form II transposed), so a typed filter that is unstable grows here'
              : 'The output is computed through second-order sections made from the roots'
          }
        >
          {structure === 'typed' ? 'runs b, a as typed' : 'runs sections from the roots'}
        </span>
        <TimeControls />
        <PictureMenu view="time" />
      </header>
      <div className="pw-time-info">
        <TimeReadout cursor={shown} envelope={envelope} />
        <ZoomControls
          what="samples"
          span={span}
          zoomed={zoomed !== null}
          spanText={`n ${Math.max(0, Math.ceil(span[0]))}–${Math.min(samples - 1, Math.floor(span[1]))}`}
          set={(sp) => workbenchStore.getState().setView({ timeSpan: sp ? clampSamples(sp, samples) : null })}
        />
        <Segmented
          mini
          label="Amplitude axis fits"
          caption="fit"
          value={fitTail ? 'tail' : 'all'}
          options={[
            { value: 'all', label: 'all', title: 'Fit the amplitude axis to every sample' },
            {
              value: 'tail',
              label: 'n ≥ 1',
              title:
                'Fit it to the samples after the first, so a large first sample does not flatten the rest',
            },
          ]}
          onChange={(v) => setFitTail(v === 'tail')}
        />
      </div>
      <div className="pw-time-body">
        <div className="pw-time-main">
          <div className="pw-chart-box" ref={box}>
            <TimeChart
              width={width}
              height={height}
              cursor={shown}
              onCursor={setCursor}
              envelope={envelope}
              fitTail={fitTail}
            />
          </div>
        </div>
        <ClosedFormList />
      </div>
    </section>
  );
}

/** The frequency view's panel-wide settings: frequency axis and hold scale (unit choices sit on each plot). */
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import type { ViewSettings } from '../../store/view.ts';
import { Segmented } from '../chart/Segmented.tsx';
import { LazyZoomControls as ZoomControls } from '../chart/LazyZoomControls.tsx';
import { clampBandHz, shownBandHz, wholeBandHz } from '../../store/zoom.ts';
import { formatHzSpan } from './cursor.ts';

const setView = (patch: Partial<ViewSettings>) => workbenchStore.getState().setView(patch);

export function FrequencyControls() {
  const frequencyAxis = useWorkbench((s) => s.view.frequencyAxis);
  const holdScale = useWorkbench((s) => s.view.holdScale);
  const span = useWorkbench((s) => s.view.frequencySpan);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const band = shownBandHz(span, fs, frequencyAxis);
  const shown = band ?? wholeBandHz(fs, frequencyAxis);
  return (
    <div className="pw-view-controls">
      <Segmented
        label="Frequency axis"
        caption="f axis"
        value={frequencyAxis}
        options={[
          { value: 'linear', label: 'linear' },
          { value: 'log', label: 'log' },
        ]}
        onChange={(v) => setView({ frequencyAxis: v })}
      />
      <button
        type="button"
        className="pw-toggle"
        aria-pressed={holdScale}
        title="Keep the axis ranges still while you drag or zoom"
        onClick={() => setView({ holdScale: !holdScale })}
      >
        Hold scale
      </button>
      <ZoomControls
        what="frequency"
        span={shown}
        zoomed={band !== null}
        kind={frequencyAxis}
        spanText={formatHzSpan(shown)}
        set={(sp) => setView({ frequencySpan: sp ? clampBandHz(sp, fs, frequencyAxis) : null })}
      />
    </div>
  );
}

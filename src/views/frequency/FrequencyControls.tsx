/** The frequency view's panel-wide settings: frequency axis and hold scale (unit choices sit on each plot). */
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import type { ViewSettings } from '../../store/view.ts';
import { Segmented } from '../chart/Segmented.tsx';

const setView = (patch: Partial<ViewSettings>) => workbenchStore.getState().setView(patch);

export function FrequencyControls() {
  const frequencyAxis = useWorkbench((s) => s.view.frequencyAxis);
  const holdScale = useWorkbench((s) => s.view.holdScale);
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
        title="Keep the current axis ranges still while you drag"
        onClick={() => setView({ holdScale: !holdScale })}
      >
        Hold scale
      </button>
    </div>
  );
}

/** The frequency view's settings: magnitude scale, phase mode, delay unit, frequency axis, hold scale. */
import { useWorkbench } from '../../store/useWorkbench.ts';
import { workbenchStore } from '../../store/useWorkbench.ts';
import type { ViewSettings } from '../../store/view.ts';
import { Segmented } from '../chart/Segmented.tsx';

const setView = (patch: Partial<ViewSettings>) => workbenchStore.getState().setView(patch);

export function FrequencyControls() {
  const magnitudeScale = useWorkbench((s) => s.view.magnitudeScale);
  const phaseMode = useWorkbench((s) => s.view.phaseMode);
  const delayUnit = useWorkbench((s) => s.view.delayUnit);
  const frequencyAxis = useWorkbench((s) => s.view.frequencyAxis);
  const holdScale = useWorkbench((s) => s.view.holdScale);
  return (
    <div className="pw-freq-controls">
      <Segmented
        label="Magnitude scale"
        caption="|H|"
        value={magnitudeScale}
        options={[
          { value: 'db', label: 'dB' },
          { value: 'linear', label: 'linear' },
        ]}
        onChange={(v) => setView({ magnitudeScale: v })}
      />
      <Segmented
        label="Phase"
        caption="Phase"
        value={phaseMode}
        options={[
          { value: 'wrapped', label: 'wrapped', title: 'Phase folded into ±180°' },
          { value: 'unwrapped', label: 'unwrapped', title: 'Continuous phase' },
        ]}
        onChange={(v) => setView({ phaseMode: v })}
      />
      <Segmented
        label="Group delay unit"
        caption="Delay"
        value={delayUnit}
        options={[
          { value: 'samples', label: 'samples' },
          { value: 'ms', label: 'ms' },
        ]}
        onChange={(v) => setView({ delayUnit: v })}
      />
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

/** Choice of snapping for dragged roots, with the radius or frequency step it needs. */
import type { SnapMode } from '../../store/view.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { NumberField } from '../shared/NumberField.tsx';
import type { NumberFieldRule } from '../shared/fieldReading.ts';

const MODES: [SnapMode, string][] = [
  ['none', 'off'],
  ['circle', 'unit circle'],
  ['real-axis', 'real axis'],
  ['radius', 'radius'],
  ['frequency', 'Hz grid'],
];

/** The radius roots snap to: 0 or more. */
export const snapRadiusRule: NumberFieldRule = {
  check: (x) => (x >= 0 ? null : 'The snap radius is 0 or more.'),
};
/** The frequency grid's step: above 0 Hz. */
export const snapStepRule: NumberFieldRule = {
  typedUnit: 'Hz',
  check: (x) => (x > 0 ? null : 'The snap step is above 0 Hz.'),
};

export function SnapControl() {
  const snap = useWorkbench((s) => s.view.snap);
  const radius = useWorkbench((s) => s.view.snapRadius);
  const stepHz = useWorkbench((s) => s.view.snapFrequencyHz);
  const setView = workbenchStore.getState().setView;
  return (
    <span className="pw-snap">
      <label>
        Snap{' '}
        <select value={snap} onChange={(e) => setView({ snap: e.target.value as SnapMode })}>
          {MODES.map(([m, words]) => (
            <option key={m} value={m}>
              {words}
            </option>
          ))}
        </select>
      </label>
      {snap === 'radius' && (
        <NumberField
          label="Snap radius"
          hideLabel
          className="pw-snap-field"
          inputClassName="pw-num pw-num-short"
          value={radius}
          title="Radius roots snap to (≥ 0), Enter applies"
          {...snapRadiusRule}
          onCommit={(snapRadius) => setView({ snapRadius })}
        />
      )}
      {snap === 'frequency' && (
        <NumberField
          label="Snap step in Hz"
          hideLabel
          className="pw-snap-field"
          inputClassName="pw-num pw-num-short"
          unit="Hz"
          value={stepHz}
          title="Frequency step in Hz (> 0), Enter applies"
          {...snapStepRule}
          onCommit={(snapFrequencyHz) => setView({ snapFrequencyHz })}
        />
      )}
    </span>
  );
}

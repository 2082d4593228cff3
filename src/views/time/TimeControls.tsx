/** The time view's settings: input signal (with its frequency or seed), number of samples, stems or line. */
import { memo } from 'react';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import type { ViewSettings } from '../../store/view.ts';
import { NumberField } from '../shared/NumberField.tsx';
import { Segmented } from '../chart/Segmented.tsx';
import { samplesRule, sineHzRule } from './bounds.ts';

const setView = (patch: Partial<ViewSettings>) => workbenchStore.getState().setView(patch);

export const TimeControls = memo(function TimeControls() {
  const input = useWorkbench((s) => s.view.timeInput);
  const sineHz = useWorkbench((s) => s.view.sineHz);
  const seed = useWorkbench((s) => s.view.noiseSeed);
  const samples = useWorkbench((s) => s.view.timeSamples);
  const style = useWorkbench((s) => s.view.timeStyle);
  const fs = useWorkbench((s) => s.design.sampleRate);
  return (
    <div className="pw-view-controls">
      <Segmented
        label="Input signal"
        value={input}
        options={[
          { value: 'impulse', label: 'impulse', title: 'Unit impulse δ[n]' },
          { value: 'step', label: 'step', title: 'Unit step u[n]' },
          { value: 'sine', label: 'sine', title: 'cos(2π·f·n/fs) from n = 0' },
          { value: 'noise', label: 'noise', title: 'White noise, unit variance' },
        ]}
        onChange={(v) => setView({ timeInput: v })}
      />
      {input === 'sine' ? (
        <NumberField
          label="at"
          unit="Hz"
          className="pw-numfield"
          messageClassName="pw-numfield-msg"
          size={6}
          value={sineHz}
          {...sineHzRule(fs)}
          onCommit={(v) => setView({ sineHz: v })}
        />
      ) : null}
      {input === 'noise' ? (
        <button
          type="button"
          className="pw-small-button"
          onClick={() => setView({ noiseSeed: seed + 1 })}
          title={`Noise seed ${seed}`}
        >
          New noise
        </button>
      ) : null}
      <NumberField
        label="N"
        unit="samples"
        className="pw-numfield"
        messageClassName="pw-numfield-msg"
        size={6}
        value={samples}
        {...samplesRule}
        onCommit={(v) => setView({ timeSamples: v })}
      />
      <Segmented
        label="Drawing style"
        value={style}
        options={[
          { value: 'stems', label: 'stems' },
          { value: 'line', label: 'line' },
        ]}
        onChange={(v) => setView({ timeStyle: v })}
      />
    </div>
  );
});

/** Sample rate in Hz or kHz; a bad entry shows a message beside the field and keeps the old rate. */
import { useState } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { NumberField } from '../shared/NumberField.tsx';
import { preferredUnit, rateRule, rateText, type RateUnit } from './sampleRate.ts';

export function SampleRateField() {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const setSampleRate = useWorkbench((s) => s.setSampleRate);
  const [unit, setUnit] = useState<RateUnit>(() => preferredUnit(fs));
  return (
    <NumberField
      // A new unit shows the rate afresh (and drops any text being typed).
      key={unit}
      className="pw-rate"
      messageClassName="pw-field-error pw-rate-error"
      label="Sample rate"
      value={fs}
      format={(hz) => rateText(hz, unit)}
      {...rateRule(unit)}
      size={7}
      onCommit={setSampleRate}
    >
      <select
        aria-label="Sample rate unit"
        value={unit}
        onChange={(e) => setUnit(e.target.value as RateUnit)}
      >
        <option value="Hz">Hz</option>
        <option value="kHz">kHz</option>
      </select>
    </NumberField>
  );
}

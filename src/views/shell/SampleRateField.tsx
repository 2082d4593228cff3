/** Sample rate in Hz or kHz; a bad entry shows a message beside the field and keeps the old rate. */
import { useId, useState } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { parseRate, preferredUnit, rateText, type RateUnit } from './sampleRate.ts';

export function SampleRateField() {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const setSampleRate = useWorkbench((s) => s.setSampleRate);
  const [unit, setUnit] = useState<RateUnit>(() => preferredUnit(fs));
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const id = useId();

  const commit = () => {
    if (draft === null) return;
    const r = parseRate(draft, unit);
    if (!r.ok) return setError(r.message);
    setSampleRate(r.hz);
    setDraft(null);
    setError(null);
  };
  const cancel = () => {
    setDraft(null);
    setError(null);
  };

  return (
    <div className="pw-rate">
      <label htmlFor={id}>Sample rate</label>
      <input
        id={id}
        className={error ? 'pw-invalid' : undefined}
        inputMode="decimal"
        size={7}
        value={draft ?? rateText(fs, unit)}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-err` : undefined}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') cancel();
        }}
      />
      <select
        aria-label="Sample rate unit"
        value={unit}
        onChange={(e) => {
          setUnit(e.target.value as RateUnit);
          cancel();
        }}
      >
        <option value="Hz">Hz</option>
        <option value="kHz">kHz</option>
      </select>
      {error && (
        <span id={`${id}-err`} role="alert" className="pw-field-error pw-rate-error">
          {error}
        </span>
      )}
    </div>
  );
}

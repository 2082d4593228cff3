/**
 * Sample rate in Hz or kHz; a bad entry shows a message beside the field and keeps the old rate. A new rate
 * keeps the design in hertz (store/sampleRate.ts): a designed filter is designed again at the new rate; for
 * hand-placed roots the field asks once, in plain words, whether to keep their frequencies in Hz (the
 * default) or their places in the plane. Each change is one undo step, and a notice says what happened.
 */
import { useEffect, useRef, useState } from 'react';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { ratePlan, type RateChoice } from '../../store/sampleRate.ts';
import { postNotice } from '../../store/notices.ts';
import { NumberField } from '../shared/NumberField.tsx';
import { preferredUnit, rateRule, rateText, type RateUnit } from './sampleRate.ts';

/** Applies the rate with the choice, posting what happened; returns why nothing changed, or null. */
function change(hz: number, choice?: RateChoice): string | null {
  const r = workbenchStore.getState().changeSampleRate(hz, choice);
  if (!r.ok) return `Not changed: ${r.error.message}${r.error.expected ? `; ${r.error.expected}` : ''}.`;
  if (r.value) postNotice('info', `${r.value} Undo restores the previous rate and design.`, { key: 'rate' });
  return null;
}

function RateQuestion({
  from,
  to,
  onDone,
}: {
  from: number;
  to: number;
  onDone: (m: string | null) => void;
}) {
  const first = useRef<HTMLButtonElement>(null);
  // Focus the default answer only once the key that committed the field is released: Enter's keypress
  // would otherwise land on the focused button and answer the question unasked.
  useEffect(() => {
    const focus = () => first.current?.focus();
    const timer = setTimeout(focus, 400);
    const up = () => {
      clearTimeout(timer);
      focus();
    };
    window.addEventListener('keyup', up, { once: true });
    return () => {
      clearTimeout(timer);
      window.removeEventListener('keyup', up);
    };
  }, []);
  const unit = (hz: number) => rateText(hz, preferredUnit(hz)) + ' ' + preferredUnit(hz);
  const factor = Number((to / from).toPrecision(3));
  return (
    <div
      className="pw-rate-question"
      role="alertdialog"
      aria-labelledby="pw-rate-q"
      data-testid="rate-question"
      onKeyDown={(e) => {
        if (e.key === 'Escape') onDone(null);
      }}
    >
      <p id="pw-rate-q">
        Sample rate {unit(from)} → {unit(to)}. These roots were placed by hand. What should stay the same?
      </p>
      <button type="button" className="pw-primary" ref={first} onClick={() => onDone(change(to, 'keep-hz'))}>
        Their frequencies in Hz (move the roots)
      </button>
      <button type="button" onClick={() => onDone(change(to, 'keep-places'))}>
        Their places in the plane (frequencies × {factor})
      </button>
      <button type="button" onClick={() => onDone(null)}>
        Cancel
      </button>
    </div>
  );
}

export function SampleRateField() {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const [unit, setUnit] = useState<RateUnit>(() => preferredUnit(fs));
  const [asking, setAsking] = useState<number | null>(null);
  const [refusal, setRefusal] = useState<string | null>(null);
  return (
    <>
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
        onCommit={(hz) => {
          setRefusal(null);
          if (ratePlan(workbenchStore.getState().design) === 'ask') {
            setAsking(hz);
            return null;
          }
          return change(hz);
        }}
      >
        <select
          aria-label="Sample rate unit"
          value={unit}
          onChange={(e) => setUnit(e.target.value as RateUnit)}
        >
          <option value="Hz">Hz</option>
          <option value="kHz">kHz</option>
        </select>
        {asking !== null && (
          <RateQuestion
            from={fs}
            to={asking}
            onDone={(m) => {
              setAsking(null);
              setRefusal(m);
            }}
          />
        )}
        {refusal && (
          <span className="pw-field-error pw-rate-error" role="alert">
            {refusal}
          </span>
        )}
      </NumberField>
    </>
  );
}

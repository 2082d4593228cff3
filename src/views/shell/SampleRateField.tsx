/**
 * Sample rate in Hz or kHz; a bad entry shows a message beside the field and keeps the old rate. A new rate
 * keeps the design in hertz (store/sampleRate.ts): a designed filter is designed again at the new rate; for
 * hand-placed roots the field asks once, in plain words, whether to keep their frequencies in Hz (the
 * default) or their places in the plane. Each change is one undo step, and a notice says what happened.
 */
import { useState } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { NumberField } from '../shared/NumberField.tsx';
import { preferredUnit, rateRule, rateText, type RateUnit } from './sampleRate.ts';

type RateSteps = typeof import('./rateSteps.tsx');
let steps: RateSteps | null = null;

/** The field's steps and its question (rateSteps.tsx), loaded after the first paint or when first used. */
export const loadRateSteps = (): Promise<RateSteps> => import('./rateSteps.tsx').then((m) => (steps = m));

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
          const ui = { ask: () => setAsking(hz), refuse: setRefusal };
          if (steps) return steps.commitRate(hz, ui);
          loadRateSteps().then(
            (m) => setRefusal(m.commitRate(hz, ui)),
            (e: unknown) =>
              setRefusal(
                `Not changed (${e instanceof Error ? e.message : String(e)}): reload the page and try again.`,
              ),
          );
          return null;
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
        {asking !== null && steps && (
          <steps.RateQuestion
            from={fs}
            to={asking}
            onAnswer={(choice) =>
              steps!.answerRate(asking, choice, (m) => {
                setAsking(null);
                setRefusal(m);
              })
            }
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

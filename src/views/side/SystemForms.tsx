/**
 * The current system in every form, each with Copy and a button that puts it in the entry box. Printing and
 * laying out seven forms of a high-order system costs more than a frame, so during a root drag the forms
 * keep their text from before it and catch up on release.
 */
import { useMemo, useState } from 'react';
import { selectExpandedCheck, selectTf, selectZpk } from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { CopyButton } from '../shared/CopyButton.tsx';
import { useSettled } from '../shared/useSettled.ts';
import { systemForms } from './systemForms.ts';

const DIGIT_CHOICES = { '6': 6, '10': 10, all: undefined } as const;
type DigitChoice = keyof typeof DIGIT_CHOICES;

export function SystemForms({ onEdit }: { onEdit: (text: string) => void }) {
  const tf = useSettled(selectTf);
  const zpk = useSettled(selectZpk);
  const dragging = useWorkbench((s) => s.dragging);
  const [digits, setDigits] = useState<DigitChoice>('6');
  const forms = useMemo(() => systemForms(tf, zpk, DIGIT_CHOICES[digits]), [tf, zpk, digits]);
  const expanded = useSettled(selectExpandedCheck);
  return (
    <section className="pw-side-section" aria-labelledby="pw-forms-h" data-testid="system-forms">
      <div className="pw-section-head">
        <h2 id="pw-forms-h">Written out</h2>
        {dragging && (
          <span className="pw-hint" data-testid="forms-paused">
            updates on release
          </span>
        )}
        <label className="pw-hint">
          digits{' '}
          <select value={digits} onChange={(e) => setDigits(e.target.value as DigitChoice)}>
            <option value="6">6</option>
            <option value="10">10</option>
            <option value="all">all (exact)</option>
          </select>
        </label>
      </div>
      {expanded?.warn && (
        <p className="pw-forms-warning" role="note" data-testid="expanded-warning">
          {expanded.message.charAt(0).toUpperCase() + expanded.message.slice(1)}. The forms below that
          multiply the roots out (difference equations, H(z), b and a) carry that error; the factored form,
          the roots and the sections on the Target page do not.
        </p>
      )}
      <dl className="pw-forms">
        {forms.map((f) => (
          <div key={f.label} className="pw-form">
            <dt>
              {f.label}
              <span className="pw-form-actions">
                <button
                  type="button"
                  aria-label={`Edit ${f.label}`}
                  title="Put this text in the entry box"
                  onClick={() => onEdit(f.text)}
                >
                  Edit
                </button>
                <CopyButton text={f.text} label={f.label} />
              </span>
            </dt>
            <dd>
              <code>{f.text}</code>
            </dd>
          </div>
        ))}
      </dl>
    </section>
  );
}

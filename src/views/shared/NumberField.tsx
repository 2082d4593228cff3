/**
 * A number typed by the user, committed on Enter or when the field loses focus. A bad entry shows a
 * message under the field and the old value stays in force; Escape brings the old value back.
 */
import { useId, useState } from 'react';
import { formatNumber } from './format.ts';

/** Reads a plain decimal number (a comma is taken as the decimal point); NaN when it is not one. */
export function readNumber(text: string): number {
  const t = text.trim().replace(',', '.').replace(/^−/, '-');
  return /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t) ? Number(t) : NaN;
}

interface Props {
  label: string;
  value: number;
  /** Why a number is not acceptable, or null when it is. */
  check: (x: number) => string | null;
  onCommit: (x: number) => void;
  unit?: string;
  digits?: number;
}

export function NumberField({ label, value, check, onCommit, unit, digits = 6 }: Props) {
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  const commit = () => {
    if (draft === null) return;
    const x = readNumber(draft);
    const why = Number.isFinite(x) ? check(x) : `"${draft.trim()}" is not a number; type e.g. 50 or 0.25`;
    if (why) return setError(why);
    if (x !== value) onCommit(x);
    setDraft(null);
    setError(null);
  };
  return (
    <span className="pw-number-field">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        inputMode="decimal"
        size={8}
        className={error ? 'pw-invalid' : undefined}
        value={draft ?? formatNumber(value, digits).replace('−', '-')}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-err` : undefined}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') {
            setDraft(null);
            setError(null);
          }
        }}
      />
      {unit && <span>{unit}</span>}
      {error && (
        <span id={`${id}-err`} role="alert" className="pw-field-error pw-block">
          {error}
        </span>
      )}
    </span>
  );
}

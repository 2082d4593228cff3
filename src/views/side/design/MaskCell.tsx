/** A number cell of the mask table: committed on Enter or leaving the field; empty means "no limit". */
import { useState } from 'react';
import { readNumber } from '../../shared/NumberField.tsx';
import { formatNumber } from '../../shared/format.ts';

export interface MaskCellProps {
  /** Accessible name, e.g. "pass, from (Hz)". */
  name: string;
  value: number | undefined;
  /** Whether the cell may be emptied (a limit that can be removed). */
  optional: boolean;
  /** Applies a value; returns why it is not accepted, or null. */
  onCommit: (v: number | undefined) => string | null;
  onError: (message: string | null) => void;
}

const shown = (v: number | undefined) => (v === undefined ? '' : formatNumber(v, 6).replace('−', '-'));

export function MaskCell({ name, value, optional, onCommit, onError }: MaskCellProps) {
  const [draft, setDraft] = useState<string | null>(null);
  const [bad, setBad] = useState(false);
  const commit = () => {
    if (draft === null) return;
    const t = draft.trim();
    const v = t === '' ? undefined : readNumber(t);
    let why: string | null = null;
    if (v === undefined && !optional) why = `${name}: a number is needed`;
    else if (v !== undefined && !Number.isFinite(v))
      why = `${name}: "${t}" is not a number; type e.g. -40 or 120`;
    else if (v !== value) why = onCommit(v);
    setBad(why !== null);
    onError(why);
    if (!why) setDraft(null);
  };
  return (
    <input
      className={bad ? 'pw-invalid' : undefined}
      inputMode="decimal"
      aria-label={name}
      aria-invalid={bad ? true : undefined}
      value={draft ?? shown(value)}
      placeholder={optional ? '—' : undefined}
      onChange={(e) => setDraft(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
        if (e.key === 'Escape') {
          setDraft(null);
          setBad(false);
          onError(null);
        }
      }}
    />
  );
}

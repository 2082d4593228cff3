/**
 * A small number box that commits on Enter or when it loses focus, and only a value its checker accepts;
 * anything else stays in the box with the checker's message beside it (nothing the user typed is lost).
 */
import { useId, useState, type KeyboardEvent } from 'react';

export interface NumberFieldProps {
  label: string;
  /** The committed value, shown when the box is not being edited. */
  value: number;
  /** Unit shown after the box, e.g. "Hz". */
  unit?: string;
  check: (text: string) => { ok: true; value: number } | { ok: false; message: string };
  onCommit: (value: number) => void;
  /** Width of the box in characters. */
  size?: number;
}

export function NumberField({ label, value, unit, check, onCommit, size = 6 }: NumberFieldProps) {
  const id = useId();
  // null while the box shows the committed value; the user's text while editing.
  const [text, setText] = useState<string | null>(null);
  const shown = text ?? String(value);
  const result = text === null ? null : check(text);
  const message = result && !result.ok ? result.message : null;
  const commit = () => {
    if (text === null) return;
    const r = check(text);
    if (!r.ok) return;
    if (r.value !== value) onCommit(r.value);
    setText(null);
  };
  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter') commit();
    if (e.key === 'Escape') setText(null);
  };
  return (
    <span className="pw-numfield">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        size={size}
        value={shown}
        aria-invalid={message !== null}
        aria-describedby={message ? `${id}-msg` : undefined}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={onKeyDown}
      />
      {unit ? <span className="pw-numfield-unit">{unit}</span> : null}
      {message ? (
        <span id={`${id}-msg`} className="pw-numfield-msg" role="alert">
          {message}
        </span>
      ) : null}
    </span>
  );
}

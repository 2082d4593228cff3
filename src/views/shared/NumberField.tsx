/**
 * The number field of the page: a label, a box, a unit, and its message. It reads what is typed with the
 * one reader of typed numbers (decimal point or comma, Unicode minus, exponents, simple fractions, and the
 * field's unit: see core/parse/typedNumber.ts), commits on Enter or when the box loses focus, keeps text it
 * does not accept with a message (the old value stays in force), and brings the old value back on Escape.
 */
import { useId, type ReactNode } from 'react';
import { TYPED_UNITS, type TypedUnitName } from '../../core/parse/typedNumber.ts';
import { readNumberField, type NumberFieldRule } from './fieldReading.ts';
import { formatNumber } from './format.ts';
import { draftInputProps, useDraft } from './useDraft.ts';

export interface NumberFieldProps extends NumberFieldRule {
  label: string;
  /** The label only for screen readers (a table cell's column names it on screen). */
  hideLabel?: boolean;
  value: number | undefined;
  /** Unit shown after the box; when it is one of the typed units (and no typedUnit is given), it may be typed too. */
  unit?: string;
  /** Applies an accepted value; may still refuse it by returning why. */
  onCommit: (x: number) => string | null | void;
  /** Called instead of onCommit when an optional field is emptied. */
  onClear?: () => string | null | void;
  /** Text of the committed value (default: `digits` significant digits). */
  format?: (x: number) => string;
  digits?: number;
  size?: number;
  className?: string;
  inputClassName?: string;
  messageClassName?: string;
  placeholder?: string | undefined;
  title?: string | undefined;
  /** Receives the field's message when it is shown elsewhere (a table's message row); the field then shows none. */
  onMessage?: (message: string | null) => void;
  /** Drawn after the box and its unit (e.g. a unit choice). */
  children?: ReactNode;
}

const typedUnitOf = (unit: string | undefined): TypedUnitName | undefined =>
  unit !== undefined && unit in TYPED_UNITS ? (unit as TypedUnitName) : undefined;

export function NumberField(p: NumberFieldProps) {
  const id = useId();
  const digits = p.digits ?? 6;
  const shown =
    p.value === undefined
      ? ''
      : p.format
        ? p.format(p.value)
        : formatNumber(p.value, digits).replace('−', '-');
  const typedUnit = p.typedUnit ?? typedUnitOf(p.unit);
  const rule: NumberFieldRule = {
    ...(typedUnit && { typedUnit }),
    ...(p.bareFactor !== undefined && { bareFactor: p.bareFactor }),
    ...(p.check && { check: p.check }),
    ...(p.optional && { optional: true }),
  };
  const draft = useDraft(
    shown,
    (text) => readNumberField(text, rule),
    (x) => {
      if (x === undefined) return p.value === undefined ? null : (p.onClear?.() ?? null);
      return x === p.value ? null : p.onCommit(x);
    },
    p.onMessage,
  );
  const message = p.onMessage ? null : draft.message;
  return (
    <span className={p.className ?? 'pw-number-field'}>
      {!p.hideLabel && <label htmlFor={id}>{p.label}</label>}
      <input
        id={id}
        type="text"
        inputMode="decimal"
        size={p.size ?? 8}
        className={[p.inputClassName, draft.message && 'pw-invalid'].filter(Boolean).join(' ') || undefined}
        {...draftInputProps(draft)}
        placeholder={p.placeholder}
        title={p.title}
        aria-label={p.hideLabel ? p.label : undefined}
        aria-invalid={draft.message ? true : undefined}
        aria-describedby={message ? `${id}-err` : undefined}
      />
      {p.unit && <span className="pw-number-field-unit">{p.unit}</span>}
      {p.children}
      {message && (
        <span id={`${id}-err`} role="alert" className={p.messageClassName ?? 'pw-field-error pw-block'}>
          {message}
        </span>
      )}
    </span>
  );
}

/** One text field of the Design form: label, input, unit, and its message when the value is not accepted. */
import { useId } from 'react';

export interface FormFieldProps {
  label: string;
  /** Accessible name when the visible label is shared (e.g. the low edge of a pair). */
  name?: string;
  value: string;
  unit?: string;
  error?: string | undefined;
  hint?: string | undefined;
  wide?: boolean;
  onChange: (text: string) => void;
  onEnter: () => void;
}

export function FormField(p: FormFieldProps) {
  const id = useId();
  return (
    <div className="pw-dz-field">
      <label htmlFor={id}>{p.label}</label>
      <span className="pw-dz-input">
        <input
          id={id}
          inputMode={p.wide ? 'text' : 'decimal'}
          className={(p.error ? 'pw-invalid ' : '') + (p.wide ? 'pw-dz-wide' : '')}
          value={p.value}
          aria-label={p.name}
          aria-invalid={p.error ? true : undefined}
          aria-describedby={p.error ? `${id}-err` : undefined}
          onChange={(e) => p.onChange(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter') p.onEnter();
          }}
        />
        {p.unit && <span className="pw-dz-unit">{p.unit}</span>}
        {p.hint && <span className="pw-hint">{p.hint}</span>}
      </span>
      {p.error && (
        <span id={`${id}-err`} role="alert" className="pw-field-error pw-dz-error">
          {p.error}
        </span>
      )}
    </div>
  );
}

export interface PairFieldProps {
  label: string;
  /** Accessible names of the two inputs, e.g. "Pass band low edge". */
  names: [string, string];
  values: [string, string];
  errors: [string | undefined, string | undefined];
  unit: string;
  onChange: (i: 0 | 1, text: string) => void;
  onEnter: () => void;
}

/** A low/high pair of frequencies on one row (band-pass and band-stop edges). */
export function PairField(p: PairFieldProps) {
  const id = useId();
  const error = p.errors[0] ?? p.errors[1];
  return (
    <div className="pw-dz-field">
      <span id={id}>{p.label}</span>
      <span className="pw-dz-input" role="group" aria-labelledby={id}>
        {([0, 1] as const).map((i) => (
          <span key={i} className="pw-dz-pair">
            {i === 1 && <span aria-hidden="true">–</span>}
            <input
              inputMode="decimal"
              aria-label={p.names[i]}
              className={p.errors[i] ? 'pw-invalid' : undefined}
              value={p.values[i]}
              aria-invalid={p.errors[i] ? true : undefined}
              aria-describedby={p.errors[i] ? `${id}-err` : undefined}
              onChange={(e) => p.onChange(i, e.target.value)}
              onKeyDown={(e) => {
                if (e.key === 'Enter') p.onEnter();
              }}
            />
          </span>
        ))}
        <span className="pw-dz-unit">{p.unit}</span>
      </span>
      {error && (
        <span id={`${id}-err`} role="alert" className="pw-field-error pw-dz-error">
          {error}
        </span>
      )}
    </div>
  );
}

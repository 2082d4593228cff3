/** A compact group of mutually exclusive buttons (a radio group) for a view setting. */
import { useRef, type KeyboardEvent } from 'react';
import './chart.css';

export interface SegmentOption<T extends string> {
  value: T;
  label: string;
  /** Longer description, shown as a tooltip. */
  title?: string;
}

export interface SegmentedProps<T extends string> {
  /** Accessible name of the group, e.g. "Magnitude scale"; shown as a small caption when `caption` is set. */
  label: string;
  caption?: string;
  value: T;
  options: readonly SegmentOption<T>[];
  onChange: (value: T) => void;
  /** Smaller buttons, for a plot's title row. */
  mini?: boolean;
  /** Drawn as tabs (underlined choice) rather than buttons: for switching what is shown. */
  tabs?: boolean;
}

/** Buttons in a row; arrow keys move the choice, as in any radio group. */
export function Segmented<T extends string>({
  label,
  caption,
  value,
  options,
  onChange,
  mini,
  tabs,
}: SegmentedProps<T>) {
  const group = useRef<HTMLDivElement>(null);
  const onKeyDown = (e: KeyboardEvent) => {
    const step =
      e.key === 'ArrowRight' || e.key === 'ArrowDown'
        ? 1
        : e.key === 'ArrowLeft' || e.key === 'ArrowUp'
          ? -1
          : 0;
    if (!step) return;
    e.preventDefault();
    const i = options.findIndex((o) => o.value === value);
    const next = options[(i + step + options.length) % options.length];
    if (!next) return;
    onChange(next.value);
    const buttons = group.current?.querySelectorAll<HTMLButtonElement>('button');
    buttons?.[options.indexOf(next)]?.focus();
  };
  return (
    <div
      className={`pw-seg${mini ? ' pw-seg-mini' : ''}${tabs ? ' pw-seg-tabs' : ''}`}
      role="radiogroup"
      aria-label={label}
      ref={group}
      onKeyDown={onKeyDown}
    >
      {caption ? (
        <span className="pw-seg-caption" aria-hidden="true">
          {caption}
        </span>
      ) : null}
      {options.map((o) => (
        <button
          key={o.value}
          type="button"
          role="radio"
          aria-checked={o.value === value}
          tabIndex={o.value === value ? 0 : -1}
          title={o.title}
          onClick={() => onChange(o.value)}
        >
          {o.label}
        </button>
      ))}
    </div>
  );
}

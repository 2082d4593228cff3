/** A number cell of the mask table: committed on Enter or leaving the field; empty means "no limit". */
import { NumberField } from '../../shared/NumberField.tsx';
import type { NumberFieldRule } from '../../shared/fieldReading.ts';

/** How a cell reads: Hz for the edges, dB for the limits (that unit may be typed); a limit may be emptied. */
export const maskCellRule = (unit: 'Hz' | 'dB', optional: boolean): NumberFieldRule => ({
  typedUnit: unit,
  optional,
});

export interface MaskCellProps {
  /** Accessible name, e.g. "Region 1 from (Hz)". */
  name: string;
  /** Hz for the edges, dB for the limits: that unit may be typed after the number. */
  unit: 'Hz' | 'dB';
  value: number | undefined;
  /** Whether the cell may be emptied (a limit that can be removed). */
  optional: boolean;
  /** Applies a value (undefined removes the limit); returns why it is not accepted, or null. */
  onCommit: (v: number | undefined) => string | null;
  onError: (message: string | null) => void;
}

export function MaskCell({ name, unit, value, optional, onCommit, onError }: MaskCellProps) {
  return (
    <NumberField
      label={name}
      hideLabel
      className="pw-mask-cell"
      value={value}
      {...maskCellRule(unit, optional)}
      placeholder={optional ? '—' : undefined}
      onCommit={(v) => onCommit(v)}
      onClear={() => onCommit(undefined)}
      onMessage={(m) => onError(m && `${name}: ${m}`)}
    />
  );
}

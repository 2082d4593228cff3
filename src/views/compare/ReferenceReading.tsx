/**
 * The reference's level at the cross-hair and the design's difference from it, in dB, appended to the
 * frequency read-out while a reference is pinned.
 */
import { referenceLevelDb, useCompare } from '../../store/compare.ts';
import { formatDb } from '../shared/format.ts';
import './compare.css';

export interface ReferenceReadingProps {
  hz: number;
  /** The design's |H| at hz, dB. */
  magnitudeDb: number;
}

/** Difference a − b in dB with a sign; ∞ − ∞ (both exactly zero) is no difference to show. */
function difference(a: number, b: number): string {
  const d = a - b;
  if (Number.isNaN(d)) return '—';
  return `${d > 0 ? '+' : ''}${formatDb(d, 3)}`;
}

export function ReferenceReading({ hz, magnitudeDb }: ReferenceReadingProps) {
  const reference = useCompare((s) => s.reference);
  if (!reference) return null;
  const level = referenceLevelDb(reference, hz);
  return (
    <span
      className="pw-readout-item pw-ref-reading"
      title="The pinned reference's |H| here, and the design minus the reference (dB)"
    >
      <span className="pw-readout-label">ref</span>
      <span className="pw-readout-value" data-testid="freq-read-ref-db">
        {level === null ? 'above its Nyquist' : formatDb(level, 4)}
      </span>
      <span className="pw-readout-label"> Δ </span>
      <span className="pw-readout-value" data-testid="freq-read-ref-diff">
        {level === null ? '—' : difference(magnitudeDb, level)}
      </span>
    </span>
  );
}

/**
 * The reference's level, phase and group delay at the cross-hair, each with the design's difference from
 * it, appended to the frequency read-out while a reference is pinned. Phase and delay are in the units the
 * plots show (wrapped or unwrapped degrees; samples or ms).
 */
import { phaseDifference, selectReferencePoint, useCompare } from '../../store/compare.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { formatDb, formatNumber } from '../shared/format.ts';
import type { FrequencyReading } from '../../core/response/readAt.ts';
import './compare.css';

export interface ReferenceReadingProps {
  /** The design's values at the cross-hair. */
  reading: FrequencyReading;
  phaseMode: 'wrapped' | 'unwrapped';
}

const DEG_PER_RAD = 180 / Math.PI;

/** A difference with its sign; ∞ − ∞ (both exactly zero) is no difference to show. */
function signed(d: number, show: (v: number) => string): string {
  if (Number.isNaN(d)) return '—';
  return `${d > 0 ? '+' : ''}${show(d)}`;
}

function Pair(p: { label: string; title: string; id: string; value: string; diff: string }) {
  return (
    <span className="pw-readout-item pw-ref-reading" title={p.title}>
      <span className="pw-readout-label">{p.label}</span>
      <span className="pw-readout-value" data-testid={`freq-read-ref-${p.id}`}>
        {p.value}
      </span>
      <span className="pw-readout-label"> Δ </span>
      <span className="pw-readout-value" data-testid={`freq-read-ref-${p.id}-diff`}>
        {p.diff}
      </span>
    </span>
  );
}

export function ReferenceReading({ reading, phaseMode }: ReferenceReadingProps) {
  const reference = useCompare((s) => s.reference);
  const ms = useWorkbench((s) => s.view.delayUnit === 'ms');
  if (!reference) return null;
  const ref = selectReferencePoint(reference, reading.hz);
  const wrapped = phaseMode === 'wrapped';
  const deg = (v: number) => `${formatNumber(v, 4)}°`;
  const delayText = (v: number) => `${formatNumber(v, 4)} ${ms ? 'ms' : 'samples'}`;
  const refPhase = ref ? (wrapped ? ref.phase : ref.phaseUnwrapped) : NaN;
  const curPhase = wrapped ? reading.phase : reading.phaseUnwrapped;
  const refDelay = ref ? (ms ? ref.groupDelayMs : ref.groupDelay) : NaN;
  const curDelay = ms ? reading.groupDelayMs : reading.groupDelay;
  return (
    <>
      <span
        className="pw-readout-item pw-ref-reading"
        title="The pinned reference's |H| here, and the design minus the reference (dB)"
      >
        <span className="pw-readout-label">ref</span>
        <span className="pw-readout-value" data-testid="freq-read-ref-db">
          {ref ? formatDb(ref.magnitudeDb, 4) : 'above its Nyquist'}
        </span>
        <span className="pw-readout-label"> Δ </span>
        <span className="pw-readout-value" data-testid="freq-read-ref-diff">
          {ref ? signed(reading.magnitudeDb - ref.magnitudeDb, (d) => formatDb(d, 3)) : '—'}
        </span>
      </span>
      {ref ? (
        <>
          <Pair
            label="ref phase"
            title="The pinned reference's phase here, and the design minus the reference (degrees)"
            id="phase"
            value={deg(refPhase * DEG_PER_RAD)}
            diff={signed(phaseDifference(curPhase, refPhase, wrapped) * DEG_PER_RAD, deg)}
          />
          <Pair
            label="ref delay"
            title="The pinned reference's group delay here, and the design minus the reference"
            id="delay"
            value={delayText(refDelay)}
            diff={signed(curDelay - refDelay, (v) => formatNumber(v, 4))}
          />
        </>
      ) : null}
    </>
  );
}

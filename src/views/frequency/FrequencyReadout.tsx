/** The cross-hair read-out: exact values at the cross-hair frequency, in every unit the plots offer. */
import { useCompare } from '../../store/compare.ts';
import { LazyReferenceReading as ReferenceReading } from '../compare/LazyReferenceReading.tsx';
import { formatDb, formatHz, formatNumber } from '../shared/format.ts';
import type { FrequencyReading } from '../../core/response/readAt.ts';
import { DEG_PER_RAD } from './series.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { shownBandHz } from '../../store/zoom.ts';
import { hzDigits } from './cursor.ts';

export interface FrequencyReadoutProps {
  reading: FrequencyReading | null;
  phaseMode: 'wrapped' | 'unwrapped';
}

/** One labelled value; the test id lets end-to-end tests read the number. */
function Item({ label, id, children }: { label: string; id: string; children: string }) {
  return (
    <span className="pw-readout-item">
      <span className="pw-readout-label">{label}</span>
      <span className="pw-readout-value" data-testid={`freq-read-${id}`}>
        {children}
      </span>
    </span>
  );
}

export function FrequencyReadout({ reading, phaseMode }: FrequencyReadoutProps) {
  // A pinned reference adds its own line; the height is kept whether or not the cross-hair is on.
  const withRef = useCompare((s) => s.reference !== null) ? ' pw-readout-ref' : '';
  // On a zoomed band the frequency carries the digits that tell its points apart.
  const digits = useWorkbench((s) =>
    hzDigits(shownBandHz(s.view.frequencySpan, s.design.sampleRate, s.view.frequencyAxis)),
  );
  if (!reading) {
    return (
      <div className={`pw-readout pw-readout-hint${withRef}`} aria-live="off">
        Point at the plots for exact values (or focus them: arrow keys); wheel or drag across to zoom.
      </div>
    );
  }
  const ph = phaseMode === 'wrapped' ? reading.phase : reading.phaseUnwrapped;
  return (
    <div className={`pw-readout${withRef}`} aria-label="Values at the cross-hair">
      <Item label="f" id="hz">
        {formatHz(reading.hz, digits)}
      </Item>
      <span className="pw-readout-item">
        <span className="pw-readout-label">|H|</span>
        <span className="pw-readout-value" data-testid="freq-read-db">
          {formatDb(reading.magnitudeDb, 4)}
        </span>
        <span className="pw-readout-label"> = </span>
        <span className="pw-readout-value" data-testid="freq-read-linear">
          {formatNumber(reading.magnitude, 4)}
        </span>
      </span>
      <Item label="phase" id="phase">
        {`${formatNumber(ph * DEG_PER_RAD, 4)}° = ${formatNumber(ph, 4)} rad`}
      </Item>
      <Item label="delay" id="delay">
        {`${formatNumber(reading.groupDelay, 4)} samples = ${formatNumber(reading.groupDelayMs, 4)} ms`}
      </Item>
      <ReferenceReading reading={reading} phaseMode={phaseMode} />
    </div>
  );
}

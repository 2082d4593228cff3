/** The bit-exact run: a test input through the fixed-point cascade, its overflows and its behaviour after. */
import { useMemo, useState } from 'react';
import type { SignalSpec } from '../../../core/fixed/index.ts';
import { simulationReport } from '../../../store/implementationDerived.ts';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { Segmented } from '../../chart/Segmented.tsx';
import { NumberField } from '../../shared/NumberField.tsx';
import {
  LISTED_OVERFLOWS,
  afterInputSummary,
  errorSummary,
  overflowSummary,
  overflowWords,
} from './simulationWords.ts';
import { useSettings, useSettled } from './useTarget.ts';
import { readTypedSamples, runLengthRule, runLevelRule, runSineRule } from './typedSamples.ts';

type Kind = 'impulse' | 'step' | 'sine' | 'noise' | 'typed';
/** Noise seed of the run (fixed, so a run is reproducible). */
const NOISE_SEED = 1;

export function SimulationPart() {
  const settings = useSettings();
  const fs = useWorkbench((s) => s.design.sampleRate);
  const [kind, setKind] = useState<Kind>('impulse');
  const [length, setLength] = useState(512);
  const [amplitude, setAmplitude] = useState(0.5);
  const [sineHz, setSineHz] = useState(() => Math.round(fs / 40));
  const [typed, setTyped] = useState('0.5, 0.5, -0.5, 0.25');
  const parsed = useMemo(() => readTypedSamples(typed), [typed]);
  const spec = useMemo((): SignalSpec => {
    if (kind === 'typed') return { kind: 'samples', values: parsed.ok ? parsed.values : [0] };
    if (kind === 'sine') return { kind, length, frequencyHz: Math.min(sineHz, fs / 2), amplitude };
    if (kind === 'noise') return { kind, length, seed: NOISE_SEED, amplitude };
    return { kind, length, amplitude };
  }, [kind, length, amplitude, sineHz, fs, parsed]);
  // While a root is dragged, the last run stays rather than re-running on every frame.
  const report = useSettled((s) => simulationReport(s, spec));
  return (
    <section className="pw-side-section" aria-labelledby="pw-sim-h">
      <h2 id="pw-sim-h">Bit-exact run</h2>
      <p className="pw-hint pw-block">
        The integer arithmetic of the exported C, sample by sample, on a test input; then zero input to look
        for limit cycles.
      </p>
      <Segmented
        label="Test input"
        value={kind}
        options={[
          { value: 'impulse', label: 'impulse' },
          { value: 'step', label: 'step' },
          { value: 'sine', label: 'sine' },
          {
            value: 'noise',
            label: 'noise',
            title: 'Gaussian noise; the amplitude is its standard deviation',
          },
          { value: 'typed', label: 'your samples', title: 'Numbers you type or paste, full scale ±1' },
        ]}
        onChange={setKind}
      />
      {kind === 'typed' ? (
        <div className="pw-sim-fields">
          <label className="pw-block pw-hint" htmlFor="pw-sim-typed">
            Samples, full scale ±1 (commas, spaces or one per line)
          </label>
          <textarea
            id="pw-sim-typed"
            className={`pw-sim-typed${parsed.ok ? '' : ' pw-invalid'}`}
            rows={3}
            value={typed}
            aria-invalid={parsed.ok ? undefined : true}
            aria-describedby={parsed.ok ? undefined : 'pw-sim-typed-err'}
            onChange={(e) => setTyped(e.target.value)}
          />
          {!parsed.ok && (
            <span id="pw-sim-typed-err" role="alert" className="pw-field-error pw-block">
              {parsed.message}
            </span>
          )}
        </div>
      ) : (
        <div className="pw-target-fields pw-sim-fields">
          <NumberField label="Length" unit="samples" value={length} {...runLengthRule} onCommit={setLength} />
          <NumberField
            label={kind === 'noise' ? 'Std. dev.' : 'Amplitude'}
            unit="of full scale"
            value={amplitude}
            {...runLevelRule}
            onCommit={setAmplitude}
          />
          {kind === 'sine' && (
            <NumberField
              label="Frequency"
              unit="Hz"
              value={sineHz}
              {...runSineRule(fs)}
              onCommit={setSineHz}
            />
          )}
        </div>
      )}
      {report && (kind !== 'typed' || parsed.ok) ? (
        <div className="pw-sim-report" data-testid="simulation-report" aria-live="polite">
          <p>{overflowSummary(report, report.simulation.input.length)}</p>
          {report.simulation.overflowCount > 1 && (
            <ul className="pw-sim-events">
              {report.simulation.overflows.slice(0, LISTED_OVERFLOWS).map((e, i) => (
                <li key={i}>{overflowWords(e)}</li>
              ))}
              {report.simulation.overflowCount > LISTED_OVERFLOWS && (
                <li>… and {report.simulation.overflowCount - LISTED_OVERFLOWS} more</li>
              )}
            </ul>
          )}
          {report.simulation.inputClipped > 0 && (
            <p>
              {report.simulation.inputClipped} input sample(s) were beyond full scale and were clipped before
              the filter.
            </p>
          )}
          <p>{errorSummary(report)}</p>
          <p data-testid="limit-cycle">{afterInputSummary(report, settings.dataWordLength)}</p>
        </div>
      ) : report ? null : (
        <p className="pw-hint pw-block">No run: the settings above do not apply.</p>
      )}
    </section>
  );
}

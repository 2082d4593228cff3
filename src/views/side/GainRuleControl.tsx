/** The gain rule: 0 dB at DC, Nyquist, a frequency or the peak, or a fixed gain; shows the resolved k. */
import { selectGain } from '../../store/derived.ts';
import type { GainRule } from '../../core/model/design.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { formatNumber } from '../shared/format.ts';
import { NumberField } from '../shared/NumberField.tsx';
import type { NumberFieldRule } from '../shared/fieldReading.ts';

const KINDS: { kind: GainRule['kind']; label: string }[] = [
  { kind: 'dc', label: '0 dB at DC' },
  { kind: 'nyquist', label: '0 dB at Nyquist' },
  { kind: 'frequency', label: '0 dB at a frequency' },
  { kind: 'peak', label: '0 dB at the peak' },
  { kind: 'fixed', label: 'Fixed gain k' },
];

/** The frequency where the gain rule puts 0 dB: 0 … fs/2 Hz. */
export function gainHzRule(fs: number): NumberFieldRule {
  return {
    typedUnit: 'Hz',
    check: (x) =>
      x >= 0 && x <= fs / 2 ? null : `Choose a frequency from 0 to ${formatNumber(fs / 2)} Hz (Nyquist)`,
  };
}

/** A fixed gain k: any finite number (the reader refuses what is not one). */
export const gainValueRule: NumberFieldRule = {};

/** The rule of a kind, seeded so that switching rules keeps the response where it is when possible. */
function ruleOf(kind: GainRule['kind'], gain: number, fs: number, last: GainRule): GainRule {
  switch (kind) {
    case 'fixed':
      return { kind, value: gain };
    case 'frequency':
      return { kind, hz: last.kind === 'frequency' ? last.hz : Math.round(fs / 8) };
    default:
      return { kind };
  }
}

export function GainRuleControl() {
  const rule = useWorkbench((s) => s.design.gainRule);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const { gain, problem } = useWorkbench(selectGain);
  const setGainRule = useWorkbench((s) => s.setGainRule);
  return (
    <section className="pw-side-section" aria-labelledby="pw-gain-h">
      <h2 id="pw-gain-h">Gain</h2>
      <div className="pw-gain-row">
        <select
          aria-label="Gain rule"
          value={rule.kind}
          onChange={(e) => setGainRule(ruleOf(e.target.value as GainRule['kind'], gain, fs, rule))}
        >
          {KINDS.map((k) => (
            <option key={k.kind} value={k.kind}>
              {k.label}
            </option>
          ))}
        </select>
        {rule.kind === 'frequency' && (
          <NumberField
            label="at"
            unit="Hz"
            value={rule.hz}
            {...gainHzRule(fs)}
            onCommit={(hz) => setGainRule({ kind: 'frequency', hz })}
          />
        )}
        {rule.kind === 'fixed' && (
          <NumberField
            label="k ="
            value={rule.value}
            digits={8}
            {...gainValueRule}
            onCommit={(value) => setGainRule({ kind: 'fixed', value })}
          />
        )}
        {rule.kind !== 'fixed' && (
          <span className="pw-gain-k" data-testid="resolved-gain">
            k = {formatNumber(gain, 6)}
          </span>
        )}
      </div>
      {problem && (
        <p className="pw-field-error" role="alert">
          {problem}
        </p>
      )}
    </section>
  );
}

/** Fixed point: coefficient word, Q format (automatic or by hand), rounding, data word, accumulator, overflow. */
import {
  MAX_WORD_LENGTH,
  MIN_WORD_LENGTH,
  qName,
  type ImplementationSettings,
} from '../../../core/fixed/index.ts';
import { Segmented } from '../../chart/Segmented.tsx';
import { formatNumber } from '../../shared/format.ts';
import { NumberField } from '../../shared/NumberField.tsx';
import { bitsRule } from './settingCheck.ts';
import { patchSettings, useImplementation, useSettings, useSettled } from './useTarget.ts';
import { selectFirImplementation } from '../../../store/firDerived.ts';

/** A whole-number field for one setting, checked against the engine's rules before it is applied. */
function BitsField(p: {
  label: string;
  field: 'wordLength' | 'dataWordLength' | 'accumulatorBits' | 'fractionBits';
  value: number;
  settings: ImplementationSettings;
}) {
  return (
    <NumberField
      label={p.label}
      unit="bits"
      value={p.value}
      digits={3}
      {...bitsRule(p.settings, p.field)}
      onCommit={(x) => void patchSettings({ [p.field]: x })}
    />
  );
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

export function FixedPointPart() {
  const s = useSettings();
  const impl = useImplementation();
  const fir = useSettled(selectFirImplementation);
  const q = fir ? (fir.ok ? fir.value.format : undefined) : impl?.quantized.format;
  const step = (d: number) => {
    const w = s.wordLength + d;
    if (w >= MIN_WORD_LENGTH && w <= MAX_WORD_LENGTH) patchSettings({ wordLength: w });
  };
  return (
    <section className="pw-side-section" aria-labelledby="pw-fixed-h">
      <h2 id="pw-fixed-h">Fixed point</h2>
      <div className="pw-target-fields">
        <span className="pw-target-word">
          <button
            type="button"
            aria-label="One bit shorter"
            disabled={s.wordLength <= MIN_WORD_LENGTH}
            onClick={() => step(-1)}
          >
            −
          </button>
          <BitsField label="Coefficients" field="wordLength" value={s.wordLength} settings={s} />
          <button
            type="button"
            aria-label="One bit longer"
            disabled={s.wordLength >= MAX_WORD_LENGTH}
            onClick={() => step(1)}
          >
            +
          </button>
        </span>
        <span className="pw-target-row">
          <Segmented
            label="Q format"
            caption="Q format"
            value={s.fractionBits === 'auto' ? 'auto' : 'hand'}
            options={[
              {
                value: 'auto',
                label: 'automatic',
                title: 'Most fraction bits that let the largest coefficient fit',
              },
              { value: 'hand', label: 'by hand' },
            ]}
            onChange={(v) =>
              patchSettings({ fractionBits: v === 'auto' ? 'auto' : (q?.fractionBits ?? s.wordLength - 2) })
            }
          />
          {q && (
            <strong className="pw-qname" data-testid="q-format">
              {qName(q)}
            </strong>
          )}
        </span>
        {s.fractionBits !== 'auto' && (
          <BitsField label="Fraction bits" field="fractionBits" value={s.fractionBits} settings={s} />
        )}
        {q && (
          <span className="pw-hint pw-block">
            {plural(q.wordLength - 1 - q.fractionBits, 'integer bit')},{' '}
            {plural(q.fractionBits, 'fraction bit')}: steps of {formatNumber(2 ** -q.fractionBits, 3)}, range
            ±{formatNumber(2 ** (q.wordLength - 1 - q.fractionBits), 3)}
            {!fir && impl && impl.quantized.saturated > 0
              ? ` — ${impl.quantized.saturated} coefficient(s) clamped`
              : ''}
          </span>
        )}
        <Segmented
          label="Rounding"
          caption="Rounding"
          value={s.rounding}
          options={[
            { value: 'nearest', label: 'nearest', title: 'Round to nearest, ties up' },
            { value: 'truncate', label: 'truncate', title: 'Drop the low bits (toward −∞)' },
          ]}
          onChange={(rounding) => patchSettings({ rounding })}
        />
        <Segmented
          label="On overflow"
          caption="On overflow"
          value={s.overflow}
          options={[
            { value: 'saturate', label: 'saturate', title: 'Clamp to the largest code of the same sign' },
            { value: 'wrap', label: 'wrap', title: "Two's-complement wraparound" },
          ]}
          onChange={(overflow) => patchSettings({ overflow })}
        />
        <BitsField label="Sample word" field="dataWordLength" value={s.dataWordLength} settings={s} />
        <BitsField label="Accumulator" field="accumulatorBits" value={s.accumulatorBits} settings={s} />
      </div>
    </section>
  );
}

/**
 * An FIR design on the Target page: it runs as a tap line, in the direct form or the symmetric form that
 * pre-adds mirrored samples (store/firDerived.ts, core/fixed/fir.ts). The form, what it costs (multiplies,
 * pre-add headroom), the accumulator width any input needs against the one chosen, whether the output word
 * can overflow, a bit-exact run of the worst full-scale input, and how far quantizing the taps moves the
 * response.
 */
import { qName } from '../../../core/fixed/index.ts';
import { selectFirChecks, selectFirImplementation } from '../../../store/firDerived.ts';
import { formatDb, formatHz, formatNumber } from '../../shared/format.ts';
import { patchSettings, useSettled } from './useTarget.ts';

const SYMMETRY = {
  even: 'symmetric taps, linear phase',
  odd: 'antisymmetric taps, linear phase',
  none: 'taps neither symmetric nor antisymmetric',
} as const;

export function FirPart() {
  const r = useSettled(selectFirImplementation);
  const checks = useSettled(selectFirChecks);
  if (!r) return null;
  if (!r.ok)
    return (
      <section className="pw-side-section" aria-labelledby="pw-fir-h">
        <h2 id="pw-fir-h">FIR taps</h2>
        <p className="pw-target-note" role="alert">
          These settings do not apply to the taps: {r.error.message}
          {r.error.expected ? ` (expected ${r.error.expected})` : ''}.
        </p>
      </section>
    );
  const impl = r.value;
  const s = impl.settings;
  const L = impl.codes.length;
  const canSym = impl.symmetry !== 'none';
  const w = checks?.worst;
  return (
    <section className="pw-side-section" aria-labelledby="pw-fir-h" data-testid="fir-part">
      <h2 id="pw-fir-h">FIR taps</h2>
      <p className="pw-hint pw-block">
        Every pole sits at the origin: this design runs as a line of {L} taps ({SYMMETRY[impl.symmetry]}), not
        as second-order sections. The fixed-point settings below apply to the taps; the exports write the
        taps.
      </p>
      <fieldset className="pw-fir-form">
        <legend>Form</legend>
        <label className="pw-check">
          <input
            type="radio"
            name="pw-fir-form"
            checked={s.form === 'symmetric'}
            disabled={!canSym}
            onChange={() => void patchSettings({ firForm: 'symmetric' })}
          />
          Symmetric: mirrored samples added before the multiply, {Math.floor(L / 2) + (L % 2)} multiplies per
          sample{canSym ? '' : ' (needs symmetric or antisymmetric taps)'}
        </label>
        <label className="pw-check">
          <input
            type="radio"
            name="pw-fir-form"
            checked={s.form === 'direct'}
            onChange={() => void patchSettings({ firForm: 'direct' })}
          />
          Direct: one multiply per tap, {L} per sample
        </label>
      </fieldset>
      <ul className="pw-fir-facts" data-testid="fir-facts">
        <li>
          Taps: {s.wordLength}-bit codes in <strong>{qName(impl.format)}</strong>
          {impl.saturatedTaps ? ' — some taps clamped to the word' : ''}.
        </li>
        {s.form === 'symmetric' && (
          <li>
            Pre-add: two {s.dataWordLength}-bit samples summed exactly in {impl.preAddBits} bits (one bit of
            headroom), then multiplied.
          </li>
        )}
        <li data-testid="fir-accumulator" className={impl.accumulatorSafe ? 'pw-fir-ok' : 'pw-fir-warn'}>
          Accumulator: {s.accumulatorBits} bits; any input fits in {impl.accumulatorNeeded} bits —{' '}
          <strong>{impl.accumulatorSafe ? 'no input can overflow it' : 'sums can overflow it'}</strong>.
        </li>
        <li data-testid="fir-gain" className={impl.worstGain <= 1 ? 'pw-fir-ok' : 'pw-fir-warn'}>
          Worst-case gain Σ|taps| = {formatNumber(impl.worstGain, 5)}:{' '}
          <strong>
            {impl.worstGain <= 1
              ? 'the output word cannot overflow'
              : `the output word can overflow for some full-scale input (${s.overflow === 'saturate' ? 'saturated' : 'wrapped'})`}
          </strong>
          .
        </li>
        {w && (
          <li data-testid="fir-worst">
            Bit-exact run of the worst full-scale input ({w.samples} samples against the taps' signs):{' '}
            <strong>
              {w.accumulator} accumulator overflow{w.accumulator === 1 ? '' : 's'}, {w.output} output overflow
              {w.output === 1 ? '' : 's'}
            </strong>
            {w.first ? ` (the first at sample ${w.first.sample})` : ''}.
          </li>
        )}
        {checks && (
          <li data-testid="fir-quantization">
            Quantized response: the largest difference from the taps' own, |H<sub>q</sub> − H|, is{' '}
            {formatNumber(checks.quantization.largest, 3)} (
            {formatDb(20 * Math.log10(checks.quantization.largest), 3)}) at{' '}
            {formatHz(checks.quantization.hz, 4)}.
          </li>
        )}
      </ul>
    </section>
  );
}

/** Ideal versus quantized: stability and, when the design has a mask, the mask's verdict, side by side. */
import type { MaskResult } from '../../../core/mask/index.ts';
import type { Stability } from '../../../core/stability/index.ts';
import { selectMaskResult, selectStability } from '../../../store/derived.ts';
import {
  selectImplementation,
  selectQuantizedMaskResult,
  selectQuantizedStability,
} from '../../../store/implementationDerived.ts';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { formatNumber } from '../../shared/format.ts';
import { maskVerdictText } from '../design/maskText.ts';
import { useSettings, useSettled } from './useTarget.ts';
import { qName } from '../../../core/fixed/index.ts';

const STABILITY_WORDS = { stable: 'stable', marginal: 'marginally stable', unstable: 'unstable' } as const;

function StabilityCell({ s, missing = '—' }: { s: Stability | null; missing?: string }) {
  if (!s) return <td>{missing}</td>;
  return (
    <td className={`pw-verdict pw-verdict-${s.verdict}`}>
      <strong>{STABILITY_WORDS[s.verdict]}</strong>
      <span className="pw-hint pw-block">r max {formatNumber(s.maxPoleRadius, 7)}</span>
    </td>
  );
}

function MaskCell({ m }: { m: MaskResult | null }) {
  if (!m) return <td>—</td>;
  return (
    <td className={`pw-verdict pw-verdict-${m.pass ? 'stable' : 'unstable'}`}>
      <strong>{m.pass ? 'inside' : 'outside'}</strong>
      <span className="pw-hint pw-block">
        {m.regions.length ? maskVerdictText(m).replace(/^[^;]*; /, '') : 'no regions to judge'}
      </span>
    </td>
  );
}

export function VerdictPart() {
  const settings = useSettings();
  const result = useSettled(selectImplementation);
  const ideal = useWorkbench(selectStability);
  const quantized = useSettled(selectQuantizedStability);
  const idealMask = useSettled(selectMaskResult);
  const quantizedMask = useSettled(selectQuantizedMaskResult);
  const impl = result.ok ? result.value : null;
  const label = impl ? `${settings.wordLength}-bit ${qName(impl.quantized.format)}` : 'quantized';
  return (
    <section className="pw-side-section" aria-labelledby="pw-verdict-h">
      <h2 id="pw-verdict-h">Ideal and quantized</h2>
      {!result.ok && (
        <p className="pw-target-note" role="alert">
          These settings do not apply: {result.error.message}; use {result.error.expected}.
        </p>
      )}
      <table className="pw-verdict-table" data-testid="quantized-verdict">
        <thead>
          <tr>
            <td />
            <th scope="col">ideal</th>
            <th scope="col">{label}</th>
          </tr>
        </thead>
        <tbody>
          <tr data-testid="verdict-stability">
            <th scope="row">Stability</th>
            {/* the ideal verdict waits for the exact checks (store/exactChecks.ts) */}
            <StabilityCell s={ideal} missing="checking…" />
            <StabilityCell s={quantized} />
          </tr>
          {idealMask && (
            <tr data-testid="verdict-mask">
              <th scope="row">Mask</th>
              <MaskCell m={idealMask} />
              <MaskCell m={quantizedMask} />
            </tr>
          )}
        </tbody>
      </table>
      {impl?.notes
        .filter((n) => !impl.cascade.notes.includes(n))
        .map((n) => (
          <p key={n} className="pw-target-note">
            {n.charAt(0).toUpperCase() + n.slice(1)}.
          </p>
        ))}
      {!idealMask && (
        <p className="pw-hint pw-block">No requirement mask on this design: only stability is judged.</p>
      )}
    </section>
  );
}

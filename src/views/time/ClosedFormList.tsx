/** The closed-form terms of the time response as a compact list, slowest mode first, or why there is none. */
import { useMemo } from 'react';
import { formatClosedForm } from '../../core/time/closedForm.ts';
import { CLOSED_FORM_MAX_ORDER, selectClosedForm, selectOrder } from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { formatHz, formatNumber, formatSeconds } from '../shared/format.ts';
import { closedFormModes, type Mode } from './modes.ts';
import { ModeText } from './ModeText.tsx';
import { omegaToHz } from '../../core/units.ts';

/** What kind of motion a mode is, in words, with its frequency and time constant. */
function modeNote(m: Mode, fs: number): string {
  const parts: string[] = [];
  if (m.kind === 'pair') parts.push(formatHz(omegaToHz(m.omega, fs)));
  else if (m.base < 0) parts.push('alternating');
  if (m.onCircle) parts.push(m.kind === 'real' && m.base === 1 ? 'steady value' : 'sustained');
  else if (m.radius > 1) parts.push('growing');
  else if (m.radius > 0) {
    const tau = -1 / Math.log(m.radius);
    parts.push(`τ ${formatNumber(tau, 3)} samples (${formatSeconds(tau / fs)})`);
  }
  return parts.join(' · ');
}

export function ClosedFormList() {
  const cf = useWorkbench(selectClosedForm);
  const order = useWorkbench(selectOrder);
  const input = useWorkbench((s) => s.view.timeInput);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const list = useMemo(() => (cf ? closedFormModes(cf) : null), [cf]);
  const whole = useMemo(() => (cf ? formatClosedForm(cf) : ''), [cf]);

  let body;
  if (!cf || !list) {
    const why =
      input === 'noise'
        ? 'White noise has no closed form; choose impulse, step or sine to see the terms.'
        : `Order ${order} is above ${CLOSED_FORM_MAX_ORDER}: the terms are not listed because partial fractions lose accuracy at such orders.`;
    body = <p className="pw-cf-note">{why}</p>;
  } else {
    body = (
      <>
        <ol className="pw-cf-list" aria-label="Closed-form terms">
          {list.modes.map((m, i) => (
            <li key={i}>
              <ModeText mode={m} />
              <span className="pw-cf-why">{modeNote(m, fs)}</span>
            </li>
          ))}
          {list.impulses.map((d) => (
            <li key={`d${d.delay}`}>
              <span className="pw-mode">
                {formatNumber(d.value, 4)}·δ[n{d.delay === 0 ? '' : `−${d.delay}`}]
              </span>
              <span className="pw-cf-why">{d.delay === 0 ? 'at n = 0 only' : `at n = ${d.delay} only`}</span>
            </li>
          ))}
        </ol>
        {list.modes.length === 0 && list.impulses.length === 0 ? (
          <p className="pw-cf-note">y[n] = 0</p>
        ) : null}
        {!cf.converged ? (
          <p className="pw-cf-note pw-cf-warn">The pole search did not converge; terms may be inaccurate.</p>
        ) : null}
        <button
          type="button"
          className="pw-cf-copy"
          onClick={() => void navigator.clipboard?.writeText(`y[n] = ${whole}`)}
          title={`y[n] = ${whole}`}
        >
          Copy as one line
        </button>
      </>
    );
  }
  return (
    <section className="pw-cf" aria-label="Closed form">
      <h3 title="The output y[n] for n ≥ 0 is the sum of these terms">
        Closed form <span className="pw-cf-sub">n ≥ 0</span>
      </h3>
      {body}
    </section>
  );
}

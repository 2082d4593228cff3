/**
 * The page's words about linear phase (loaded when the design on show is an FIR, linearPhaseSlot.tsx).
 *
 * Under the stability banner, for an FIR filter: that it has linear phase (its constant delay, and that a
 * dragged zero takes its reciprocal partner along), or that a hand edit broke it, with a button that
 * restores it (store/linearPhase.ts). Nothing for any other design.
 */
import { selectLinearPhase } from '../../store/linearPhaseStatus.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { formatNumber, formatSeconds } from '../shared/format.ts';
import { positionText } from '../side/rootRows.ts';

export function LinearPhaseNote() {
  const status = useWorkbench(selectLinearPhase);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const zeros = useWorkbench((s) => s.design.zeros);
  if (!status) return null;
  if (status.linear) {
    return (
      <p className="pw-linear-phase" data-testid="linear-phase">
        <strong>Linear phase</strong>: every frequency is delayed by{' '}
        <span data-testid="linear-phase-delay">{formatNumber(status.delaySamples, 6)}</span> samples (
        {formatSeconds(status.delaySamples / fs)}). A dragged zero takes its reciprocal 1/z̄ along; zeros on
        the unit circle slide along it.
      </p>
    );
  }
  const n = status.orphans.length;
  const shown = status.orphans.slice(0, 3).map((i) => positionText(zeros[i]!.re, zeros[i]!.im, 4));
  return (
    <div className="pw-linear-phase pw-linear-phase-broken" role="status" data-testid="linear-phase-broken">
      <p>
        <strong>Linear phase lost</strong>: {n === 1 ? 'one zero has' : `${n} zeros have`} no reciprocal
        partner 1/z̄ ({shown.join('; ')}
        {n > 3 ? '; …' : ''}), so the taps are no longer symmetric and the group delay is no longer constant.
      </p>
      <button type="button" onClick={() => workbenchStore.getState().restoreLinearPhase()}>
        Restore linear phase
      </button>
      <span className="pw-linear-phase-hint">
        {' '}
        moves or adds the missing partners (the selected zero stays; undo takes it back).
      </span>
    </div>
  );
}

/** A linear-phase FIR's group delay is one number: said beside the plot's title (store/linearPhase.ts). */
export function ConstantDelay() {
  const status = useWorkbench(selectLinearPhase);
  const unit = useWorkbench((s) => s.view.delayUnit);
  const fs = useWorkbench((s) => s.design.sampleRate);
  if (!status?.linear) return null;
  const text =
    unit === 'ms'
      ? `${formatNumber((1000 * status.delaySamples) / fs, 6)} ms`
      : `${formatNumber(status.delaySamples, 6)} samples`;
  return (
    <span
      className="pw-plot-note"
      data-testid="constant-delay"
      title="Linear phase: the same delay at every frequency"
    >
      constant {text} (linear phase)
    </span>
  );
}

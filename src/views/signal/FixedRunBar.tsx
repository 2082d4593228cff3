/** The switch that runs the recording through the fixed-point implementation, and what the run found. */
import { useWorkbench } from '../../store/useWorkbench.ts';
import { currentResult, setFixedRunEnabled, useFixedRun } from './fixedRecording.ts';
import { afterWords, differenceWords, implementationWords, overflowWordsOf } from './fixedRunWords.ts';

/** The checkbox, for the toolbar. */
export function FixedRunSwitch() {
  const enabled = useFixedRun((s) => s.enabled);
  return (
    <label
      className="pw-fixed-switch"
      title="Run the recording through the fixed-point filter in force (the exported C's arithmetic)"
    >
      <input type="checkbox" checked={enabled} onChange={(e) => setFixedRunEnabled(e.target.checked)} />
      fixed point
    </label>
  );
}

/** The run's status and findings, under the toolbar (nothing while off). */
export function FixedRunSummary() {
  const state = useFixedRun((s) => s);
  const recording = useWorkbench((s) => s.signal.current?.id ?? null);
  const fs = useWorkbench((s) => s.signal.current?.sampleRate ?? 1);
  const dragging = useWorkbench((s) => s.dragging);
  if (!state.enabled) return null;
  const impl = state.implementation;
  const result = currentResult(state, recording, dragging);
  const status = state.status;
  let text: string;
  let warning = '';
  if (result && impl) {
    text = `Fixed point (${implementationWords(impl)}): ${differenceWords(result)}`;
    const overflow = overflowWordsOf(result, fs);
    const after = afterWords(result);
    const bad = (w: string, yes: boolean) => (yes ? ((warning += ` ${w}`), '') : ` ${w}`);
    text += bad(overflow, result.report.overflowCount > 0 || result.report.inputClipped > 0);
    text += bad(after, result.report.afterInput.verdict !== 'rest');
  } else if (dragging) text = 'Fixed point: runs again when you release the root.';
  else if (status.kind === 'running')
    text = `Running the recording through the fixed-point filter… ${Math.round(100 * status.fraction)} %`;
  else if (status.kind === 'unavailable') text = status.reason;
  else if (status.kind === 'error') text = `The fixed-point run failed: ${status.message}`;
  else text = 'Fixed point: starting…';
  return (
    <p
      className="pw-fixed-summary"
      data-testid="fixed-run-summary"
      data-state={result ? 'done' : status.kind}
      aria-live="polite"
    >
      {status.kind === 'running' && !result ? (
        <progress max={1} value={status.fraction} aria-label="Fixed-point run" />
      ) : null}
      {text}
      {warning ? <span className="pw-fixed-warn">{warning}</span> : null}
    </p>
  );
}

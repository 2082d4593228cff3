/** One line for a worker run in progress (what, a bar, the per cent), or its error; nothing when idle. */
import type { RunStatus } from './recordingWorker.ts';

export function RunProgress({ run, what, testId }: { run: RunStatus; what: string; testId: string }) {
  if (run.kind === 'idle') return null;
  if (run.kind === 'error') {
    return (
      <p className="pw-signal-note pw-signal-error" role="alert" data-testid={testId}>
        {what} failed: {run.message}
      </p>
    );
  }
  const pct = Math.round(100 * run.fraction);
  return (
    <p className="pw-signal-note pw-signal-run" role="status" data-testid={testId}>
      <span>{what}…</span>
      <progress max={100} value={pct} aria-label={what} />
      <span className="pw-signal-pct">{pct} %</span>
    </p>
  );
}

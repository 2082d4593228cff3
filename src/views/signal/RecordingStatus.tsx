/**
 * One line under the recording's toolbar saying how current the filtered trace is: live over a stretch
 * during a drag (and from how far before it the filter started from rest), being filtered again with
 * progress, or nothing when it is the design's. The line keeps its height, so the plot does not jump.
 */
import type { LoadedSignal } from '../../store/signal.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { formatSeconds } from '../shared/format.ts';
import { RunProgress } from './RunProgress.tsx';
import { useRecordingRuns } from './recordingWorker.ts';

export function RecordingStatus({ signal }: { signal: LoadedSignal }) {
  const dragging = useWorkbench((s) => s.dragging);
  const preview = useRecordingRuns((r) => (dragging ? (r.view?.preview ?? null) : null));
  const i1 = useRecordingRuns((r) => r.view?.request.i1 ?? 0);
  const i0 = useRecordingRuns((r) => r.view?.request.i0 ?? 0);
  const run = useRecordingRuns((r) => r.outputRun);
  const hasOutput = useRecordingRuns((r) => r.outputVersion !== null);
  const fs = signal.sampleRate;
  const t = (i: number) => formatSeconds(signal.startTime + i / fs);
  let text: string | null = null;
  if (preview) {
    const start =
      preview.warmup > 0
        ? ` from rest ${formatSeconds(preview.warmup / fs)} before it${preview.settled ? '' : ' (the filter may still ring at its start)'}`
        : preview.settled
          ? ''
          : ' (the filter may still ring at its start)';
    text =
      preview.liveEnd >= i1
        ? `While you drag: the visible stretch is filtered live${start}; the whole recording is filtered again on release.`
        : `While you drag: filtered live from ${t(i0)} to ${t(preview.liveEnd)}${start}; beyond, faint, the last full result until release.`;
  }
  return (
    <div className="pw-signal-state" data-testid="recording-state">
      {text ? (
        <p className="pw-signal-note" role="status" data-testid="recording-preview-note">
          {text}
        </p>
      ) : (
        <RunProgress
          run={run}
          what={
            hasOutput
              ? 'Filtering the recording again (faint: the previous design)'
              : 'Filtering the recording'
          }
          testId="recording-run"
        />
      )}
    </div>
  );
}

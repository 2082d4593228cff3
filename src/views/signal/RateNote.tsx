/**
 * When the recording's sample rate differs from the design's: says what that means (the filter acts at
 * the same angles, so at other hertz) and offers to take the recording's rate for the design, one undo
 * step — re-running the design's designer at the new rate in the same step when it has one, so a notch
 * designed at 50 Hz stays at 50 Hz.
 */
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { postNotice } from '../../store/notices.ts';
import { formatHz } from '../shared/format.ts';

/** Takes the recording's rate for the design (one undo step: the store's adoptSampleRate), saying if its designer could not follow. */
function adoptSignalRate(hz: number): void {
  // a promise when the design algorithms are still loading (the step waits for them)
  void Promise.resolve(workbenchStore.getState().adoptSampleRate(hz)).then((r) => {
    if (r && !r.ok)
      postNotice(
        'info',
        `The design is now at ${formatHz(hz)}, but its designer could not re-run there (${r.error.message}); the roots stay as they were.`,
      );
  });
}

export function RateNote() {
  const signalRate = useWorkbench((s) => s.signal.current?.sampleRate ?? null);
  const designRate = useWorkbench((s) => s.design.sampleRate);
  const hasDesigner = useWorkbench((s) => s.design.designer !== undefined || s.design.parts !== undefined);
  if (signalRate === null || signalRate === designRate) return null;
  return (
    <div className="pw-signal-rate" role="note" data-testid="rate-mismatch">
      <span>
        Recorded at {formatHz(signalRate)}; the design is at {formatHz(designRate)}. The filter acts on
        samples, so on this recording its features sit at {formatNumberRatio(signalRate, designRate)} their
        hertz.
      </span>
      <button type="button" className="pw-small-button" onClick={() => adoptSignalRate(signalRate)}>
        Design at {formatHz(signalRate)}
        {hasDesigner ? ' (re-design)' : ''}
      </button>
    </div>
  );
}

function formatNumberRatio(a: number, b: number): string {
  const r = a / b;
  return `${Number.isInteger(r) ? r : r.toPrecision(3)}×`;
}

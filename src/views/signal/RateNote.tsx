/**
 * When the recording's sample rate differs from the design's: says what that means (the filter acts at
 * the same angles, so at other hertz) and offers to take the recording's rate for the design, one undo
 * step, keeping the design in hertz as the Sample rate field does (store/sampleRate.ts): its designer
 * re-run at the new rate when the roots are as designed, hand-placed roots moved so their Hz stay.
 */
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { postNotice } from '../../store/notices.ts';
import { formatHz } from '../shared/format.ts';

/** Takes the recording's rate for the design keeping its hertz (one undo step), saying what happened. */
function adoptSignalRate(hz: number): void {
  // a promise when a designer must run and the design algorithms are still loading (the step waits)
  void Promise.resolve(workbenchStore.getState().changeSampleRate(hz, 'keep-hz')).then((r) => {
    if (!r.ok)
      postNotice(
        'error',
        `The design stays at its rate: ${r.error.message}${r.error.expected ? `; ${r.error.expected}` : ''}.`,
      );
    else if (r.value)
      postNotice('info', `${r.value} Undo restores the previous rate and design.`, { key: 'rate' });
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
        {hasDesigner ? ' (re-design)' : ' (keeping Hz)'}
      </button>
    </div>
  );
}

function formatNumberRatio(a: number, b: number): string {
  const r = a / b;
  return `${Number.isInteger(r) ? r : r.toPrecision(3)}×`;
}

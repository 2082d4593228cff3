/**
 * The side column's Signal page: open or drop a recording, make a test signal, download the filtered
 * result. The plots are in the time region (Recording and Spectrum).
 */
import './signal.css';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { ExportButtons } from './ExportButtons.tsx';
import { OpenFileButton } from './OpenFileButton.tsx';
import { RateNote } from './RateNote.tsx';
import { RecipeForm } from './RecipeForm.tsx';
import { SignalInfo } from './SignalInfo.tsx';
import { SourceStatus } from './SourceStatus.tsx';
import { useSignalDrop } from './useSignalDrop.ts';

export function SignalPage() {
  const signal = useWorkbench((s) => s.signal.current);
  const drop = useSignalDrop();
  return (
    <>
      <section className="pw-side-section" aria-labelledby="pw-signal-source">
        <h2 id="pw-signal-source">Recording</h2>
        <div className={`pw-signal-drop${drop.over ? ' pw-drop-over' : ''}`} {...drop.handlers}>
          <OpenFileButton />
          <span className="pw-hint">or drop a WAV (8–32-bit, float) or CSV/TSV file here</span>
        </div>
        <SourceStatus />
        {signal ? (
          <div className="pw-signal-current">
            <SignalInfo signal={signal} />
            {signal.notes.map((n) => (
              <p key={n} className="pw-hint pw-block">
                {n}
              </p>
            ))}
            <div className="pw-signal-show">
              <button type="button" onClick={() => workbenchStore.getState().setTimeRegion('recording')}>
                Show before/after
              </button>
              <button type="button" onClick={() => workbenchStore.getState().setTimeRegion('spectrum')}>
                Show spectrum
              </button>
              <button type="button" onClick={() => workbenchStore.getState().clearSignal()}>
                Close
              </button>
            </div>
          </div>
        ) : null}
        <RateNote />
      </section>
      <section className="pw-side-section" aria-labelledby="pw-signal-make">
        <h2 id="pw-signal-make">Make a test signal</h2>
        <RecipeForm />
      </section>
      {signal ? (
        <section className="pw-side-section" aria-labelledby="pw-signal-export">
          <h2 id="pw-signal-export">Filtered signal</h2>
          <ExportButtons signal={signal} />
        </section>
      ) : null}
    </>
  );
}

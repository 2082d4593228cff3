/**
 * The time region when it shows a recording: the region switch, what is loaded, and either the before /
 * after plot or the spectrum. Files dropped anywhere on it are read here (and go no further).
 */
import { useWorkbench } from '../../store/useWorkbench.ts';
import '../chart/chart.css';
import '../time/time.css';
import './signal.css';
import { EmptySignal } from './EmptySignal.tsx';
import { RateNote } from './RateNote.tsx';
import { RecordingView } from './RecordingView.tsx';
import { RegionSwitch } from './RegionSwitch.tsx';
import { SignalInfo } from './SignalInfo.tsx';
import { SourceStatus } from './SourceStatus.tsx';
import { SpectrumView } from './SpectrumView.tsx';
import { useSignalDrop } from './useSignalDrop.ts';

export function SignalPanel() {
  const region = useWorkbench((s) => s.signal.region);
  const signal = useWorkbench((s) => s.signal.current);
  const drop = useSignalDrop();
  return (
    <section
      aria-label="recording"
      className={`pw-panel pw-view pw-time pw-signal${drop.over ? ' pw-drop-over' : ''}`}
      {...drop.handlers}
    >
      <header className="pw-view-head">
        <h2>Time</h2>
        <RegionSwitch />
        {signal ? <SignalInfo signal={signal} /> : null}
      </header>
      <SourceStatus />
      <RateNote />
      {signal === null ? (
        <EmptySignal />
      ) : region === 'spectrum' ? (
        <SpectrumView signal={signal} />
      ) : (
        <RecordingView signal={signal} />
      )}
    </section>
  );
}

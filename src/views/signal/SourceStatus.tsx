/** The loader's state in words: progress with Cancel, an error with what is accepted, or a sample-rate question. */
import { useState } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { NumberField } from '../shared/NumberField.tsx';
import { rateRule } from '../shell/sampleRate.ts';
import { cancelLoad, dismissStatus, provideSampleRate, useLoader } from './loader.ts';

export function SourceStatus() {
  const status = useLoader((s) => s.status);
  if (status.kind === 'idle') return null;
  if (status.kind === 'loading') {
    const pct = Math.round(100 * status.fraction);
    return (
      <div className="pw-signal-status" role="status">
        <span>Reading “{status.name}”…</span>
        <progress max={100} value={pct} aria-label={`Reading ${status.name}`} />
        <span>{pct} %</span>
        <button type="button" className="pw-small-button" onClick={cancelLoad}>
          Cancel
        </button>
      </div>
    );
  }
  if (status.kind === 'error') {
    const { error } = status;
    return (
      <div className="pw-signal-status pw-signal-error" role="alert">
        <p>
          <strong>“{status.name}” could not be read.</strong> {error.message}
        </p>
        {error.expected ? <p className="pw-signal-expected">Accepted: {error.expected}.</p> : null}
        <button type="button" className="pw-small-button" onClick={dismissStatus}>
          Dismiss
        </button>
      </div>
    );
  }
  return <RateQuestion name={status.name} count={status.count} />;
}

function RateQuestion({ name, count }: { name: string; count: number }) {
  const designRate = useWorkbench((s) => s.design.sampleRate);
  const [rate, setRate] = useState(designRate);
  return (
    <div className="pw-signal-status" role="group" aria-label="Sample rate of the text file">
      <p>
        “{name}” holds {count} samples and no time column. At what rate were they taken?
      </p>
      <NumberField label="Sample rate" unit="Hz" value={rate} {...rateRule('Hz')} onCommit={setRate} />
      <button type="button" className="pw-small-button" onClick={() => provideSampleRate(rate)}>
        Use {rate} Hz
      </button>
      <button type="button" className="pw-small-button" onClick={dismissStatus}>
        Cancel
      </button>
    </div>
  );
}

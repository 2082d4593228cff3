/** One line about the signal shown: its name, sample rate, length, and the channel (a picker for multichannel WAV). */
import type { LoadedSignal } from '../../store/signal.ts';
import { formatHz, formatSeconds } from '../shared/format.ts';
import { loadChannel, useLoader } from './loader.ts';

export function SignalInfo({ signal }: { signal: LoadedSignal }) {
  const file = useLoader((s) => s.file);
  const seconds = signal.length / signal.sampleRate;
  return (
    <span className="pw-signal-info" data-testid="signal-info">
      <span className="pw-signal-name" title={signal.name}>
        {signal.name}
      </span>
      <span>
        {formatHz(signal.sampleRate)} · {formatSeconds(seconds)} · {signal.length.toLocaleString('en')}{' '}
        samples
      </span>
      {signal.channelCount > 1 ? (
        <label>
          channel{' '}
          <select
            value={signal.channel}
            disabled={file === null}
            onChange={(e) => loadChannel(Number(e.target.value))}
          >
            {Array.from({ length: signal.channelCount }, (_, c) => (
              <option key={c} value={c}>
                {c + 1} of {signal.channelCount}
              </option>
            ))}
          </select>
        </label>
      ) : null}
    </span>
  );
}

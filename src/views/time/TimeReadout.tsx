/** The time cross-hair read-out: sample index, time, input and output at that sample. */
import { selectTimeInput, selectTimeOutput } from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { formatNumber, formatSeconds } from '../shared/format.ts';
import type { EnvelopeResult } from './useEnvelope.ts';

function Item({ label, id, children }: { label: string; id: string; children: string }) {
  return (
    <span className="pw-readout-item">
      <span className="pw-readout-label">{label}</span>
      <span className="pw-readout-value" data-testid={`time-read-${id}`}>
        {children}
      </span>
    </span>
  );
}

/** The envelope's caption: its time constant, or why no envelope is drawn. */
function EnvelopeNote({ envelope, fs }: { envelope: EnvelopeResult; fs: number }) {
  if (!envelope.shown) return <span className="pw-readout-hint">{envelope.note}</span>;
  const tau = envelope.timeConstant;
  const text = `slowest pole r = ${formatNumber(envelope.radius, 5)}, τ = ${formatNumber(tau, 3)} samples (${formatSeconds(tau / fs)})`;
  // Where the row is too narrow the text ends in an ellipsis; the tooltip keeps the whole of it.
  return (
    <span className="pw-envelope-note" data-testid="time-envelope-note" title={text}>
      <svg width="18" height="8" aria-hidden="true">
        <path d="M0 4H18" className="pw-time-envelope" />
      </svg>
      <span className="pw-envelope-text">{text}</span>
    </span>
  );
}

export function TimeReadout({ cursor, envelope }: { cursor: number | null; envelope: EnvelopeResult }) {
  const x = useWorkbench(selectTimeInput);
  const y = useWorkbench(selectTimeOutput);
  const fs = useWorkbench((s) => s.design.sampleRate);
  if (cursor === null || cursor >= y.length) {
    return (
      <div className="pw-readout">
        <EnvelopeNote envelope={envelope} fs={fs} />
      </div>
    );
  }
  return (
    <div className="pw-readout" aria-label="Values at the cross-hair">
      <Item label="n" id="n">
        {String(cursor)}
      </Item>
      <Item label="t" id="t">
        {formatSeconds(cursor / fs, 4)}
      </Item>
      <Item label="x[n]" id="x">
        {formatNumber(x[cursor]!, 5)}
      </Item>
      <Item label="y[n]" id="y">
        {formatNumber(y[cursor]!, 5)}
      </Item>
    </div>
  );
}

/** "Compare": pin the current design as a reference, drawn faintly under the design as it changes. */
import { compareStore, useCompare } from '../../store/compare.ts';
import { workbenchStore } from '../../store/useWorkbench.ts';
import { formatHz } from '../shared/format.ts';
import './compare.css';

function pinnedTime(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleTimeString(undefined, { timeStyle: 'short' });
}

export function CompareSection() {
  const reference = useCompare((s) => s.reference);
  const pin = () => compareStore.getState().pin(workbenchStore.getState().design);
  return (
    <section className="pw-side-section pw-files" aria-labelledby="pw-files-compare">
      <h2 id="pw-files-compare">Compare</h2>
      {reference ? (
        <p className="pw-files-status" data-testid="reference-status">
          <span>Reference: </span>
          <span className="pw-lib-name">{reference.design.name || 'untitled design'}</span>
          <span className="pw-hint">
            {` · ${formatHz(reference.design.sampleRate)} · pinned ${pinnedTime(reference.pinnedAt)}`}
          </span>
        </p>
      ) : (
        <p className="pw-hint pw-block">
          Pin the design as it is now; keep editing and its roots and responses (magnitude, phase, group
          delay, time) stay drawn, dashed, beside the design’s, with the differences read at the cross-hair.
        </p>
      )}
      <div className="pw-files-row">
        <button type="button" onClick={pin}>
          {reference ? 'Pin current instead' : 'Pin as reference'}
        </button>
        {reference ? (
          <button type="button" onClick={() => compareStore.getState().unpin()}>
            Unpin
          </button>
        ) : null}
      </div>
    </section>
  );
}

/** "Link": copy a link that holds the whole design, with its length and a short confirmation. */
import { useEffect, useMemo, useState } from 'react';
import { encodeLink, linkUrl } from '../../../share/link/index.ts';
import { pickSharedView } from '../../../core/model/view.ts';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { defaultView } from '../../../store/view.ts';
import { copyText } from '../../shared/copyText.ts';

/** How long "Copied" stays, ms. */
const CONFIRM_MS = 2500;

export function LinkSection() {
  // While a root is dragged the link stays the one from before the drag (said below), so the page does not
  // encode a link per pointer move; it follows on release.
  const design = useWorkbench((s) => (s.dragging ? (s.history.gestureStart ?? s.design) : s.design));
  const dragging = useWorkbench((s) => s.dragging);
  const view = useWorkbench((s) => s.view);
  const [state, setState] = useState<'idle' | 'copied' | 'failed'>('idle');
  // Only view settings that differ from the defaults travel: shorter links, same picture.
  const fragment = useMemo(
    () => encodeLink({ design, view: pickSharedView(view, defaultView) }),
    [design, view],
  );
  const url = linkUrl(window.location.href, { design, view: pickSharedView(view, defaultView) });
  useEffect(() => {
    if (state !== 'copied') return;
    const t = window.setTimeout(() => setState('idle'), CONFIRM_MS);
    return () => window.clearTimeout(t);
  }, [state]);
  useEffect(() => setState('idle'), [fragment]);

  const copy = () => {
    void copyText(url).then((ok) => setState(ok ? 'copied' : 'failed'));
  };
  return (
    <section className="pw-side-section pw-files" aria-labelledby="pw-files-link">
      <h2 id="pw-files-link">Link</h2>
      <p className="pw-hint pw-block">
        The whole design travels in the link itself; nothing is uploaded. Opening it elsewhere gives the same
        numbers, bit for bit.
      </p>
      <div className="pw-files-row">
        <button type="button" className="pw-primary" onClick={copy}>
          Copy link
        </button>
        <span className="pw-files-status" role="status" data-testid="link-status">
          {state === 'copied'
            ? `Copied · ${url.length} characters`
            : state === 'failed'
              ? 'Copying was blocked: select the link below and copy it.'
              : `${url.length} characters${dragging ? ' (updates on release)' : ''}`}
        </span>
      </div>
      {state === 'failed' ? (
        <input
          className="pw-files-link"
          readOnly
          value={url}
          aria-label="Design link"
          onFocus={(e) => e.currentTarget.select()}
          autoFocus
        />
      ) : null}
    </section>
  );
}

/** A small Copy button with a brief "Copied" confirmation. */
import { useEffect, useState } from 'react';
import { copyText } from './copyText.ts';

/** How long the confirmation stays, ms. */
const CONFIRM_MS = 1500;

export function CopyButton({ text, label }: { text: string; label: string }) {
  const [state, setState] = useState<'idle' | 'copied' | 'failed'>('idle');
  useEffect(() => {
    if (state === 'idle') return;
    const t = window.setTimeout(() => setState('idle'), CONFIRM_MS);
    return () => window.clearTimeout(t);
  }, [state]);
  return (
    <button
      type="button"
      className="pw-copy"
      aria-label={`Copy ${label}`}
      onClick={() => void copyText(text).then((ok) => setState(ok ? 'copied' : 'failed'))}
    >
      <span aria-live="polite">
        {state === 'copied' ? 'Copied' : state === 'failed' ? 'Copy failed' : 'Copy'}
      </span>
    </button>
  );
}

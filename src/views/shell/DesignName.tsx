/**
 * The design's name, editable in place; committed on Enter or when the field loses focus, and — if the page
 * is reloaded or closed while it is being typed — before the autosave that goes with the page.
 */
import { useState } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { useHeldDraft } from '../shared/useHeldDraft.ts';

/** Longest name kept. */
const MAX_NAME = 120;

export function DesignName() {
  const name = useWorkbench((s) => s.design.name);
  const setName = useWorkbench((s) => s.setName);
  const [draft, setDraft] = useState<string | null>(null);
  const commit = () => {
    if (draft === null) return;
    const t = draft.trim();
    if (t) setName(t.slice(0, MAX_NAME));
    setDraft(null);
  };
  useHeldDraft('name', draft !== null, commit);
  return (
    <input
      className="pw-name"
      aria-label="Design name"
      value={draft ?? name}
      maxLength={MAX_NAME}
      size={Math.min(48, Math.max(12, (draft ?? name).length + 1))}
      onChange={(e) => setDraft(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
        if (e.key === 'Escape') setDraft(null);
      }}
    />
  );
}

/** The design's name, editable in place; committed on Enter or when the field loses focus. */
import { useState } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';

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

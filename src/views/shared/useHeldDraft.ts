/** Binds a field's uncommitted text to the store's held drafts (store/drafts.ts), so leaving the page keeps it. */
import { useEffect, useRef } from 'react';
import { holdDraft } from '../../store/drafts.ts';

/** While `active` (the field's text differs from the design), `commit` runs if the page goes away first. */
export function useHeldDraft(field: string, active: boolean, commit: () => void): void {
  const latest = useRef(commit);
  latest.current = commit;
  useEffect(() => (active ? holdDraft(field, () => latest.current()) : undefined), [field, active]);
}

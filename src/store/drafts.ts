/**
 * Text a user is typing into a field of the design (its name, its note) that the field has not committed
 * yet. Such a field holds its draft here while it differs from the design; before the page goes away (a
 * reload, a closed tab, the tab hidden) persistence commits every held draft, so the autosave that follows
 * keeps what was typed — half-typed text is never lost.
 */

const held = new Map<string, () => void>();

/**
 * Holds a field's uncommitted text: `commit` puts it into the design (one undo step, as Enter would).
 * Returns the release, called once the field commits, reverts or unmounts.
 */
export function holdDraft(field: string, commit: () => void): () => void {
  held.set(field, commit);
  return () => {
    if (held.get(field) === commit) held.delete(field);
  };
}

/** Commits every held draft (fields commit in the order they started holding). */
export function commitDrafts(): void {
  const commits = [...held.values()];
  held.clear();
  for (const commit of commits) commit();
}

/** How many drafts are held (for tests). */
export function heldDraftCount(): number {
  return held.size;
}

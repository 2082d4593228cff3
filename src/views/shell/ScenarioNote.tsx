/**
 * The design's note (the demo's scenario, or what the user writes about the design), shown as plain text and
 * editable in place: Enter or leaving the field commits it as one undo step, Shift+Enter starts a new line,
 * Escape brings the note back. Text being typed when the page is reloaded or closed is committed first.
 * The line is one line high with or without a note, so the regions below never move when a design comes or
 * goes; while it is edited the field grows over them (app.css).
 */
import { useState } from 'react';
import { MAX_NOTE_CHARS } from '../../core/model/limits.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { useHeldDraft } from '../shared/useHeldDraft.ts';

/** Most lines the field grows to before it scrolls. */
const MAX_ROWS = 6;

export function ScenarioNote() {
  const note = useWorkbench((s) => s.design.note);
  const setNote = useWorkbench((s) => s.setNote);
  const [draft, setDraft] = useState<string | null>(null);
  const commit = () => {
    if (draft === null) return;
    setNote(draft.trim().slice(0, MAX_NOTE_CHARS));
    setDraft(null);
  };
  useHeldDraft('note', draft !== null, commit);
  const text = draft ?? note;
  return (
    <div className="pw-note-line">
      <textarea
        className="pw-note"
        aria-label="About this design"
        placeholder="Add a note about this design: what it is for, where it runs…"
        title="A note about this design, kept in its file and link (Enter keeps it, Shift+Enter starts a new line, Esc cancels)"
        value={text}
        maxLength={MAX_NOTE_CHARS}
        rows={Math.min(MAX_ROWS, text.split('\n').length)}
        spellCheck
        onChange={(e) => setDraft(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter' && !e.shiftKey) {
            e.preventDefault();
            commit();
          }
          if (e.key === 'Escape') setDraft(null);
        }}
      />
    </div>
  );
}

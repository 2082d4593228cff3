/** One design in the local library: its name (as text), when it was saved, and open / rename / delete. */
import { useState, type FormEvent } from 'react';
import type { LibraryEntry } from '../../../share/library.ts';
import { formatHz } from '../../shared/format.ts';

export interface LibraryRowProps {
  entry: LibraryEntry;
  onOpen(): void;
  /** Returns an error message, or null when renamed. */
  onRename(name: string): string | null;
  onDelete(): void;
}

function savedAt(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime())
    ? iso
    : d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

function order(roots: readonly { im: number; multiplicity: number }[]): number {
  return roots.reduce((n, r) => n + r.multiplicity * (r.im === 0 ? 1 : 2), 0);
}

export function LibraryRow({ entry, onOpen, onRename, onDelete }: LibraryRowProps) {
  const [mode, setMode] = useState<'show' | 'rename' | 'delete'>('show');
  const [draft, setDraft] = useState(entry.name);
  const [error, setError] = useState<string | null>(null);
  const d = entry.shared.design;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const message = onRename(draft);
    setError(message);
    if (!message) setMode('show');
  };
  const cancel = () => {
    setMode('show');
    setDraft(entry.name);
    setError(null);
  };
  return (
    <li className="pw-lib-row" data-testid="library-entry">
      {mode === 'rename' ? (
        <form className="pw-files-row" onSubmit={submit} onKeyDown={(e) => e.key === 'Escape' && cancel()}>
          <input
            className={`pw-lib-name-input${error ? ' pw-invalid' : ''}`}
            value={draft}
            onChange={(e) => setDraft(e.target.value)}
            aria-label={`New name for ${entry.name}`}
            aria-invalid={error ? true : undefined}
            autoFocus
          />
          <button type="submit" className="pw-primary">
            Rename
          </button>
          <button type="button" onClick={cancel}>
            Cancel
          </button>
          {error ? (
            <span role="alert" className="pw-field-error pw-block">
              {error}
            </span>
          ) : null}
        </form>
      ) : (
        <div className="pw-lib-head">
          <span className="pw-lib-name" data-testid="library-name">
            {entry.name}
          </span>
          <span className="pw-hint">
            {`${formatHz(d.sampleRate)} · order ${Math.max(order(d.zeros), order(d.poles))} · ${savedAt(entry.savedAt)}`}
          </span>
        </div>
      )}
      {mode === 'delete' ? (
        <div className="pw-files-row" role="group" aria-label={`Delete ${entry.name}?`}>
          <span>Delete this design from the library?</span>
          <button type="button" className="pw-danger" onClick={onDelete} autoFocus>
            Delete
          </button>
          <button type="button" onClick={cancel}>
            Keep
          </button>
        </div>
      ) : mode === 'show' ? (
        <div className="pw-files-row pw-lib-actions">
          <button type="button" onClick={onOpen} aria-label={`Open ${entry.name}`}>
            Open
          </button>
          <button type="button" onClick={() => setMode('rename')} aria-label={`Rename ${entry.name}`}>
            Rename
          </button>
          <button type="button" onClick={() => setMode('delete')} aria-label={`Delete ${entry.name}`}>
            Delete…
          </button>
        </div>
      ) : null}
    </li>
  );
}

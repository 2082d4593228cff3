/** "On this computer": a small library of named designs in browser storage (save as, open, rename, delete). */
import { useState, type FormEvent } from 'react';
import { deleteEntry, openEntry, renameEntry, saveAs } from '../../../share/library.ts';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { LibraryRow } from './LibraryRow.tsx';
import { currentShared, openShared } from './openShared.ts';
import { useLibrary } from './useLibrary.ts';

type Outcome = { tone: 'error' | 'info'; text: string; replace?: string } | null;

export function LibrarySection() {
  const { storage, entries, refresh } = useLibrary();
  const designName = useWorkbench((s) => s.design.name);
  const [name, setName] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<Outcome>(null);
  const shownName = name ?? designName;

  if (!storage) {
    return (
      <section className="pw-side-section pw-files" aria-labelledby="pw-files-lib">
        <h2 id="pw-files-lib">On this computer</h2>
        <p className="pw-hint">
          This browser gives the page no storage (a private window or blocked site data), so designs cannot be
          kept here. Save a design file instead.
        </p>
      </section>
    );
  }

  const save = (replace: boolean) => {
    const r = saveAs(storage, shownName, currentShared(), { replace });
    if (!r.ok) {
      const exists = entries.some((e) => e.name === shownName.trim());
      setOutcome({ tone: 'error', text: r.message, ...(exists ? { replace: shownName.trim() } : {}) });
      return;
    }
    refresh();
    setName(null);
    setOutcome({ tone: 'info', text: `Saved “${r.value.name}” in the library.` });
  };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    save(false);
  };
  const open = (id: string) => {
    const r = openEntry(storage, id);
    if (!r.ok) {
      setOutcome({ tone: 'error', text: r.message });
      refresh();
      return;
    }
    const changed = openShared(r.value);
    setOutcome({
      tone: 'info',
      text: changed
        ? `Opened “${r.value.design.name}”. Undo brings back the design you had.`
        : `“${r.value.design.name}” is the design already open.`,
    });
  };
  const rename = (id: string, to: string): string | null => {
    const r = renameEntry(storage, id, to);
    if (!r.ok) return r.message;
    refresh();
    setOutcome({ tone: 'info', text: `Renamed to “${r.value.name}”.` });
    return null;
  };
  const remove = (id: string, was: string) => {
    const r = deleteEntry(storage, id);
    refresh();
    setOutcome(r.ok ? { tone: 'info', text: `Deleted “${was}”.` } : { tone: 'error', text: r.message });
  };

  return (
    <section className="pw-side-section pw-files" aria-labelledby="pw-files-lib">
      <h2 id="pw-files-lib">On this computer</h2>
      <form className="pw-files-row" onSubmit={submit}>
        <label className="pw-lib-save">
          <span className="pw-hint">Name</span>
          <input
            value={shownName}
            onChange={(e) => {
              setName(e.target.value);
              setOutcome(null);
            }}
            aria-label="Name to save under"
          />
        </label>
        <button type="submit">Save to library</button>
      </form>
      {outcome ? (
        <p
          className={outcome.tone === 'error' ? 'pw-field-error' : 'pw-files-status'}
          role={outcome.tone === 'error' ? 'alert' : 'status'}
          data-testid="library-outcome"
        >
          {outcome.text}{' '}
          {outcome.replace !== undefined ? (
            <button type="button" onClick={() => save(true)}>
              Replace it
            </button>
          ) : null}
        </p>
      ) : null}
      {entries.length === 0 ? (
        <p className="pw-hint">No designs kept yet. They stay in this browser only.</p>
      ) : (
        <ul className="pw-lib-list" aria-label="Designs kept in this browser">
          {entries.map((e) => (
            <LibraryRow
              key={e.id}
              entry={e}
              onOpen={() => open(e.id)}
              onRename={(to) => rename(e.id, to)}
              onDelete={() => remove(e.id, e.name)}
            />
          ))}
        </ul>
      )}
    </section>
  );
}

/**
 * The local library: a few named designs kept in browser storage (save as, rename, delete, open). Pure
 * functions over a KeyValueStorage, so they run on an in-memory storage in tests. A damaged entry is
 * skipped with a warning; the others stay usable.
 */
import { fromDocument, toDocument, type SharedDesign } from './document.ts';
import { stringifyExact } from './exactJson.ts';
import { plainText } from './schema/common.ts';
import { MAX_NAME_CHARS } from '../core/model/limits.ts';
import { readDocument } from './schema/migrate.ts';
import { consoleWarn, type KeyValueStorage, type Warn } from './storage.ts';

export const LIBRARY_KEY = 'polewright.library';
/** Most designs the library keeps. */
export const LIBRARY_LIMIT = 100;

export interface LibraryEntry {
  id: string;
  name: string;
  /** When it was saved, ISO 8601. */
  savedAt: string;
  shared: SharedDesign;
}

export type LibraryResult<T> = { ok: true; value: T } | { ok: false; message: string };

const nameSchema = plainText(MAX_NAME_CHARS);

/** Every readable entry, newest first. */
export function listLibrary(storage: KeyValueStorage, warn: Warn = consoleWarn): LibraryEntry[] {
  let text: string | null = null;
  try {
    text = storage.getItem(LIBRARY_KEY);
  } catch {
    return [];
  }
  if (text === null) return [];
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    warn('the design library in browser storage is damaged (not JSON) and cannot be read.');
    return [];
  }
  const raw = (json as { entries?: unknown } | null)?.entries;
  if (!Array.isArray(raw)) {
    warn('the design library in browser storage is not one this version reads.');
    return [];
  }
  const out: LibraryEntry[] = [];
  for (const e of raw.slice(0, LIBRARY_LIMIT) as {
    id?: unknown;
    name?: unknown;
    savedAt?: unknown;
    design?: unknown;
  }[]) {
    const doc = readDocument(e?.design);
    const name = nameSchema.safeParse(e?.name);
    if (!doc.ok || !name.success || typeof e.id !== 'string' || typeof e.savedAt !== 'string') {
      warn(`a damaged library entry was skipped${doc.ok ? '' : `: ${doc.message}`}`);
      continue;
    }
    out.push({ id: e.id, name: name.data, savedAt: e.savedAt, shared: fromDocument(doc.document) });
  }
  return out.sort((a, b) => (a.savedAt < b.savedAt ? 1 : a.savedAt > b.savedAt ? -1 : 0));
}

function write(storage: KeyValueStorage, entries: LibraryEntry[]): LibraryResult<null> {
  const body = entries.map(
    (e) =>
      `{"id":${JSON.stringify(e.id)},"name":${JSON.stringify(e.name)},"savedAt":${JSON.stringify(e.savedAt)},"design":${stringifyExact(toDocument(e.shared))}}`,
  );
  try {
    storage.setItem(LIBRARY_KEY, `{"polewright":"library","version":1,"entries":[${body.join(',')}]}`);
    return { ok: true, value: null };
  } catch {
    return {
      ok: false,
      message:
        'The library could not be written: browser storage is full or unavailable. Delete a design and try again.',
    };
  }
}

function checkName(name: string): LibraryResult<string> {
  const t = name.trim();
  if (!t) return { ok: false, message: 'Give the design a name.' };
  const r = nameSchema.safeParse(t);
  return r.success
    ? { ok: true, value: t }
    : { ok: false, message: `The name ${r.error.issues[0]?.message ?? 'is not accepted'}.` };
}

/** Saves a design under a name (the design takes that name); an existing entry of that name is replaced only with `replace`. */
export function saveAs(
  storage: KeyValueStorage,
  name: string,
  shared: SharedDesign,
  options: { replace?: boolean; now?: Date; warn?: Warn } = {},
): LibraryResult<LibraryEntry> {
  const n = checkName(name);
  if (!n.ok) return n;
  const entries = listLibrary(storage, options.warn);
  const same = entries.find((e) => e.name === n.value);
  if (same && !options.replace)
    return { ok: false, message: `A design named “${n.value}” is already in the library.` };
  if (!same && entries.length >= LIBRARY_LIMIT) {
    return { ok: false, message: `The library holds at most ${LIBRARY_LIMIT} designs; delete one first.` };
  }
  const now = options.now ?? new Date();
  let id = same?.id ?? `d${now.getTime().toString(36)}`;
  for (let k = 1; !same && entries.some((e) => e.id === id); k++) id = `d${now.getTime().toString(36)}-${k}`;
  const entry: LibraryEntry = {
    id,
    name: n.value,
    savedAt: now.toISOString(),
    shared: { design: { ...shared.design, name: n.value }, view: { ...shared.view } },
  };
  const w = write(storage, [entry, ...entries.filter((e) => e !== same)]);
  return w.ok ? { ok: true, value: entry } : w;
}

/** Renames an entry (and the design in it). */
export function renameEntry(
  storage: KeyValueStorage,
  id: string,
  name: string,
  warn?: Warn,
): LibraryResult<LibraryEntry> {
  const n = checkName(name);
  if (!n.ok) return n;
  const entries = listLibrary(storage, warn);
  const entry = entries.find((e) => e.id === id);
  if (!entry) return { ok: false, message: 'That design is no longer in the library.' };
  if (entries.some((e) => e.id !== id && e.name === n.value)) {
    return { ok: false, message: `A design named “${n.value}” is already in the library.` };
  }
  const renamed = {
    ...entry,
    name: n.value,
    shared: { ...entry.shared, design: { ...entry.shared.design, name: n.value } },
  };
  const w = write(
    storage,
    entries.map((e) => (e.id === id ? renamed : e)),
  );
  return w.ok ? { ok: true, value: renamed } : w;
}

/** Deletes an entry. */
export function deleteEntry(storage: KeyValueStorage, id: string, warn?: Warn): LibraryResult<null> {
  const entries = listLibrary(storage, warn);
  if (!entries.some((e) => e.id === id))
    return { ok: false, message: 'That design is no longer in the library.' };
  return write(
    storage,
    entries.filter((e) => e.id !== id),
  );
}

/** The design of an entry, to open. */
export function openEntry(storage: KeyValueStorage, id: string, warn?: Warn): LibraryResult<SharedDesign> {
  const entry = listLibrary(storage, warn).find((e) => e.id === id);
  return entry
    ? { ok: true, value: entry.shared }
    : { ok: false, message: 'That design is no longer in the library.' };
}

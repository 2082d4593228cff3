/** The local library as React state: read from browser storage, re-read after each change and when another tab writes it. */
import { useCallback, useEffect, useMemo, useState } from 'react';
import { LIBRARY_KEY, listLibrary, type LibraryEntry } from '../../../share/library.ts';
import { browserStorage, type KeyValueStorage } from '../../../share/storage.ts';

export interface LibraryState {
  /** Null when the browser gives no storage (blocked, private mode). */
  storage: KeyValueStorage | null;
  entries: LibraryEntry[];
  refresh(): void;
}

export function useLibrary(): LibraryState {
  const storage = useMemo(() => browserStorage(), []);
  const read = useCallback(() => (storage ? listLibrary(storage) : []), [storage]);
  const [entries, setEntries] = useState<LibraryEntry[]>(read);
  const refresh = useCallback(() => setEntries(read()), [read]);
  useEffect(() => {
    const onStorage = (e: StorageEvent) => {
      if (e.key === LIBRARY_KEY || e.key === null) refresh();
    };
    window.addEventListener('storage', onStorage);
    return () => window.removeEventListener('storage', onStorage);
  }, [refresh]);
  return { storage, entries, refresh };
}

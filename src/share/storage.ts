/** The little of Web Storage the share layer needs, so autosave and the library run on any key-value store. */

export interface KeyValueStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

/** An in-memory storage; `quotaChars` makes setItem throw as a full localStorage does. */
export function memoryStorage(quotaChars = Infinity): KeyValueStorage & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return {
    data,
    getItem: (k) => data.get(k) ?? null,
    setItem: (k, v) => {
      const used = [...data].reduce((n, [key, val]) => n + (key === k ? 0 : key.length + val.length), 0);
      if (used + k.length + v.length > quotaChars)
        throw new DOMException('quota exceeded', 'QuotaExceededError');
      data.set(k, v);
    },
    removeItem: (k) => void data.delete(k),
  };
}

/** The page's localStorage, or null where it is unavailable (private modes, blocked storage, Node). */
export function browserStorage(): KeyValueStorage | null {
  try {
    const s = globalThis.localStorage;
    return s ?? null;
  } catch {
    return null;
  }
}

/** Reports a problem with stored data without breaking anything. */
export type Warn = (message: string) => void;
export const consoleWarn: Warn = (m) => console.warn(`Polewright: ${m}`);

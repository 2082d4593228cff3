/** The little of Web Storage the share layer needs, so autosave and the library run on any key-value store. */

export interface KeyValueStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
  /** Every key held. */
  keys(): string[];
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
    keys: () => [...data.keys()],
  };
}

/** The page's localStorage, or null where it is unavailable (private modes, blocked storage, Node). */
export function browserStorage(): KeyValueStorage | null {
  let s: Storage | undefined;
  try {
    s = globalThis.localStorage;
  } catch {
    return null;
  }
  if (!s) return null;
  const ls = s;
  return {
    getItem: (k) => ls.getItem(k),
    setItem: (k, v) => ls.setItem(k, v),
    removeItem: (k) => ls.removeItem(k),
    keys: () => {
      const out: string[] = [];
      for (let i = 0; i < ls.length; i++) {
        const k = ls.key(i);
        if (k !== null) out.push(k);
      }
      return out;
    },
  };
}

/** Reports a problem with stored data without breaking anything. */
export type Warn = (message: string) => void;
export const consoleWarn: Warn = (m) => console.warn(`Polewright: ${m}`);

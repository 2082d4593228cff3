/**
 * Autosave: each browser tab keeps its own session — the current design, its undo history and the shared
 * view settings — in localStorage under its own key, so a reload or a crashed tab loses nothing and two tabs
 * never overwrite each other. A session names the tab that wrote it and its lineage: the chain of sessions
 * one design went through (a new tab continues the newest session, a copy with the same lineage), which is
 * how a tab knows another one changed "the same design". Writes are throttled and bounded in size (the
 * oldest undo steps go first; the design itself is always attempted); every write says whether it worked.
 */
import type { Design } from '../core/model/design.ts';
import { HISTORY_LIMIT } from '../core/model/limits.ts';
import { describeProblem, designProblem } from '../core/model/check.ts';
import { fromDocument } from './document.ts';
import { designJson } from './documentCache.ts';
import { stringifyExact } from './exactJson.ts';
import { readDocumentNow, readViewNow } from './schema/reader.ts';
import type { SharedView } from '../core/model/view.ts';
import { consoleWarn, type KeyValueStorage, type Warn } from './storage.ts';

/** Each tab's session is kept under this prefix followed by the tab's id. */
export const SESSION_KEY_PREFIX = 'polewright.session.';
/** The one shared session of versions before tabs kept their own (read once, then removed). */
export const LEGACY_SESSION_KEY = 'polewright.session';
/** Sessions of other tabs kept besides this tab's own; older ones are removed when a tab writes. */
export const MAX_OTHER_SESSIONS = 7;
/** Most characters the undo history may add to a saved session (the design itself is always attempted). */
export const AUTOSAVE_BUDGET_CHARS = 1_500_000;
/** Least time between two writes, ms. */
export const AUTOSAVE_INTERVAL_MS = 300;

export interface Session {
  design: Design;
  /** Undo steps, oldest first. */
  past: Design[];
  /** Redo steps, next first. */
  future: Design[];
  view: SharedView;
}

/** Who wrote a session and when. */
export interface SessionHead {
  /** The id of the tab that wrote it. */
  tab: string;
  /** The id shared by every session that continues the same design (see the top of this file). */
  lineage: string;
  /** When it was written, ms since 1970. */
  savedAt: number;
}

export type StoredSession = Session & SessionHead;

export interface SerialisedSession {
  text: string;
  /** Undo and redo steps left out to stay within the budget. */
  droppedPast: number;
  droppedFuture: number;
}

/** The storage key of a tab's session. */
export const sessionKey = (tab: string) => SESSION_KEY_PREFIX + tab;

const headText = (h: SessionHead) =>
  `{"polewright":"session","version":2,"tab":${JSON.stringify(h.tab)},"lineage":${JSON.stringify(h.lineage)},"savedAt":${h.savedAt}`;

/**
 * Session text with the undo history cut to `budget` characters (the oldest undo steps first, then the
 * farthest redo steps). The design is always written, even when it alone takes more than the budget.
 */
export function serialiseSession(s: StoredSession, budget = AUTOSAVE_BUDGET_CHARS): SerialisedSession {
  const head = `${headText(s)},"view":${stringifyExact(s.view)},"design":${designJson(s.design)}`;
  const past = s.past.map(designJson);
  const future = s.future.map(designJson);
  // Each entry costs its text plus a comma; the tail adds the two list names and brackets.
  let size = head.length + ',"past":[],"future":[]}'.length;
  for (const t of past) size += t.length + 1;
  for (const t of future) size += t.length + 1;
  let p = 0;
  let f = future.length;
  while (size > budget && p < past.length) size -= past[p++]!.length + 1;
  while (size > budget && f > 0) size -= future[--f]!.length + 1;
  const text = `${head},"past":[${past.slice(p).join(',')}],"future":[${future.slice(0, f).join(',')}]}`;
  return { text, droppedPast: p, droppedFuture: future.length - f };
}

/** Why a session was not written. */
export type SaveFailure =
  /** The storage refused the write even with no history (quota). */
  | 'full'
  /** The storage cannot be used at all (blocked, private mode, removed). */
  | 'unavailable'
  /** The design breaks a bound every design keeps, so it would not read back. */
  | 'refused';

export type SaveOutcome =
  | { ok: true; droppedPast: number; droppedFuture: number }
  | { ok: false; reason: SaveFailure; message: string };

function isQuotaError(e: unknown): boolean {
  const name = (e as { name?: unknown } | null)?.name;
  const code = (e as { code?: unknown } | null)?.code;
  return name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED' || code === 22;
}

/** Sessions of other tabs older than this (ms) give way when the storage is full. */
export const STALE_SESSION_MS = 60 * 60 * 1000;

/**
 * Writes the session under its tab's key. On a full storage it retries with half the history budget, then a
 * quarter, then the design alone, then after removing the sessions of tabs silent for STALE_SESSION_MS one by
 * one (oldest first); the outcome says what happened.
 */
export function saveSession(
  storage: KeyValueStorage,
  s: StoredSession,
  budget = AUTOSAVE_BUDGET_CHARS,
): SaveOutcome {
  const problem = designProblem(s.design);
  if (problem)
    return {
      ok: false,
      reason: 'refused',
      message: `the design would not reopen (${describeProblem(problem)})`,
    };
  const attempt = (): SaveOutcome | 'full' => {
    for (const b of [budget, budget / 2, budget / 4, 0]) {
      const out = serialiseSession(s, b);
      try {
        storage.setItem(sessionKey(s.tab), out.text);
        return { ok: true, droppedPast: out.droppedPast, droppedFuture: out.droppedFuture };
      } catch (e) {
        if (!isQuotaError(e))
          return {
            ok: false,
            reason: 'unavailable',
            message: `browser storage refused the write (${(e as Error).message || String(e)})`,
          };
      }
    }
    return 'full';
  };
  let outcome = attempt();
  // Still full: the sessions of tabs not heard from for an hour give way, oldest first (a tab still open
  // writes its own again when it changes or is hidden).
  const stale = listSessions(storage)
    .filter((h) => h.tab !== s.tab && h.savedAt < s.savedAt - STALE_SESSION_MS)
    .reverse();
  while (outcome === 'full' && stale.length > 0) {
    try {
      storage.removeItem(stale.shift()!.key);
    } catch {
      break;
    }
    outcome = attempt();
  }
  return outcome === 'full' ? { ok: false, reason: 'full', message: 'browser storage is full' } : outcome;
}

const HEAD =
  /^\{"polewright":"session","version":2,"tab":("(?:[^"\\]|\\.)*"),"lineage":("(?:[^"\\]|\\.)*"),"savedAt":(\d+)/;

/** Who wrote a stored session and when, read from its first characters; null when it is not one. */
export function readSessionHead(text: string | null): SessionHead | null {
  const m = text === null ? null : HEAD.exec(text.slice(0, 400));
  if (!m) return null;
  try {
    return { tab: JSON.parse(m[1]!) as string, lineage: JSON.parse(m[2]!) as string, savedAt: Number(m[3]) };
  } catch {
    return null;
  }
}

function keysOf(storage: KeyValueStorage): string[] {
  try {
    return storage.keys();
  } catch {
    return [];
  }
}

function textOf(storage: KeyValueStorage, key: string): string | null {
  try {
    return storage.getItem(key);
  } catch {
    return null;
  }
}

/** Every tab session in storage with who wrote it, newest first. */
export function listSessions(storage: KeyValueStorage): (SessionHead & { key: string })[] {
  const out: (SessionHead & { key: string })[] = [];
  for (const key of keysOf(storage)) {
    if (!key.startsWith(SESSION_KEY_PREFIX)) continue;
    const head = readSessionHead(textOf(storage, key));
    if (head) out.push({ ...head, key });
  }
  return out.sort((a, b) => b.savedAt - a.savedAt);
}

/**
 * Removes the oldest sessions of other tabs beyond MAX_OTHER_SESSIONS, and the shared session of older
 * versions (a tab calls this once it has written its own session).
 */
export function pruneSessions(storage: KeyValueStorage, own: string): void {
  try {
    const others = listSessions(storage).filter((h) => h.tab !== own);
    for (const h of others.slice(MAX_OTHER_SESSIONS)) storage.removeItem(h.key);
    if (storage.getItem(LEGACY_SESSION_KEY) !== null) storage.removeItem(LEGACY_SESSION_KEY);
  } catch {
    // Pruning is housekeeping; a storage that refuses it keeps working.
  }
}

/** Reads one stored design; null (with a warning) when it is damaged. */
function readEntry(json: unknown, where: string, warn: Warn): Design | null {
  const r = readDocumentNow(json);
  if (r.ok) return fromDocument(r.document).design;
  warn(`autosaved ${where} ignored: ${r.message}`);
  return null;
}

/**
 * A session from its stored text (version 1, the shared session of older versions, or 2), or null. In the
 * page it throws FullReaderPending when a part needs the full reader before it has loaded (schema/reader.ts).
 */
export function parseSession(
  text: string,
  warn: Warn = consoleWarn,
): (Session & Partial<SessionHead>) | null {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    warn('the autosaved session is damaged (not JSON) and was ignored.');
    return null;
  }
  const env = json as {
    polewright?: unknown;
    version?: unknown;
    tab?: unknown;
    lineage?: unknown;
    savedAt?: unknown;
    design?: unknown;
    past?: unknown;
    future?: unknown;
    view?: unknown;
  } | null;
  if (
    typeof env !== 'object' ||
    env === null ||
    env.polewright !== 'session' ||
    (env.version !== 1 && env.version !== 2)
  ) {
    warn('the autosaved session is not one this version reads and was ignored.');
    return null;
  }
  const design = readEntry(env.design, 'design', warn);
  if (!design) return null;
  // A damaged step breaks the chain: keep only the steps between it and the current design.
  const past: Design[] = [];
  const rawPast = Array.isArray(env.past) ? env.past.slice(-HISTORY_LIMIT) : [];
  for (let i = rawPast.length - 1; i >= 0; i--) {
    const d = readEntry(rawPast[i], 'undo step', warn);
    if (!d) break;
    past.unshift(d);
  }
  const future: Design[] = [];
  for (const raw of Array.isArray(env.future) ? env.future.slice(0, HISTORY_LIMIT) : []) {
    const d = readEntry(raw, 'redo step', warn);
    if (!d) break;
    future.push(d);
  }
  const v = readViewNow(env.view ?? {});
  if (!v) warn('the autosaved view settings were damaged and were ignored.');
  return {
    design,
    past,
    future,
    view: v ?? {},
    ...(typeof env.tab === 'string' ? { tab: env.tab } : {}),
    ...(typeof env.lineage === 'string' ? { lineage: env.lineage } : {}),
    ...(typeof env.savedAt === 'number' ? { savedAt: env.savedAt } : {}),
  };
}

/** The session stored under a key, or null when there is none or it is damaged (a warning says why). */
export function loadSession(
  storage: KeyValueStorage,
  key: string,
  warn: Warn = consoleWarn,
): (Session & Partial<SessionHead>) | null {
  const text = textOf(storage, key);
  return text === null ? null : parseSession(text, warn);
}

/** What a tab restores when it starts, and from where. */
export interface Restored {
  session: Session;
  /** The lineage to continue (absent for a session of an older version: a new one starts). */
  lineage: string | null;
  /** 'own': this tab's session (a reload); 'newest': a copy of the newest session of any tab (a new tab). */
  from: 'own' | 'newest';
}

/**
 * The session a tab starts with: its own (after a reload), else a copy of the newest readable session of
 * any tab (a new tab continues the latest work), else the shared session of older versions; null if none.
 */
export function restoreSession(
  storage: KeyValueStorage,
  tab: string | null,
  warn: Warn = consoleWarn,
): Restored | null {
  if (tab !== null) {
    const own = loadSession(storage, sessionKey(tab), warn);
    if (own) return { session: own, lineage: own.lineage ?? null, from: 'own' };
  }
  for (const h of listSessions(storage)) {
    if (h.tab === tab) continue;
    const s = loadSession(storage, h.key, warn);
    if (s) return { session: s, lineage: h.lineage, from: 'newest' };
  }
  const legacy = loadSession(storage, LEGACY_SESSION_KEY, warn);
  return legacy ? { session: legacy, lineage: null, from: 'newest' } : null;
}

export interface Timers {
  set(fn: () => void, ms: number): unknown;
  clear(handle: unknown): void;
  now(): number;
}

const realTimers: Timers = {
  set: (fn, ms) => setTimeout(fn, ms),
  clear: (h) => clearTimeout(h as ReturnType<typeof setTimeout>),
  now: () => Date.now(),
};

export interface Autosaver {
  /** Asks for a write; it happens at most once per interval, with the latest state. */
  schedule(): void;
  /** Writes now if a write is pending (on pagehide). */
  flush(): void;
  dispose(): void;
}

/** A throttled writer of the session returned by `snapshot`; `done` hears the outcome of every write. */
export function createAutosaver(
  storage: KeyValueStorage,
  snapshot: () => StoredSession,
  options: {
    intervalMs?: number;
    timers?: Timers;
    budget?: number;
    done?: (outcome: SaveOutcome) => void;
  } = {},
): Autosaver {
  const interval = options.intervalMs ?? AUTOSAVE_INTERVAL_MS;
  const timers = options.timers ?? realTimers;
  let last = -Infinity;
  let handle: unknown = null;
  const write = () => {
    if (handle !== null) timers.clear(handle);
    handle = null;
    last = timers.now();
    const outcome = saveSession(storage, snapshot(), options.budget);
    options.done?.(outcome);
  };
  return {
    schedule() {
      if (handle !== null) return;
      handle = timers.set(write, Math.max(0, last + interval - timers.now()));
    },
    flush() {
      if (handle !== null) write();
    },
    dispose() {
      if (handle !== null) timers.clear(handle);
      handle = null;
    },
  };
}

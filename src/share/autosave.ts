/**
 * Autosave: the current design, its undo history and the shared view settings, kept in localStorage so a
 * reload or a crashed tab loses nothing. Writes are throttled and bounded in size (the oldest undo steps go
 * first); a damaged entry is skipped with a warning and never stops the page.
 */
import type { Design } from '../core/model/design.ts';
import { HISTORY_LIMIT } from '../core/model/limits.ts';
import { fromDocument } from './document.ts';
import { designJson } from './documentCache.ts';
import { stringifyExact } from './exactJson.ts';
import { readDocument } from './schema/migrate.ts';
import type { SharedView } from '../core/model/view.ts';
import { sharedView } from './schema/view.ts';
import { consoleWarn, type KeyValueStorage, type Warn } from './storage.ts';

export const AUTOSAVE_KEY = 'polewright.session';
/** Most characters the saved session may take (localStorage holds about 5 M characters per site). */
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

export interface SerialisedSession {
  text: string;
  /** Undo and redo steps left out to stay within the budget. */
  droppedPast: number;
  droppedFuture: number;
}

/** Session text within `budget` characters, dropping the oldest undo steps then the farthest redo steps; null if the design alone does not fit. */
export function serialiseSession(s: Session, budget = AUTOSAVE_BUDGET_CHARS): SerialisedSession | null {
  const head = `{"polewright":"session","version":1,"view":${stringifyExact(s.view)},"design":${designJson(s.design)}`;
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
  if (size > budget) return null;
  const text = `${head},"past":[${past.slice(p).join(',')}],"future":[${future.slice(0, f).join(',')}]}`;
  return { text, droppedPast: p, droppedFuture: future.length - f };
}

/** Writes the session; on a full storage retries with half the budget, then gives up with a warning. */
export function saveSession(
  storage: KeyValueStorage,
  s: Session,
  budget = AUTOSAVE_BUDGET_CHARS,
  warn: Warn = consoleWarn,
): boolean {
  for (let b = budget; b >= budget / 4; b /= 2) {
    const out = serialiseSession(s, b);
    if (!out) break;
    try {
      storage.setItem(AUTOSAVE_KEY, out.text);
      return true;
    } catch {
      // Storage full: try again with less history.
    }
  }
  warn('the design could not be autosaved (browser storage is full or unavailable).');
  return false;
}

/** Reads one stored design; null (with a warning) when it is damaged. */
function readEntry(json: unknown, where: string, warn: Warn): Design | null {
  const r = readDocument(json);
  if (r.ok) return fromDocument(r.document).design;
  warn(`autosaved ${where} ignored: ${r.message}`);
  return null;
}

/** The saved session, or null when there is none or it is damaged (a warning says why). */
export function loadSession(storage: KeyValueStorage, warn: Warn = consoleWarn): Session | null {
  let text: string | null;
  try {
    text = storage.getItem(AUTOSAVE_KEY);
  } catch {
    return null;
  }
  if (text === null) return null;
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
    design?: unknown;
    past?: unknown;
    future?: unknown;
    view?: unknown;
  } | null;
  if (typeof env !== 'object' || env === null || env.polewright !== 'session' || env.version !== 1) {
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
  const v = sharedView.safeParse(env.view ?? {});
  if (!v.success) warn('the autosaved view settings were damaged and were ignored.');
  return { design, past, future, view: v.success ? v.data : {} };
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

/** A throttled writer of the session returned by `snapshot`. */
export function createAutosaver(
  storage: KeyValueStorage,
  snapshot: () => Session,
  options: { intervalMs?: number; timers?: Timers; budget?: number; warn?: Warn } = {},
): Autosaver {
  const interval = options.intervalMs ?? AUTOSAVE_INTERVAL_MS;
  const timers = options.timers ?? realTimers;
  let last = -Infinity;
  let handle: unknown = null;
  const write = () => {
    if (handle !== null) timers.clear(handle);
    handle = null;
    last = timers.now();
    saveSession(storage, snapshot(), options.budget, options.warn);
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

/**
 * Wires the share layer into the page's store: restore the autosaved session, open a design link from the
 * URL fragment (one undo step on top, so the previous design stays reachable), open later links on
 * `hashchange`, and autosave every change (throttled, flushed on pagehide). Problems become notices.
 */
import { createAutosaver, loadSession, type Session, type Timers } from '../share/autosave.ts';
import { designJson } from '../share/documentCache.ts';
import { decodeLink } from '../share/link/index.ts';
import { postNotice } from './notices.ts';
import { pickSharedView } from '../core/model/view.ts';
import { browserStorage, consoleWarn, type KeyValueStorage, type Warn } from '../share/storage.ts';
import type { WorkbenchStore } from './store.ts';
import { defaultView } from './view.ts';

/** What persistence needs from the browser; tests pass a fake. */
export interface PersistEnv {
  storage: KeyValueStorage | null;
  /** The URL fragment including '#', or ''. */
  hash(): string;
  /** Removes the fragment without reloading or adding a browser-history entry. */
  clearHash(): void;
  listen(event: 'hashchange' | 'pagehide' | 'hidden', fn: () => void): () => void;
  timers?: Timers;
  warn?: Warn;
}

/** The page's environment: localStorage, location and window events. */
export function browserEnv(): PersistEnv {
  return {
    storage: browserStorage(),
    hash: () => window.location.hash,
    clearHash: () =>
      window.history.replaceState(
        window.history.state,
        '',
        window.location.pathname + window.location.search,
      ),
    listen: (event, fn) => {
      if (event === 'hidden') {
        const onVis = () => {
          if (document.visibilityState === 'hidden') fn();
        };
        document.addEventListener('visibilitychange', onVis);
        return () => document.removeEventListener('visibilitychange', onVis);
      }
      window.addEventListener(event, fn);
      return () => window.removeEventListener(event, fn);
    },
    warn: consoleWarn,
  };
}

/** Opens the design link in the fragment, if there is one; returns whether a design was opened. */
export function openLinkFromHash(store: WorkbenchStore, env: PersistEnv): boolean {
  const hash = env.hash();
  if (!/^#pw/.test(hash)) return false;
  env.clearHash();
  const r = decodeLink(hash);
  if (!r.ok) {
    postNotice('error', `The design link could not be opened, so your design is unchanged. ${r.message}`);
    return false;
  }
  const state = store.getState();
  // Reopening the design already open would only add an undo step that changes nothing.
  if (designJson(r.value.design) !== designJson(state.design)) state.replaceDesign(r.value.design);
  state.setView({ ...pickSharedView(defaultView), ...r.value.view });
  postNotice(
    'info',
    `Opened “${r.value.design.name || 'untitled design'}” from the link. Undo brings back the design you had before.`,
  );
  return true;
}

/** The store's session as autosave writes it (a gesture in progress counts as finished). */
export function sessionOf(store: WorkbenchStore): Session {
  const { design, history, view } = store.getState();
  const past = history.gestureStart ? [...history.past, history.gestureStart] : history.past;
  return { design, past, future: history.future, view: pickSharedView(view) };
}

/** Restores the autosave, opens a link, and keeps saving; returns a function that undoes the wiring. */
export function installPersistence(store: WorkbenchStore, env: PersistEnv = browserEnv()): () => void {
  const warn = env.warn ?? consoleWarn;
  const { storage } = env;
  if (storage) {
    let session: Session | null = null;
    try {
      session = loadSession(storage, warn);
    } catch (e) {
      warn(`the autosaved session could not be restored: ${(e as Error).message}`);
    }
    if (session) {
      store.setState({
        design: session.design,
        history: { past: session.past, future: session.future, gestureStart: null },
        view: { ...store.getState().view, ...session.view },
        selection: null,
      });
    }
  }
  openLinkFromHash(store, env);
  const offs = [env.listen('hashchange', () => openLinkFromHash(store, env))];
  if (storage) {
    const saver = createAutosaver(storage, () => sessionOf(store), {
      ...(env.timers ? { timers: env.timers } : {}),
      warn,
    });
    // The first autosave after a reload or a link captures the opened design at once.
    saver.schedule();
    // A root drag changes the design on every pointer move; writing the session (design and undo history)
    // mid-drag would cost a frame every throttle interval, so the drag is saved on release, or when the page
    // goes away mid-drag.
    let heldByDrag = false;
    const flush = () => {
      if (heldByDrag) saver.schedule();
      heldByDrag = false;
      saver.flush();
    };
    offs.push(
      store.subscribe((s, prev) => {
        const changed = s.design !== prev.design || s.history !== prev.history || s.view !== prev.view;
        if (s.dragging && !prev.dragging) {
          // A write already pending (e.g. the gesture's start) waits for the release too.
          saver.dispose();
          heldByDrag = true;
        } else if (s.dragging) heldByDrag ||= changed;
        else if (changed || heldByDrag) {
          heldByDrag = false;
          saver.schedule();
        }
      }),
      env.listen('pagehide', flush),
      env.listen('hidden', flush),
      () => saver.dispose(),
    );
  }
  return () => offs.forEach((off) => off());
}

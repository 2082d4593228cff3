/**
 * Wires the share layer into the page's store: restore this tab's autosaved session (or continue the newest
 * one in a new tab), open a design link from the URL fragment (one undo step on top, so the previous design
 * stays reachable), open later links on `hashchange` (a pasted link, or Back/Forward through the address
 * bar's entries), and autosave every change (throttled, flushed on
 * pagehide). Work that is not saved is never silent: a lasting notice says why, with the design one click
 * away as a file, and a tab says when another tab changed the same design, offering to keep its own copy.
 */
import {
  createAutosaver,
  parseSession,
  pruneSessions,
  readSessionHead,
  restoreSession,
  sessionKey,
  SESSION_KEY_PREFIX,
  type SaveOutcome,
  type StoredSession,
  type Timers,
} from '../share/autosave.ts';
import type { SharedDesign } from '../share/document.ts';
import { sameDesign } from '../core/model/design.ts';
import { FullReaderPending, loadFullReader, readWhenReady } from '../share/schema/reader.ts';
import { commitDrafts } from './drafts.ts';
import { dismissKey, hasNotice, postNotice, type NoticeAction } from './notices.ts';
import { pickSharedView } from '../core/model/view.ts';
import { browserStorage, consoleWarn, type KeyValueStorage, type Warn } from '../share/storage.ts';
import type { WorkbenchStore } from './store.ts';
import { defaultView } from './view.ts';
import { framed } from './planeFit.ts';

/** What persistence needs from the browser; tests pass a fake. */
export interface PersistEnv {
  storage: KeyValueStorage | null;
  /** The URL fragment including '#', or ''. */
  hash(): string;
  /** Whether the current history entry is one the address bar wrote (a 'hashchange' then is Back/Forward). */
  isHistoryStep?(): boolean;
  /** Whether the page was loaded by a reload (not by following a link, a bookmark or a typed address). */
  isReload?(): boolean;
  listen(event: 'hashchange' | 'pagehide' | 'hidden', fn: () => void): () => void;
  /** This tab's id as kept across its reloads (sessionStorage), or null in a new tab. */
  tabId?(): string | null;
  setTabId?(id: string): void;
  /** Another tab changed a storage key (the 'storage' event). */
  onStorage?(fn: (key: string | null) => void): () => void;
  /** Resolves false when another open tab holds this id (a duplicated tab copies its original's id). */
  claimTab?(id: string): Promise<boolean>;
  /** A fresh random id. */
  newId?(): string;
  /** Downloads the design as a design file (the page's own Save file). */
  downloadDesign?(shared: SharedDesign): void;
  timers?: Timers;
  warn?: Warn;
}

/** Notice keys of the lasting states persistence reports. */
export const UNSAVED_NOTICE = 'autosave';
export const otherTabNotice = (tab: string) => `other-tab:${tab}`;

function randomId(): string {
  const c = globalThis.crypto;
  if (c && typeof c.randomUUID === 'function') return c.randomUUID();
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`;
}

function sessionStorageOrNull(): Storage | null {
  try {
    return globalThis.sessionStorage ?? null;
  } catch {
    return null;
  }
}

const TAB_KEY = 'polewright.tab';

/** The page's environment: localStorage, sessionStorage, location, window events and Web Locks. */
export function browserEnv(): PersistEnv {
  const session = sessionStorageOrNull();
  return {
    storage: browserStorage(),
    hash: () => window.location.hash,
    isReload: () =>
      (performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming | undefined)?.type ===
      'reload',
    isHistoryStep: () =>
      (window.history.state as { polewright?: unknown } | null)?.polewright === ADDRESS_STATE.polewright,
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
    tabId: () => {
      try {
        return session?.getItem(TAB_KEY) ?? null;
      } catch {
        return null;
      }
    },
    setTabId: (id) => {
      try {
        session?.setItem(TAB_KEY, id);
      } catch {
        // Without sessionStorage a reload starts a new tab session (it continues the newest one).
      }
    },
    onStorage: (fn) => {
      const on = (e: StorageEvent) => fn(e.key);
      window.addEventListener('storage', on);
      return () => window.removeEventListener('storage', on);
    },
    claimTab: (id) => {
      const locks = (navigator as Navigator & { locks?: LockManager }).locks;
      if (!locks) return Promise.resolve(true);
      return new Promise<boolean>((resolve) => {
        // The lock is held (the callback never settles) until the page goes away.
        void locks.request(`polewright.tab.${id}`, { ifAvailable: true }, (lock) => {
          resolve(lock !== null);
          return lock === null ? undefined : new Promise<void>(() => {});
        });
      });
    },
    newId: randomId,
    warn: consoleWarn,
  };
}

/** The history-entry state that marks an entry the address bar wrote (src/store/addressBar.ts). */
export const ADDRESS_STATE = { polewright: 'design' } as const;

export type LinkReader = typeof import('../share/link/index.ts');
let linkReader: LinkReader | null = null;
let linkLoading: Promise<LinkReader> | null = null;

/**
 * The link codec is needed only when a page opens with a link or gets one later, so it is not in the first
 * view: it loads then (the first view waits for it) and is prefetched after the first paint (prefetch.ts).
 */
export function loadLinkReader(): Promise<LinkReader> {
  if (linkReader) return Promise.resolve(linkReader);
  return (linkLoading ??= import('../share/link/index.ts').then(
    (m) => (linkReader = m),
    (e: unknown) => {
      linkLoading = null;
      throw e;
    },
  ));
}

/**
 * Opens the design link in the fragment, if there is one; returns whether a design was opened, or a promise
 * of it when the link codec or the full design reader has not loaded yet. The fragment stays (the address
 * bar holds the open design, src/store/addressBar.ts); a link to the design and view already open, as after
 * a reload, changes nothing and says nothing.
 */
export function openLinkFromHash(store: WorkbenchStore, env: PersistEnv): boolean | Promise<boolean> {
  const hash = env.hash();
  if (!/^#pw/.test(hash)) return false;
  const historyStep = env.isHistoryStep?.() ?? false;
  const notLoaded = (err: unknown) => {
    postNotice(
      'error',
      `The design link could not be opened, so your design is unchanged: part of the page did not load (${(err as Error).message}). Reload the page with the link to try again.`,
    );
    return false;
  };
  if (linkReader) {
    try {
      return openLink(store, hash, linkReader, historyStep);
    } catch (e) {
      if (!(e instanceof FullReaderPending)) throw e;
    }
  }
  return loadLinkReader()
    .then((reader) => readWhenReady(() => openLink(store, hash, reader, historyStep)))
    .catch(notLoaded);
}

function openLink(
  store: WorkbenchStore,
  hash: string,
  { decodeLink }: LinkReader,
  historyStep: boolean,
): boolean {
  const r = decodeLink(hash);
  if (!r.ok) {
    postNotice('error', `The design link could not be opened, so your design is unchanged. ${r.message}`);
    return false;
  }
  const state = store.getState();
  const view = { ...pickSharedView(defaultView), ...r.value.view };
  const sameView = Object.entries(view).every(([k, v]) => Object.is(state.view[k as keyof typeof view], v));
  // Reopening the design already open would only add an undo step that changes nothing.
  if (sameDesign(r.value.design, state.design)) {
    if (!sameView) state.setView(view);
    return false;
  }
  // The view first: the address bar then finds the design it already shows and adds no entry.
  state.setView(view);
  state.replaceDesign(r.value.design);
  const notes = r.notes?.length ? ` ${r.notes.join(' ')}` : '';
  const name = r.value.design.name || 'untitled design';
  const text = historyStep
    ? `Back/Forward: “${name}”. Undo brings back the design you had before.`
    : `Opened “${name}” from the link. Undo brings back the design you had before.`;
  // A note (an old link without a check value) stays until read; a plain confirmation fades.
  postNotice('info', `${text}${notes}`, notes ? { persistent: true } : {});
  return true;
}

/** The store's session as autosave writes it (a gesture in progress counts as finished). */
export function sessionOf(store: WorkbenchStore) {
  const { design, history, view } = store.getState();
  const past = history.gestureStart ? [...history.past, history.gestureStart] : history.past;
  return { design, past, future: history.future, view: pickSharedView(view) };
}

/** The words of a lasting "not saved" notice. */
export function unsavedText(outcome: Extract<SaveOutcome, { ok: false }> | 'no-storage'): string {
  const tail = 'A reload or a closed tab would lose it: download the design to keep it.';
  if (outcome === 'no-storage')
    return `Your work is not being saved: this browser does not let the workbench use its storage (blocked, or a private mode). ${tail}`;
  if (outcome.reason === 'full')
    return `Your latest changes are not saved: ${outcome.message}. ${tail} Deleting designs from the library frees space.`;
  return `Your latest changes are not saved: ${outcome.message}. ${tail}`;
}

/** What installPersistence returns: undoes the wiring; `restored` settles once the autosave is restored. */
export type Persistence = (() => void) & { restored: Promise<void> };

/**
 * Restores the autosave, opens a link, and keeps saving. The session is restored at once when the quick
 * design reader can read it (what this workbench wrote); otherwise (an older version's session, a damaged
 * one) the restore waits for the full reader, and nothing is autosaved before it is done, so the demo never
 * overwrites the session waiting to be read. `restored` tells the page when to draw its first view.
 */
export function installPersistence(store: WorkbenchStore, env: PersistEnv = browserEnv()): Persistence {
  const warn = env.warn ?? consoleWarn;
  const newId = env.newId ?? randomId;
  const { storage } = env;
  const offs: (() => void)[] = [];
  const download: NoticeAction[] = env.downloadDesign
    ? [
        {
          label: 'Download the design',
          keep: true,
          run: () => {
            const { design, view } = store.getState();
            env.downloadDesign!({ design, view: pickSharedView(view) });
          },
        },
      ]
    : [];
  let tab = env.tabId?.() ?? null;
  let lineage: string | null = null;
  let disposed = false;
  /** Settles once a link in the fragment at start has been opened (or refused). */
  let opening: Promise<unknown> = Promise.resolve();
  /** Whether this tab's own session was restored (a reload then keeps it over the fragment). */
  let restoredSession = false;
  /** Restores the session; false when that needs the full reader, which has not loaded yet. */
  const restore = (): boolean => {
    try {
      const restored = restoreSession(storage!, tab, warn);
      if (restored) {
        const { session } = restored;
        lineage = restored.lineage;
        restoredSession = true;
        store.setState({
          design: session.design,
          history: { past: session.past, future: session.future, gestureStart: null },
          view: framed({ ...store.getState().view, ...session.view }, session.design),
          selection: null,
        });
      }
    } catch (e) {
      if (e instanceof FullReaderPending) return false;
      warn(`the autosaved session could not be restored: ${(e as Error).message}`);
    }
    return true;
  };
  const dispose = () => {
    disposed = true;
    offs.forEach((off) => off());
    for (const k of [UNSAVED_NOTICE]) if (hasNotice(k)) dismissKey(k);
  };
  if (!storage) {
    postNotice('error', unsavedText('no-storage'), {
      key: UNSAVED_NOTICE,
      persistent: true,
      actions: download,
    });
  } else if (!restore()) {
    const restored = loadFullReader().then(
      () => {
        if (disposed) return;
        restore();
        wire();
        return opening.then(() => undefined);
      },
      (e: unknown) => {
        if (disposed) return;
        // Without the reader the session cannot be read, and writing would replace it: save nothing.
        warn(`the autosaved session could not be restored: ${(e as Error).message}`);
        postNotice(
          'error',
          `Your autosaved design could not be restored: part of the page did not load (${(e as Error).message}). It is kept as it was, and nothing is saved until the page is reloaded: reload to get it back.`,
          { key: UNSAVED_NOTICE, persistent: true },
        );
      },
    );
    return Object.assign(dispose, { restored });
  }
  wire();
  return Object.assign(dispose, { restored: opening.then(() => undefined) });

  /** Opens a link in the fragment and keeps saving (after the restore). */
  function wire(): void {
    if (tab === null) {
      tab = newId();
      env.setTabId?.(tab);
    }
    lineage ??= newId();
    // A reload of this tab goes on with its own session (the address bar then shows it again): the fragment
    // can lag behind it, as when the page went away mid-drag. Following a link or a bookmark opens the link.
    if (!(restoredSession && env.isReload?.())) opening = Promise.resolve(openLinkFromHash(store, env));
    offs.push(env.listen('hashchange', () => openLinkFromHash(store, env)));
    if (!storage) return;

    let pruned = false;
    const done = (outcome: SaveOutcome) => {
      if (outcome.ok) {
        if (dismissKey(UNSAVED_NOTICE))
          postNotice('info', 'Autosave works again: your design is saved in this browser.');
        if (!pruned) pruneSessions(storage, tab!);
        pruned = true;
        return;
      }
      warn(`the design could not be autosaved: ${outcome.message}.`);
      postNotice('error', unsavedText(outcome), { key: UNSAVED_NOTICE, persistent: true, actions: download });
    };
    const snapshot = (): StoredSession => ({
      ...sessionOf(store),
      tab: tab!,
      lineage: lineage!,
      savedAt: (env.timers ?? { now: () => Date.now() }).now(),
    });
    const saver = createAutosaver(storage, snapshot, { ...(env.timers ? { timers: env.timers } : {}), done });
    // A duplicated tab starts with its original's id; it writes nothing until it knows the id is its own.
    let ready = env.claimTab === undefined;
    let wanted = true;
    const schedule = () => {
      wanted = true;
      if (ready) saver.schedule();
    };
    if (env.claimTab) {
      void env.claimTab(tab).then((mine) => {
        if (!mine) {
          tab = newId();
          env.setTabId?.(tab);
        }
        ready = true;
        if (wanted) saver.schedule();
      });
    }
    // The first autosave after a reload or a link captures the opened design at once.
    schedule();
    // A root drag changes the design on every pointer move; writing the session (design and undo history)
    // mid-drag would cost a frame every throttle interval, so the drag is saved on release, or when the page
    // goes away mid-drag.
    let heldByDrag = false;
    const flush = () => {
      // Text still being typed into the name or note goes into the design first, so this write keeps it.
      commitDrafts();
      if (heldByDrag) schedule();
      heldByDrag = false;
      if (ready) saver.flush();
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
          schedule();
        }
      }),
      env.listen('pagehide', flush),
      env.listen('hidden', flush),
      () => saver.dispose(),
    );
    if (env.onStorage) offs.push(env.onStorage((key) => otherTabChanged(key)));

    /** Another tab wrote its session: say so when it continues the same design and now holds another one. */
    function otherTabChanged(key: string | null): void {
      if (key === null || !key.startsWith(SESSION_KEY_PREFIX) || key === sessionKey(tab!)) return;
      let text: string | null;
      try {
        text = storage!.getItem(key);
      } catch {
        return;
      }
      const head = readSessionHead(text);
      if (!head || head.tab === tab) return;
      // The other tab went its own way (it kept its copy): what it did no longer concerns this tab.
      if (head.lineage !== lineage) {
        dismissKey(otherTabNotice(head.tab));
        return;
      }
      let other: ReturnType<typeof parseSession>;
      try {
        other = text === null ? null : parseSession(text, () => {});
      } catch (e) {
        // A session this tab's quick reader cannot read: look again once the full reader is here.
        if (e instanceof FullReaderPending)
          void loadFullReader().then(
            () => otherTabChanged(key),
            () => {},
          );
        return;
      }
      if (!other || sameDesign(other.design, store.getState().design)) return;
      const noticeKey = otherTabNotice(head.tab);
      const keepCopy = () => {
        // A lineage of its own: this tab's copy goes on by itself, and neither tab reports the other again.
        lineage = newId();
        schedule();
      };
      const name = other.design.name || 'untitled design';
      postNotice(
        'info',
        `Another tab changed this design (it now holds “${name}”). This tab keeps its own copy, which a reload of this tab restores.`,
        {
          key: noticeKey,
          persistent: true,
          onDismiss: keepCopy,
          actions: [
            { label: "Keep this tab's copy", run: keepCopy },
            {
              label: "Open the other tab's version",
              run: () => {
                let latest = other;
                try {
                  latest = parseSession(storage!.getItem(key) ?? '', () => {}) ?? other;
                } catch (e) {
                  if (!(e instanceof FullReaderPending)) throw e; // the version read when the notice came
                }
                store.getState().replaceDesign(latest.design);
                store.getState().setView({ ...pickSharedView(defaultView), ...latest.view });
                postNotice('info', 'Opened the other tab’s version. Undo brings back this tab’s copy.');
              },
            },
          ],
        },
      );
    }
  }
}

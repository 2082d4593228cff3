import { beforeEach, describe, expect, it } from 'vitest';
import { saveSession, sessionKey, type StoredSession } from '../../src/share/autosave.ts';
import { encodeLink } from '../../src/share/link/index.ts';
import { noticeStore, runNoticeAction } from '../../src/store/notices.ts';
import { memoryStorage, type KeyValueStorage } from '../../src/share/storage.ts';
import { demoDesign } from '../../src/store/demo.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import {
  installPersistence,
  otherTabNotice,
  UNSAVED_NOTICE,
  type PersistEnv,
} from '../../src/store/persist.ts';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { heldDraftCount, holdDraft } from '../../src/store/drafts.ts';
import { bitwiseDifference } from '../share/arbitraries.ts';

/** A fake page: a fragment, listeners, a tab id kept across "reloads", and timers that run when told. */
function fakeEnv(storage: KeyValueStorage, hash = '', options: Partial<PersistEnv> = {}) {
  const listeners = new Map<string, (() => void)[]>();
  let pending: (() => void)[] = [];
  let tab: string | null = null;
  let ids = 0;
  const env: PersistEnv & {
    fire(e: string): void;
    setHash(h: string): void;
    runTimers(): void;
    hashNow(): string;
    tabNow(): string | null;
  } = {
    storage,
    hash: () => hash,
    listen: (event, fn) => {
      listeners.set(event, [...(listeners.get(event) ?? []), fn]);
      return () =>
        listeners.set(
          event,
          (listeners.get(event) ?? []).filter((f) => f !== fn),
        );
    },
    tabId: () => tab,
    setTabId: (id) => void (tab = id),
    newId: () => `id${++ids}-${Math.random().toString(36).slice(2, 8)}`,
    timers: { set: (fn) => pending.push(fn), clear: () => (pending = []), now: () => 0 },
    warn: () => {},
    fire: (e) => (listeners.get(e) ?? []).forEach((f) => f()),
    setHash: (h) => void (hash = h),
    runTimers: () => pending.splice(0).forEach((f) => f()),
    hashNow: () => hash,
    tabNow: () => tab,
    ...options,
  };
  return env;
}

/** The session this page wrote. */
const savedBy = (storage: KeyValueStorage, env: { tabNow(): string | null }) =>
  storage.getItem(sessionKey(env.tabNow()!));

const notices = () => noticeStore.getState().notices;

/** A session as another tab would have written it. */
const stored = (s: Omit<StoredSession, 'tab' | 'lineage' | 'savedAt'>, tab = 'earlier'): StoredSession => ({
  ...s,
  tab,
  lineage: 'line-0',
  savedAt: 1,
});

describe('page persistence', () => {
  beforeEach(() => noticeStore.setState({ notices: [] }));

  it('restores the autosaved design with its undo history', () => {
    const storage = memoryStorage();
    const mine = { ...emptyDesign(500), name: 'mine' };
    saveSession(
      storage,
      stored({ design: mine, past: [demoDesign()], future: [], view: { timeStyle: 'line' } }),
    );
    const store = createWorkbenchStore();
    installPersistence(store, fakeEnv(storage));
    expect(store.getState().design.name).toBe('mine');
    expect(store.getState().view.timeStyle).toBe('line');
    store.getState().undo();
    expect(bitwiseDifference(store.getState().design, demoDesign())).toBeNull();
  });

  it('opens a link on top of the restored design, one undo step away, and keeps the fragment', async () => {
    const storage = memoryStorage();
    saveSession(
      storage,
      stored({ design: { ...emptyDesign(), name: 'before' }, past: [], future: [], view: {} }),
    );
    const shared = { design: demoDesign(), view: { frequencyAxis: 'log' as const } };
    const env = fakeEnv(storage, '#' + encodeLink(shared));
    const store = createWorkbenchStore(emptyDesign());
    // The link codec loads when a link comes; the page draws its first view once it is open.
    await installPersistence(store, env).restored;
    expect(bitwiseDifference(store.getState().design, shared.design)).toBeNull();
    expect(store.getState().view.frequencyAxis).toBe('log');
    expect(env.hashNow()).toBe('#' + encodeLink(shared));
    expect(notices()[0]!.tone).toBe('info');
    store.getState().undo();
    expect(store.getState().design.name).toBe('before');
  });

  it('a reload of the tab keeps its own session over a fragment that lags behind it', async () => {
    const storage = memoryStorage();
    saveSession(
      storage,
      stored({ design: { ...emptyDesign(), name: 'mid-drag' }, past: [], future: [], view: {} }),
    );
    const shared = { design: demoDesign(), view: {} };
    const env = fakeEnv(storage, '#' + encodeLink(shared), { isReload: () => true });
    const store = createWorkbenchStore(emptyDesign());
    await installPersistence(store, env).restored;
    expect(store.getState().design.name).toBe('mid-drag');
    expect(notices()).toHaveLength(0);
  });

  it('leaves the design untouched and posts a message for a malformed link, also on hashchange', async () => {
    const storage = memoryStorage();
    const env = fakeEnv(storage, '#pw1.AAAA');
    const store = createWorkbenchStore();
    const before = store.getState().design;
    await installPersistence(store, env).restored;
    expect(store.getState().design).toBe(before);
    expect(store.getState().history.past).toHaveLength(0);
    expect(notices()[0]).toMatchObject({
      tone: 'error',
      text: expect.stringMatching(/unchanged.*cut short/),
    });
    env.setHash('#pw1.' + encodeLink({ design: demoDesign(), view: {} }).slice(4, 30));
    env.fire('hashchange');
    expect(store.getState().design).toBe(before);
    expect(notices()).toHaveLength(2);
  });

  it('autosaves changes (throttled) and on pagehide, so a new page gets them back', () => {
    const storage = memoryStorage();
    const env = fakeEnv(storage);
    const store = createWorkbenchStore();
    installPersistence(store, env);
    env.runTimers();
    store.getState().setName('edited');
    store.getState().setSampleRate(4000);
    env.fire('pagehide');
    const next = createWorkbenchStore(emptyDesign());
    installPersistence(next, fakeEnv(storage));
    expect(next.getState().design.name).toBe('edited');
    expect(next.getState().design.sampleRate).toBe(4000);
    expect(next.getState().history.past).toHaveLength(2);
  });

  it('commits a name and note still being typed before the pagehide write, so a reload keeps them', () => {
    for (const event of ['pagehide', 'hidden'] as const) {
      const storage = memoryStorage();
      const env = fakeEnv(storage);
      const store = createWorkbenchStore();
      installPersistence(store, env);
      env.runTimers();
      // Two fields hold text that no Enter or blur has committed yet; one of them lets go (Escape) first.
      const releaseName = holdDraft('name', () => store.getState().setName('Half-typed name'));
      holdDraft('note', () => store.getState().setNote('Half-typed note'));
      const releaseOther = holdDraft('other', () => store.getState().setName('reverted, must not win'));
      releaseOther();
      env.fire(event);
      expect(heldDraftCount()).toBe(0);
      releaseName(); // releasing after the commit is harmless
      const next = createWorkbenchStore(emptyDesign());
      installPersistence(next, fakeEnv(storage));
      expect(next.getState().design.name).toBe('Half-typed name');
      expect(next.getState().design.note).toBe('Half-typed note');
      // Each commit is an undo step of its own, as Enter would have made it.
      expect(next.getState().history.past).toHaveLength(2);
    }
  });

  it('holds the autosave during a root drag and writes the dropped root on release or pagehide', () => {
    for (const end of ['release', 'pagehide'] as const) {
      const storage = memoryStorage();
      const env = fakeEnv(storage);
      const store = createWorkbenchStore(demoDesign());
      installPersistence(store, env);
      env.runTimers();
      const saved = savedBy(storage, env);
      const st = store.getState();
      st.beginGesture();
      st.setDragging(true);
      st.moveRoot({ kind: 'pole', index: 0 }, 0.5, 0.5);
      st.moveRoot({ kind: 'pole', index: 0 }, 0.4, 0.6);
      env.runTimers();
      expect(savedBy(storage, env), 'nothing written mid-drag').toBe(saved);
      if (end === 'release') {
        st.endGesture();
        st.setDragging(false);
        env.runTimers();
      } else env.fire('pagehide');
      const next = createWorkbenchStore(emptyDesign());
      installPersistence(next, fakeEnv(storage));
      const pole = next.getState().design.poles[0]!;
      expect([pole.re, pole.im], end).toEqual([0.4, 0.6]);
    }
  });

  it('starts normally when the autosave is corrupted', () => {
    const storage = memoryStorage();
    storage.setItem('polewright.session', '{"polewright":"session","version":1,"design":7}');
    const store = createWorkbenchStore();
    const before = store.getState().design;
    expect(() => installPersistence(store, fakeEnv(storage))).not.toThrow();
    expect(store.getState().design).toBe(before);
  });
});

/** One browser profile: a shared storage whose writes reach the other tabs as 'storage' events. */
function browser(quotaChars = Infinity) {
  const shared = memoryStorage(quotaChars);
  const tabs: { fn: (key: string | null) => void; storage: KeyValueStorage }[] = [];
  /** A tab: its own view of the storage, and a page environment around it. */
  const open = (tabId: string | null = null, extra: Partial<PersistEnv> = {}) => {
    const me = { fn: (_: string | null) => {}, storage: null as unknown as KeyValueStorage };
    me.storage = {
      ...shared,
      setItem: (k, v) => {
        shared.setItem(k, v);
        for (const t of tabs) if (t !== me) t.fn(k);
      },
    };
    tabs.push(me);
    const env = fakeEnv(me.storage, '', {
      onStorage: (fn) => {
        me.fn = fn;
        return () => void (me.fn = () => {});
      },
      ...extra,
    });
    if (tabId !== null) env.setTabId!(tabId);
    return env;
  };
  return { shared, open };
}

describe('work that is not saved is never silent', () => {
  beforeEach(() => noticeStore.setState({ notices: [] }));

  it('a full storage gives a lasting notice whose button downloads the design; it goes when saving works again', () => {
    const b = browser();
    const downloads: string[] = [];
    const env = b.open(null, { downloadDesign: (s) => downloads.push(s.design.name) });
    const store = createWorkbenchStore();
    installPersistence(store, env);
    env.runTimers();
    expect(notices().map((x) => x.text)).toEqual([]);
    // Another site-wide use fills the storage.
    b.shared.setItem('filler', 'x'.repeat(10));
    const full = {
      ...b.shared,
      setItem: () => {
        throw new DOMException('full', 'QuotaExceededError');
      },
    };
    Object.assign(env.storage!, { setItem: full.setItem });
    store.getState().setName('not saved yet');
    env.runTimers();
    const n = notices().find((x) => x.key === UNSAVED_NOTICE)!;
    expect(n).toMatchObject({ tone: 'error', persistent: true });
    expect(n.text).toMatch(/not saved: browser storage is full.*download the design/i);
    n.actions![0]!.run();
    expect(downloads).toEqual(['not saved yet']);
    // Still one notice however often the save fails.
    store.getState().setName('still not saved');
    env.runTimers();
    expect(notices().filter((x) => x.key === UNSAVED_NOTICE)).toHaveLength(1);
    // Space again: the notice goes and a short message says so.
    Object.assign(env.storage!, { setItem: (k: string, v: string) => b.shared.setItem(k, v) });
    store.getState().setName('saved again');
    env.runTimers();
    expect(notices().some((x) => x.key === UNSAVED_NOTICE)).toBe(false);
    expect(notices().at(-1)!.text).toMatch(/Autosave works again/);
  });

  it('a page without storage says at once that nothing is saved, with the download', () => {
    const env = fakeEnv(null as unknown as KeyValueStorage, '', { storage: null, downloadDesign: () => {} });
    installPersistence(createWorkbenchStore(), env);
    const n = notices()[0]!;
    expect(n.key).toBe(UNSAVED_NOTICE);
    expect(n.text).toMatch(/not being saved.*blocked/);
    expect(n.actions!.map((a) => a.label)).toEqual(['Download the design']);
  });
});

describe('each tab keeps its own session', () => {
  beforeEach(() => noticeStore.setState({ notices: [] }));

  it('two tabs do not overwrite each other, and a reload of each restores its own work', () => {
    const b = browser();
    const envA = b.open();
    const a = createWorkbenchStore();
    installPersistence(a, envA);
    a.getState().setName('work of A');
    envA.runTimers();
    // A second tab continues the newest session, then goes its own way.
    const envB = b.open();
    const bStore = createWorkbenchStore(emptyDesign());
    installPersistence(bStore, envB);
    expect(bStore.getState().design.name).toBe('work of A');
    envB.runTimers();
    bStore.getState().setName('work of B');
    envB.runTimers();
    a.getState().setSampleRate(3000);
    envA.runTimers();
    // Reload A (same tab id), then B.
    const a2 = createWorkbenchStore(emptyDesign());
    installPersistence(a2, b.open(envA.tabNow()));
    expect(a2.getState().design.name).toBe('work of A');
    expect(a2.getState().design.sampleRate).toBe(3000);
    const b2 = createWorkbenchStore(emptyDesign());
    installPersistence(b2, b.open(envB.tabNow()));
    expect(b2.getState().design.name).toBe('work of B');
    expect(b2.getState().design.sampleRate).toBe(demoDesign().sampleRate);
  });

  it('says when another tab changed the same design, and keeps or takes the other copy on request', () => {
    const b = browser();
    const envA = b.open();
    const a = createWorkbenchStore();
    installPersistence(a, envA);
    envA.runTimers();
    const envB = b.open();
    const bStore = createWorkbenchStore(emptyDesign());
    installPersistence(bStore, envB);
    envB.runTimers();
    // B's first write holds the same design as A: nothing to say.
    expect(notices().map((x) => x.text)).toEqual([]);
    bStore.getState().setName('changed in B');
    envB.runTimers();
    const n = notices().find((x) => x.key === otherTabNotice(envB.tabNow()!))!;
    expect(n.text).toMatch(/Another tab changed this design.*“changed in B”/);
    expect(n.actions!.map((x) => x.label)).toEqual(["Keep this tab's copy", "Open the other tab's version"]);
    // Take the other version: one undo step, A's own copy comes back with undo.
    runNoticeAction(n, n.actions![1]!);
    expect(a.getState().design.name).toBe('changed in B');
    a.getState().undo();
    expect(a.getState().design.name).toBe(demoDesign().name);
    a.getState().redo();
    // Keep its own copy: from then on neither tab reports the other.
    noticeStore.setState({ notices: [] });
    bStore.getState().setName('changed in B again');
    envB.runTimers();
    runNoticeAction(notices()[0]!, notices()[0]!.actions![0]!);
    envA.runTimers();
    bStore.getState().setName('and again');
    envB.runTimers();
    a.getState().setName('A alone');
    envA.runTimers();
    expect(
      notices()
        .filter((x) => x.key?.startsWith('other-tab'))
        .map((x) => x.text),
    ).toEqual([]);
  });

  it('a duplicated tab (same id as an open tab) takes a new id before it writes', async () => {
    const b = browser();
    const envA = b.open('orig');
    const a = createWorkbenchStore();
    installPersistence(a, envA);
    a.getState().setName('original');
    envA.runTimers();
    const envDup = b.open('orig', { claimTab: async () => false });
    const dup = createWorkbenchStore(emptyDesign());
    installPersistence(dup, envDup);
    expect(dup.getState().design.name).toBe('original');
    await Promise.resolve();
    dup.getState().setName('the duplicate');
    envDup.runTimers();
    expect(envDup.tabNow()).not.toBe('orig');
    const back = createWorkbenchStore(emptyDesign());
    installPersistence(back, b.open('orig'));
    expect(back.getState().design.name).toBe('original');
  });
});

import { beforeEach, describe, expect, it } from 'vitest';
import { AUTOSAVE_KEY, saveSession } from '../../src/share/autosave.ts';
import { encodeLink } from '../../src/share/link/index.ts';
import { noticeStore } from '../../src/store/notices.ts';
import { memoryStorage, type KeyValueStorage } from '../../src/share/storage.ts';
import { demoDesign } from '../../src/store/demo.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import { installPersistence, type PersistEnv } from '../../src/store/persist.ts';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { bitwiseDifference } from '../share/arbitraries.ts';

/** A fake page: a fragment, listeners, and timers that run when told. */
function fakeEnv(storage: KeyValueStorage, hash = '') {
  const listeners = new Map<string, (() => void)[]>();
  let pending: (() => void)[] = [];
  const env: PersistEnv & {
    fire(e: string): void;
    setHash(h: string): void;
    runTimers(): void;
    hashNow(): string;
  } = {
    storage,
    hash: () => hash,
    clearHash: () => void (hash = ''),
    listen: (event, fn) => {
      listeners.set(event, [...(listeners.get(event) ?? []), fn]);
      return () =>
        listeners.set(
          event,
          (listeners.get(event) ?? []).filter((f) => f !== fn),
        );
    },
    timers: { set: (fn) => pending.push(fn), clear: () => (pending = []), now: () => 0 },
    warn: () => {},
    fire: (e) => (listeners.get(e) ?? []).forEach((f) => f()),
    setHash: (h) => void (hash = h),
    runTimers: () => pending.splice(0).forEach((f) => f()),
    hashNow: () => hash,
  };
  return env;
}

const notices = () => noticeStore.getState().notices;

describe('page persistence', () => {
  beforeEach(() => noticeStore.setState({ notices: [] }));

  it('restores the autosaved design with its undo history', () => {
    const storage = memoryStorage();
    const mine = { ...emptyDesign(500), name: 'mine' };
    saveSession(storage, { design: mine, past: [demoDesign()], future: [], view: { timeStyle: 'line' } });
    const store = createWorkbenchStore();
    installPersistence(store, fakeEnv(storage));
    expect(store.getState().design.name).toBe('mine');
    expect(store.getState().view.timeStyle).toBe('line');
    store.getState().undo();
    expect(bitwiseDifference(store.getState().design, demoDesign())).toBeNull();
  });

  it('opens a link on top of the restored design, one undo step away, and removes the fragment', () => {
    const storage = memoryStorage();
    saveSession(storage, { design: { ...emptyDesign(), name: 'before' }, past: [], future: [], view: {} });
    const shared = { design: demoDesign(), view: { frequencyAxis: 'log' as const } };
    const env = fakeEnv(storage, '#' + encodeLink(shared));
    const store = createWorkbenchStore(emptyDesign());
    installPersistence(store, env);
    expect(bitwiseDifference(store.getState().design, shared.design)).toBeNull();
    expect(store.getState().view.frequencyAxis).toBe('log');
    expect(env.hashNow()).toBe('');
    expect(notices()[0]!.tone).toBe('info');
    store.getState().undo();
    expect(store.getState().design.name).toBe('before');
  });

  it('leaves the design untouched and posts a message for a malformed link, also on hashchange', () => {
    const storage = memoryStorage();
    const env = fakeEnv(storage, '#pw1.AAAA');
    const store = createWorkbenchStore();
    const before = store.getState().design;
    installPersistence(store, env);
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

  it('holds the autosave during a root drag and writes the dropped root on release or pagehide', () => {
    for (const end of ['release', 'pagehide'] as const) {
      const storage = memoryStorage();
      const env = fakeEnv(storage);
      const store = createWorkbenchStore(demoDesign());
      installPersistence(store, env);
      env.runTimers();
      const saved = storage.getItem(AUTOSAVE_KEY);
      const st = store.getState();
      st.beginGesture();
      st.setDragging(true);
      st.moveRoot({ kind: 'pole', index: 0 }, 0.5, 0.5);
      st.moveRoot({ kind: 'pole', index: 0 }, 0.4, 0.6);
      env.runTimers();
      expect(storage.getItem(AUTOSAVE_KEY), 'nothing written mid-drag').toBe(saved);
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

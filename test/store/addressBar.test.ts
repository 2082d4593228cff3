import { afterEach, describe, expect, it } from 'vitest';
import {
  COALESCE_MS,
  fragmentOf,
  installAddressBar,
  VIEW_WRITE_MS,
  type AddressEnv,
} from '../../src/store/addressBar.ts';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { decodeLink } from '../../src/share/link/index.ts';
import { bitwiseDifference } from '../share/arbitraries.ts';
import { installPersistence, loadLinkReader, type PersistEnv } from '../../src/store/persist.ts';
import * as link from '../../src/share/link/index.ts';
import { noticeStore } from '../../src/store/notices.ts';

const notices = () => noticeStore.getState().notices;
const clearNotices = () => noticeStore.setState({ notices: [] });

/** A browser history of fragments with a clock and timers the test runs by hand. */
function fakeAddress() {
  const entries = [''];
  let at = 0;
  let clock = 1000;
  const timers: { due: number; fn: () => void }[] = [];
  const env: AddressEnv = {
    hash: () => entries[at]!,
    write: (hash, mode) => {
      if (mode === 'push') {
        entries.splice(at + 1, Infinity, hash);
        at++;
      } else entries[at] = hash;
    },
    now: () => clock,
    setTimeout: (fn, ms) => {
      const t = { due: clock + ms, fn };
      timers.push(t);
      return t;
    },
    clearTimeout: (h) => void timers.splice(timers.indexOf(h as (typeof timers)[0]) >>> 0, 1),
  };
  return {
    env,
    entries,
    at: () => at,
    back: () => void at--,
    advance(ms: number) {
      clock += ms;
      for (const t of [...timers]) {
        if (t.due > clock) continue;
        timers.splice(timers.indexOf(t), 1);
        t.fn();
      }
    },
  };
}

afterEach(() => clearNotices());

describe('the address bar follows the design', () => {
  it('holds the open design from the start, without a new entry', async () => {
    const a = fakeAddress();
    const store = createWorkbenchStore();
    await installAddressBar(store, a.env).ready;
    expect(a.entries).toHaveLength(1);
    const r = decodeLink(a.entries[0]!);
    expect(r.ok && bitwiseDifference(r.value.design, store.getState().design)).toBeNull();
  });

  it('leaves a link that could not be opened in the address bar until the next change', async () => {
    const a = fakeAddress();
    a.entries[0] = '#pw2.AAAA';
    const store = createWorkbenchStore();
    await installAddressBar(store, a.env).ready;
    expect(a.entries).toEqual(['#pw2.AAAA']);
    store.getState().setName('edited');
    expect(a.entries[1]).toBe(fragmentOf(store.getState(), link));
  });

  it('adds one entry per committed change; a burst within COALESCE_MS is one entry', async () => {
    const a = fakeAddress();
    const store = createWorkbenchStore();
    await installAddressBar(store, a.env).ready;
    store.getState().setName('first');
    expect(a.entries).toHaveLength(2);
    a.advance(COALESCE_MS + 1);
    store.getState().setName('second');
    a.advance(10);
    store.getState().setName('second, typed on');
    expect(a.entries).toHaveLength(3);
    expect(a.entries[2]).toBe(fragmentOf(store.getState(), link));
  });

  it('writes nothing while a root is dragged and one entry on release', async () => {
    const a = fakeAddress();
    const store = createWorkbenchStore();
    await installAddressBar(store, a.env).ready;
    const s = store.getState();
    s.setDragging(true);
    s.beginGesture();
    for (let i = 1; i <= 5; i++) store.getState().moveRoot({ kind: 'pole', index: 0 }, 0.5, 0.1 * i);
    expect(a.entries).toHaveLength(1);
    store.getState().endGesture();
    store.getState().setDragging(false);
    expect(a.entries).toHaveLength(2);
    const r = decodeLink(a.entries[1]!);
    expect(r.ok && r.value.design.poles[0]!.im).toBeCloseTo(0.5, 15);
  });

  it('a view change replaces the entry (throttled) instead of adding one', async () => {
    const a = fakeAddress();
    const store = createWorkbenchStore();
    await installAddressBar(store, a.env).ready;
    store.getState().setView({ magnitudeScale: 'linear' });
    store.getState().setView({ phaseMode: 'wrapped' });
    expect(a.entries[0]).not.toContain('linear');
    a.advance(VIEW_WRITE_MS);
    expect(a.entries).toHaveLength(1);
    const r = decodeLink(a.entries[0]!);
    expect(r.ok && r.value.view).toMatchObject({ magnitudeScale: 'linear', phaseMode: 'wrapped' });
  });

  it('Back opens the earlier design as one undo step and adds no entry; a reload of it says nothing', async () => {
    const a = fakeAddress();
    const store = createWorkbenchStore();
    const listeners: (() => void)[] = [];
    const env: PersistEnv = {
      storage: null,
      hash: a.env.hash,
      listen: (event, fn) => {
        if (event === 'hashchange') listeners.push(fn);
        return () => {};
      },
      isHistoryStep: () => true,
    };
    await loadLinkReader();
    await installPersistence(store, env).restored;
    clearNotices();
    await installAddressBar(store, a.env).ready;
    const before = store.getState().design;
    store.getState().setName('changed');
    expect(a.entries).toHaveLength(2);
    a.back();
    listeners.forEach((fn) => fn());
    expect(bitwiseDifference(store.getState().design, before)).toBeNull();
    expect(a.entries).toHaveLength(2);
    expect(a.at()).toBe(0);
    expect(notices().at(-1)!.text).toMatch(/^Back\/Forward/);
    store.getState().undo();
    expect(store.getState().design.name).toBe('changed');

    // The same fragment read again (a reload) is the design already open: no notice, no undo step.
    const count = notices().length;
    a.advance(COALESCE_MS + 1);
    store.getState().redo();
    const past = store.getState().history.past.length;
    listeners.forEach((fn) => fn());
    expect(notices()).toHaveLength(count);
    expect(store.getState().history.past).toHaveLength(past);
  });
});

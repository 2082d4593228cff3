import { describe, expect, it } from 'vitest';
import {
  LEGACY_SESSION_KEY,
  MAX_OTHER_SESSIONS,
  createAutosaver,
  listSessions,
  loadSession,
  pruneSessions,
  readSessionHead,
  restoreSession,
  saveSession,
  serialiseSession,
  sessionKey,
  type StoredSession,
  type Timers,
} from '../../src/share/autosave.ts';
import { memoryStorage } from '../../src/share/storage.ts';
import { demoDesign } from '../../src/store/demo.ts';
import { emptyDesign, type Design } from '../../src/core/model/design.ts';
import { bitwiseDifference } from './arbitraries.ts';

/** n distinct designs, each a little different from the last. */
function steps(n: number): Design[] {
  return Array.from({ length: n }, (_, i) => ({ ...emptyDesign(1000 + i), name: `step ${i}` }));
}

function session(past = 3, future = 2, tab = 'tab-a'): StoredSession {
  return {
    tab,
    lineage: 'line-1',
    savedAt: 1000,
    design: demoDesign(),
    past: steps(past),
    future: steps(future).map((d) => ({ ...d, note: 'redo' })),
    view: { timeInput: 'step' },
  };
}

const quiet = () => {};
const KEY = sessionKey('tab-a');

describe('autosave', () => {
  it('restores the design, the undo and redo steps, the view and who wrote it, bit for bit', () => {
    const storage = memoryStorage();
    const s = session();
    s.design = { ...s.design, zeros: [{ re: -0, im: 0.1 + 0.2, multiplicity: 2 }] };
    expect(saveSession(storage, s)).toMatchObject({ ok: true });
    const back = loadSession(storage, KEY, quiet);
    expect(back).not.toBeNull();
    expect(bitwiseDifference(back, s)).toBeNull();
    expect(readSessionHead(storage.getItem(KEY))).toEqual({ tab: 'tab-a', lineage: 'line-1', savedAt: 1000 });
  });

  it('drops the oldest undo steps, then the farthest redo steps, to stay within the budget', () => {
    const s = session(50, 10);
    const full = serialiseSession(s, Infinity);
    const out = serialiseSession(s, full.text.length - 1000);
    expect(out.text.length).toBeLessThanOrEqual(full.text.length - 1000);
    expect(out.droppedPast).toBeGreaterThan(0);
    expect(out.droppedFuture).toBe(0);
    const storage = memoryStorage();
    storage.setItem(KEY, out.text);
    const back = loadSession(storage, KEY, quiet)!;
    // The newest undo steps are the ones kept.
    expect(back.past.at(-1)!.name).toBe('step 49');
    expect(back.past.length).toBe(50 - out.droppedPast);
    // With a budget for the design alone, both histories go; below that the design is still written.
    const alone = serialiseSession({ ...s, past: [], future: [] }, Infinity).text.length;
    expect(serialiseSession(s, alone)).toMatchObject({ droppedPast: 50, droppedFuture: 10 });
    expect(serialiseSession(s, 10)).toMatchObject({ droppedPast: 50, droppedFuture: 10 });
    expect(serialiseSession(s, 10).text.length).toBe(alone);
  });

  it('retries with less history when storage is full, and says so when even the design does not fit', () => {
    const s = session(200, 0);
    const full = serialiseSession(s, Infinity).text.length;
    const storage = memoryStorage(Math.floor(full * 0.6));
    expect(saveSession(storage, s, full + 10)).toMatchObject({ ok: true });
    expect(loadSession(storage, KEY, quiet)!.past.length).toBeLessThan(200);
    expect(saveSession(memoryStorage(10), s, full)).toMatchObject({ ok: false, reason: 'full' });
    // A storage that refuses writes for another reason (blocked) is reported as unavailable.
    const blocked = {
      ...memoryStorage(),
      setItem: () => {
        throw new DOMException('denied', 'SecurityError');
      },
    };
    expect(saveSession(blocked, s)).toMatchObject({ ok: false, reason: 'unavailable' });
  });

  it('refuses to write a design outside the bounds every design keeps, saying where', () => {
    const s = session(0, 0);
    s.design = { ...s.design, poles: [{ re: 0, im: 0, multiplicity: 2000 }] };
    const out = saveSession(memoryStorage(), s);
    expect(out).toMatchObject({ ok: false, reason: 'refused' });
    if (!out.ok) expect(out.message).toMatch(/poles\.0\.multiplicity/);
  });

  it('ignores a corrupted entry with a warning', () => {
    for (const text of [
      '{not json',
      '[]',
      '{"polewright":"session","version":9}',
      '{"polewright":"session","version":1,"design":{"polewright":"design","version":2}}',
    ]) {
      const storage = memoryStorage();
      storage.setItem(KEY, text);
      const warnings: string[] = [];
      expect(loadSession(storage, KEY, (m) => warnings.push(m))).toBeNull();
      expect(warnings.length).toBe(1);
    }
  });

  it('keeps the steps after a damaged undo step and drops the ones before it', () => {
    const storage = memoryStorage();
    saveSession(storage, session(4, 0));
    const json = JSON.parse(storage.getItem(KEY)!);
    json.past[1].sampleRate = -5;
    storage.setItem(KEY, JSON.stringify(json));
    const warnings: string[] = [];
    const back = loadSession(storage, KEY, (m) => warnings.push(m))!;
    expect(back.past.map((d) => d.name)).toEqual(['step 2', 'step 3']);
    expect(warnings[0]).toMatch(/undo step ignored.*sampleRate/);
  });

  it('restores a tab its own session, a new tab the newest one, and reads the shared session of older versions', () => {
    const storage = memoryStorage();
    const older = { ...session(0, 0, 'tab-a'), savedAt: 1000, design: { ...demoDesign(), name: 'A' } };
    const newer = {
      ...session(0, 0, 'tab-b'),
      savedAt: 2000,
      lineage: 'line-2',
      design: { ...demoDesign(), name: 'B' },
    };
    saveSession(storage, older);
    saveSession(storage, newer);
    expect(restoreSession(storage, 'tab-a', quiet)).toMatchObject({ from: 'own', lineage: 'line-1' });
    expect(restoreSession(storage, 'tab-a', quiet)!.session.design.name).toBe('A');
    const fresh = restoreSession(storage, null, quiet)!;
    expect(fresh).toMatchObject({ from: 'newest', lineage: 'line-2' });
    expect(fresh.session.design.name).toBe('B');
    // A tab whose own session is gone continues the newest.
    expect(restoreSession(storage, 'tab-gone', quiet)!.session.design.name).toBe('B');
    // Before tabs kept their own sessions there was one shared session (version 1).
    const legacy = memoryStorage();
    const v1 = serialiseSession(session(1, 0), Infinity).text.replace(
      /^\{"polewright":"session","version":2,"tab":"tab-a","lineage":"line-1","savedAt":1000/,
      '{"polewright":"session","version":1',
    );
    legacy.setItem(LEGACY_SESSION_KEY, v1);
    const r = restoreSession(legacy, null, quiet)!;
    expect(r).toMatchObject({ from: 'newest', lineage: null });
    expect(r.session.past).toHaveLength(1);
    expect(restoreSession(memoryStorage(), 'x', quiet)).toBeNull();
  });

  it('keeps the newest sessions of other tabs and removes the rest with the shared session of older versions', () => {
    const storage = memoryStorage();
    for (let i = 0; i < MAX_OTHER_SESSIONS + 3; i++)
      saveSession(storage, { ...session(0, 0, `t${i}`), savedAt: 100 + i });
    storage.setItem(LEGACY_SESSION_KEY, '{}');
    pruneSessions(storage, 't0');
    const left = listSessions(storage).map((h) => h.tab);
    // Its own session stays however old; of the others the newest MAX_OTHER_SESSIONS stay.
    expect(left).toContain('t0');
    expect(left).toHaveLength(MAX_OTHER_SESSIONS + 1);
    expect(left).not.toContain('t1');
    expect(storage.getItem(LEGACY_SESSION_KEY)).toBeNull();
  });

  it('writes at most once per interval, with the latest state, and flushes on demand', () => {
    let now = 0;
    let pending: { fn: () => void; at: number }[] = [];
    const timers: Timers = {
      set: (fn, ms) => {
        const t = { fn, at: now + ms };
        pending.push(t);
        return t;
      },
      clear: (h) => void (pending = pending.filter((p) => p !== h)),
      now: () => now,
    };
    const run = (t: number) => {
      now = t;
      for (const p of pending.splice(0))
        if (p.at <= t) p.fn();
        else pending.push(p);
    };
    const storage = memoryStorage();
    let writes = 0;
    const counting = { ...storage, setItem: (k: string, v: string) => (writes++, storage.setItem(k, v)) };
    let current = session(0, 0);
    const outcomes: boolean[] = [];
    const saver = createAutosaver(counting, () => current, {
      timers,
      intervalMs: 300,
      done: (o) => outcomes.push(o.ok),
    });
    saver.schedule();
    saver.schedule();
    run(0);
    expect(writes).toBe(1);
    current = { ...current, design: { ...current.design, name: 'second' } };
    saver.schedule();
    run(100);
    expect(writes).toBe(1); // throttled: the next write waits until 300 ms
    run(300);
    expect(writes).toBe(2);
    expect(loadSession(storage, KEY, quiet)!.design.name).toBe('second');
    current = { ...current, design: { ...current.design, name: 'third' } };
    saver.schedule();
    saver.flush(); // pagehide
    expect(writes).toBe(3);
    expect(loadSession(storage, KEY, quiet)!.design.name).toBe('third');
    saver.flush();
    expect(writes).toBe(3); // nothing pending
    expect(outcomes).toEqual([true, true, true]);
  });
});

describe('a full storage', () => {
  it('makes the sessions of tabs silent for an hour give way, oldest first, but never a recent one', () => {
    const hour = 60 * 60 * 1000;
    const now = 10 * hour;
    const big = (tab: string, savedAt: number): StoredSession => ({
      ...session(0, 0, tab),
      savedAt,
      design: { ...demoDesign(), note: 'x'.repeat(5000) },
    });
    const one = serialiseSession(big('mine', now), Infinity).text.length;
    const storage = memoryStorage(Math.floor(one * 3.5));
    saveSession(storage, big('old', now - 3 * hour));
    saveSession(storage, big('older', now - 5 * hour));
    saveSession(storage, big('recent', now - 10 * 60 * 1000));
    expect(saveSession(storage, big('mine', now))).toMatchObject({ ok: true });
    const left = listSessions(storage).map((h) => h.tab);
    expect(left).toEqual(['mine', 'recent', 'old']);
    // With only recent sessions left, a write that does not fit is reported, and nothing is removed.
    const full = memoryStorage(Math.floor(one * 1.5));
    saveSession(full, big('recent', now - 60_000));
    expect(saveSession(full, big('mine', now))).toMatchObject({ ok: false, reason: 'full' });
    expect(listSessions(full).map((h) => h.tab)).toEqual(['recent']);
  });
});

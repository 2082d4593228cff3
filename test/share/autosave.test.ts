import { describe, expect, it } from 'vitest';
import {
  AUTOSAVE_KEY,
  createAutosaver,
  loadSession,
  saveSession,
  serialiseSession,
  type Session,
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

function session(past = 3, future = 2): Session {
  return {
    design: demoDesign(),
    past: steps(past),
    future: steps(future).map((d) => ({ ...d, note: 'redo' })),
    view: { timeInput: 'step' },
  };
}

const quiet = () => {};

describe('autosave', () => {
  it('restores the design, the undo and redo steps and the view bit for bit', () => {
    const storage = memoryStorage();
    const s = session();
    s.design = { ...s.design, zeros: [{ re: -0, im: 0.1 + 0.2, multiplicity: 2 }] };
    expect(saveSession(storage, s)).toBe(true);
    const back = loadSession(storage, quiet);
    expect(back).not.toBeNull();
    expect(bitwiseDifference(back, s)).toBeNull();
  });

  it('drops the oldest undo steps, then the farthest redo steps, to stay within the budget', () => {
    const s = session(50, 10);
    const full = serialiseSession(s, Infinity)!;
    const out = serialiseSession(s, full.text.length - 1000)!;
    expect(out.text.length).toBeLessThanOrEqual(full.text.length - 1000);
    expect(out.droppedPast).toBeGreaterThan(0);
    expect(out.droppedFuture).toBe(0);
    const storage = memoryStorage();
    storage.setItem(AUTOSAVE_KEY, out.text);
    const back = loadSession(storage, quiet)!;
    // The newest undo steps are the ones kept.
    expect(back.past.at(-1)!.name).toBe('step 49');
    expect(back.past.length).toBe(50 - out.droppedPast);
    // With a budget for the design alone, both histories go; below that nothing is written.
    const alone = serialiseSession({ ...s, past: [], future: [] }, Infinity)!.text.length;
    expect(serialiseSession(s, alone)).toMatchObject({ droppedPast: 50, droppedFuture: 10 });
    expect(serialiseSession(s, alone - 1)).toBeNull();
  });

  it('retries with less history when storage is full, and warns when even that fails', () => {
    const s = session(200, 0);
    const full = serialiseSession(s, Infinity)!.text.length;
    const storage = memoryStorage(Math.floor(full * 0.6));
    expect(saveSession(storage, s, full + 10, quiet)).toBe(true);
    expect(loadSession(storage, quiet)!.past.length).toBeLessThan(200);
    const warnings: string[] = [];
    expect(saveSession(memoryStorage(10), s, full, (m) => warnings.push(m))).toBe(false);
    expect(warnings[0]).toMatch(/could not be autosaved/);
  });

  it('ignores a corrupted entry with a warning', () => {
    for (const text of [
      '{not json',
      '[]',
      '{"polewright":"session","version":9}',
      '{"polewright":"session","version":1,"design":{"polewright":"design","version":2}}',
    ]) {
      const storage = memoryStorage();
      storage.setItem(AUTOSAVE_KEY, text);
      const warnings: string[] = [];
      expect(loadSession(storage, (m) => warnings.push(m))).toBeNull();
      expect(warnings.length).toBe(1);
    }
  });

  it('keeps the steps after a damaged undo step and drops the ones before it', () => {
    const storage = memoryStorage();
    saveSession(storage, session(4, 0));
    const json = JSON.parse(storage.getItem(AUTOSAVE_KEY)!);
    json.past[1].sampleRate = -5;
    storage.setItem(AUTOSAVE_KEY, JSON.stringify(json));
    const warnings: string[] = [];
    const back = loadSession(storage, (m) => warnings.push(m))!;
    expect(back.past.map((d) => d.name)).toEqual(['step 2', 'step 3']);
    expect(warnings[0]).toMatch(/undo step ignored.*sampleRate/);
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
    const saver = createAutosaver(counting, () => current, { timers, intervalMs: 300 });
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
    expect(loadSession(storage, quiet)!.design.name).toBe('second');
    current = { ...current, design: { ...current.design, name: 'third' } };
    saver.schedule();
    saver.flush(); // pagehide
    expect(writes).toBe(3);
    expect(loadSession(storage, quiet)!.design.name).toBe('third');
    saver.flush();
    expect(writes).toBe(3); // nothing pending
  });
});

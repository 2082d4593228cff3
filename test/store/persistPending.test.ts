/**
 * The page starts without the full design reader (src/share/schema/reader.ts). A session only that reader
 * can read (here one whose design is a version-1 document) is restored once it has loaded, the first view
 * waits for it, and nothing is autosaved before: the demo never overwrites the session waiting to be read.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { sessionKey } from '../../src/share/autosave.ts';
import * as fullReader from '../../src/share/schema/full.ts';
import { fullReaderLoaded, installFullReader } from '../../src/share/schema/reader.ts';
import { memoryStorage } from '../../src/share/storage.ts';
import { installPersistence, type PersistEnv } from '../../src/store/persist.ts';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { noticeStore } from '../../src/store/notices.ts';

/** A version-1 design document, as the first release wrote it. */
const v1Design = {
  polewright: 'design',
  version: 1,
  name: 'scale notch (first release)',
  note: '',
  sampleRate: 2000,
  zeros: [{ re: 0.9876883405951378, im: 0.15643446504023087, multiplicity: 1 }],
  poles: [{ re: 0.97, im: 0.15, multiplicity: 1 }],
  gainRule: { kind: 'dc' },
};

function env(storage: ReturnType<typeof memoryStorage>, tab: string, hash = '') {
  const timers: (() => void)[] = [];
  const e: PersistEnv & { runTimers(): void } = {
    storage,
    hash: () => hash,
    listen: () => () => {},
    tabId: () => tab,
    setTabId: () => {},
    newId: () => 'new-id',
    timers: { set: (fn) => timers.push(fn), clear: () => void timers.splice(0), now: () => 5 },
    warn: () => {},
    runTimers: () => timers.splice(0).forEach((f) => f()),
  };
  return e;
}

describe('restoring before the full reader has loaded', () => {
  beforeEach(() => {
    installFullReader(null);
    noticeStore.setState({ notices: [] });
  });
  afterEach(() => installFullReader(fullReader));

  it('waits for the reader, writes nothing meanwhile, then restores the session unchanged', async () => {
    const storage = memoryStorage();
    const text = JSON.stringify({
      polewright: 'session',
      version: 2,
      tab: 'mine',
      lineage: 'line-1',
      savedAt: 1,
      view: { timeStyle: 'line' },
      design: v1Design,
      past: [],
      future: [],
    });
    storage.setItem(sessionKey('mine'), text);
    const store = createWorkbenchStore();
    const demoName = store.getState().design.name;
    const page = env(storage, 'mine');
    const persistence = installPersistence(store, page);
    expect(fullReaderLoaded()).toBe(false);
    // Before the reader is here: still the demo, and no write has been asked for or made.
    expect(store.getState().design.name).toBe(demoName);
    page.runTimers();
    store.getState().replaceDesign({ ...store.getState().design, name: 'an edit of the demo' });
    page.runTimers();
    expect(storage.getItem(sessionKey('mine'))).toBe(text);
    await persistence.restored;
    expect(fullReaderLoaded()).toBe(true);
    expect(store.getState().design.name).toBe('scale notch (first release)');
    expect(store.getState().view.timeStyle).toBe('line');
    // From now on the tab saves as usual, in the current version.
    page.runTimers();
    const saved = JSON.parse(storage.getItem(sessionKey('mine'))!) as {
      design: { version: number; name: string };
    };
    expect(saved.design).toMatchObject({ version: 2, name: 'scale notch (first release)' });
  });

  it('restores a session the workbench wrote at once, without the full reader', async () => {
    const storage = memoryStorage();
    const first = createWorkbenchStore();
    const page = env(storage, 'mine');
    installPersistence(first, page);
    first.getState().replaceDesign({ ...first.getState().design, name: 'kept at once' });
    page.runTimers();
    installFullReader(null);
    const again = createWorkbenchStore();
    const persistence = installPersistence(again, env(storage, 'mine'));
    expect(again.getState().design.name).toBe('kept at once');
    expect(fullReaderLoaded()).toBe(false);
    await persistence.restored;
  });
});

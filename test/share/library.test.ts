import { describe, expect, it } from 'vitest';
import {
  LIBRARY_KEY,
  deleteEntry,
  listLibrary,
  openEntry,
  renameEntry,
  saveAs,
} from '../../src/share/library.ts';
import { memoryStorage } from '../../src/share/storage.ts';
import { demoDesign } from '../../src/store/demo.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import { bitwiseDifference } from './arbitraries.ts';

const quiet = () => {};
const at = (s: number) => new Date(Date.UTC(2025, 0, 1, 0, 0, s));

describe('design library', () => {
  it('saves, lists newest first, opens bit for bit, renames and deletes', () => {
    const storage = memoryStorage();
    const a = saveAs(
      storage,
      '  Hopper notch ',
      { design: demoDesign(), view: { frequencyAxis: 'log' } },
      { now: at(1) },
    );
    const b = saveAs(storage, 'Empty', { design: emptyDesign(), view: {} }, { now: at(2) });
    expect(a.ok && b.ok).toBe(true);
    if (!a.ok || !b.ok) return;
    expect(listLibrary(storage).map((e) => e.name)).toEqual(['Empty', 'Hopper notch']);
    const opened = openEntry(storage, a.value.id);
    expect(opened.ok).toBe(true);
    if (opened.ok) {
      expect(
        bitwiseDifference(opened.value, {
          design: { ...demoDesign(), name: 'Hopper notch' },
          view: { frequencyAxis: 'log' },
        }),
      ).toBeNull();
    }
    const r = renameEntry(storage, a.value.id, 'Hum filter');
    expect(r.ok && r.value.shared.design.name).toBe('Hum filter');
    expect(renameEntry(storage, a.value.id, 'Empty')).toMatchObject({
      ok: false,
      message: expect.stringMatching(/already/),
    });
    expect(deleteEntry(storage, b.value.id).ok).toBe(true);
    expect(listLibrary(storage).map((e) => e.name)).toEqual(['Hum filter']);
    expect(deleteEntry(storage, b.value.id).ok).toBe(false);
  });

  it('refuses an empty or duplicate name unless asked to replace', () => {
    const storage = memoryStorage();
    const shared = { design: demoDesign(), view: {} };
    expect(saveAs(storage, '   ', shared).ok).toBe(false);
    expect(saveAs(storage, 'x'.repeat(201), shared).ok).toBe(false);
    saveAs(storage, 'One', shared, { now: at(1) });
    expect(saveAs(storage, 'One', shared, { now: at(2) }).ok).toBe(false);
    const replaced = saveAs(
      storage,
      'One',
      { design: emptyDesign(), view: {} },
      { replace: true, now: at(3) },
    );
    expect(replaced.ok).toBe(true);
    const list = listLibrary(storage);
    expect(list).toHaveLength(1);
    expect(list[0]!.shared.design.zeros).toEqual([]);
  });

  it('skips a damaged entry and keeps the others', () => {
    const storage = memoryStorage();
    saveAs(storage, 'Good', { design: demoDesign(), view: {} }, { now: at(1) });
    saveAs(storage, 'Bad', { design: demoDesign(), view: {} }, { now: at(2) });
    const json = JSON.parse(storage.getItem(LIBRARY_KEY)!);
    json.entries[0].design.poles = 'many';
    storage.setItem(LIBRARY_KEY, JSON.stringify(json));
    const warnings: string[] = [];
    expect(listLibrary(storage, (m) => warnings.push(m)).map((e) => e.name)).toEqual(['Good']);
    expect(warnings[0]).toMatch(/poles/);
    storage.setItem(LIBRARY_KEY, '{{{');
    expect(listLibrary(storage, quiet)).toEqual([]);
  });

  it('reports a full storage instead of throwing', () => {
    const r = saveAs(memoryStorage(100), 'Big', { design: demoDesign(), view: {} });
    expect(r).toMatchObject({ ok: false, message: expect.stringMatching(/full/) });
  });
});

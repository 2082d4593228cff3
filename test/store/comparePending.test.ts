/**
 * A pinned reference kept in a form only the full design reader reads (a first-release design file) appears
 * once that reader has loaded; a pin or unpin made meanwhile wins, and nothing is written before.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import * as fullReader from '../../src/share/schema/full.ts';
import { installFullReader, loadFullReader } from '../../src/share/schema/reader.ts';
import { memoryStorage } from '../../src/share/storage.ts';
import { createCompareStore, REFERENCE_KEY } from '../../src/store/compare.ts';
import { demoDesign } from '../../src/store/demo.ts';

const firstReleaseFile = JSON.stringify({
  polewright: 'design',
  version: 1,
  name: 'kept reference (first release)',
  note: '',
  sampleRate: 1000,
  zeros: [],
  poles: [{ re: 0.5, im: 0, multiplicity: 1 }],
  gainRule: { kind: 'dc' },
});

function storageWithReference() {
  const storage = memoryStorage();
  const text = JSON.stringify({ pinnedAt: '2026-12-01T10:00:00.000Z', file: firstReleaseFile });
  storage.setItem(REFERENCE_KEY, text);
  return { storage, text };
}

describe('the pinned reference before the full reader has loaded', () => {
  beforeEach(() => installFullReader(null));
  afterEach(() => installFullReader(fullReader));

  it('appears once the reader is there, and storage is left as it was meanwhile', async () => {
    const { storage, text } = storageWithReference();
    const store = createCompareStore(storage, () => {});
    expect(store.getState().reference).toBeNull();
    expect(storage.getItem(REFERENCE_KEY)).toBe(text);
    await loadFullReader();
    await Promise.resolve();
    expect(store.getState().reference?.design.name).toBe('kept reference (first release)');
    expect(store.getState().reference?.pinnedAt).toBe('2026-12-01T10:00:00.000Z');
  });

  it('gives way to a pin made while the reader loads', async () => {
    const { storage } = storageWithReference();
    const store = createCompareStore(storage, () => {});
    const mine = { ...demoDesign(), name: 'pinned meanwhile' };
    store.getState().pin(mine);
    await loadFullReader();
    await Promise.resolve();
    expect(store.getState().reference?.design).toBe(mine);
  });
});

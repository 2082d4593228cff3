/** A requirement mask belongs to its design: a typed or opened system does not inherit it. */
import { describe, expect, it } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import type { DesignerSpec } from '../../src/core/design/index.ts';

const HUM: DesignerSpec = { kind: 'harmonicNotch', fs: 2000, f0: 50, harmonics: [1, 3, 5], bandwidthHz: 2 };
const typed = { b: [1, -1.6, 0.64], a: [1], text: 'b = [1, -1.6, 0.64]' };
const zeros = [{ re: 0.8, im: 0, multiplicity: 2 }];

function designedStore() {
  const store = createWorkbenchStore(emptyDesign(2000));
  expect(store.getState().runDesigner(HUM).ok).toBe(true);
  expect(store.getState().design.mask?.regions.length).toBeGreaterThan(0);
  return store;
}

describe('masks belong to designs', () => {
  it('typing a system removes the previous design’s mask and designer; one undo brings both back', () => {
    const store = designedStore();
    const before = store.getState().design;
    expect(store.getState().loadTyped(zeros, [], 1, typed)).toBeNull();
    expect(store.getState().design.mask).toBeUndefined();
    expect(store.getState().design.designer).toBeUndefined();
    store.getState().undo();
    expect(store.getState().design).toBe(before);
  });

  it('keeps the mask when the user chose to', () => {
    const store = designedStore();
    const mask = store.getState().design.mask;
    store.getState().loadTyped(zeros, [], 1, typed, undefined, { mask: true });
    expect(store.getState().design.mask).toBe(mask);
    expect(store.getState().design.designer).toBeUndefined();
  });

  it('an opened design brings its own mask, or none', () => {
    const store = designedStore();
    store.getState().replaceDesign({ ...emptyDesign(1000), name: 'opened' });
    expect(store.getState().design.mask).toBeUndefined();
  });
});

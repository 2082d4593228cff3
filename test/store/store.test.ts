import { describe, it, expect } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';

describe('workbench store: edits and undo', () => {
  it('a whole drag (many moves inside one gesture) is one undo step', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    const s = store.getState();
    s.addRoot('pole', { re: 0.5, im: 0.2, multiplicity: 1 });
    const afterAdd = store.getState().design;
    s.beginGesture();
    for (let i = 1; i <= 20; i++) store.getState().moveRoot({ kind: 'pole', index: 0 }, 0.5 + i * 0.01, 0.2);
    store.getState().endGesture();
    expect(store.getState().design.poles[0]!.re).toBeCloseTo(0.7, 12);
    store.getState().undo();
    expect(store.getState().design).toBe(afterAdd);
    store.getState().undo();
    expect(store.getState().design.poles).toHaveLength(0);
    store.getState().redo();
    store.getState().redo();
    expect(store.getState().design.poles[0]!.re).toBeCloseTo(0.7, 12);
  });

  it('a real root stays on the real axis when moved; a pair keeps im > 0', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    store.getState().addRoot('zero', { re: 0.3, im: 0, multiplicity: 1 });
    store.getState().addRoot('zero', { re: 0.3, im: 0.4, multiplicity: 1 });
    store.getState().moveRoot({ kind: 'zero', index: 0 }, 0.6, 0.5);
    store.getState().moveRoot({ kind: 'zero', index: 1 }, 0.6, -0.5);
    const [real, pair] = store.getState().design.zeros;
    expect(real).toEqual({ re: 0.6, im: 0, multiplicity: 1 });
    expect(pair).toEqual({ re: 0.6, im: 0.5, multiplicity: 1 });
  });

  it('editing a root releases the typed coefficients', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    store.getState().loadTyped([], [{ re: 0.8, im: 0, multiplicity: 2 }], 1, {
      b: [1],
      a: [1, -1.6, 0.64],
      text: 'b=[1]; a=[1,-1.6,0.64]',
    });
    expect(store.getState().design.typed?.a).toEqual([1, -1.6, 0.64]);
    store.getState().moveRoot({ kind: 'pole', index: 0 }, 0.7, 0);
    expect(store.getState().design.typed).toBeUndefined();
  });

  it('a rejected edit leaves history untouched', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    store.getState().setSampleRate(-5);
    store.getState().setSampleRate(NaN);
    expect(store.getState().history.past).toHaveLength(0);
    expect(store.getState().design.sampleRate).toBe(1000);
  });
});

import { describe, expect, it } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { selectLinearPhase } from '../../src/store/linearPhaseStatus.ts';
import { emptyDesign, type Design } from '../../src/core/model/design.ts';
import { zpkToTf } from '../../src/core/system/transferFunction.ts';
import type { Root } from '../../src/core/types.ts';

/** A linear-phase FIR by hand: a quadruplet, a pair on the circle, −1; six poles at the origin (order 7). */
function fir(): Design {
  const q = { re: 0.5, im: 0.4, multiplicity: 1 };
  return {
    ...emptyDesign(1000),
    zeros: [
      q,
      { re: Math.SQRT1_2, im: Math.SQRT1_2, multiplicity: 1 },
      { re: -1, im: 0, multiplicity: 1 },
      { re: 0.5 / 0.41, im: 0.4 / 0.41, multiplicity: 1 },
    ],
    poles: [{ re: 0, im: 0, multiplicity: 7 }],
  };
}

/** common practice: linear phase ⇔ taps symmetric or antisymmetric; the larger mismatch, relative. */
function asymmetry(zeros: Root[]): number {
  const b = zpkToTf({ zeros, poles: [], gain: 1 }).b;
  const big = Math.max(...b.map(Math.abs));
  let sym = 0;
  let anti = 0;
  for (let n = 0; n < b.length; n++) {
    sym = Math.max(sym, Math.abs(b[n]! - b[b.length - 1 - n]!));
    anti = Math.max(anti, Math.abs(b[n]! + b[b.length - 1 - n]!));
  }
  return Math.min(sym, anti) / big;
}

describe('linear phase kept by the store', () => {
  it('a drag of a quadruplet zero takes its partner along, one undo step; the status says linear, delay 3.5', () => {
    const store = createWorkbenchStore(fir());
    expect(selectLinearPhase(store.getState())).toMatchObject({ linear: true, delaySamples: 3.5 });
    const before = store.getState().design;
    store.getState().beginGesture();
    for (let k = 1; k <= 10; k++) store.getState().moveRoot({ kind: 'zero', index: 0 }, 0.5 - 0.02 * k, 0.4);
    store.getState().endGesture();
    const zeros = store.getState().design.zeros;
    expect(zeros[0]).toEqual({ re: 0.3, im: 0.4, multiplicity: 1 });
    expect(zeros[3]!.re).toBeCloseTo(0.3 / 0.25, 14);
    expect(zeros[3]!.im).toBeCloseTo(0.4 / 0.25, 14);
    expect(asymmetry(zeros)).toBeLessThan(1e-13);
    expect(selectLinearPhase(store.getState())).toMatchObject({ linear: true, delaySamples: 3.5 });
    store.getState().undo();
    expect(store.getState().design).toBe(before);
  });

  it('a typed value breaks it, the status says so, and restoring is one undo step that keeps the typed zero', () => {
    const store = createWorkbenchStore(fir());
    store.getState().select({ kind: 'zero', index: 3 });
    store.getState().moveRoots([{ ref: { kind: 'zero', index: 3 }, re: 0.9, im: 0.9 }]);
    const broken = store.getState().design;
    expect(asymmetry(broken.zeros)).toBeGreaterThan(1e-2);
    expect(selectLinearPhase(store.getState())).toMatchObject({
      linear: false,
      broken: true,
      orphans: [0, 3],
    });
    store.getState().restoreLinearPhase();
    const zeros = store.getState().design.zeros;
    expect(zeros[3]).toEqual({ re: 0.9, im: 0.9, multiplicity: 1 });
    expect(asymmetry(zeros)).toBeLessThan(1e-13);
    expect(selectLinearPhase(store.getState())).toMatchObject({ linear: true });
    store.getState().undo();
    expect(store.getState().design).toBe(broken);
  });

  it('a deleted member of a quadruplet comes back on restore, with the poles enough for a causal FIR', () => {
    const store = createWorkbenchStore({ ...fir(), poles: [{ re: 0, im: 0, multiplicity: 5 }] });
    store.getState().deleteRoot({ kind: 'zero', index: 3 });
    expect(selectLinearPhase(store.getState())).toMatchObject({ broken: true, orphans: [0] });
    store.getState().restoreLinearPhase();
    const d = store.getState().design;
    expect(d.zeros).toHaveLength(4);
    expect(asymmetry(d.zeros)).toBeLessThan(1e-13);
    expect(d.poles).toEqual([{ re: 0, im: 0, multiplicity: 7 }]);
    expect(d.parts).toBeUndefined(); // the partner given back is not a part placed by hand
  });

  it('zeros placed by hand without poles move freely, and nothing is said about them', () => {
    const store = createWorkbenchStore({ ...fir(), poles: [] });
    store.getState().moveRoot({ kind: 'zero', index: 1 }, 0.5, 0.5);
    expect(store.getState().design.zeros[1]).toEqual({ re: 0.5, im: 0.5, multiplicity: 1 });
    expect(store.getState().design.zeros[3]).toEqual(fir().zeros[3]);
    expect(selectLinearPhase(store.getState())).toBeNull();
  });
});

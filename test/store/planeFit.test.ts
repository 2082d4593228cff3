import { describe, expect, it } from 'vitest';
import { framed, HOME_VIEW, viewForDesign, viewShows } from '../../src/store/planeFit.ts';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import { defaultView } from '../../src/store/view.ts';
import { addPartEdit, removePartEdit } from '../../src/store/partEdits.ts';
import type { DesignerSpec } from '../../src/core/design/index.ts';

const root = (re: number, im = 0) => ({ re, im, multiplicity: 1 });
const circle = [
  { re: 1, im: 0 },
  { re: -1, im: 0 },
  { re: 0, im: 1 },
  { re: 0, im: -1 },
];

describe('viewForDesign', () => {
  it('keeps the current view when every root and the unit circle are already shown', () => {
    const design = { zeros: [root(-1)], poles: [root(0.5, 0.5)] };
    expect(viewForDesign(HOME_VIEW, design)).toBe(HOME_VIEW);
  });

  it('frames a pole at z = 2 together with the whole unit circle', () => {
    const design = { zeros: [root(-1)], poles: [root(2)] };
    const v = viewForDesign(HOME_VIEW, design);
    expect(viewShows(v, [{ re: 2, im: 0 }])).toBe(true);
    expect(viewShows(v, circle)).toBe(true);
    // Not needlessly far out: the roots and circle span 3 units of real axis.
    expect(v.span).toBeLessThan(3);
  });

  it('goes back to the unit circle from a zoomed view that hides roots inside it', () => {
    const zoomed = { span: 0.05, centre: { re: 0.9, im: 0.1 } };
    const design = { zeros: [], poles: [root(0.5, 0.5)] };
    expect(viewForDesign(zoomed, design)).toEqual(HOME_VIEW);
  });

  it('frames conjugate mirrors too (a pair stored once, drawn twice)', () => {
    const v = viewForDesign(HOME_VIEW, { zeros: [], poles: [root(0, 3)] });
    expect(viewShows(v, [{ re: 0, im: -3 }, { re: 0, im: 3 }, ...circle])).toBe(true);
  });
});

describe('store: a design that arrives whole is framed', () => {
  it('replaceDesign with a pole at z = 2 moves the plane view to include it', () => {
    const store = createWorkbenchStore(emptyDesign());
    store.getState().replaceDesign({ ...emptyDesign(), poles: [root(2)] });
    const { view } = store.getState();
    expect(viewShows({ span: view.planeSpan, centre: view.planeCentre }, [{ re: 2, im: 0 }, ...circle])).toBe(
      true,
    );
  });

  it('loadTyped (Apply) frames the typed roots; an edit inside the view leaves the view alone', () => {
    const store = createWorkbenchStore(emptyDesign());
    expect(
      store
        .getState()
        .loadTyped([], [root(-2.5)], 1, { b: [1], a: [1, 2.5], text: 'b = [1]; a = [1, 2.5]' }, {}),
    ).toBeNull();
    const v = store.getState().view;
    expect(viewShows({ span: v.planeSpan, centre: v.planeCentre }, [{ re: -2.5, im: 0 }])).toBe(true);
    store.getState().replaceDesign({ ...emptyDesign(), poles: [root(-2)] });
    expect(store.getState().view).toBe(v);
  });

  it('framed returns the same settings object when nothing needs to move', () => {
    expect(framed(defaultView, { zeros: [], poles: [root(0.9)] })).toBe(defaultView);
  });

  it('a designer run and a part added to a composed design are framed too; removing a part is not', () => {
    const fs = 1000;
    const lowpass: DesignerSpec = {
      kind: 'iir',
      family: 'butterworth',
      response: 'lowpass',
      order: 4,
      edgesHz: [125],
      fs,
    };
    const notch: DesignerSpec = { kind: 'notch', f0: 300, bandwidthHz: 4, fs };
    const store = createWorkbenchStore(emptyDesign(fs));
    const s = () => store.getState();
    const shown = () => ({ span: s().view.planeSpan, centre: s().view.planeCentre });
    const allRoots = () =>
      [...s().design.zeros, ...s().design.poles].flatMap((r) => [
        { re: r.re, im: r.im },
        { re: r.re, im: -r.im },
      ]);
    // Zoomed in far from where the designs put their roots.
    const away = { planeSpan: 0.05, planeCentre: { re: -0.5, im: -0.5 } };
    s().setView(away);
    expect(s().runDesigner(lowpass).ok).toBe(true);
    expect(viewShows(shown(), [...allRoots(), ...circle])).toBe(true);
    s().setView(away);
    // The notch at 300 Hz (angle 108°) is a part of its own, added on top of the low-pass.
    expect(s().designerEdit(addPartEdit(notch)).ok).toBe(true);
    expect(s().design.parts).toHaveLength(2);
    expect(viewShows(shown(), [...allRoots(), ...circle])).toBe(true);
    // Taking a part away only removes roots: a view the user zoomed stays.
    s().setView(away);
    const before = s().view;
    s().partsEdit(removePartEdit(1));
    expect(s().design.parts).toBeUndefined();
    expect(s().view).toBe(before);
  });
});

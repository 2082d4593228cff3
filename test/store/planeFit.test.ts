import { describe, expect, it } from 'vitest';
import { framed, HOME_VIEW, viewForDesign, viewShows } from '../../src/store/planeFit.ts';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import { defaultView } from '../../src/store/view.ts';

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
});

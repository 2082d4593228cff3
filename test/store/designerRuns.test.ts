/**
 * Designer output is derived data keyed on the designer's description: a root drag (a hundred moves, as the
 * Design page reads the store after each) must not run the designer at all; an auto-order elliptic design
 * takes about 20 ms per run, more than a frame.
 */
import { describe, expect, it, vi } from 'vitest';

const runs = vi.hoisted(() => ({ count: 0 }));
// the store imports the designers' light door (the page's first view; the algorithms load after it)
vi.mock('../../src/core/design/light.ts', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../src/core/design/light.ts')>();
  return {
    ...real,
    runDesigner: (...args: Parameters<typeof real.runDesigner>) => {
      runs.count++;
      return real.runDesigner(...args);
    },
  };
});

const { createWorkbenchStore } = await import('../../src/store/store.ts');
const { emptyDesign } = await import('../../src/core/model/design.ts');
const { selectDesignerResult, selectDesignerStatus, selectMaskResult, selectDisplayResponse } =
  await import('../../src/store/derived.ts');

describe('designer runs during a root drag', () => {
  it('a 100-step moveRoot sequence runs the designer 0 times; a new description runs it once', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    store.getState().runDesigner({
      kind: 'iir',
      fs: 1000,
      family: 'elliptic',
      response: 'lowpass',
      order: 'auto',
      passbandHz: [120],
      stopbandHz: [200],
      rippleDb: 1,
      attenuationDb: 60,
    });
    const read = () => {
      const s = store.getState();
      selectDesignerStatus(s);
      selectDesignerResult(s);
      selectMaskResult(s);
      selectDisplayResponse(s);
    };
    read();
    runs.count = 0;
    const pole = store.getState().design.poles[0]!;
    store.getState().beginGesture();
    store.getState().setDragging(true);
    const statuses = new Set<unknown>();
    for (let k = 1; k <= 100; k++) {
      const f = 1 + 0.002 * k;
      store.getState().moveRoot({ kind: 'pole', index: 0 }, pole.re / f, pole.im * f);
      read();
      statuses.add(selectDesignerStatus(store.getState()));
    }
    store.getState().setDragging(false);
    store.getState().endGesture();
    read();
    expect(runs.count).toBe(0);
    // The status object changes once (the roots become edited by hand), not per move.
    expect(statuses.size).toBe(1);
    expect(selectDesignerStatus(store.getState())!.editedByHand).toBe(true);
    // The counter does count: re-running with a new description runs the designer.
    store.getState().rerunDesigner({ rippleDb: 0.5 });
    read();
    expect(runs.count).toBeGreaterThanOrEqual(1);
  });
});

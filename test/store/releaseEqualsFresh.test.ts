/**
 * What a drag may do cheaply (a response grid of about one point per plot column, the mask judged on a
 * coarser grid, one designer status object for the whole drag) must not outlive it: after the release every
 * derived value equals what a fresh store of the same design (read back from its saved text) computes.
 */
import { describe, expect, it } from 'vitest';
import { createWorkbenchStore, type WorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import {
  selectDesignerResult,
  selectDesignerStatus,
  selectDisplayResponse,
  selectMaskResult,
  selectReadouts,
  selectSections,
  selectStability,
  selectTimeOutput,
  selectTf,
} from '../../src/store/derived.ts';

function everything(store: WorkbenchStore) {
  const s = store.getState();
  const response = selectDisplayResponse(s);
  return {
    omega: Array.from(response.omega),
    magnitude: Array.from(response.magnitude),
    phase: Array.from(response.phase),
    mask: selectMaskResult(s),
    status: selectDesignerStatus(s),
    designer: selectDesignerResult(s),
    stability: selectStability(s),
    readouts: selectReadouts(s),
    sections: selectSections(s),
    tf: selectTf(s),
    time: Array.from(selectTimeOutput(s)),
  };
}

describe('state after a drag', () => {
  it('equals a fresh load of the same design once the pointer is released', () => {
    const store = createWorkbenchStore(emptyDesign(48000));
    store.getState().runDesigner({
      kind: 'iir',
      fs: 48000,
      family: 'elliptic',
      response: 'lowpass',
      order: 'auto',
      passbandHz: [4000],
      stopbandHz: [4800],
      rippleDb: 0.5,
      attenuationDb: 70,
    });
    // The frequency plot says how many pixel columns it has (as FrequencyChart does when it mounts).
    store.getState().setView({ responseColumns: 300 });
    const rest = selectDisplayResponse(store.getState()).omega.length;
    const st = store.getState();
    st.beginGesture();
    st.setDragging(true);
    const pole = st.design.poles[0]!;
    const r0 = Math.hypot(pole.re, pole.im);
    const w0 = Math.atan2(pole.im, pole.re);
    let fewest = Infinity;
    for (let k = 1; k <= 100; k++) {
      const r = r0 * (1 - 0.0004 * k);
      const w = w0 * (1 + 0.003 * k);
      store.getState().moveRoot({ kind: 'pole', index: 0 }, r * Math.cos(w), r * Math.sin(w));
      fewest = Math.min(fewest, selectDisplayResponse(store.getState()).omega.length);
      selectMaskResult(store.getState());
      selectDesignerStatus(store.getState());
    }
    // The drag did use the coarser grid (so the check below can fail).
    expect(fewest).toBeLessThan(rest);
    store.getState().setDragging(false);
    store.getState().endGesture();
    const after = everything(store);

    const saved = JSON.stringify(store.getState().design);
    const fresh = createWorkbenchStore(JSON.parse(saved));
    fresh.getState().setView({ responseColumns: 300 });
    const loaded = everything(fresh);
    expect(after.omega.length).toBe(rest);
    expect(after).toEqual(loaded);
    expect(after.status?.editedByHand).toBe(true);
  });
});

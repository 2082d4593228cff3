import { describe, it, expect } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { demoDesign } from '../../src/store/demo.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import type { DesignerSpec } from '../../src/core/design/index.ts';
import { selectMaskResult, selectZpk } from '../../src/store/derived.ts';
import { evaluateMask } from '../../src/core/mask/index.ts';
import { expectClose } from '../helpers/expectClose.ts';
import { mulberry32 } from '../../src/core/random.ts';

/** An equiripple design whose mask has wide regions, where the grid (not only root angles) finds the worst point. */
const ELLIPTIC: DesignerSpec = {
  kind: 'iir',
  fs: 1000,
  family: 'elliptic',
  response: 'lowpass',
  order: 'auto',
  passbandHz: [120],
  stopbandHz: [200],
  rippleDb: 1,
  attenuationDb: 60,
};

function ellipticStore() {
  const store = createWorkbenchStore(emptyDesign(1000));
  store.getState().runDesigner(ELLIPTIC);
  return store;
}

describe('selectMaskResult during a root drag', () => {
  it.each([
    ['demo notches', () => createWorkbenchStore(demoDesign())],
    ['elliptic low-pass', ellipticStore],
  ])('the coarser drag grid reaches the full-grid verdict for seeded pole moves (%s)', (_name, make) => {
    const store = make();
    const rand = mulberry32(7);
    store.getState().beginGesture();
    store.getState().setDragging(true);
    for (let k = 0; k < 20; k++) {
      const poles = store.getState().design.poles;
      const i = Math.floor(rand() * poles.length);
      const p = poles[i]!;
      const r = Math.min(0.995, Math.hypot(p.re, p.im) * (0.97 + 0.05 * rand()));
      const w = Math.atan2(p.im, p.re) * (0.9 + 0.2 * rand());
      store.getState().moveRoot({ kind: 'pole', index: i }, r * Math.cos(w), r * Math.sin(w));
      const s = store.getState();
      const during = selectMaskResult(s)!;
      // The judge at rest: the engine's default grid on the same roots.
      const full = evaluateMask(s.design.mask!, selectZpk(s), s.design.sampleRate);
      expect(during.regions.map((x) => x.pass)).toEqual(full.regions.map((x) => x.pass));
      // Both refine their lowest minima to far below display precision (0.001 dB shown).
      expectClose(
        during.regions.map((x) => x.worstMarginDb),
        full.regions.map((x) => x.worstMarginDb),
        { abs: 1e-6 },
        `move ${k}`,
      );
    }
    store.getState().setDragging(false);
    store.getState().endGesture();
  });

  it('is judged again on the full grid on release, and memoised at rest', () => {
    const store = createWorkbenchStore(demoDesign());
    store.getState().setDragging(true);
    const during = selectMaskResult(store.getState());
    store.getState().setDragging(false);
    const rest = selectMaskResult(store.getState());
    expect(rest).not.toBe(during);
    expect(selectMaskResult(store.getState())).toBe(rest);
    const s = store.getState();
    expect(rest).toEqual(evaluateMask(s.design.mask!, selectZpk(s), s.design.sampleRate));
  });
});

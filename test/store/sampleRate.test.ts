/** A sample-rate change keeps a design in hertz, in one undo step. */
import { describe, expect, it } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import type { DesignerSpec } from '../../src/core/design/index.ts';
import { selectDesignerStatus, selectMaskResult } from '../../src/store/derived.ts';
import { rootFrequencyHz } from '../../src/core/readouts.ts';
import { expectClose } from '../helpers/expectClose.ts';

const NOTCH: DesignerSpec = { kind: 'notch', fs: 2000, f0: 50, bandwidthHz: 2 };

describe('changeSampleRate', () => {
  it('designs a designed notch again at the new rate: still 50 Hz, as designed, mask rebuilt and passing', () => {
    const store = createWorkbenchStore(emptyDesign(2000));
    store.getState().runDesigner(NOTCH);
    const before = store.getState().design;
    const r = store.getState().changeSampleRate(4000);
    expect(r.ok && r.value).toMatch(/Designed again at 4 kHz/);
    const d = store.getState().design;
    expect(d.sampleRate).toBe(4000);
    expect(d.designer).toMatchObject({ kind: 'notch', f0: 50, fs: 4000 });
    expectClose(rootFrequencyHz(d.zeros[0]!, 4000), 50, { rel: 1e-12 }, 'notch zero at 50 Hz');
    expect(selectDesignerStatus(store.getState())!.editedByHand).toBe(false);
    expect(d.mask!.regions.some((x) => x.toHz === 2000)).toBe(true);
    expect(selectMaskResult(store.getState())!.pass).toBe(true);
    store.getState().undo();
    expect(store.getState().design).toBe(before);
  });

  it('hand-placed roots keep their Hz by default, or their places when asked', () => {
    const theta = (2 * Math.PI * 50) / 2000;
    const start = {
      ...emptyDesign(2000),
      zeros: [{ re: Math.cos(theta), im: Math.sin(theta), multiplicity: 1 }],
      poles: [{ re: 0.95 * Math.cos(theta), im: 0.95 * Math.sin(theta), multiplicity: 1 }],
    };
    const store = createWorkbenchStore(start);
    expect(store.getState().changeSampleRate(4000).ok).toBe(true);
    expectClose(rootFrequencyHz(store.getState().design.zeros[0]!, 4000), 50, { rel: 1e-12 }, 'Hz kept');
    store.getState().undo();
    expect(store.getState().changeSampleRate(4000, 'keep-places').ok).toBe(true);
    expect(store.getState().design.zeros).toEqual(start.zeros);
    expectClose(rootFrequencyHz(store.getState().design.zeros[0]!, 4000), 100, { rel: 1e-12 }, 'places kept');
  });

  it('refuses a rate the designer cannot follow, and changes nothing', () => {
    const store = createWorkbenchStore(emptyDesign(2000));
    store.getState().runDesigner({ ...NOTCH, f0: 600 });
    const before = store.getState().design;
    const r = store.getState().changeSampleRate(1000);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/the designer cannot make this design at 1 kHz/);
    expect(store.getState().design).toBe(before);
  });
});

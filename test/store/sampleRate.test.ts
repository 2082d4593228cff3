/** A sample-rate change keeps a design in hertz, in one undo step. */
import { describe, expect, it } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import type { DesignerSpec } from '../../src/core/design/index.ts';
import { selectDesignerStatus, selectMaskResult } from '../../src/store/derived.ts';
import { rootFrequencyHz } from '../../src/core/readouts.ts';
import { expectClose } from '../helpers/expectClose.ts';
import { ratePlan } from '../../src/store/sampleRate.ts';
import { addPartEdit } from '../../src/store/partEdits.ts';
import { selectPartStatuses } from '../../src/store/partsDerived.ts';
import { maskOfParts } from '../../src/core/model/compose.ts';
import type { Design } from '../../src/core/model/design.ts';
import { magnitudeDbAt } from '../../src/core/response/magnitude.ts';
import { hzToOmega } from '../../src/core/units.ts';

/** The result of a change made at once (the design algorithms are installed in tests). */
function now<T>(r: T | Promise<T>): T {
  if (r instanceof Promise) throw new Error('the rate change waited for the design algorithms');
  return r;
}

const NOTCH: DesignerSpec = { kind: 'notch', fs: 2000, f0: 50, bandwidthHz: 2 };

describe('changeSampleRate', () => {
  it('designs a designed notch again at the new rate: still 50 Hz, as designed, mask rebuilt and passing', () => {
    const store = createWorkbenchStore(emptyDesign(2000));
    store.getState().runDesigner(NOTCH);
    const before = store.getState().design;
    const r = now(store.getState().changeSampleRate(4000));
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
    expect(now(store.getState().changeSampleRate(4000)).ok).toBe(true);
    expectClose(rootFrequencyHz(store.getState().design.zeros[0]!, 4000), 50, { rel: 1e-12 }, 'Hz kept');
    store.getState().undo();
    expect(now(store.getState().changeSampleRate(4000, 'keep-places')).ok).toBe(true);
    expect(store.getState().design.zeros).toEqual(start.zeros);
    expectClose(rootFrequencyHz(store.getState().design.zeros[0]!, 4000), 100, { rel: 1e-12 }, 'places kept');
  });

  it('refuses a rate the designer cannot follow, and changes nothing', () => {
    const store = createWorkbenchStore(emptyDesign(2000));
    store.getState().runDesigner({ ...NOTCH, f0: 600 });
    const before = store.getState().design;
    const r = now(store.getState().changeSampleRate(1000));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/the designer cannot make this design at 1 kHz/);
    expect(store.getState().design).toBe(before);
  });
});

describe('changeSampleRate on a composed design (a low-pass with a notch part)', () => {
  const FS = 1000;
  const LOWPASS: DesignerSpec = {
    kind: 'iir',
    family: 'butterworth',
    response: 'lowpass',
    order: 6,
    edgesHz: [125],
    passbandHz: [100],
    stopbandHz: [300],
    rippleDb: 1,
    attenuationDb: 40,
    fs: FS,
  };
  const NOTCH50: DesignerSpec = { kind: 'notch', f0: 50, bandwidthHz: 4, fs: FS };
  const composed = () => {
    const store = createWorkbenchStore(emptyDesign(FS));
    expect(store.getState().runDesigner(LOWPASS).ok).toBe(true);
    expect(store.getState().designerEdit(addPartEdit(NOTCH50)).ok).toBe(true);
    return store;
  };
  /** The notch part's zero (the last stored zero: the notch is part 2). */
  const notchZero = (d: Design) => d.zeros[d.zeros.length - 1]!;

  it('asks nothing, designs every part again at the new rate, rebuilds the mask, and one undo restores all', () => {
    const store = composed();
    const before = store.getState().design;
    expect(ratePlan(before)).toBe('rerun');
    const r = now(store.getState().changeSampleRate(4000));
    expect(r.ok && r.value).toMatch(/Every part was designed again at 4 kHz/);
    const d = store.getState().design;
    expect(d.parts!.map((p) => p.designer!.fs)).toEqual([4000, 4000]);
    expectClose(rootFrequencyHz(notchZero(d), 4000), 50, { rel: 1e-12 }, 'notch zero at 50 Hz');
    expect(selectPartStatuses(store.getState()).map((p) => p.editedByHand)).toEqual([false, false]);
    // The mask the parts imply at 4 kHz: the stop band now reaches the new fs/2, the pass band keeps its
    // ceiling (two-sided) around the notch, and the design passes it as it did at 1 kHz.
    expect(d.mask).toEqual(maskOfParts(d));
    expect(Math.max(...d.mask!.regions.map((x) => x.toHz))).toBe(2000);
    const pass = d.mask!.regions.filter((x) => x.kind === 'pass');
    expect(pass.length).toBeGreaterThan(1);
    for (const x of pass) expect([x.lowerDb, x.upperDb]).toEqual([-1, 1]);
    expect(selectMaskResult(store.getState())!.pass).toBe(true);
    store.getState().undo();
    expect(store.getState().design).toBe(before);
  });

  it('with a root placed by hand it asks; the designed parts are designed again and the hand root keeps its Hz', () => {
    const store = composed();
    const theta = (2 * Math.PI * 150) / FS;
    store.getState().addRoot('zero', { re: Math.cos(theta), im: Math.sin(theta), multiplicity: 1 });
    const before = store.getState().design;
    expect(before.parts!.map((p) => (p.designer ? p.designer.kind : 'hand'))).toEqual([
      'iir',
      'notch',
      'hand',
    ]);
    expect(ratePlan(before)).toBe('ask');
    const r = now(store.getState().changeSampleRate(4000, 'keep-hz'));
    expect(r.ok && r.value).toMatch(/2 of 3 parts were designed again .* part 3 \(placed by hand\) moved/);
    const d = store.getState().design;
    expectClose(rootFrequencyHz(d.zeros.at(-1)!, 4000), 150, { rel: 1e-12 }, 'hand zero at 150 Hz');
    expectClose(rootFrequencyHz(d.zeros.at(-2)!, 4000), 50, { rel: 1e-12 }, 'notch zero at 50 Hz');
    // The level is kept: the loudest point of the pass band (0–100 Hz) reads the same at both rates, within
    // what a 1000-point grid can tell apart.
    const peak = (x: Design) => {
      const zpk = { zeros: x.zeros, poles: x.poles, gain: (x.gainRule as { value: number }).value };
      let best = -Infinity;
      for (let k = 0; k <= 1000; k++)
        best = Math.max(best, magnitudeDbAt(zpk, hzToOmega(k / 10, x.sampleRate)));
      return best;
    };
    expectClose(peak(d), peak(before), { abs: 0.01 }, 'pass-band peak level');
    store.getState().undo();
    expect(store.getState().design).toBe(before);
    // Keeping places: the hand zero stays where it was in the plane (now at 600 Hz); the parts still follow Hz.
    expect(now(store.getState().changeSampleRate(4000, 'keep-places')).ok).toBe(true);
    const p = store.getState().design;
    expect(p.zeros.at(-1)).toEqual(before.zeros.at(-1));
    expectClose(rootFrequencyHz(p.zeros.at(-2)!, 4000), 50, { rel: 1e-12 }, 'notch zero at 50 Hz');
  });

  it('a designed part edited by hand keeps its hand edit in Hz and still reads as edited by hand', () => {
    const store = composed();
    const d0 = store.getState().design;
    const i = d0.zeros.length - 1; // the notch's zero
    const theta = (2 * Math.PI * 52) / FS;
    store.getState().moveRoot({ kind: 'zero', index: i }, Math.cos(theta), Math.sin(theta));
    expect(ratePlan(store.getState().design)).toBe('ask');
    const r = now(store.getState().changeSampleRate(2000));
    expect(r.ok && r.value).toMatch(/part 2 \(edited by hand\) moved/);
    const d = store.getState().design;
    expectClose(rootFrequencyHz(d.zeros[i]!, 2000), 52, { rel: 1e-12 }, 'the moved zero stays at 52 Hz');
    expect(d.parts!.map((p) => p.designer!.fs)).toEqual([2000, 2000]);
    expect(selectPartStatuses(store.getState()).map((p) => p.editedByHand)).toEqual([false, true]);
  });

  it('a part whose designer cannot follow the rate refuses the change and names the part', () => {
    const store = composed();
    const before = store.getState().design;
    const r = now(store.getState().changeSampleRate(90));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/part 1 cannot make it at 90 Hz/);
    expect(store.getState().design).toBe(before);
  });
});

describe('changeSampleRate on an FIR design', () => {
  it('designs the FIR again at the new rate: its band edges stay in Hz and it passes its two-sided mask', () => {
    const store = createWorkbenchStore(emptyDesign(8000));
    const spec = {
      kind: 'iir',
      family: 'equiripple',
      response: 'lowpass',
      order: 'auto',
      passbandHz: [1000],
      stopbandHz: [1500],
      rippleDb: 0.5,
      attenuationDb: 40,
      fs: 8000,
    } as unknown as DesignerSpec;
    expect(store.getState().runDesigner(spec).ok).toBe(true);
    expect(selectMaskResult(store.getState())!.pass).toBe(true);
    const r = now(store.getState().changeSampleRate(16000));
    expect(r.ok && r.value).toMatch(/Designed again at 16 kHz/);
    const d = store.getState().design;
    expect(d.designer).toMatchObject({ fs: 16000, passbandHz: [1000], stopbandHz: [1500] });
    expect(d.mask!.regions.find((x) => x.kind === 'pass')).toMatchObject({
      toHz: 1000,
      lowerDb: -0.5,
      upperDb: 0.5,
    });
    expect(selectMaskResult(store.getState())!.pass).toBe(true);
  });
});

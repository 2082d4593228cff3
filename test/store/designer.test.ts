import { describe, it, expect } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import { demoDesign } from '../../src/store/demo.ts';
import { mergeDesignerPatch } from '../../src/store/designer.ts';
import { selectDesignerStatus, selectMaskResult, selectZpk } from '../../src/store/derived.ts';
import { responseAt } from '../../src/core/response/index.ts';
import type { DesignerSpec } from '../../src/core/design/index.ts';
import { expectClose } from '../helpers/expectClose.ts';

const NOTCH: DesignerSpec = { kind: 'notch', fs: 1000, f0: 50, bandwidthHz: 2 };
const dbAt = (store: ReturnType<typeof createWorkbenchStore>, f: number) => {
  const h = responseAt(selectZpk(store.getState()), (2 * Math.PI * f) / store.getState().design.sampleRate);
  return 20 * Math.log10(Math.hypot(h.re, h.im));
};

describe('running a designer', () => {
  it('replaces roots, gain and sample rate, remembers the designer, and is one undo step', () => {
    const store = createWorkbenchStore(emptyDesign(48000));
    store.getState().addRoot('pole', { re: 0.5, im: 0, multiplicity: 1 });
    const before = store.getState().design;
    const r = store.getState().runDesigner(NOTCH);
    expect(r.ok).toBe(true);
    const d = store.getState().design;
    expect(d.sampleRate).toBe(1000);
    expect(d.designer).toEqual(NOTCH);
    expect(d.gainRule.kind).toBe('fixed');
    expect(d.zeros).toHaveLength(1);
    // A notch puts a zero pair on the unit circle at f0: angle 2π·50/1000 (common practice).
    expectClose(
      Math.atan2(d.zeros[0]!.im, d.zeros[0]!.re),
      (2 * Math.PI * 50) / 1000,
      { abs: 1e-12 },
      'zero angle',
    );
    expect(dbAt(store, 50)).toBeLessThan(-200);
    expectClose(dbAt(store, 0), 0, { abs: 1e-9 }, 'DC gain'); // a notch passes DC at 0 dB
    store.getState().undo();
    expect(store.getState().design).toBe(before);
  });

  it('bad parameters change nothing and say what to change', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    const before = store.getState().design;
    const r = store.getState().runDesigner({ kind: 'notch', fs: 1000, f0: 700, q: 10 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/f0 = 700 Hz lies outside \(0, 500\) Hz/);
    expect(store.getState().design).toBe(before);
    expect(store.getState().history.past).toHaveLength(0);
  });

  it('re-runs with changed parameters as one undo step; a width given drops the Q it replaces', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    store.getState().runDesigner({ kind: 'notch', fs: 1000, f0: 50, q: 25 });
    const designed = store.getState().design;
    const r = store.getState().rerunDesigner({ f0: 60, bandwidthHz: 4 });
    expect(r.ok).toBe(true);
    expect(store.getState().design.designer).toEqual({ kind: 'notch', fs: 1000, f0: 60, bandwidthHz: 4 });
    expect(dbAt(store, 60)).toBeLessThan(-200);
    expect(dbAt(store, 50)).toBeGreaterThan(-3);
    store.getState().undo();
    expect(store.getState().design).toBe(designed);
  });

  it('re-running without a designer is refused', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    const r = store.getState().rerunDesigner({ f0: 60 });
    expect(!r.ok && r.error.message).toMatch(/no designer/);
  });

  it('hand edits keep the designer but read "edited by hand"; undo reads "as designed" again', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    store.getState().runDesigner(NOTCH);
    expect(selectDesignerStatus(store.getState())).toEqual({ spec: NOTCH, editedByHand: false });
    store.getState().moveRoot({ kind: 'pole', index: 0 }, 0.9, 0.3);
    expect(store.getState().design.designer).toEqual(NOTCH);
    expect(selectDesignerStatus(store.getState())?.editedByHand).toBe(true);
    store.getState().undo();
    expect(selectDesignerStatus(store.getState())?.editedByHand).toBe(false);
  });

  it('a re-run follows a sample rate changed since; release forgets the designer and keeps the roots', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    store.getState().runDesigner(NOTCH);
    store.getState().setSampleRate(2000);
    expect(selectDesignerStatus(store.getState())?.editedByHand).toBe(true);
    store.getState().rerunDesigner({});
    expect(store.getState().design.designer?.fs).toBe(2000);
    expect(dbAt(store, 50)).toBeLessThan(-200);
    const roots = store.getState().design.poles;
    store.getState().releaseDesigner();
    expect(store.getState().design.designer).toBeUndefined();
    expect(store.getState().design.poles).toBe(roots);
    expect(selectDesignerStatus(store.getState())).toBeNull();
    store.getState().undo();
    expect(store.getState().design.designer?.fs).toBe(2000);
  });

  it('merges a patch: q replaces a bandwidth, a function patch replaces everything', () => {
    expect(mergeDesignerPatch(NOTCH, { q: 10 })).toEqual({ kind: 'notch', fs: 1000, f0: 50, q: 10 });
    expect(mergeDesignerPatch(NOTCH, () => ({ kind: 'dcBlocker', fs: 1000, cutoffHz: 5 }))).toEqual({
      kind: 'dcBlocker',
      fs: 1000,
      cutoffHz: 5,
    });
  });
});

describe('requirement mask in the store', () => {
  const REQUIREMENT: DesignerSpec = {
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

  it('a designer with a requirement fills in its mask, which passes; the verdict follows a dragged pole', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    store.getState().runDesigner(REQUIREMENT);
    const mask = store.getState().design.mask;
    expect(mask?.regions.map((r) => r.id)).toEqual(['pass', 'stop']);
    const verdict = selectMaskResult(store.getState());
    expect(verdict?.pass).toBe(true);
    expect(selectMaskResult(store.getState())).toBe(verdict); // memoised
    // Pull the pole nearest the circle inwards during a drag: its pass-band peak sags past the ripple limit.
    const poles = store.getState().design.poles;
    const i = poles.reduce(
      (b, p, j) => (Math.hypot(p.re, p.im) > Math.hypot(poles[b]!.re, poles[b]!.im) ? j : b),
      0,
    );
    const p = poles[i]!;
    store.getState().beginGesture();
    store.getState().moveRoot({ kind: 'pole', index: i }, p.re * 0.9, p.im * 0.9);
    const during = selectMaskResult(store.getState());
    expect(during?.pass).toBe(false);
    expect(during?.worstRegionId).toBe('pass');
    store.getState().moveRoot({ kind: 'pole', index: i }, p.re, p.im);
    store.getState().endGesture();
    expect(selectMaskResult(store.getState())?.pass).toBe(true);
  });

  it('keeps a user mask on a later design unless asked to replace it', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    const own = { regions: [{ id: 'mine', kind: 'stop' as const, fromHz: 45, toHz: 55, upperDb: -20 }] };
    expect(store.getState().setMask(own).ok).toBe(true);
    store.getState().runDesigner(REQUIREMENT);
    expect(store.getState().design.mask).toBe(own);
    store.getState().runDesigner(REQUIREMENT, 'replace');
    expect(store.getState().design.mask?.regions.map((r) => r.id)).toEqual(['pass', 'stop']);
  });

  it('region edits are one undo step each; a drag of an edge is one step', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    const s = () => store.getState();
    const added = s().addRegion({ kind: 'pass', fromHz: 0, toHz: 20, lowerDb: -0.1, upperDb: 0.1 });
    expect(added).toEqual({ ok: true, value: 'r1' });
    expect(s().updateRegion('r1', { toHz: 25 }).ok).toBe(true);
    const bad = s().updateRegion('r1', { toHz: 900 });
    expect(!bad.ok && bad.error.message).toMatch(/toHz = 900 Hz lies outside \[0, 500\] Hz/);
    expect(s().setMask({ regions: [{ id: 'x', kind: 'stop', fromHz: 1, toHz: 0, upperDb: -1 }] }).ok).toBe(
      false,
    );
    const beforeDrag = s().design;
    s().beginGesture();
    for (let f = 26; f <= 40; f++) s().moveRegionEdge('r1', 'toHz', f);
    s().endGesture();
    expect(s().design.mask?.regions[0]?.toHz).toBe(40);
    s().undo();
    expect(s().design).toBe(beforeDrag);
    s().deleteRegion('r1');
    expect(s().design.mask?.regions).toEqual([]);
    s().undo();
    s().undo();
    expect(s().design.mask?.regions[0]?.toHz).toBe(20);
    s().undo();
    expect(s().design.mask).toBeUndefined();
    expect(s().setMask(null).ok).toBe(true);
  });
});

describe('the name of a design a designer replaced', () => {
  const LOWPASS = {
    kind: 'iir',
    family: 'butterworth',
    response: 'lowpass',
    order: 4,
    edgesHz: [100],
    fs: 2000,
  } as unknown as DesignerSpec;
  const naming = { title: 'Butterworth low-pass' };

  it("the demo's name and note give way to the designer's title, in the same undo step", () => {
    const store = createWorkbenchStore(demoDesign());
    const before = store.getState().design;
    expect(store.getState().runDesigner(LOWPASS, 'keep', naming).ok).toBe(true);
    expect(store.getState().design.name).toBe('Butterworth low-pass');
    expect(store.getState().design.note).toBe('');
    store.getState().undo();
    expect(store.getState().design).toBe(before);
  });

  it('a name the user gave stays, and so does their note', () => {
    const d = { ...emptyDesign(2000), name: 'Silo level anti-alias', note: 'runs on the level board' };
    const store = createWorkbenchStore(d);
    store.getState().runDesigner(LOWPASS, 'keep', naming);
    expect(store.getState().design.name).toBe('Silo level anti-alias');
    expect(store.getState().design.note).toBe('runs on the level board');
  });

  it("a previous designer's title follows the next designer; an empty design's name does too", () => {
    const store = createWorkbenchStore(emptyDesign(2000));
    store.getState().runDesigner(LOWPASS, 'keep', naming);
    expect(store.getState().design.name).toBe('Butterworth low-pass');
    store.getState().runDesigner(NOTCH, 'keep', { title: 'Notch', previousTitle: 'Butterworth low-pass' });
    expect(store.getState().design.name).toBe('Notch');
    // Without naming (the command line, re-runs) the name is never touched.
    store.getState().runDesigner(LOWPASS);
    expect(store.getState().design.name).toBe('Notch');
  });
});

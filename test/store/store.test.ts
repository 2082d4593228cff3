import { describe, it, expect } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import { rootFrequencyHz } from '../../src/core/readouts.ts';

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

describe('compound edits are named store actions of one undo step', () => {
  const hopper = () => {
    const store = createWorkbenchStore(emptyDesign(2000));
    const r = store.getState().runDesigner({ kind: 'notch', fs: 2000, f0: 50, bandwidthHz: 4 });
    if (!r.ok) throw new Error(r.error.message);
    return store;
  };

  it("taking a recording's rate re-runs the designer there: the notch stays at 50 Hz, and one undo restores all", () => {
    const store = hopper();
    const before = store.getState().design;
    const r = store.getState().changeSampleRate(48000, 'keep-hz');
    expect(r).toMatchObject({ ok: true }); // at once: the design algorithms are installed
    const d = store.getState().design;
    expect(d.sampleRate).toBe(48000);
    expect(d.designer).toMatchObject({ fs: 48000, f0: 50 });
    // The zero pair sits at 50 Hz at the new rate (it would sit at 1.2 kHz had only the rate changed).
    expect(rootFrequencyHz(d.zeros[0]!, 48000)).toBeCloseTo(50, 9);
    store.getState().undo();
    expect(store.getState().design).toBe(before);
  });

  it('a rate the designer cannot follow, or no rate at all, changes nothing and says why', () => {
    const store = hopper();
    const before = store.getState().design;
    const r = store.getState().changeSampleRate(80);
    expect(r).toMatchObject({ ok: false, error: { parameter: 'f0' } });
    expect(store.getState().design).toBe(before);
    expect(store.getState().history.past).toHaveLength(1);
    expect(store.getState().changeSampleRate(-1)).toMatchObject({ ok: false });
    expect(store.getState().design).toBe(before);
  });

  it('without a designer or roots, a rate change is just the rate, one step', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    expect(store.getState().changeSampleRate(8000)).toEqual({ ok: true, value: 'Sample rate 8 kHz.' });
    expect(store.getState().design.sampleRate).toBe(8000);
    store.getState().undo();
    expect(store.getState().design.sampleRate).toBe(1000);
  });

  it('designing from the form sets the roots and the mask its requirement implies in one undo step', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    const before = store.getState().design;
    const r = store.getState().runDesigner(
      {
        kind: 'iir',
        fs: 1000,
        family: 'butterworth',
        response: 'lowpass',
        order: 'auto',
        passbandHz: [100],
        stopbandHz: [300],
        rippleDb: 1,
        attenuationDb: 40,
      },
      'replace',
    );
    expect(r.ok).toBe(true);
    expect(store.getState().design.mask?.regions.length).toBeGreaterThan(0);
    store.getState().undo();
    expect(store.getState().design).toBe(before);
  });
});

describe('the door every edit passes (core/model/check.ts)', () => {
  it('refuses an edit past a bound, leaves design and history alone and says why in a notice', async () => {
    const { noticeStore } = await import('../../src/store/notices.ts');
    noticeStore.setState({ notices: [] });
    const store = createWorkbenchStore(emptyDesign(1000));
    store.getState().addRoot('pole', { re: 0.5, im: 0.5, multiplicity: 500 });
    const before = store.getState().design;
    // A pair of multiplicity 513 would be order 1026.
    store.getState().setMultiplicity({ kind: 'pole', index: 0 }, 513);
    expect(store.getState().design).toBe(before);
    expect(store.getState().history.past).toHaveLength(1);
    expect(noticeStore.getState().notices.at(-1)!.text).toMatch(
      /That change was not made: poles: the poles have order 1026.*at most 1024/,
    );
    // Within the bound it goes through.
    store.getState().setMultiplicity({ kind: 'pole', index: 0 }, 512);
    expect(store.getState().design.poles[0]!.multiplicity).toBe(512);
  });

  it('returns the problem of a typed system past a bound instead of loading it', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    const problem = store.getState().loadTyped([], [], 1, { b: [1], a: [1], text: 'x'.repeat(131_201) });
    expect(problem?.path).toEqual(['typed', 'text']);
    expect(store.getState().design.typed).toBeUndefined();
  });

  it('turns a mask edit past a bound into the edit error', () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    const regions = Array.from({ length: 1025 }, (_, i) => ({
      id: `r${i}`,
      kind: 'stop' as const,
      fromHz: i * 0.4,
      toHz: i * 0.4 + 0.2,
      upperDb: -20,
    }));
    store.getState().replaceDesign({ ...emptyDesign(1000), mask: { regions } });
    const r = store.getState().addRegion({ kind: 'stop', fromHz: 450, toHz: 460, upperDb: -30 });
    expect(r).toMatchObject({
      ok: false,
      error: { message: expect.stringMatching(/mask\.regions: 1026 regions/) },
    });
    expect(store.getState().design.mask!.regions).toHaveLength(1025);
  });
});

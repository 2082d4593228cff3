/**
 * The page's first view carries the designers without their heavy algorithms (core/design/light.ts); the
 * store loads them after the first paint (store/designEngine.ts). A designer re-run asked for before they
 * arrived waits for them and then happens whole; a designer status never gives a verdict without them.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { emptyDesign } from '../../src/core/model/design.ts';
import { rootFrequencyHz } from '../../src/core/readouts.ts';
import { DESIGN_ENGINE } from '../../src/core/design/engine.ts';
import { designEngineReady, installDesignEngine } from '../../src/core/design/engineSlot.ts';
import { selectDesignerResult, selectDesignerStatus } from '../../src/store/derived.ts';
import type { DesignerSpec } from '../../src/core/design/light.ts';

/** The engine module's import, held until the test lets it arrive (or fail). */
const gate = await vi.hoisted(async () => (await import('../helpers/importGate.ts')).importGate());
vi.mock('../../src/store/designEngineImport.ts', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../src/store/designEngineImport.ts')>();
  return { importDesignEngine: gate.gated(real.importDesignEngine) };
});
const { loadDesignEngine } = await import('../../src/store/designEngine.ts');

const LOWPASS: DesignerSpec = {
  kind: 'iir',
  fs: 1000,
  family: 'butterworth',
  response: 'lowpass',
  order: 4,
  edgesHz: [100],
};

/** A store with a designed Butterworth low-pass (100 Hz at 1 kHz), made while the engine was installed. */
function designed() {
  const store = createWorkbenchStore(emptyDesign(1000));
  const r = store.getState().runDesigner(LOWPASS);
  if (!r.ok) throw new Error(r.error.message);
  return store;
}

describe('the design algorithms arriving after the first view', () => {
  beforeEach(() => {
    gate.hold();
    gate.imports = 0;
  });
  afterEach(() => installDesignEngine(DESIGN_ENGINE));

  it('when they cannot be fetched, a rate change changes nothing and the error says why', async () => {
    const store = designed();
    const before = store.getState().design;
    installDesignEngine(null);
    const pending = store.getState().changeSampleRate(8000);
    expect(pending).toBeInstanceOf(Promise);
    gate.fail();
    const r = await pending;
    expect(r).toMatchObject({ ok: false });
    expect(!r.ok && r.error.message).toMatch(/could not be loaded/);
    expect(store.getState().design).toBe(before);
    expect(designEngineReady()).toBe(false);
    expect(gate.imports).toBe(1); // the next attempt fetches again (the test below)
  });

  it("a recording's rate taken before they arrive waits, then re-runs the designer there in one step", async () => {
    const store = designed();
    const before = store.getState().design;
    installDesignEngine(null); // as on the page before the engine's chunk came
    const pending = store.getState().changeSampleRate(48000, 'keep-hz');
    expect(pending).toBeInstanceOf(Promise);
    expect(store.getState().design).toBe(before); // nothing yet: no rate without its re-run
    gate.arrive();
    const r = await pending;
    expect(r).toMatchObject({ ok: true });
    const d = store.getState().design;
    expect(d.sampleRate).toBe(48000);
    expect(d.designer).toMatchObject({ fs: 48000, edgesHz: [100] });
    // The poles of a 4th-order Butterworth low-pass at 100 Hz sit below 100 Hz (the highest near 92 Hz,
    // 100·sin 67.5°); the old roots read at 48 kHz would sit 48 times higher.
    const angle = (fs: number) => Math.max(...d.poles.map((p) => Math.abs(rootFrequencyHz(p, fs))));
    expect(angle(48000)).toBeLessThan(100);
    expect(angle(48000)).toBeGreaterThan(50);
    expect(store.getState().history.past).toHaveLength(2); // run + rate: one step each
    store.getState().undo();
    expect(store.getState().design).toBe(before);
    expect(gate.imports).toBe(1); // fetched again after the failure above, and once
  });

  it('the Design page runs the designer once they are loaded; the status gives no verdict before', async () => {
    const store = createWorkbenchStore(emptyDesign(1000));
    const r0 = store.getState().runDesigner(LOWPASS);
    expect(r0.ok).toBe(true);
    installDesignEngine(null);
    // the status without the engine: nothing (never "edited by hand")
    expect(selectDesignerStatus(store.getState())).toBeNull();
    expect(selectDesignerResult(store.getState())).toBeNull();
    const loading = loadDesignEngine(); // fetched by the test above: installed on the next tick
    expect(designEngineReady()).toBe(false);
    await loading;
    expect(designEngineReady()).toBe(true);
    expect(selectDesignerStatus(store.getState())).toMatchObject({ editedByHand: false });
    const r = store.getState().runDesigner({ ...LOWPASS, order: 6 });
    expect(r.ok).toBe(true);
    expect(store.getState().design.designer).toMatchObject({ order: 6 });
    expect(store.getState().design.poles.length).toBe(3); // three conjugate pairs
  });
});

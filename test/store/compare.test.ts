import { describe, expect, it } from 'vitest';
import { memoryStorage } from '../../src/share/storage.ts';
import {
  createCompareStore,
  phaseDifference,
  referenceLevelDb,
  REFERENCE_KEY,
  selectReferenceCurves,
  selectReferencePoint,
  selectReferenceResponse,
  selectReferenceTimeOutput,
} from '../../src/store/compare.ts';
import type { Design } from '../../src/core/model/design.ts';
import { defaultView } from '../../src/store/view.ts';
import { expectClose } from '../helpers/expectClose.ts';

/** H(z) = 1 + z⁻¹: one zero at z = −1, one pole at the origin, gain 1. */
function twoTap(sampleRate = 1000): Design {
  return {
    sampleRate,
    zeros: [{ re: -1, im: 0, multiplicity: 1 }],
    poles: [{ re: 0, im: 0, multiplicity: 1 }],
    gainRule: { kind: 'fixed', value: 1 },
    name: 'Two taps',
    note: '',
  };
}

describe('reference store', () => {
  it('pins and unpins without touching anything but its own storage key', () => {
    const storage = memoryStorage();
    const store = createCompareStore(storage, () => {});
    expect(store.getState().reference).toBeNull();
    store.getState().pin(twoTap(), new Date('2026-03-04T05:06:07Z'));
    expect(store.getState().reference?.pinnedAt).toBe('2026-03-04T05:06:07.000Z');
    expect([...storage.data.keys()]).toEqual([REFERENCE_KEY]);
    store.getState().unpin();
    expect(store.getState().reference).toBeNull();
    expect(storage.data.size).toBe(0);
  });

  it('brings the pinned design back after a reload, bit for bit', () => {
    const storage = memoryStorage();
    const design: Design = {
      ...twoTap(),
      zeros: [{ re: -0, im: 0.1 + 0.2, multiplicity: 2 }],
      gainRule: { kind: 'fixed', value: 1 / 3 },
      name: '<b>not bold</b>',
    };
    createCompareStore(storage, () => {})
      .getState()
      .pin(design);
    const again = createCompareStore(storage, () => {}).getState().reference;
    expect(again?.design).toEqual(design);
    expect(Object.is(again?.design.zeros[0]?.re, -0)).toBe(true);
  });

  it('drops a damaged entry with a warning instead of failing', () => {
    for (const text of ['{', '{"pinnedAt":"x","file":"{}"}', '[]', '{"file":3}']) {
      const storage = memoryStorage();
      storage.setItem(REFERENCE_KEY, text);
      const warnings: string[] = [];
      const store = createCompareStore(storage, (m) => warnings.push(m));
      expect(store.getState().reference).toBeNull();
      expect(warnings).toHaveLength(1);
    }
  });

  it('keeps working in memory when storage refuses to write', () => {
    const warnings: string[] = [];
    const store = createCompareStore(memoryStorage(10), (m) => warnings.push(m));
    store.getState().pin(twoTap());
    expect(store.getState().reference?.design.name).toBe('Two taps');
    expect(warnings[0]).toContain('could not be kept');
  });
});

describe('reference response', () => {
  const ref = { design: twoTap(1000), pinnedAt: '' };

  it('gives |1 + e^{-jω}| = 2·cos(ω/2) in dB at the reference sample rate', () => {
    // common practice: the two-tap sum has |H| = 2|cos(ω/2)|
    for (const hz of [0, 100, 250, 400]) {
      const expected = 20 * Math.log10(2 * Math.cos((Math.PI * hz) / 1000));
      expectClose(referenceLevelDb(ref, hz)!, expected, { abs: 1e-12 });
    }
    // At Nyquist the zero at z = −1 is hit to within the rounding of e^{-jπ}: far below any plot.
    expect(referenceLevelDb(ref, 500)!).toBeLessThan(-250);
    expect(referenceLevelDb(ref, 500.001)).toBeNull();
  });

  it('spans 0 Hz to the reference Nyquist on the frequency view grid', () => {
    const r = selectReferenceResponse(ref, { ...defaultView, responsePoints: 101 });
    expect(r.hz.length).toBe(101);
    expect(r.hz[0]).toBe(0);
    expectClose(r.hz[100]!, 500, { rel: 1e-15 });
    expectClose(r.response.magnitude[50]!, Math.SQRT2, { rel: 1e-14 });
    // memoised: the same inputs give the same object
    expect(selectReferenceResponse(ref, { ...defaultView, responsePoints: 101 })).toBe(r);
  });
});

describe('reference phase, delay and time output', () => {
  /** H(z) = (1 + z⁻¹)/2, the two-tap average. */
  const ref = {
    design: { ...twoTap(1000), gainRule: { kind: 'fixed', value: 0.5 } } as Design,
    pinnedAt: '',
  };

  it('has phase −ω/2 and a group delay of half a sample', () => {
    // common practice: the two-tap average is linear phase, −ω/2, with a constant delay of 0.5 samples
    for (const hz of [0, 50, 200, 320, 480]) {
      const w = (2 * Math.PI * hz) / 1000;
      const p = selectReferencePoint(ref, hz)!;
      expectClose(p.phase, -w / 2, { abs: 1e-12 });
      expectClose(p.phaseUnwrapped, -w / 2, { abs: 1e-12 });
      expectClose(p.groupDelay, 0.5, { abs: 1e-12 });
      expectClose(p.groupDelayMs, 0.5, { abs: 1e-12 }); // 0.5 samples at 1000 Hz
      expectClose(p.magnitudeDb, 20 * Math.log10(Math.cos(w / 2)), { abs: 1e-12 });
    }
    expect(selectReferencePoint(ref, 501)).toBeNull();
  });

  it('gives the curves in the plots’ units on the view grid', () => {
    const view = { ...defaultView, responsePoints: 101, magnitudeScale: 'db', delayUnit: 'samples' } as const;
    const c = selectReferenceCurves(ref, { ...view, phaseMode: 'unwrapped' });
    expect(selectReferenceCurves(ref, { ...view, phaseMode: 'unwrapped' })).toBe(c);
    // 101 grid points plus the zero's angle π, already on the grid: nothing merged in.
    expect(c.hz.length).toBe(101);
    for (const i of [0, 10, 50, 90]) {
      const w = (2 * Math.PI * c.hz[i]!) / 1000;
      expectClose(c.phase[i]!, (-w / 2) * (180 / Math.PI), { abs: 1e-10 });
      expectClose(c.delay[i]!, 0.5, { abs: 1e-12 });
      expectClose(c.magnitude[i]!, 20 * Math.log10(Math.cos(w / 2)), { abs: 1e-10 });
    }
    expectClose(c.phase[50]!, -45, { abs: 1e-10 }); // ω = π/2
    const ms = selectReferenceCurves(ref, { ...view, phaseMode: 'wrapped', delayUnit: 'ms' });
    expectClose(ms.delay[20]!, 0.5, { abs: 1e-12 }); // 0.5 samples of 1 ms
    const at2k = { design: { ...ref.design, sampleRate: 2000 }, pinnedAt: '' };
    const ms2 = selectReferenceCurves(at2k, { ...view, phaseMode: 'wrapped', delayUnit: 'ms' });
    expectClose(ms2.delay[20]!, 0.25, { abs: 1e-12 }); // 0.5 samples of 0.5 ms
    expectClose(ms2.hz[100]!, 1000, { rel: 1e-15 });
  });

  it('wraps the phase difference only when the view shows wrapped phase', () => {
    expectClose(phaseDifference(3, -3, true), 6 - 2 * Math.PI, { abs: 1e-15 });
    expect(phaseDifference(3, -3, false)).toBe(6);
  });

  it('filters the time input through the reference: y[n] = (x[n] + x[n−1])/2', () => {
    // common practice: the difference equation of the two-tap average
    const x = Float64Array.of(1, 0, 0, 2, -4, 1, 1, 1);
    const y = selectReferenceTimeOutput(ref, x);
    const expected = [0.5, 0.5, 0, 1, -1, -1.5, 1, 1];
    for (let n = 0; n < x.length; n++) expectClose(y[n]!, expected[n]!, { abs: 1e-15 });
    expect(selectReferenceTimeOutput(ref, x)).toBe(y);
  });
});

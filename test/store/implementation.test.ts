import { describe, it, expect } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { DEFAULT_IMPLEMENTATION, quantizedResponse } from '../../src/core/fixed/index.ts';
import type { SignalSpec } from '../../src/core/fixed/index.ts';
import {
  selectImplementation,
  selectQuantizedMaskResult,
  selectQuantizedResponse,
  selectShowQuantized,
  selectWordLengthSearch,
  simulationReport,
} from '../../src/store/implementationDerived.ts';
import { selectMaskResult, selectResponse } from '../../src/store/derived.ts';
import { expectClose } from '../helpers/expectClose.ts';

/** The demo's pole radius: r = 1 − 4π/fs at fs = 2 kHz (src/store/demo.ts). */
const DEMO_POLE_RADIUS = 1 - (4 * Math.PI) / 2000;

describe('implementation settings in the store', () => {
  it('the first change starts from the defaults and is one undo step; undo removes the settings', () => {
    const store = createWorkbenchStore();
    expect(store.getState().design.implementation).toBeUndefined();
    expect(store.getState().setImplementation({ wordLength: 12 })).toBeNull();
    expect(store.getState().design.implementation).toEqual({ ...DEFAULT_IMPLEMENTATION, wordLength: 12 });
    expect(store.getState().history.past).toHaveLength(1);
    store.getState().undo();
    expect(store.getState().design.implementation).toBeUndefined();
  });

  it('a bad value changes nothing and says what is accepted', () => {
    const store = createWorkbenchStore();
    const before = store.getState().design;
    const error = store.getState().setImplementation({ wordLength: 40 });
    expect(error?.message).toMatch(/word length 40/);
    expect(error?.expected).toMatch(/8 to 32/);
    expect(store.getState().design).toBe(before);
    expect(store.getState().history.past).toHaveLength(0);
  });

  it('setting what is already set records no step', () => {
    const store = createWorkbenchStore();
    store.getState().setImplementation({ rounding: 'truncate' });
    const after = store.getState().design;
    store.getState().setImplementation({ rounding: 'truncate' });
    expect(store.getState().design).toBe(after);
    expect(store.getState().history.past).toHaveLength(1);
  });

  it('a longer word widens the accumulator; hand-set fraction bits keep their integer bits', () => {
    const store = createWorkbenchStore();
    store.getState().setImplementation({ wordLength: 32 });
    // 16-bit data × 32-bit coefficients: a 16 + 32 − 1 = 47-bit product (defaults: 40-bit accumulator).
    expect(store.getState().design.implementation!.accumulatorBits).toBe(47);
    store.getState().setImplementation({ wordLength: 16, fractionBits: 13 });
    expect(store.getState().design.implementation!.accumulatorBits).toBe(47); // never narrowed
    store.getState().setImplementation({ wordLength: 12 });
    // Q2.13 in 16 bits has 2 integer bits; in 12 bits that is Q2.9.
    expect(store.getState().design.implementation!.fractionBits).toBe(9);
  });

  it('clearing is one undo step and hides the quantized layers', () => {
    const store = createWorkbenchStore();
    store.getState().setImplementation({ wordLength: 12 });
    expect(selectShowQuantized(store.getState())).toBe(true);
    store.getState().setView({ showQuantized: false });
    expect(selectShowQuantized(store.getState())).toBe(false);
    store.getState().setView({ showQuantized: true });
    store.getState().clearImplementation();
    expect(selectShowQuantized(store.getState())).toBe(false);
    store.getState().undo();
    expect(store.getState().design.implementation?.wordLength).toBe(12);
  });
});

describe('implementation selectors on the demo (50/150/250 Hz notches at 2 kHz)', () => {
  it('12-bit coefficients: pole radius from a2 rounded to Q1.10, notch at 50 Hz far shallower', () => {
    const store = createWorkbenchStore();
    store.getState().setImplementation({ wordLength: 12 });
    const r = selectImplementation(store.getState());
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.quantized.format).toEqual({ wordLength: 12, fractionBits: 10 });
    // a2 = r² is untouched by scaling; its code is round(r²·2^10) (common practice, worked by hand).
    const expectedRadius = Math.sqrt(Math.round(DEMO_POLE_RADIUS ** 2 * 1024) / 1024);
    for (const sec of r.value.sectionRoots)
      expectClose(Math.hypot(sec.poles[0]!.re, sec.poles[0]!.im), expectedRadius, { rel: 1e-12 });

    const q = selectQuantizedResponse(store.getState())!;
    expect(q.omega).toBe(selectResponse(store.getState()).omega);
    // The ideal zero sits on the circle at 50 Hz (−∞ dB); the quantized one has moved off 50 Hz.
    const at50 = quantizedResponse(r.value, Float64Array.of((2 * Math.PI * 50) / 2000));
    expect(at50.magnitudeDb[0]!).toBeGreaterThan(-20);
    // Selectors hand back the same objects until something changes.
    expect(selectQuantizedResponse(store.getState())).toBe(q);
  });

  it('the word-length search with a 40 dB hum mask needs more bits than stability alone', () => {
    const store = createWorkbenchStore();
    store.getState().setMask(null); // the demo comes with its own mask; start from none
    store.getState().setImplementation({ wordLength: 16 });
    const plain = selectWordLengthSearch(store.getState());
    expect(plain.wordLength).not.toBeNull();
    store.getState().setMask({
      regions: [{ id: 'hum', kind: 'stop', fromHz: 49.99, toHz: 50.01, upperDb: -40 }],
    });
    expect(selectMaskResult(store.getState())!.pass).toBe(true); // the ideal design meets it
    const withMask = selectWordLengthSearch(store.getState());
    expect(withMask.wordLength).not.toBeNull();
    expect(withMask.wordLength!).toBeGreaterThan(plain.wordLength!);
    // The found length passes the mask and one bit fewer does not.
    store.getState().setImplementation({ wordLength: withMask.wordLength! });
    expect(selectQuantizedMaskResult(store.getState())!.pass).toBe(true);
    store.getState().setImplementation({ wordLength: withMask.wordLength! - 1 });
    expect(selectQuantizedMaskResult(store.getState())!.pass).toBe(false);
  });

  it('an impulse of half scale through the L∞-scaled cascade does not overflow and comes to rest', () => {
    const store = createWorkbenchStore();
    store.getState().setImplementation({ wordLength: 16 });
    const spec: SignalSpec = { kind: 'impulse', length: 512 };
    const report = simulationReport(store.getState(), spec)!;
    expect(report.simulation.output).toHaveLength(512);
    expect(report.simulation.overflowCount).toBe(0);
    expect(report.afterInput.verdict).not.toBe('undecided');
    expect(simulationReport(store.getState(), spec)).toBe(report);
  });
});

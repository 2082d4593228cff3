import { describe, it, expect } from 'vitest';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  quantizedResponse,
} from '../../../src/core/fixed/index.ts';
import { responseZpk } from '../../../src/core/response/index.ts';
import type { Zpk } from '../../../src/core/types.ts';

/** Hopper scale notches (invented scenario): zeros on the circle at 50/150/250 Hz, poles 4 Hz wide, fs 2 kHz. */
const fs = 2000;
const r = 1 - (4 * Math.PI) / fs;
const pair = (f: number, radius: number) => ({
  re: radius * Math.cos((2 * Math.PI * f) / fs),
  im: radius * Math.sin((2 * Math.PI * f) / fs),
  multiplicity: 1,
});
const notch: Zpk = {
  zeros: [50, 150, 250].map((f) => pair(f, 1)),
  poles: [50, 150, 250].map((f) => pair(f, r)),
  gain: 0.99,
};

describe('a narrow notch in 12-bit coefficients', () => {
  const impl = buildImplementation(notch, fs, { ...DEFAULT_IMPLEMENTATION, wordLength: 12 });
  if (!impl.ok) throw new Error(impl.error.message);
  const q = impl.value;

  it('moves the roots: zeros stay on the circle (b0 = b2 codes) but turn; poles change radius', () => {
    for (let i = 0; i < q.quantized.codes.length; i++) {
      const { b } = q.quantized.codes[i]!;
      expect(b[0]).toBe(b[2]); // a symmetric numerator b0 = b2 keeps |z|² = b2/b0 = 1
      const z = q.sectionRoots[i]!.zeros[0]!;
      expect(Math.abs(Math.hypot(z.re, z.im) - 1)).toBeLessThan(1e-12);
    }
    const idealAngles = notch.zeros.map((z) => Math.atan2(z.im, z.re)).sort();
    const quantAngles = q.quantizedZpk.zeros.map((z) => Math.atan2(z.im, z.re)).sort();
    const moved = quantAngles.map((a, i) => Math.abs(a - idealAngles[i]!));
    expect(Math.max(...moved)).toBeGreaterThan(1e-4);
    const radii = q.quantizedZpk.poles.map((p) => Math.hypot(p.re, p.im));
    expect(Math.max(...radii.map((x) => Math.abs(x - r)))).toBeGreaterThan(1e-5);
  });

  it('makes the notch at 50 Hz shallower than the ideal one', () => {
    const w = Float64Array.of((2 * Math.PI * 50) / fs);
    const ideal = responseZpk(notch, w).magnitudeDb[0]!;
    const quant = quantizedResponse(q, w).magnitudeDb[0]!;
    expect(ideal).toBeLessThan(-200); // a zero on the circle: the ideal depth is unbounded (only rounding limits it)
    expect(quant).toBeGreaterThan(ideal + 100);
    expect(Number.isFinite(quant)).toBe(true);
  });
});

/**
 * An FIR kept as roots runs as a cascade of second-order sections (zpkToSections) in the page's time view, the
 * recording filter, the signal export and the command line. Its impulse response must be its taps (common
 * practice: the impulse response of an FIR is its coefficient sequence). The taps are scipy's
 * (scipy.signal.firwin, firls and remez fixtures, test/reference/gen_roots.py and gen_fir.py), taken to roots
 * by the root finder as a typed design would be. Before the sections of a zeros-only cascade were interleaved
 * by angle, the 129-tap cases came out wrong by more than the taps themselves and the 1025-tap one by ~1e80.
 */
import { describe, expect, it } from 'vitest';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';
import { zpkToSections } from '../../../src/core/system/sections.ts';
import { filterSections } from '../../../src/core/time/filter.ts';
import { makeImpulse } from '../../../src/core/time/inputs.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

interface Taps {
  name: string;
  h: number[];
}

const firwin = loadFixture<{ taps: number; coefficients: number[] }[]>('roots_fir').map((c) => ({
  name: `scipy.signal.firwin, ${c.taps} taps`,
  h: c.coefficients,
}));
const firls = loadFixture<{ taps: number; h: number[] }[]>('fir_firls').map((c) => ({
  name: `scipy.signal.firls, ${c.taps} taps`,
  h: c.h,
}));
const remez = loadFixture<{ kind: string; taps: number; h: number[] }[]>('fir_remez').map((c) => ({
  name: `scipy.signal.remez (${c.kind}), ${c.taps} taps`,
  h: c.h,
}));
const CASES: Taps[] = [...firwin, ...firls, ...remez].filter((c) => c.h.length >= 9);

describe('an FIR kept as roots, run as sections, gives its taps as its impulse response', () => {
  for (const c of CASES) {
    it(c.name, () => {
      const zpk = tfToZpk({ b: c.h, a: [1] });
      expect(zpk.poles.every((p) => p.re === 0 && p.im === 0)).toBe(true);
      const y = filterSections(zpkToSections(zpk), makeImpulse(c.h.length + 8));
      const big = Math.max(...c.h.map(Math.abs));
      let worst = 0;
      for (let k = 0; k < y.length; k++) worst = Math.max(worst, Math.abs(y[k]! - (c.h[k] ?? 0)));
      // The roots carry their own error (the taps multiplied out again from them: 1e-14 of the largest tap at
      // 129 taps, 2e-12 at 1025), and the n/2 sections' roundings pass through the sections after them: measured
      // 5e-14, 5e-13, 2e-11 and 2.5e-9 at 129, 255, 513 and 1025 taps. The bound grows as n²·1e-14 (1.7e-10 at
      // 129 taps, 1e-8 at 1025); the cascade in the pairing's order missed by more than the taps from 129 taps.
      const n = c.h.length;
      expect(worst / big, `largest error ${worst} against the largest tap ${big}`).toBeLessThan(
        1e-14 * n * n,
      );
    });
  }
});

/**
 * An FIR's quantized taps drawn on the plane and the magnitude plot (store/firQuantizedDerived.ts): the zeros
 * are the roots of the quantized taps and the magnitude is their response, both checked against numpy and
 * scipy on the same quantized taps (test/reference/gen_fir_quantized.py).
 */
import { describe, expect, it } from 'vitest';
import { createWorkbenchStore } from '../../src/store/store.ts';
import { selectFirImplementation } from '../../src/store/firDerived.ts';
import { selectFirQuantized, selectFirQuantizedMagnitude } from '../../src/store/firQuantizedDerived.ts';
import { selectRunsAsTaps, selectShowQuantized } from '../../src/store/implementationDerived.ts';
import { tfToZpk } from '../../src/core/system/fromCoefficients.ts';
import type { Root } from '../../src/core/types.ts';
import { loadFixture } from '../helpers/fixtures.ts';

interface Case {
  name: string;
  taps: number[];
  wordLength: number;
  fractionBits: number;
  codes: number[];
  zeros: { re: number[]; im: number[]; bound: number[] };
  magnitude: number[];
  magnitudeBound: number;
}

const CASES = loadFixture<Case[]>('fir_quantized');
/** The fixture's grid: the frequency view's default, 2048 points from 0 to π (store/view.ts). */
const GRID_POINTS = 2048;

/** A store holding the taps as typed coefficients (b = taps, a = 1) at 1 kHz, with a W-bit target set. */
function storeWith(c: Case) {
  const store = createWorkbenchStore();
  const zpk = tfToZpk({ b: c.taps, a: [1] });
  const problem = store
    .getState()
    .loadTyped(zpk.zeros, zpk.poles, zpk.gain, { b: c.taps, a: [1], text: `b = [${c.taps.join(', ')}]` });
  expect(problem).toBeNull();
  return store;
}

/** Every zero with its conjugate and multiplicity, as the complex list numpy.roots gives. */
function expand(zeros: readonly Root[]): { re: number; im: number }[] {
  return zeros.flatMap((z) =>
    Array.from({ length: z.multiplicity }, () =>
      z.im === 0
        ? [{ re: z.re, im: 0 }]
        : [
            { re: z.re, im: z.im },
            { re: z.re, im: -z.im },
          ],
    ).flat(),
  );
}

describe('the quantized taps of an FIR on the plane and the magnitude plot', () => {
  for (const c of CASES) {
    it(`${c.name}: codes, zeros and magnitude of the quantized taps`, () => {
      const store = storeWith(c);
      expect(selectRunsAsTaps(store.getState())).toBe(true);
      // no target settings: nothing quantized to draw
      expect(selectFirQuantized(store.getState())).toBeNull();
      expect(selectFirQuantizedMagnitude(store.getState())).toBeNull();
      store.getState().setImplementation({ wordLength: c.wordLength });
      const s = store.getState();
      expect(selectShowQuantized(s)).toBe(true);

      // the codes: most fraction bits that fit, nearest code, ties up (common practice; computed in Python)
      const fir = selectFirImplementation(s);
      expect(fir?.ok).toBe(true);
      if (!fir?.ok) return;
      expect(fir.value.format.fractionBits).toBe(c.fractionBits);
      expect(fir.value.codes).toEqual(c.codes);

      const q = selectFirQuantized(s)!;
      expect(q.zeros.converged).toBe(true);
      expect(q.zeros.leadingZeroTaps).toBe(c.codes.findIndex((k) => k !== 0));
      // numpy.roots 2.4 of the same quantized taps: the same count (zeros lost to leading zero taps, zeros
      // at the origin from trailing ones), each within twice numpy's own error bound (both solvers are
      // backward stable, so each is within such a bound of the truth); a multiple zero at the origin exactly
      const ours = expand(q.zeros.zeros);
      expect(ours).toHaveLength(c.zeros.re.length);
      const claimed = new Uint8Array(ours.length);
      for (let i = 0; i < c.zeros.re.length; i++) {
        const ref = { re: c.zeros.re[i]!, im: c.zeros.im[i]! };
        let best = -1;
        let bestD = Infinity;
        ours.forEach((z, j) => {
          const d = Math.hypot(z.re - ref.re, z.im - ref.im);
          if (!claimed[j] && d < bestD) [best, bestD] = [j, d];
        });
        claimed[best] = 1;
        const bound = c.zeros.bound[i]!;
        if (Number.isFinite(bound)) expect(bestD, `zero ${ref.re} ${ref.im}i`).toBeLessThanOrEqual(2 * bound);
        else expect(ours[best]).toEqual({ re: 0, im: 0 }); // numpy.roots: trailing zero taps, exact zeros
      }

      // scipy.signal.freqz 1.17 of the same quantized taps on the view's grid: both are Horner's rule, each
      // within 2 L eps Σ|c| of the true value
      const m = selectFirQuantizedMagnitude(s)!;
      let at = 0;
      for (let i = 0; i < GRID_POINTS; i++) {
        const w = (Math.PI * i) / (GRID_POINTS - 1);
        while (m.omega[at]! < w) at++;
        expect(m.omega[at], `grid point ${i}`).toBe(w);
        expect(Math.abs(m.magnitude[at]! - c.magnitude[i]!), `|H| at grid point ${i}`).toBeLessThanOrEqual(
          2 * c.magnitudeBound,
        );
        expect(m.magnitudeDb[at]).toBe(20 * Math.log10(m.magnitude[at]!));
      }
      // the points added between them sit at the angles of the zeros near the circle: the bottom of each
      // notch, below both grid neighbours for a zero on the circle
      const onCircle = ours.filter((z) => z.im > 0 && Math.abs(Math.hypot(z.re, z.im) - 1) < 1e-9);
      expect(m.omega.length).toBeGreaterThanOrEqual(GRID_POINTS + onCircle.length);
      for (const z of onCircle) {
        const w = Math.atan2(z.im, z.re);
        const k = m.omega.indexOf(w);
        expect(k, `a point at the zero ${z.re} ${z.im}i`).toBeGreaterThan(0);
        expect(m.magnitude[k]!).toBeLessThan(Math.min(m.magnitude[k - 1]!, m.magnitude[k + 1]!));
      }
    });
  }

  it('finds the zeros again only when the quantized taps change', () => {
    const c = CASES[0]!;
    const store = storeWith(c);
    store.getState().setImplementation({ wordLength: c.wordLength });
    const first = selectFirQuantized(store.getState())!;
    // the data word does not change the taps: the same zeros (not found again)
    store.getState().setImplementation({ dataWordLength: 24 });
    const same = selectFirQuantized(store.getState())!;
    expect(same.zeros).toBe(first.zeros);
    store.getState().setImplementation({ wordLength: c.wordLength - 4 });
    const other = selectFirQuantized(store.getState())!;
    expect(other.zeros).not.toBe(first.zeros);
    expect(other.taps).not.toEqual(first.taps);
  });
});

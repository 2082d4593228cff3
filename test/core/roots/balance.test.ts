/**
 * Exact power-of-two scaling of coefficients and variable (roots/balance.ts), and findRoots on polynomials
 * whose coefficients reach the subnormal range.
 */
import { describe, it, expect } from 'vitest';
import { applyBalance, chooseBalance, timesPowerOfTwo } from '../../../src/core/roots/balance.ts';
import { findRoots } from '../../../src/core/roots/index.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

const MIN_NORMAL = 2 ** -1022;

describe('chooseBalance', () => {
  it('scales only the coefficients, to a leading coefficient near 1, when every one stays normal', () => {
    const p = [0, 3e5, -2, 7e-200, 1e-250];
    const b = chooseBalance(p, 1, 3);
    expect(b.zoom).toBe(0);
    expect(b.shift).toBe(-Math.round(Math.log2(3e5)));
    const c = applyBalance(p, 1, 3, b);
    // the same bits as one multiplication by the power of two
    for (let k = 0; k <= 3; k++) expect(Object.is(c[k], p[1 + k]! * 2 ** b.shift)).toBe(true);
  });

  it('moves the subnormal coefficients of a degree-768 Butterworth denominator into the normal range, exactly', () => {
    const cases = loadFixture<{ name: string; coefficients: number[] }[]>('roots_truth_degree_768_1024');
    for (const name of [
      'Butterworth denominator, order 768, cutoff 0.5 of Nyquist',
      'Butterworth denominator, order 1024, cutoff 0.5 of Nyquist',
    ]) {
      const p = cases.find((c) => c.name === name)!.coefficients;
      let tail = p.length - 1;
      while (p[tail] === 0) tail--;
      expect(Math.abs(p[tail]!)).toBeLessThan(MIN_NORMAL);
      const b = chooseBalance(p, 0, tail);
      expect(b.zoom).not.toBe(0);
      const c = applyBalance(p, 0, tail, b);
      for (let k = 0; k <= tail; k++) {
        if (p[k] === 0) expect(c[k]).toBe(0);
        else expect(Math.abs(c[k]!)).toBeGreaterThanOrEqual(MIN_NORMAL);
        expect(Number.isFinite(c[k])).toBe(true);
        // undoing the scaling gives back the given bits: nothing was rounded
        expect(Object.is(timesPowerOfTwo(c[k]!, -(b.shift + b.zoom * k)), p[k])).toBe(true);
      }
    }
  });
});

describe('findRoots with a subnormal constant coefficient', () => {
  // z^n − 2^e: the roots are 2^(e/n)·exp(2πjk/n), k = 0 … n − 1 (de Moivre). Before the variable was scaled,
  // degree 16 with e = −1074 came back with moduli 4 % off and not converged, degree 1024 took 7 s; with
  // e = −1000 (a normal constant, but double-double's error terms underflow) degree 300 did not converge.
  it.each([
    [16, -1074],
    [16, -1060],
    [64, -1074],
    [300, -1060],
    [300, -1000],
  ])('finds the %i roots of z^n − 2^%i to the last bits', (n, e) => {
    const p = new Float64Array(n + 1);
    p[0] = 1;
    p[n] = -(2 ** e);
    const r = findRoots(p);
    expect(r.converged).toBe(true);
    const modulus = 2 ** (e / n);
    const angles: number[] = [];
    for (let i = 0; i < n; i++) {
      expect(Math.abs(Math.hypot(r.re[i]!, r.im[i]!) / modulus - 1)).toBeLessThanOrEqual(4 * Number.EPSILON);
      angles.push(Math.atan2(r.im[i]!, r.re[i]!));
    }
    angles.sort((a, b) => a - b);
    // one root at each n-th of the circle (atan2 in (−π, π]: k runs from −⌈n/2⌉ + 1)
    const first = -Math.ceil(n / 2) + 1;
    angles.forEach((a, k) => expect(Math.abs(a - (2 * Math.PI * (first + k)) / n)).toBeLessThan(1e-14));
  });
});

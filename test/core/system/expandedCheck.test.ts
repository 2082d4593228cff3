import { describe, it, expect } from 'vitest';
import { checkExpandedCoefficients } from '../../../src/core/system/expandedCheck.ts';
import type { Root, Zpk } from '../../../src/core/types.ts';

/** A comb of order n: poles at radius rho and zeros on the circle at the n-th roots of unity. */
function comb(n: number, rho: number): Zpk {
  const poles: Root[] = [];
  const zeros: Root[] = [];
  for (let k = 0; k <= n / 2; k++) {
    const t = (2 * Math.PI * k) / n;
    const im = k === 0 || k === n / 2 ? 0 : Math.sin(t);
    poles.push({ re: rho * Math.cos(t), im: rho * im, multiplicity: 1 });
    zeros.push({ re: Math.cos(t), im, multiplicity: 1 });
  }
  return { zeros, poles, gain: 1 };
}

describe('expanded coefficients against the design', () => {
  it('a low-order design multiplies out to itself: no warning', () => {
    const c = checkExpandedCoefficients(comb(8, 0.9));
    expect(c).toMatchObject({
      coefficientVerdict: 'stable',
      designVerdict: 'stable',
      warn: false,
      message: '',
    });
  });

  it('a comb of order 1000 multiplies out to z^1000 − rho^1000: stable, and no warning', () => {
    // Poles at rho times the 1000th roots of unity: Π(z − rho·w_k) = z^1000 − rho^1000 (algebra). Multiplied
    // out one factor at a time in doubles its middle coefficients came out near 1e234; in double-double
    // (core/multiplyOut.ts) they are roundings of 0, so the exact test decides and the response agrees.
    const c = checkExpandedCoefficients(comb(1000, 0.9994));
    expect(c.designVerdict).toBe('stable');
    expect(c.coefficientVerdict).toBe('stable');
    expect(c.maxResponseErrorDb).toBeLessThan(1e-6);
    expect(c.warn).toBe(false);
  }, 60_000);

  it('a cluster of 500 pole pairs gets its answer within bounded work: no exact verdict, and a warning to use sections', () => {
    // 500 pole pairs at radius 0.999 within 0.3 rad of z = 1, 1000 zeros at −1: the multiplied-out
    // denominator's coefficients span hundreds of orders of magnitude; the exact recursion at this size would
    // run for hours, and the page must not wait for it.
    const poles: Root[] = [];
    const zeros: Root[] = [{ re: -1, im: 0, multiplicity: 1000 }];
    for (let k = 0; k < 500; k++) {
      const t = (0.3 * (k + 0.5)) / 500;
      poles.push({ re: 0.999 * Math.cos(t), im: 0.999 * Math.sin(t), multiplicity: 1 });
    }
    const c = checkExpandedCoefficients({ zeros, poles, gain: 1 });
    expect(c.designVerdict).toBe('stable');
    expect(c.coefficientVerdict).toBe('undecided');
    expect(c.warn).toBe(true);
    expect(c.message).toMatch(/no exact stability verdict.*second-order sections/);
  }, 60_000);
});

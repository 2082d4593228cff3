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

  it('a comb of order 1000 gets its answer within bounded work: no exact verdict, and a warning to use sections', () => {
    // z^1000 multiplied out from 1000 roots in doubles: coefficients up to about 1e234, while the design's are
    // 1 and -rho^1000 (algebra), so its b, a are not the design; the exact recursion at this size would run
    // for hours, and the page must not wait for it.
    const c = checkExpandedCoefficients(comb(1000, 0.9994));
    expect(c.designVerdict).toBe('stable');
    expect(c.coefficientVerdict).toBe('undecided');
    expect(c.warn).toBe(true);
    expect(c.message).toMatch(/no exact stability verdict.*second-order sections/);
  }, 60_000);
});

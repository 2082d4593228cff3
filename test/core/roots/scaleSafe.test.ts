import { describe, expect, it } from 'vitest';
import { modulus, powerOfTwoScale } from '../../../src/core/roots/scaleSafe.ts';
import { mulberry32 } from '../../../src/core/random.ts';

/** Doubles over the whole range: random mantissas and exponents, subnormals, and the edges. */
function samples(): number[] {
  const u = mulberry32(2026);
  const out = [1, 2, 3, 0.5, 0.9999999999999999, 1.0000000000000002, 2 ** 52, 2 ** -1022, 2 ** -1023, 5e-324];
  out.push(1e-310, 1e300, 1.7976931348623157e308, 2 ** 1000, 2 ** 1001, 2 ** -1000, 2 ** -1001);
  for (let i = 0; i < 20000; i++) out.push((u() - 0.5) * 10 ** (u() * 640 - 325));
  return out;
}

describe('powerOfTwoScale', () => {
  it('is an exact power of two that brings max(|a|, |b|) into [1, 2), clamped to 2^±1000', () => {
    for (const a of samples()) {
      const m = Math.abs(a);
      const s = powerOfTwoScale(a, -a / 3);
      // A power of two: log2 is an integer (exact for every power of two in range).
      expect(Number.isInteger(Math.log2(s))).toBe(true);
      expect(Math.abs(Math.log2(s))).toBeLessThanOrEqual(1000);
      if (m === 0) continue;
      if (m >= 2 ** -1000 && m < 2 ** 1001) {
        expect(s * m).toBeGreaterThanOrEqual(1);
        expect(s * m).toBeLessThan(2);
      }
    }
  });

  it('is 1 for zero and non-finite input', () => {
    for (const a of [0, -0, Infinity, -Infinity, NaN]) expect(powerOfTwoScale(a, 0)).toBe(1);
  });
});

describe('modulus', () => {
  it('agrees with Math.hypot to an ulp or two over the whole range, and at the edges exactly', () => {
    const xs = samples();
    for (let k = 0; k + 1 < xs.length; k += 2) {
      const x = xs[k]!;
      const y = xs[k + 1]!;
      const h = Math.hypot(x, y);
      if (!Number.isFinite(h)) {
        expect(modulus(x, y)).toBe(h);
        continue;
      }
      // √(x² + y²) with two roundings inside the root: within 2 ulps of the correctly scaled value.
      expect(Math.abs(modulus(x, y) - h)).toBeLessThanOrEqual(2 * Number.EPSILON * h);
    }
    expect(modulus(1e200, 1e200)).toBe(Math.hypot(1e200, 1e200));
    expect(modulus(1e-200, 1e-200)).toBe(Math.hypot(1e-200, 1e-200));
    expect(modulus(0, 0)).toBe(0);
    expect(modulus(Infinity, NaN)).toBe(Infinity);
    expect(modulus(NaN, 1)).toBeNaN();
    expect(modulus(3, 4)).toBe(5);
  });
});

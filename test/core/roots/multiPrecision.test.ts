/**
 * The multi-precision Horner scheme against exact rational evaluation: every double is a dyadic rational, so
 * p(z) and p'(z) at double points are computed exactly with BigInt (roots/exactEval.ts) and rounded once.
 */
import { describe, it, expect } from 'vitest';
import { MultiPrecisionEvaluator } from '../../../src/core/roots/multiPrecision.ts';
import { exactPoly, exactValues } from '../../../src/core/roots/exactEval.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

/** p'/p from exact values (one rounding of each part, then a few double operations). */
function exactLogDerivative(c: number[], x: number, y: number): [number, number] {
  const v = exactValues(exactPoly(c), x, y);
  const s = Math.max(Math.abs(v.pr), Math.abs(v.pi));
  const pr = v.pr / s;
  const pi = v.pi / s;
  const den = pr * pr + pi * pi;
  return [((v.dr / s) * pr + (v.di / s) * pi) / den, ((v.di / s) * pr - (v.dr / s) * pi) / den];
}

describe('multi-precision Horner scheme', () => {
  const cases = loadFixture<{ name: string; coefficients: number[] }[]>('roots_truth_degree_768_1024');
  // Butterworth denominator at 0.5 of Nyquist, degree 768: its constant coefficient is subnormal
  const subnormal = cases.find(
    (c) => c.name === 'Butterworth denominator, order 768, cutoff 0.5 of Nyquist',
  )!;

  it('agrees with exact evaluation where coefficients reach the subnormal range', () => {
    const c = subnormal.coefficients;
    expect(Math.min(...c.map(Math.abs).filter((v) => v > 0))).toBeLessThan(2 ** -1022);
    const ev = new MultiPrecisionEvaluator(c);
    const out = new Float64Array(2);
    for (const [x, y] of [
      [0.1, 0.07],
      [-0.08, 0.03],
      [0.95, 0.2],
      [1.3, -0.4],
    ] as const) {
      expect(ev.at(x, y, out)).toBe(true);
      const [er, ei] = exactLogDerivative(c, x, y);
      // resolved to 2^-24 by its running bound; in practice to the last bits
      expect(Math.hypot(out[0]! - er, out[1]! - ei)).toBeLessThanOrEqual(2 ** -24 * Math.hypot(er, ei));
    }
  });

  it('says so where it cannot resolve p: at an exact root', () => {
    // z² − 1/4 at z = 1/2: p is exactly 0
    const ev = new MultiPrecisionEvaluator([1, 0, -0.25]);
    const out = new Float64Array([7, 7]);
    expect(ev.at(0.5, 0, out)).toBe(false);
    expect(Array.from(out)).toEqual([7, 7]);
  });
});

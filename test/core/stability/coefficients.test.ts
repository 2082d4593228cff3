import { describe, it, expect } from 'vitest';
import { stabilityOfCoefficients } from '../../../src/core/stability/coefficients.ts';
import { stabilityOfTyped } from '../../../src/core/stability/typed.ts';
import { schurCohnCertified, schurCohnExact } from '../../../src/core/stability/schurCohn.ts';
import { splitDouble, toIntegers } from '../../../src/core/stability/dyadic.ts';
import { gcd, sturmCount, divideExact } from '../../../src/core/stability/bigPoly.ts';
import { findRoots } from '../../../src/core/roots/index.ts';
import {
  exactInclusionDisks,
  inclusionDisks,
  mixedInclusionDisks,
} from '../../../src/core/roots/inclusion.ts';
import { exactPoly } from '../../../src/core/roots/exactEval.ts';
import { refineExactly } from '../../../src/core/roots/exactRefine.ts';
import { polyFromRoots } from '../../../src/core/poly.ts';
import type { Root } from '../../../src/core/types.ts';

/** Order-n digital Butterworth low-pass denominator (bilinear transform), multiplied out in doubles. */
function butterworthDenominator(n: number, cutoff: number): Float64Array {
  const wc = Math.tan((Math.PI * cutoff) / 2);
  const poles: Root[] = [];
  for (let k = 0; k < n; k++) {
    const th = (Math.PI * (2 * k + n + 1)) / (2 * n);
    const sr = wc * Math.cos(th);
    const si = wc * Math.sin(th);
    if (si < -1e-12) continue;
    const dr = 1 - sr;
    const dd = dr * dr + si * si;
    const zi = (si * dr + (1 + sr) * si) / dd;
    poles.push({ re: ((1 + sr) * dr - si * si) / dd, im: Math.abs(zi) < 1e-12 ? 0 : zi, multiplicity: 1 });
  }
  return polyFromRoots(poles);
}

/** Seeded uniform generator on [0, 1) (mulberry32). */
function uniform(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Ascending integer coefficients of Π (z − r) for integer roots r (exact). */
function fromIntegerRoots(roots: number[]): bigint[] {
  let p: bigint[] = [1n];
  for (const r of roots) {
    const q = new Array<bigint>(p.length + 1).fill(0n);
    for (let k = 0; k < p.length; k++) {
      q[k + 1] = q[k + 1]! + p[k]!;
      q[k] = q[k]! - BigInt(r) * p[k]!;
    }
    p = q;
  }
  return p;
}

describe('exact integers from doubles', () => {
  it('splits a double into an odd mantissa and a power of two', () => {
    // IEEE 754: 0.75 = 3·2^-2, 2^-1074 is the smallest subnormal
    expect(splitDouble(0.75)).toEqual({ mantissa: 3n, exponent: -2 });
    expect(splitDouble(-6)).toEqual({ mantissa: -3n, exponent: 1 });
    expect(splitDouble(5e-324)).toEqual({ mantissa: 1n, exponent: -1074 });
    expect(splitDouble(0.1)).toEqual({ mantissa: 3602879701896397n, exponent: -55 });
  });
  it('scales a coefficient list by one power of two', () => {
    expect(toIntegers([1, -0.5, 0.25, 0])).toEqual([4n, -2n, 1n, 0n]);
  });
});

describe('Schur–Cohn counts', () => {
  it('counts roots of integer polynomials with known roots exactly', () => {
    // Π (z − r) for integer roots: |r| ≥ 2 lies outside, r = 0 inside (algebra, no reference needed)
    const r = schurCohnExact(fromIntegerRoots([0, 2, -3, 0, 5]));
    expect(r).toEqual({ kind: 'counted', inside: 2, outside: 3 });
  });
  it('fraction-free rows divide exactly: random polynomials agree with the certified run', () => {
    const u = uniform(11);
    for (let t = 0; t < 200; t++) {
      const n = 2 + Math.floor(u() * 14);
      const p = Array.from({ length: n + 1 }, () => BigInt(Math.floor(u() * 199) - 99));
      if (p[n] === 0n) p[n] = 1n;
      const exact = schurCohnExact(p);
      const certified = schurCohnCertified(p, 4096);
      if (certified.kind === 'counted') expect(exact).toEqual(certified);
    }
  });
  it('stops at |k| = 1 exactly, never at a nearby value', () => {
    // z² + 0.3z − 1: |k| = 1 with no root on the circle (a removable singularity of the recursion)
    expect(schurCohnExact(toIntegers([-1, 0.3, 1])).kind).toBe('singular');
    expect(schurCohnExact(toIntegers([-1 + 2 ** -52, 0.3, 1])).kind).toBe('counted');
  });
});

describe('exact polynomial helpers', () => {
  it('gcd and exact division of integer polynomials', () => {
    const a = fromIntegerRoots([1, 2, 3]);
    const b = fromIntegerRoots([2, 3, 7]);
    expect(gcd(a, b)).toEqual(fromIntegerRoots([2, 3]));
    expect(divideExact(a, fromIntegerRoots([1]))).toEqual(fromIntegerRoots([2, 3]));
  });
  it('Sturm counts distinct real roots in (lo, hi]', () => {
    expect(sturmCount(fromIntegerRoots([-1, 0, 0, 1, 3]), -2n, 2n)).toBe(3);
    expect(sturmCount([1n, 0n, 1n], -2n, 2n)).toBe(0); // x² + 1
  });
});

describe('stabilityOfCoefficients', () => {
  it('decides the pole pair the fixed-distance merge hid: 0.9999993 and 1.0000001', () => {
    // 1 − 1.9999994 z^-1 + 0.99999939999993 z^-2 = (1 − 0.9999993 z^-1)(1 − 1.0000001 z^-1) to within the
    // doubles' rounding, which cannot move a root by 1e-7 (common practice: simple roots move by ~ε·κ)
    const s = stabilityOfCoefficients([1, -1.9999994, 0.99999939999993]);
    expect(s).toMatchObject({ verdict: 'unstable', inside: 1, outside: 1 });
  });
  it('finds roots exactly on the circle: integrator, oscillator, z³ − 1, comb of 200', () => {
    expect(stabilityOfCoefficients([1, -1])).toMatchObject({ verdict: 'marginal', onCircle: 1 });
    // a2 = 1 exactly: the complex pair's product of moduli is 1, so both lie on the circle (algebra)
    expect(stabilityOfCoefficients([1, -2 * Math.cos(0.3), 1])).toMatchObject({
      verdict: 'marginal',
      onCircle: 2,
    });
    expect(stabilityOfCoefficients([1, 0, 0, -1])).toMatchObject({ verdict: 'marginal', onCircle: 3 });
    const comb = [1, ...new Array<number>(199).fill(0), -1];
    expect(stabilityOfCoefficients(comb)).toMatchObject({ verdict: 'marginal', onCircle: 200 });
  });
  it('calls repeated poles on the circle and mirrored pairs unstable', () => {
    expect(stabilityOfCoefficients([1, -2, 1])).toMatchObject({
      verdict: 'unstable',
      repeatedOnCircle: true,
    });
    expect(stabilityOfCoefficients([1, 0, 2, 0, 1]).verdict).toBe('unstable'); // (z² + 1)²
    expect(stabilityOfCoefficients([1, -2.5, 1]).verdict).toBe('unstable'); // poles 2 and 0.5
    expect(stabilityOfCoefficients([1, -3.5, 3.5, -1]).verdict).toBe('unstable'); // 2, 0.5 and 1
    expect(stabilityOfCoefficients([1, 0.3, -1]).verdict).toBe('unstable'); // |k| = 1, roots −1.16, 0.86
  });
  it('counts poles at the origin as inside and ignores leading zeros', () => {
    expect(stabilityOfCoefficients([0, 1, -0.5, 0, 0])).toMatchObject({ verdict: 'stable', inside: 3 });
    expect(stabilityOfCoefficients([2])).toMatchObject({ verdict: 'stable', inside: 0 });
  });
  it('rejects non-finite and all-zero denominators', () => {
    expect(() => stabilityOfCoefficients([1, NaN])).toThrow(/a\[1\]/);
    expect(() => stabilityOfCoefficients([0, 0])).toThrow(/all zeros/);
  });
});

describe('stabilityOfTyped', () => {
  it('lets the exact coefficient verdict overrule poles that cannot be resolved', () => {
    // poles given as a double pole at 1 - 1e-6 (stable by the roots) but typed as (1 - z^-1)²: the typed
    // denominator has a double pole exactly on the circle (algebra), which grows
    const zpk = { zeros: [], poles: [{ re: 1 - 1e-6, im: 0, multiplicity: 2 }], gain: 1 };
    const s = stabilityOfTyped(zpk, [1, -2, 1]);
    expect(s).toMatchObject({ verdict: 'unstable', decidedBy: 'coefficients', rootsSuggested: 'stable' });
    expect(s.reason).toMatch(/repeated/);
  });
  it('confirms an agreeing verdict and says it was checked exactly', () => {
    const zpk = { zeros: [], poles: [{ re: 0.5, im: 0, multiplicity: 1 }], gain: 1 };
    const s = stabilityOfTyped(zpk, [1, -0.5]);
    expect(s).toMatchObject({ verdict: 'stable', decidedBy: 'coefficients' });
    expect(s.rootsSuggested).toBeUndefined();
    expect(s.reason).toMatch(/confirmed exactly/);
  });

  it('mixed disks: compensated bounds agree with the plain disks, exact values with the exact disks', () => {
    const c = butterworthDenominator(24, 0.3);
    const r = findRoots(c);
    const p = exactPoly(c);
    const none = mixedInclusionDisks(c, p, r.re, r.im, new Set());
    const plain = inclusionDisks(c, r.re, r.im);
    const every = mixedInclusionDisks(c, p, r.re, r.im, new Set(r.re.map((_, i) => i)));
    const exact = exactInclusionDisks(p, r.re, r.im);
    for (let i = 0; i < r.re.length; i++) {
      expect(none.radius[i]! / plain.radius[i]!).toBeCloseTo(1, 9);
      expect(every.radius[i]! / exact.radius[i]!).toBeCloseTo(1, 9);
    }
  });

  it('a degree-200 Butterworth denominator: the verdict equals the count with every root refined exactly', () => {
    // Two approximations of a tight pair near the origin lie a rounding apart, so their disks cover the whole
    // plane; refining those few exactly decides the verdict. The count must equal the slower certified route
    // (every root refined with exact evaluation, disks from exact values).
    const c = butterworthDenominator(200, 0.5);
    const s = stabilityOfCoefficients(c);
    const r = findRoots(c);
    const re = Float64Array.from(r.re);
    const im = Float64Array.from(r.im);
    const p = exactPoly(c);
    expect(refineExactly(p, re, im, 40)).toBe(true);
    const disks = exactInclusionDisks(p, re, im);
    let outside = 0;
    for (let i = 0; i < re.length; i++) {
      const mod = Math.hypot(re[i]!, im[i]!);
      expect(Math.abs(mod - 1)).toBeGreaterThan(disks.radius[i]!);
      if (mod > 1) outside++;
    }
    expect(s).toMatchObject({ method: 'inclusion', outside, inside: 200 - outside });
    expect(s.verdict).toBe(outside > 0 ? 'unstable' : 'stable');
  });
});

import { describe, expect, it } from 'vitest';
import {
  polyAdd,
  polyDerivative,
  polyEval,
  polyEvalComplex,
  polyFromRoots,
  polyMul,
  polyScale,
  polyTrim,
} from '../../src/core/poly.ts';
import { expectClose } from '../helpers/expectClose.ts';

/** Seeded uniform numbers in [-1, 1) (mulberry32), so every run checks the same cases. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return (((t ^ (t >>> 14)) >>> 0) / 4294967296) * 2 - 1;
  };
}

function randomPoly(rand: () => number, maxDegree: number): number[] {
  const n = Math.floor(((rand() + 1) / 2) * (maxDegree + 1));
  return Array.from({ length: n + 1 }, rand);
}

/** Scale for comparing values of a polynomial at x: Σ|a_k||x|^k. */
function evalScale(p: ArrayLike<number>, x: number): number {
  return polyEval(Array.from(p, Math.abs), Math.abs(x));
}

describe('polyTrim', () => {
  it('removes leading zeros and keeps the zero polynomial as [0]', () => {
    expect(Array.from(polyTrim([0, 0, 1, 0, 2]))).toEqual([1, 0, 2]);
    expect(Array.from(polyTrim([0, 0, 0]))).toEqual([0]);
    expect(Array.from(polyTrim([3]))).toEqual([3]);
  });
});

describe('polyMul, polyAdd, polyScale, polyEval', () => {
  it('evaluate consistently: (a·b)(x) = a(x)·b(x), (a+b)(x) = a(x)+b(x), (s·a)(x) = s·a(x)', () => {
    const rand = seeded(11);
    for (let trial = 0; trial < 200; trial++) {
      const a = randomPoly(rand, 12);
      const b = randomPoly(rand, 12);
      const x = 1.5 * rand();
      const s = 4 * rand();
      const ab = polyMul(a, b);
      expect(ab.length).toBe(a.length + b.length - 1);
      // Rounding of Horner's rule is bounded by about 2nε · Σ|a_k||x|^k (common practice).
      const tolAB = 64 * Number.EPSILON * evalScale(a, x) * evalScale(b, x);
      expectClose(polyEval(ab, x), polyEval(a, x) * polyEval(b, x), { abs: tolAB }, 'mul');
      const tolSum = 64 * Number.EPSILON * (evalScale(a, x) + evalScale(b, x));
      expectClose(polyEval(polyAdd(a, b), x), polyEval(a, x) + polyEval(b, x), { abs: tolSum }, 'add');
      expectClose(polyEval(polyScale(a, s), x), s * polyEval(a, x), { abs: tolSum * Math.abs(s) }, 'scale');
    }
  });

  it('multiplies small integer polynomials exactly', () => {
    // (x + 1)(x - 1) = x² - 1; (x + 2)² = x² + 4x + 4: hand-expanded (common practice).
    expect(Array.from(polyMul([1, 1], [1, -1]))).toEqual([1, 0, -1]);
    expect(Array.from(polyMul([1, 2], [1, 2]))).toEqual([1, 4, 4]);
    expect(Array.from(polyAdd([1, 0, 0], [2, 3]))).toEqual([1, 2, 3]);
  });
});

describe('polyEvalComplex', () => {
  it('agrees with polyEval on the real axis and maps conjugates to conjugates', () => {
    const rand = seeded(12);
    for (let trial = 0; trial < 100; trial++) {
      const p = randomPoly(rand, 15);
      const x = 2 * rand();
      const y = 2 * rand();
      const [r0, i0] = polyEvalComplex(p, x, 0);
      expect(r0).toBe(polyEval(p, x));
      expect(i0 === 0).toBe(true);
      const [r1, i1] = polyEvalComplex(p, x, y);
      const [r2, i2] = polyEvalComplex(p, x, -y);
      expect(r2).toBe(r1);
      expect(i2 === -i1).toBe(true);
    }
  });

  it('evaluates x² + 1 at i to zero and at 1 + i to 1 + 2i', () => {
    // (1+i)² + 1 = 1 + 2i: by hand (common practice).
    expect(polyEvalComplex([1, 0, 1], 0, 1)).toEqual([0, 0]);
    expect(polyEvalComplex([1, 0, 1], 1, 1)).toEqual([1, 2]);
  });
});

describe('polyDerivative', () => {
  it('obeys the product rule (a·b)′ = a′·b + a·b′', () => {
    const rand = seeded(13);
    for (let trial = 0; trial < 100; trial++) {
      const a = randomPoly(rand, 10);
      const b = randomPoly(rand, 10);
      const lhs = polyDerivative(polyMul(a, b));
      const rhs = polyAdd(polyMul(polyDerivative(a), b), polyMul(a, polyDerivative(b)));
      const x = rand();
      const tol = 1e-12 * (1 + evalScale(lhs, x));
      expectClose(polyEval(lhs, x), polyEval(rhs, x), { abs: tol }, 'product rule');
    }
  });

  it('differentiates x³ - 2x + 5 to 3x² - 2 and a constant to [0]', () => {
    expect(Array.from(polyDerivative([1, 0, -2, 5]))).toEqual([3, 0, -2]);
    expect(Array.from(polyDerivative([7]))).toEqual([0]);
  });
});

describe('polyFromRoots', () => {
  it('turns a conjugate pair into the exactly real quadratic x² - 2·re·x + |z|²', () => {
    const p = polyFromRoots([{ re: 0.3, im: 0.4, multiplicity: 1 }]);
    expect(Array.from(p)).toEqual([1, -0.6, 0.3 * 0.3 + 0.4 * 0.4]);
  });

  it('repeats a root by its multiplicity: (x - 2)³ = x³ - 6x² + 12x - 8', () => {
    // Binomial expansion (common practice).
    expect(Array.from(polyFromRoots([{ re: 2, im: 0, multiplicity: 3 }]))).toEqual([1, -6, 12, -8]);
  });

  it('vanishes at every root it was built from', () => {
    const rand = seeded(14);
    for (let trial = 0; trial < 50; trial++) {
      const roots = Array.from({ length: 1 + Math.floor(4 * (rand() + 1)) }, () => ({
        re: rand(),
        im: rand() > 0 ? Math.abs(rand()) : 0,
        multiplicity: 1 + Math.floor(rand() + 1),
      }));
      const p = polyFromRoots(roots);
      for (const r of roots) {
        const [pr, pi] = polyEvalComplex(p, r.re, r.im);
        const scale = evalScale(p, Math.hypot(r.re, r.im));
        expect(Math.hypot(pr, pi)).toBeLessThanOrEqual(1e-13 * scale);
      }
    }
  });

  it('multiplies 256 roots of unity times rho out to z^256 − rho^256 within a few roundings', () => {
    // Π(z − rho·w_k) over the n-th roots of unity w_k is z^n − rho^n (algebra). One factor at a time in
    // doubles the middle coefficients came out near 1e-4 here; they are roundings of 0 now.
    const n = 256;
    const rho = 0.999;
    const roots = [
      { re: rho, im: 0, multiplicity: 1 },
      { re: -rho, im: 0, multiplicity: 1 },
      ...Array.from({ length: n / 2 - 1 }, (_, k) => {
        const t = (2 * Math.PI * (k + 1)) / n;
        return { re: rho * Math.cos(t), im: rho * Math.sin(t), multiplicity: 1 };
      }),
    ];
    const p = polyFromRoots(roots);
    expect(p).toHaveLength(n + 1);
    expect(p[0]).toBe(1);
    let middle = 0;
    for (let k = 1; k < n; k++) middle = Math.max(middle, Math.abs(p[k]!));
    expect(middle).toBeLessThan(1e-13);
    expectClose(p[n]!, -(rho ** n), { rel: 1e-13 }, 'constant term −rho^n');
  });

  it('multiplies (z + 1)^16 out to the binomial coefficients exactly', () => {
    // Binomial expansion (common practice): integers below 2^53, so every coefficient is exact.
    const p = polyFromRoots([{ re: -1, im: 0, multiplicity: 16 }]);
    const binomial = [1];
    for (let k = 1; k <= 16; k++) binomial.push((binomial[k - 1]! * (17 - k)) / k);
    expect(Array.from(p)).toEqual(binomial);
  });
});

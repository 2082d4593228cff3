import { describe, expect, it } from 'vitest';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { findRoots, rootsBackwardError } from '../../../src/core/roots/index.ts';
import { setBackwardError } from '../../../src/core/roots/setBackwardError.ts';
import { polyFromRoots } from '../../../src/core/poly.ts';
import type { Root } from '../../../src/core/types.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { mulberry32 } from '../../../src/core/random.ts';

interface Roots {
  re: number[];
  im: number[];
}

/** The backward-error goal for every computed root set (dimensionless, relative to Σ|a_k||z|^k). */
const BACKWARD_GOAL = 1e-13;

/**
 * Largest relative distance |ours − reference| / max(1, |reference|) after matching the two root sets:
 * each reference root, taken in order of decreasing isolation, claims its nearest unclaimed computed root.
 */
function setDistance(ours: Roots, ref: Roots): number {
  expect(ours.re.length).toBe(ref.re.length);
  const n = ref.re.length;
  const claimed = new Uint8Array(n);
  let worst = 0;
  for (let i = 0; i < n; i++) {
    let best = -1;
    let bestD = Infinity;
    for (let j = 0; j < n; j++) {
      if (claimed[j]) continue;
      const d = Math.hypot(ours.re[j]! - ref.re[i]!, ours.im[j]! - ref.im[i]!);
      if (d < bestD) [best, bestD] = [j, d];
    }
    claimed[best] = 1;
    worst = Math.max(worst, bestD / Math.max(1, Math.hypot(ref.re[i]!, ref.im[i]!)));
  }
  return worst;
}

function asRoots(r: { re: Float64Array; im: Float64Array }): Roots {
  return { re: Array.from(r.re), im: Array.from(r.im) };
}

/** Every complex root has its exact conjugate in the set (real input), with equal multiplicity. */
function expectConjugateSymmetric(re: ArrayLike<number>, im: ArrayLike<number>): void {
  const key = (x: number, y: number) => `${x},${y}`;
  const count = new Map<string, number>();
  for (let i = 0; i < re.length; i++)
    count.set(key(re[i]!, im[i]!), (count.get(key(re[i]!, im[i]!)) ?? 0) + 1);
  for (let i = 0; i < re.length; i++) {
    if (im[i] === 0) continue;
    expect(count.get(key(re[i]!, -im[i]!)), `conjugate of ${re[i]} + ${im[i]}i`).toBe(
      count.get(key(re[i]!, im[i]!)),
    );
  }
}

function companionEigenvalues(p: ArrayLike<number>): Roots {
  const n = p.length - 1;
  const m = Matrix.zeros(n, n);
  for (let k = 0; k < n; k++) m.set(0, k, -p[k + 1]! / p[0]!);
  for (let k = 1; k < n; k++) m.set(k, k - 1, 1);
  const e = new EigenvalueDecomposition(m);
  return { re: e.realEigenvalues, im: e.imaginaryEigenvalues };
}

describe('findRoots against numpy.roots', () => {
  const random = loadFixture<{ degree: number; coefficients: number[]; roots: Roots }[]>('roots_random');
  const fir = loadFixture<{ taps: number; coefficients: number[]; roots: Roots }[]>('roots_fir');

  for (const c of random) {
    it(`random polynomial of degree ${c.degree}`, () => {
      const r = findRoots(c.coefficients);
      expect(r.converged).toBe(true);
      // numpy.roots 2.4: both solvers are backward stable; these roots are condition ~1e3 or better.
      expect(setDistance(asRoots(r), c.roots)).toBeLessThan(1e-10);
      expect(rootsBackwardError(c.coefficients, r.re, r.im)).toBeLessThan(BACKWARD_GOAL);
      expectConjugateSymmetric(r.re, r.im);
    });
  }

  for (const c of fir) {
    it(`FIR low-pass with ${c.taps} taps (zeros on and off the unit circle)`, () => {
      const r = findRoots(c.coefficients);
      expect(r.converged).toBe(true);
      // numpy.roots 2.4 of scipy.signal.firwin 1.17 coefficients.
      expect(setDistance(asRoots(r), c.roots)).toBeLessThan(1e-7);
      expect(rootsBackwardError(c.coefficients, r.re, r.im)).toBeLessThan(BACKWARD_GOAL);
      expectConjugateSymmetric(r.re, r.im);
      // A linear-phase (symmetric) filter has its zeros in reciprocal pairs z, 1/z̄: same count inside and outside.
      const inside = Array.from(r.re).filter((x, i) => Math.hypot(x, r.im[i]!) < 1 - 1e-6).length;
      const outside = Array.from(r.re).filter((x, i) => Math.hypot(x, r.im[i]!) > 1 + 1e-6).length;
      expect(inside).toBe(outside);
    });
  }
});

describe('findRoots against ml-matrix companion eigenvalues', () => {
  it('agrees on seeded random polynomials of degree 3 to 60', () => {
    const rand = mulberry32(21);
    for (const n of [3, 5, 7, 10, 15, 20, 30, 45, 60]) {
      const p = Array.from({ length: n + 1 }, () => 2 * rand() - 1);
      const r = findRoots(p);
      // ml-matrix 6.15 EigenvalueDecomposition of the companion matrix (a second, independent solver).
      expect(setDistance(asRoots(r), companionEigenvalues(p)), `degree ${n}`).toBeLessThan(1e-9);
    }
  });
});

describe('findRoots on clustered Butterworth denominators', () => {
  const cases =
    loadFixture<{ order: number; coefficients: number[]; poles: Roots; exactRoots: Roots }[]>(
      'roots_butterworth',
    );
  for (const c of cases) {
    it(`order ${c.order}: matches the exact roots of the stored coefficients`, () => {
      const r = findRoots(c.coefficients);
      expect(r.converged).toBe(true);
      expect(rootsBackwardError(c.coefficients, r.re, r.im)).toBeLessThan(BACKWARD_GOAL);
      expectConjugateSymmetric(r.re, r.im);
      // mpmath.polyroots 1.3 at 80 digits on the same coefficients. Up to order 20 the compensated polish
      // reaches them to rounding.
      if (c.order <= 20) expect(setDistance(asRoots(r), c.exactRoots)).toBeLessThan(1e-12);
      else {
        // At order 40 the cluster is so sensitive (ε-sized coefficient changes move it by 0.2) that even
        // twice the working precision pins it down only to about 0.15; numpy.roots 2.4 is 0.11 away from
        // the nearest exact root (measured when writing the test). Nearest distances only.
        for (let i = 0; i < c.exactRoots.re.length; i++) {
          const d = Math.min(
            ...Array.from(r.re, (x, j) =>
              Math.hypot(x - c.exactRoots.re[i]!, r.im[j]! - c.exactRoots.im[i]!),
            ),
          );
          expect(d).toBeLessThan(0.2);
        }
      }
      if (c.order <= 8) {
        // The true poles (bilinear transform of the analog prototype) are well conditioned at low order.
        expect(setDistance(asRoots(r), c.poles)).toBeLessThan(1e-12);
      }
    });
  }
});

/** Denominator of an order-n digital Butterworth low-pass (cutoff 0.2 of Nyquist), multiplied out. */
function butterworthDenominator(order: number): Float64Array {
  // Poles by the bilinear transform of the analog prototype (Butterworth, from memory).
  const wc = Math.tan((Math.PI * 0.2) / 2);
  const poles: Root[] = [];
  for (let k = 0; k < order / 2; k++) {
    const th = (Math.PI * (2 * k + order + 1)) / (2 * order);
    const sr = wc * Math.cos(th);
    const si = Math.abs(wc * Math.sin(th));
    const d = (1 - sr) ** 2 + si * si; // z = (1 + s) / (1 - s)
    poles.push({ re: ((1 + sr) * (1 - sr) - si * si) / d, im: (2 * si) / d, multiplicity: 1 });
  }
  return polyFromRoots(poles);
}

describe('findRoots on hopelessly clustered polynomials', () => {
  it('keeps the backward error small and the set symmetric for Butterworth denominators of order 128-512', () => {
    // The multiplied-out coefficients reach 1e107 and their exact roots scatter far from the poles;
    // numpy.roots 2.4 gets backward errors of 1e-3 to 1 here (bench/roots.ts), and Aberth's answers are
    // not symmetric on their own.
    for (const order of [128, 256, 512]) {
      const p = butterworthDenominator(order);
      const r = findRoots(p);
      expect(r.converged, `order ${order}`).toBe(true);
      expect(rootsBackwardError(p, r.re, r.im), `order ${order}`).toBeLessThan(BACKWARD_GOAL);
      expectConjugateSymmetric(r.re, r.im);
    }
  });

  it('converges for the order-1024 Butterworth denominator, whose coefficients span 1e-182 to 1e215', () => {
    // Near the origin |p| ≈ 1e-182 and elsewhere p' ≈ 1e218, so |p|² leaves the double range both ways;
    // numpy.roots 2.4 has backward error 1.0 here (bench/roots.ts).
    const p = butterworthDenominator(1024);
    const r = findRoots(p);
    expect(r.converged).toBe(true);
    expect(r.re.length).toBe(1024);
    expect(rootsBackwardError(p, r.re, r.im)).toBeLessThan(BACKWARD_GOAL);
    expectConjugateSymmetric(r.re, r.im);
  });

  it('finds roots whose residuals are below 1e-154 (|p|² underflows): x³ − 1e-200', () => {
    // Exact roots: 1e-200^(1/3) times the cube roots of unity (common practice).
    const r = findRoots(Float64Array.of(1, 0, 0, -1e-200));
    expect(r.converged).toBe(true);
    const mod = Math.cbrt(1e-200);
    const got = asRoots(r);
    const want: Roots = {
      re: [mod, -mod / 2, -mod / 2],
      im: [0, (mod * Math.sqrt(3)) / 2, (-mod * Math.sqrt(3)) / 2],
    };
    expect(setDistance(got, want) / mod).toBeLessThan(1e-14);
  });
});

describe('findRoots on repeated roots', () => {
  const cases = loadFixture<{ name: string; coefficients: number[]; roots: Root[] }[]>('roots_repeated');
  for (const c of cases) {
    it(`${c.name}: each repeated root merged when the merge reproduces the polynomial, else a tight cluster`, () => {
      const r = findRoots(c.coefficients);
      expect(r.converged).toBe(true);
      expect(rootsBackwardError(c.coefficients, r.re, r.im)).toBeLessThan(BACKWARD_GOAL);
      const full = (gs: Root[]) => gs.flatMap((g) => new Array<Root>(g.multiplicity).fill(g));
      const set = full(r.grouped);
      const merged = setBackwardError(
        c.coefficients,
        set.map((g) => g.re),
        set.map((g) => g.im),
      );
      // A multiplicity is only reported when the merged set multiplies out to the coefficients as well as
      // the separate roots do (issue 10); the double-double product is the measure.
      expect(merged).toBeLessThanOrEqual(
        2 * setBackwardError(c.coefficients, r.re, r.im) + 2 * Number.EPSILON,
      );
      const expected = c.roots.flatMap((q) => (q.im > 0 ? [q, { ...q, im: -q.im }] : [q]));
      for (const q of expected) {
        const dist = (x: Root) => Math.hypot(x.re - q.re, x.im - q.im);
        const g = r.grouped.reduce((a, b) => (dist(b) < dist(a) ? b : a));
        // Known roots the coefficients were multiplied out from (by hand). A merged root is refined, so it
        // is far better than the ε^(1/m) spread of the raw approximations; an unmerged m-fold root comes
        // back as m roots of the rounded coefficients within that spread.
        if (g.multiplicity === q.multiplicity) {
          const tol = q.multiplicity > 1 ? 1e-10 : 1e-8;
          expectClose(g.re, q.re, { abs: tol }, `${c.name} re`);
          expectClose(g.im, q.im, { abs: tol }, `${c.name} im`);
        } else {
          // (ε·κ)^(1/m), κ up to 1e8 for these degree-32 products
          const spread = (1e8 * Number.EPSILON) ** (1 / q.multiplicity) * Math.max(1, Math.hypot(q.re, q.im));
          const near = set.filter((x) => dist(x) <= spread);
          expect(near.length, `${c.name}: roots near ${q.re} + ${q.im}j`).toBe(q.multiplicity);
        }
      }
    });
  }

  it('merges the exactly representable multiple roots it is given', () => {
    // (z − 0.5)^4 and (z + 0.5)^3 multiplied out are exact in double: the merged roots are exact
    expect(findRoots([1, -2, 1.5, -0.5, 0.0625]).grouped).toEqual([{ re: 0.5, im: 0, multiplicity: 4 }]);
    expect(findRoots([1, 1.5, 0.75, 0.125]).grouped).toEqual([{ re: -0.5, im: 0, multiplicity: 3 }]);
  });

  it('returns 0.8 as a double root of x² - 1.6x + 0.64 to 1e-12', () => {
    const r = findRoots([1, -1.6, 0.64]);
    expect(r.grouped).toHaveLength(1);
    expect(r.grouped[0]!.multiplicity).toBe(2);
    expectClose(r.grouped[0]!.re, 0.8, { abs: 1e-12 }); // by hand: (x - 0.8)²
    expect(r.grouped[0]!.im).toBe(0);
  });

  it('finds a fourfold root and a double conjugate pair built from known roots', () => {
    const known: Root[] = [
      { re: -0.25, im: 0, multiplicity: 4 },
      { re: 0.5, im: 0.5, multiplicity: 2 },
      { re: 2, im: 0, multiplicity: 1 },
    ];
    const r = findRoots(polyFromRoots(known));
    const byMultiplicity = r.grouped.map((g) => g.multiplicity).sort();
    expect(byMultiplicity).toEqual([1, 2, 2, 4]);
    const four = r.grouped.find((g) => g.multiplicity === 4)!;
    expectClose(four.re, -0.25, { abs: 1e-11 }); // known root
    expect(four.im).toBe(0);
    const pair = r.grouped.filter((g) => g.multiplicity === 2);
    expect(pair[0]!.re).toBe(pair[1]!.re);
    expect(pair[0]!.im).toBe(-pair[1]!.im);
    expectClose(pair[0]!.re, 0.5, { abs: 1e-11 }); // known root
    expectClose(Math.abs(pair[0]!.im), 0.5, { abs: 1e-11 });
  });
});

describe('findRoots forward error on known roots', () => {
  it('recovers seeded, well-separated roots of polyFromRoots', () => {
    const rand = mulberry32(31);
    for (let trial = 0; trial < 20; trial++) {
      const known: Root[] = [];
      for (let k = 0; k < 6; k++) {
        const radius = 0.2 + rand();
        const angle = Math.PI * rand();
        known.push({
          re: radius * Math.cos(angle),
          im: rand() < 0.3 ? 0 : radius * Math.sin(angle),
          multiplicity: 1,
        });
      }
      const expected = known.flatMap((q) => (q.im > 0 ? [q, { ...q, im: -q.im }] : [q]));
      const r = findRoots(polyFromRoots(known));
      const ref = { re: expected.map((q) => q.re), im: expected.map((q) => q.im) };
      // Random roots at least this far apart have condition numbers ≲ 1e4 (common practice).
      let sep = Infinity;
      for (const a of expected)
        for (const b of expected) if (a !== b) sep = Math.min(sep, Math.hypot(a.re - b.re, a.im - b.im));
      if (sep < 0.05) continue;
      expect(setDistance(asRoots(r), ref)).toBeLessThan(1e-10);
    }
  });
});

describe('findRoots edge cases', () => {
  it('solves degree 1 and 2 in closed form', () => {
    expect(Array.from(findRoots([2, -1]).re)).toEqual([0.5]);
    const q = findRoots([1, -3, 2]); // (x - 1)(x - 2)
    expect(Array.from(q.re).sort()).toEqual([1, 2]);
    const c = findRoots([1, 2, 5]); // -1 ± 2i
    expect(Array.from(c.re)).toEqual([-1, -1]);
    expect(Array.from(c.im).sort()).toEqual([-2, 2]);
    expect(c.iterations).toBe(0);
  });

  it('counts leading zeros as roots at infinity and trailing zeros as exact roots at the origin', () => {
    const r = findRoots([0, 0, 1, -3, 2, 0, 0, 0]);
    expect(r.atInfinity).toBe(2);
    expect(r.re).toHaveLength(5);
    expect(Array.from(r.re.subarray(2))).toEqual([0, 0, 0]);
    expect(Array.from(r.im.subarray(2))).toEqual([0, 0, 0]);
    expect(r.grouped).toContainEqual({ re: 0, im: 0, multiplicity: 3 });
  });

  it('reports the zero polynomial and constants plainly', () => {
    const z = findRoots([0, 0, 0]);
    expect(z.zeroPolynomial).toBe(true);
    expect(z.re).toHaveLength(0);
    expect(findRoots([]).zeroPolynomial).toBe(true);
    const k = findRoots([0, 4]);
    expect(k.zeroPolynomial).toBe(false);
    expect(k.re).toHaveLength(0);
    expect(k.atInfinity).toBe(1);
  });

  it('rejects non-finite coefficients with the position named', () => {
    expect(() => findRoots([1, NaN, 2])).toThrow(/coefficient 1/);
  });

  it('puts the roots of x^n - 1 exactly on the unit circle to rounding', () => {
    for (const n of [3, 12, 64, 255]) {
      const p = new Float64Array(n + 1);
      p[0] = 1;
      p[n] = -1;
      const r = findRoots(p);
      for (let i = 0; i < n; i++) expectClose(Math.hypot(r.re[i]!, r.im[i]!), 1, { abs: 1e-14 }, `n=${n}`);
      // Roots of unity (common practice): the matching angles 2πk/n.
      const ref = {
        re: Array.from({ length: n }, (_, k) => Math.cos((2 * Math.PI * k) / n)),
        im: Array.from({ length: n }, (_, k) => Math.sin((2 * Math.PI * k) / n)),
      };
      expect(setDistance(asRoots(r), ref)).toBeLessThan(1e-13);
    }
  });

  it('keeps relative accuracy for roots of very different magnitudes', () => {
    const known = [1e-6, 1, 1e6, -3e-3, 4e3];
    const r = findRoots(polyFromRoots(known.map((re) => ({ re, im: 0, multiplicity: 1 }))));
    for (const x of known) {
      const got = Array.from(r.re).reduce((b, v) => (Math.abs(v - x) < Math.abs(b - x) ? v : b), Infinity);
      expectClose(got, x, { rel: 1e-12 }, `root ${x}`); // known root
    }
  });

  it('reports non-convergence when the sweep limit is too small', () => {
    const p = Array.from({ length: 41 }, (_, k) => (k % 3) - 1 + 0.5);
    const r = findRoots(p, { maxIterations: 1 });
    expect(r.converged).toBe(false);
    expect(r.iterations).toBe(1);
    expect(findRoots(p).converged).toBe(true);
  });

  it('gives exactly conjugate-symmetric roots for seeded random real polynomials', () => {
    const rand = mulberry32(41);
    for (let trial = 0; trial < 30; trial++) {
      const n = 3 + Math.floor(40 * rand());
      const p = Array.from({ length: n + 1 }, () => 2 * rand() - 1);
      const r = findRoots(p);
      expectConjugateSymmetric(r.re, r.im);
      const g = r.grouped;
      for (const q of g) if (q.im !== 0) expect(g.some((o) => o.re === q.re && o.im === -q.im)).toBe(true);
    }
  });
});

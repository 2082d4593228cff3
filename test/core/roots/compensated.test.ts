/**
 * The one-pass compensated evaluation of p and p' (roots/compensated.ts, division by the real quadratic with
 * roots z and z̄) against exact values: p(z) and p'(z) computed in exact rational arithmetic (BigInt Horner
 * on the dyadic coefficients and point, roots/exactEval.ts), at points near the roots of badly conditioned
 * polynomials where plain Horner loses every digit.
 */
import { describe, it, expect } from 'vitest';
import { compensatedEvalWithDerivative } from '../../../src/core/roots/compensated.ts';
import { exactPoly, exactValues } from '../../../src/core/roots/exactEval.ts';
import { findRoots } from '../../../src/core/roots/index.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

interface Named {
  name: string;
  coefficients: number[];
}

const high = loadFixture<Named[]>('roots_truth_high_degree');
const special = loadFixture<Named[]>('roots_truth_special');
const pick = (list: Named[], name: string) => list.find((c) => c.name === name)!.coefficients;
const random = (() => {
  const u = mulberry32(4242);
  return Array.from({ length: 41 }, () => u() - 0.5);
})();

const cases: [string, number[]][] = [
  // scipy's coefficients (test/reference fixtures)
  [
    'Butterworth denominator, order 128',
    pick(high, 'Butterworth denominator, order 128, cutoff 0.2 of Nyquist'),
  ],
  ['Wilkinson type, roots k/21', pick(special, 'Wilkinson type, roots k/21')],
  ['(z + 1)^8', pick(special, '(z + 1)^8')],
  ['(z - 1)^7', pick(special, '(z - 1)^7')],
  ['seeded random, degree 40', random],
];

/** Exact p(z), p'(z) as doubles in the coefficients' own units. */
function exact(c: number[], x: number, y: number): { pr: number; pi: number; dr: number; di: number } {
  const ints = exactPoly(c);
  const k = ints.findIndex((v) => v !== 0n);
  // The integers are c·2^s for one s: undo it with the first nonzero coefficient (a power-of-two ratio).
  const unit = c[k]! / Number(ints[k]!);
  const e = exactValues(ints, x, y);
  const f = unit * 2 ** e.scale;
  return { pr: e.pr * f, pi: e.pi * f, dr: e.dr * f, di: e.di * f };
}

describe('compensatedEvalWithDerivative against exact rational arithmetic', () => {
  it.each(cases)('%s: p and p′ within the twice-the-precision bound near every root', (_name, c) => {
    const n = c.length - 1;
    const coeffs = Float64Array.from(c);
    const r = findRoots(c);
    const u = mulberry32(17);
    const out = new Float64Array(5);
    const eps = Number.EPSILON / 2;
    let plainFails = 0;
    let checked = 0;
    for (let i = 0; i < r.re.length; i++) {
      for (const rel of [1e-2, 1e-4, 1e-6]) {
        const a = 2 * Math.PI * u();
        const m = Math.max(Math.hypot(r.re[i]!, r.im[i]!), 1e-3);
        const x = r.re[i]! + rel * m * Math.cos(a);
        const y = r.im[i]! + rel * m * Math.sin(a);
        const t = exact(c, x, y);
        compensatedEvalWithDerivative(coeffs, x, y, out);
        // Bounds: Σ|c_k||z|^k for p, Σ k|c_k||z|^(k−1) for p'.
        const mod = Math.hypot(x, y);
        let b = 0;
        let bd = 0;
        let pr = 0;
        let pi = 0;
        for (let k = 0; k <= n; k++) {
          bd = bd * mod + b;
          b = b * mod + Math.abs(c[k]!);
          const tr = pr * x - pi * y + c[k]!;
          pi = pr * y + pi * x;
          pr = tr;
        }
        expect(Math.abs(out[4]! - b)).toBeLessThanOrEqual(1e-12 * b);
        // As if computed with unit roundoff ε², up to the recurrence's factor n (see compensated.ts):
        // |error| ≤ 2ε|value| + n·(4nε)²·bound.
        const slack = n * (4 * n * eps) ** 2;
        const errP = Math.hypot(out[0]! - t.pr, out[1]! - t.pi);
        const errD = Math.hypot(out[2]! - t.dr, out[3]! - t.di);
        expect(errP).toBeLessThanOrEqual(2 * eps * Math.hypot(t.pr, t.pi) + slack * b);
        expect(errD).toBeLessThanOrEqual(2 * eps * Math.hypot(t.dr, t.di) + slack * bd);
        // Plain Horner at the same point, for contrast: fails the same bound where the polynomial is badly
        // conditioned (so the bound is a real test).
        if (Math.hypot(pr - t.pr, pi - t.pi) > 2 * eps * Math.hypot(t.pr, t.pi) + slack * b) plainFails++;
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(0);
    if (!_name.startsWith('seeded random')) expect(plainFails).toBeGreaterThan(0);
  });
});

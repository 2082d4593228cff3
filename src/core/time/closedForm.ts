/**
 * Closed form of a zero-state response y[n] = Z^-1{H(z)X(z)} for impulse, step and cosine inputs:
 *   y[n] = Σ c·n^k·p^n  (n ≥ 0)  +  direct[n],
 * from the partial fractions of H(z)X(z). An input pole that lands on a pole of H (a step into a pole at
 * z = 1, a cosine at a pole's frequency on the unit circle) becomes a repeated pole, hence the n^k terms.
 * From the stored roots here; from b/a (the root finder first) in fromCoefficients.ts.
 */
import type { Complex, Root, Zpk } from '../types.ts';
import { partialFractionsZpk, type PartialFractions, type RationalFactor } from './partialFractions.ts';

export { describeTerm, formatClosedForm } from './closedFormText.ts';

/** One mode of the response: coefficient·n^power·pole^n for n ≥ 0. */
export interface Term {
  coefficient: Complex;
  pole: Complex;
  /** Power of n (0 for a plain geometric mode). */
  power: number;
}

/** Zero-state response as modes plus a finite-length part; conjugate modes are listed separately. */
export interface ClosedForm {
  terms: Term[];
  /** Finite-length part: direct[n] is added at n = 0, 1, 2, … */
  direct: number[];
  /** Whether the pole search converged. */
  converged: boolean;
}

/** A test input: unit impulse, unit step, or cos(omega·n + phase)·u[n] (radians per sample, radians). */
export type TimeInput =
  { kind: 'impulse' } | { kind: 'step' } | { kind: 'sine'; omega: number; phase?: number };

/**
 * Closed form of the zero-state response for H given by zeros, poles and gain (b/a aligned as zpkToTf). The
 * stored poles are used directly, so this stays accurate at high order where coefficients lose the poles.
 */
export function closedFormResponseZpk(zpk: Zpk, input: TimeInput): ClosedForm {
  return toClosedForm(partialFractionsZpk(zpk, inputTransform(input)));
}

/** X(z) = B(z^-1)/A(z^-1) of an input with its poles listed (conjugates included). */
export function inputTransform(input: TimeInput): RationalFactor & { poles: Root[] } {
  if (input.kind === 'impulse') return { b: [1], a: [1], poles: [] };
  if (input.kind === 'step') return { b: [1], a: [1, -1], poles: [{ re: 1, im: 0, multiplicity: 1 }] };
  // Fold omega into [0, pi]: cos((2π − ω)n − φ) = cos(ωn + φ).
  let omega = input.omega % (2 * Math.PI);
  let phase = input.phase ?? 0;
  if (omega < 0) omega += 2 * Math.PI;
  if (omega > Math.PI) {
    omega = 2 * Math.PI - omega;
    phase = -phase;
  }
  const c = Math.cos(phase);
  // At ω = 0 and ω = π the cosine is c·(±1)^n: one real pole, not a double one.
  if (omega === 0) return { b: [c], a: [1, -1], poles: [{ re: 1, im: 0, multiplicity: 1 }] };
  if (omega === Math.PI) return { b: [c], a: [1, 1], poles: [{ re: -1, im: 0, multiplicity: 1 }] };
  // Z{cos(ωn + φ)u[n]} = (cos φ − cos(ω − φ) z^-1) / (1 − 2 cos ω z^-1 + z^-2)
  const re = Math.cos(omega);
  const im = Math.sin(omega);
  return {
    b: [c, -Math.cos(omega - phase)],
    a: [1, -2 * re, 1],
    poles: [
      { re, im, multiplicity: 1 },
      { re, im: -im, multiplicity: 1 },
    ],
  };
}

/**
 * Modes from partial fractions: the inverse z-transform of 1/(1 − p z^-1)^k is C(n+k−1, k−1)·p^n, a polynomial
 * in n of degree k−1 whose coefficients are spread over the powers of n.
 */
export function toClosedForm(pf: PartialFractions): ClosedForm {
  const terms: Term[] = [];
  let i = 0;
  while (i < pf.poles.length) {
    const pole = pf.poles[i]!;
    let m = 1;
    while (i + m < pf.poles.length && pf.powers[i + m] === m + 1) m++;
    const cr = new Float64Array(m);
    const ci = new Float64Array(m);
    for (let k = 1; k <= m; k++) {
      const r = pf.residues[i + k - 1]!;
      const poly = binomialInN(k);
      for (let j = 0; j < k; j++) {
        cr[j]! += r.re * poly[j]!;
        ci[j]! += r.im * poly[j]!;
      }
    }
    for (let j = 0; j < m; j++)
      terms.push({ coefficient: { re: cr[j]!, im: ci[j]! }, pole: { ...pole }, power: j });
    i += m;
  }
  return { terms, direct: [...pf.direct], converged: pf.converged };
}

/** Coefficients (ascending powers of n) of C(n+k−1, k−1) = (n+1)(n+2)…(n+k−1)/(k−1)!. */
export function binomialInN(k: number): Float64Array {
  let poly = new Float64Array([1]);
  for (let i = 1; i < k; i++) {
    const next = new Float64Array(poly.length + 1);
    for (let j = 0; j < poly.length; j++) {
      next[j]! += poly[j]!;
      next[j + 1]! += poly[j]! / i;
    }
    poly = next;
  }
  return poly;
}

/** Real part of the closed form at n = 0..count−1. */
export function evaluateClosedForm(cf: ClosedForm, count: number): Float64Array {
  const y = new Float64Array(count);
  for (const t of cf.terms) {
    const r = Math.hypot(t.pole.re, t.pole.im);
    const theta = Math.atan2(t.pole.im, t.pole.re);
    const { re: cr, im: ci } = t.coefficient;
    // Polar form r^n·e^{jθn}: no error growth with n, unlike repeated multiplication.
    for (let n = 0; n < count; n++) {
      const mag = Math.pow(r, n) * (t.power === 0 ? 1 : Math.pow(n, t.power));
      const ang = theta * n;
      y[n]! += mag * (cr * Math.cos(ang) - ci * Math.sin(ang));
    }
  }
  for (let n = 0; n < Math.min(count, cf.direct.length); n++) y[n]! += cf.direct[n]!;
  return y;
}

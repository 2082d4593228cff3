/**
 * Real polynomials as coefficient arrays in DESCENDING powers (p[0] multiplies x^(n), p[n] the constant),
 * the numpy convention. A b/a array in powers of z^-1 is the same array read as a polynomial in z.
 */
import type { Root } from './types.ts';
import { multiplyOutDd } from './multiplyOut.ts';

export type Poly = ArrayLike<number>;

/** Removes leading (highest-power) zero coefficients; the zero polynomial becomes [0]. */
export function polyTrim(p: Poly): Float64Array {
  let i = 0;
  while (i < p.length - 1 && p[i] === 0) i++;
  return Float64Array.from(Array.prototype.slice.call(p, i) as number[]);
}

/** Product of two polynomials (full convolution of coefficient arrays). */
export function polyMul(a: Poly, b: Poly): Float64Array {
  if (a.length === 0 || b.length === 0) return new Float64Array(0);
  const out = new Float64Array(a.length + b.length - 1);
  for (let i = 0; i < a.length; i++) {
    const ai = a[i]!;
    if (ai === 0) continue;
    for (let j = 0; j < b.length; j++) out[i + j]! += ai * b[j]!;
  }
  return out;
}

/** Sum of two polynomials, aligned at the constant term. */
export function polyAdd(a: Poly, b: Poly): Float64Array {
  const n = Math.max(a.length, b.length);
  const out = new Float64Array(n);
  for (let i = 0; i < a.length; i++) out[n - a.length + i]! += a[i]!;
  for (let i = 0; i < b.length; i++) out[n - b.length + i]! += b[i]!;
  return out;
}

/** Polynomial times a scalar. */
export function polyScale(p: Poly, s: number): Float64Array {
  const out = new Float64Array(p.length);
  for (let i = 0; i < p.length; i++) out[i] = p[i]! * s;
  return out;
}

/** Value at a real point, by Horner's rule. */
export function polyEval(p: Poly, x: number): number {
  let acc = 0;
  for (let i = 0; i < p.length; i++) acc = acc * x + p[i]!;
  return acc;
}

/** Value at the complex point re + i·im, by Horner's rule; returns [re, im]. */
export function polyEvalComplex(p: Poly, re: number, im: number): [number, number] {
  let ar = 0;
  let ai = 0;
  for (let i = 0; i < p.length; i++) {
    const tr = ar * re - ai * im + p[i]!;
    ai = ar * im + ai * re;
    ar = tr;
  }
  return [ar, ai];
}

/** First derivative. */
export function polyDerivative(p: Poly): Float64Array {
  const n = p.length - 1;
  if (n <= 0) return new Float64Array([0]);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = p[i]! * (n - i);
  return out;
}

/**
 * Monic polynomial with the given roots, each repeated by its multiplicity; a root with im ≠ 0 contributes
 * its conjugate too, as the exactly real quadratic x^2 - 2·re·x + (re^2 + im^2). Multiplied out in
 * double-double and rounded once at the end (core/multiplyOut.ts): each coefficient is within a rounding or
 * so of the exact product, where one factor at a time in doubles lost up to 1e-6 of the largest coefficient
 * at order 128.
 */
export function polyFromRoots(roots: readonly Root[]): Float64Array {
  let m = 0;
  let length = 1;
  for (const r of roots) {
    m += r.multiplicity;
    length += (r.im === 0 ? 1 : 2) * r.multiplicity;
  }
  const fr = new Float64Array(m);
  const fi = new Float64Array(m);
  let k = 0;
  for (const r of roots)
    for (let j = 0; j < r.multiplicity; j++) {
      fr[k] = r.re;
      fi[k++] = Math.abs(r.im);
    }
  return multiplyOutDd(fr, fi, length).hi;
}

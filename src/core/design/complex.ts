/** Small complex helpers for the (non-hot) design code: plain {re, im} values, no allocation tricks. */

import type { Complex } from '../types.ts';

export const cx = (re: number, im = 0): Complex => ({ re, im });
export const cAdd = (a: Complex, b: Complex): Complex => ({ re: a.re + b.re, im: a.im + b.im });
export const cSub = (a: Complex, b: Complex): Complex => ({ re: a.re - b.re, im: a.im - b.im });
export const cScale = (a: Complex, s: number): Complex => ({ re: a.re * s, im: a.im * s });
export const cConj = (a: Complex): Complex => ({ re: a.re, im: -a.im });
export const cMul = (a: Complex, b: Complex): Complex => ({
  re: a.re * b.re - a.im * b.im,
  im: a.re * b.im + a.im * b.re,
});

/** a / b by Smith's algorithm, which avoids overflow in |b|². */
export function cDiv(a: Complex, b: Complex): Complex {
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return { re: (a.re + a.im * r) / d, im: (a.im - a.re * r) / d };
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return { re: (a.re * r + a.im) / d, im: (a.im * r - a.re) / d };
}

/** Principal square root, computed without cancellation. */
export function cSqrt(a: Complex): Complex {
  if (a.re === 0 && a.im === 0) return { re: 0, im: 0 };
  const t = Math.sqrt((Math.abs(a.re) + Math.hypot(a.re, a.im)) / 2);
  if (a.re >= 0) return { re: t, im: a.im / (2 * t) };
  return { re: Math.abs(a.im) / (2 * t), im: a.im < 0 ? -t : t };
}

/** The stored representative of a root of a real system: the one of z, conj(z) with im >= 0. */
export const upperHalf = (a: Complex): Complex => (a.im < 0 ? cConj(a) : a);

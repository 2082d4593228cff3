/**
 * Truncated power series with complex coefficients (separate re/im Float64Arrays), for expanding a rational
 * function about one pole. Lengths are a pole's multiplicity: small, so nothing here is hot.
 */
import type { Root } from '../types.ts';

/** A truncated series Σ s_j t^j as [re, im]. */
export type Series = [Float64Array, Float64Array];

/** The series 1. */
export function seriesOne(m: number): Series {
  const re = new Float64Array(m);
  re[0] = 1;
  return [re, new Float64Array(m)];
}

/** s·f in place, truncated to s's length. */
export function seriesMulInPlace(s: Series, f: Series): void {
  const [sr, si] = s;
  const [fr, fi] = f;
  for (let j = sr.length - 1; j >= 0; j--) {
    let r = 0;
    let i = 0;
    for (let k = 0; k <= j && k < fr.length; k++) {
      r += sr[j - k]! * fr[k]! - si[j - k]! * fi[k]!;
      i += sr[j - k]! * fi[k]! + si[j - k]! * fr[k]!;
    }
    sr[j] = r;
    si[j] = i;
  }
}

/** num/den, truncated to num's length; den[0] must be nonzero. */
export function seriesDiv(num: Series, den: Series): Series {
  const m = num[0].length;
  const [nr, ni] = num;
  const [dr, di] = den;
  const gr = new Float64Array(m);
  const gi = new Float64Array(m);
  const d0 = dr[0]! * dr[0]! + di[0]! * di[0]!;
  for (let j = 0; j < m; j++) {
    let r = nr[j]!;
    let i = ni[j]!;
    for (let k = 1; k <= j && k < dr.length; k++) {
      r -= gr[j - k]! * dr[k]! - gi[j - k]! * di[k]!;
      i -= gr[j - k]! * di[k]! + gi[j - k]! * dr[k]!;
    }
    gr[j] = (r * dr[0]! + i * di[0]!) / d0;
    gi[j] = (i * dr[0]! - r * di[0]!) / d0;
  }
  return [gr, gi];
}

/**
 * Π (1 − q x)^(multiplicity) over the listed roots (conjugates listed explicitly), as a series in t = x − x0:
 * each factor is (1 − q x0) − q t. `skip` is left out (the pole being expanded about).
 */
export function factorSeries(
  roots: readonly Root[],
  x0r: number,
  x0i: number,
  m: number,
  skip?: Root,
): Series {
  const s = seriesOne(m);
  for (const q of roots) {
    if (q === skip) continue;
    const f: Series = [
      Float64Array.of(1 - (q.re * x0r - q.im * x0i), -q.re),
      Float64Array.of(-(q.re * x0i + q.im * x0r), -q.im),
    ];
    for (let k = 0; k < q.multiplicity; k++) seriesMulInPlace(s, f);
  }
  return s;
}

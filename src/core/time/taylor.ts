/**
 * Taylor coefficients of real polynomials about a complex point, by repeated synthetic division (Horner).
 * Small and not hot: used once per pole when expanding partial fractions and merging repeated poles.
 */

/**
 * First `count` Taylor coefficients of the real polynomial p (descending powers) about c = cr + i·ci:
 * p(c + t) = Σ α_j t^j. Returns [re, im] arrays of length count (zero past the degree).
 */
export function taylorAt(
  p: ArrayLike<number>,
  cr: number,
  ci: number,
  count: number,
): [Float64Array, Float64Array] {
  const n = p.length;
  const wr = Float64Array.from(p);
  const wi = new Float64Array(n);
  const outR = new Float64Array(count);
  const outI = new Float64Array(count);
  // Each pass divides by (x - c): the remainder is the next coefficient, the quotient the next input.
  for (let j = 0; j < count && j < n; j++) {
    const len = n - j;
    for (let k = 1; k < len; k++) {
      const r = wr[k - 1]! * cr - wi[k - 1]! * ci + wr[k]!;
      const i = wr[k - 1]! * ci + wi[k - 1]! * cr + wi[k]!;
      wr[k] = r;
      wi[k] = i;
    }
    outR[j] = wr[len - 1]!;
    outI[j] = wi[len - 1]!;
  }
  return [outR, outI];
}

/**
 * First `count` Taylor coefficients of Σ|p_k| x^k about the real point |c|: each bounds the size of the terms
 * summed in the matching coefficient of taylorAt, so rounding errors are measured against it.
 */
export function taylorBound(p: ArrayLike<number>, modulus: number, count: number): Float64Array {
  const abs = Float64Array.from(p, Math.abs);
  return taylorAt(abs, modulus, 0, count)[0];
}

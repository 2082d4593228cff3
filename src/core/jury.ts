/**
 * Stability from denominator coefficients alone, by the Schur–Cohn test in its step-down (reflection
 * coefficient) form, which is the Jury table computed row by row: A(z) of degree n has every root strictly
 * inside the unit circle iff every reflection coefficient k_i, i = n..1, has |k_i| < 1.
 */

/** Outcome of the coefficient test: 'not-stable' covers both roots on and outside the circle. */
export type JuryVerdict = 'stable' | 'not-stable';

/** Verdict, reflection coefficients computed up to the decisive one, and a sentence. */
export interface JuryResult {
  verdict: JuryVerdict;
  /** k_n, k_(n-1), … down to k_1, or to the first one with |k| >= 1 − JURY_BOUNDARY_TOLERANCE. */
  reflection: number[];
  /** Degree at which the test failed, when it did. */
  failedAtDegree?: number;
  /** The failing |k| is within the tolerance of 1: a root on (or within rounding of) the circle. */
  onBoundary: boolean;
  detail: string;
}

/**
 * A reflection coefficient with |k| >= 1 − 1e-9 fails the test: |k| = 1 exactly is a root on the circle,
 * and for a first-order factor 1 − |k| is the root's distance from the circle, matching UNIT_CIRCLE_TOLERANCE.
 */
export const JURY_BOUNDARY_TOLERANCE = 1e-9;

/**
 * Jury / Schur–Cohn test on a denominator a (descending powers of z, i.e. b/a order in z^-1; leading zeros
 * are dropped). Throws a RangeError for non-finite or all-zero coefficients.
 */
export function juryTest(a: ArrayLike<number>): JuryResult {
  const coeffs = Array.from(a);
  const bad = coeffs.findIndex((v) => !Number.isFinite(v));
  if (bad >= 0) throw new RangeError(`a[${bad}] is ${coeffs[bad]}; coefficients must be finite numbers`);
  const lead = coeffs.findIndex((v) => v !== 0);
  if (lead < 0)
    throw new RangeError('the denominator is all zeros; it needs at least one non-zero coefficient');
  let c = coeffs.slice(lead).map((v) => v / coeffs[lead]!);
  const reflection: number[] = [];
  for (let i = c.length - 1; i >= 1; i--) {
    const k = c[i]!;
    reflection.push(k);
    if (Math.abs(k) >= 1 - JURY_BOUNDARY_TOLERANCE) {
      const onBoundary = Math.abs(Math.abs(k) - 1) <= JURY_BOUNDARY_TOLERANCE;
      return {
        verdict: 'not-stable',
        reflection,
        failedAtDegree: i,
        onBoundary,
        detail: `reflection coefficient k${i} = ${k.toPrecision(6)} has |k| ${onBoundary ? '= 1: a root lies on' : '> 1: a root lies on or outside'} the unit circle`,
      };
    }
    const s = 1 - k * k;
    const next = new Array<number>(i);
    for (let j = 0; j < i; j++) next[j] = (c[j]! - k * c[i - j]!) / s;
    c = next;
  }
  return {
    verdict: 'stable',
    reflection,
    onBoundary: false,
    detail: 'every reflection coefficient has |k| < 1',
  };
}

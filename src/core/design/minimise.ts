/** Bounded minimisation of a function of one variable by golden-section search (Kiefer, 1953). */

/** Interval width, relative to the interval's magnitude, at which the golden-section search stops. */
export const GOLDEN_TOLERANCE = 1e-12;
/** Iteration limit; each step shrinks the bracket by 0.618, so 200 steps reach any double-precision width. */
export const GOLDEN_MAX_ITERATIONS = 200;

const INV_PHI = (Math.sqrt(5) - 1) / 2;

/** The x in [lo, hi] minimising f (assumed unimodal there), and whether the bracket shrank to tolerance. */
export function minimiseOnInterval(
  f: (x: number) => number,
  lo: number,
  hi: number,
  tolerance = GOLDEN_TOLERANCE,
): { x: number; value: number; converged: boolean } {
  let a = lo;
  let b = hi;
  let c = b - INV_PHI * (b - a);
  let d = a + INV_PHI * (b - a);
  let fc = f(c);
  let fd = f(d);
  let converged = false;
  for (let i = 0; i < GOLDEN_MAX_ITERATIONS; i++) {
    if (b - a <= tolerance * Math.max(Math.abs(a), Math.abs(b), Number.MIN_VALUE)) {
      converged = true;
      break;
    }
    if (fc <= fd) {
      [b, d, fd] = [d, c, fc];
      c = b - INV_PHI * (b - a);
      fc = f(c);
    } else {
      [a, c, fc] = [c, d, fd];
      d = a + INV_PHI * (b - a);
      fd = f(d);
    }
  }
  // The ends are candidates too: the minimum of a monotone stretch sits on the boundary.
  const candidates = [
    { x: lo, value: f(lo) },
    { x: hi, value: f(hi) },
    fc <= fd ? { x: c, value: fc } : { x: d, value: fd },
  ];
  const best = candidates.reduce((p, q) => (q.value < p.value ? q : p));
  return { ...best, converged };
}

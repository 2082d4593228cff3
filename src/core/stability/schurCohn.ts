/**
 * Counting the roots of an integer polynomial inside and outside the unit circle by the Schur–Cohn step-down
 * recursion (I. Schur, 1917; A. Cohn, 1922; the counting form in M. Marden, "Geometry of Polynomials",
 * 1966, ch. X, from memory). With A_i(z) = Σ α_j z^j of degree i and k_i = α_0/α_i, the next polynomial is
 * A_{i-1}(z) = (α_i·A_i(z) − α_0·A_i*(z))/z, A_i* the reversed polynomial. By Rouché's theorem on the unit
 * circle, if |k_i| < 1 then A_{i-1} has one root fewer inside than A_i, and if |k_i| > 1 it has one fewer than
 * A_i has outside; roots on the circle (and pairs mirrored in it) survive every step, so a recursion with no
 * |k_i| = 1 proves there are none and counts the rest exactly. Two arithmetics run it:
 *
 * - certified block floating point: each row is BigInt mantissas of at most P bits with one error radius
 *   for the row (midpoint–radius interval arithmetic, S. M. Rump, BIT 39, 1999); a step is decided only when
 *   | |α_i| − |α_0| | exceeds twice the radius. Cheap at P of a few hundred bits.
 * - exact, fraction-free: integer rows, each divided exactly by the leading coefficient two rows up (the
 *   rows are determinants, so the division leaves no remainder: Sylvester's identity, as in E. H. Bareiss,
 *   "Sylvester's identity and multistep integer-preserving Gaussian elimination", Math. Comp. 22, 1968).
 *   Exact always, but the integers grow by about twice the input's bit length per row.
 */
import { bitLength, magnitudeDown, magnitudeUp } from './bigMagnitude.ts';

/** How a run of the recursion ended. */
export type SchurCohnCount =
  | { kind: 'counted'; inside: number; outside: number }
  /** An exact step with |k_i| = 1: a root on the circle, a mirrored pair, or a removable singularity. */
  | { kind: 'singular'; degree: number }
  /** The certified arithmetic could not tell |k_i| from 1 at this precision. */
  | { kind: 'undecided'; degree: number }
  /** The exact run stopped at its work limit. */
  | { kind: 'stopped'; degree: number };

const abs = (x: bigint) => (x < 0n ? -x : x);

/** Roots inside from the per-step outcomes, innermost degree first (Marden's counting rule). */
function countInside(shrinks: boolean[]): number {
  // shrinks[i - 1]: |k_i| < 1 at degree i.
  let inside = 0;
  for (let i = 1; i <= shrinks.length; i++) inside = shrinks[i - 1] ? inside + 1 : i - 1 - inside;
  return inside;
}

/** x / 2^s rounded to nearest (ties up), for s ≥ 1: error at most half a unit of the result. */
function roundShift(x: bigint, s: number): bigint {
  const b = BigInt(s);
  return (x + (1n << (b - 1n))) >> b;
}

/**
 * The recursion on an integer polynomial (ascending powers, last entry non-zero) in certified arithmetic with
 * `precision`-bit mantissas.
 */
export function schurCohnCertified(ascending: readonly bigint[], precision: number): SchurCohnCount {
  let row = ascending.slice();
  let rho = 0; // error radius of every entry, in units of the row's last place
  let top = Math.max(...row.map(bitLength));
  if (top > precision) {
    const s = top - precision;
    row = row.map((x) => roundShift(x, s));
    rho = 0.5;
  }
  const n = row.length - 1;
  const shrinks = new Array<boolean>(n);
  while (row.length > 1) {
    const d = row.length - 1;
    const l = row[d]!;
    const c = row[0]!;
    const gap = abs(l) - abs(c);
    if (gap === 0n || !(magnitudeDown(gap, 0) > 2 * rho)) return { kind: 'undecided', degree: d };
    shrinks[d - 1] = gap > 0n;
    const next = new Array<bigint>(d);
    let big = 0n;
    for (let j = 0; j < d; j++) {
      const v = l * row[j + 1]! - c * row[d - 1 - j]!;
      next[j] = v;
      const a = abs(v);
      if (a > big) big = a;
    }
    let rowMax = 0n;
    for (const x of row) if (abs(x) > rowMax) rowMax = abs(x);
    top = bitLength(big);
    const s = Math.max(0, top - precision);
    // |Δ(l·r − c·r')| ≤ ρ(|l| + |r| + |c| + |r'|) + 2ρ² ≤ 4ρ·max|row| + 2ρ², in squared units, then scaled by 2^-s.
    let radius =
      rho === 0 ? 0 : (4 * rho * magnitudeUp(rowMax, s) + 2 * rho * rho * 2 ** -s) * (1 + 2 ** -40);
    if (s > 0) {
      for (let j = 0; j < d; j++) next[j] = roundShift(next[j]!, s);
      radius += 0.5;
    }
    if (!Number.isFinite(radius) || radius >= 2 ** Math.min(1000, precision - 2))
      return { kind: 'undecided', degree: d - 1 };
    rho = radius;
    row = next;
  }
  const inside = countInside(shrinks);
  return { kind: 'counted', inside, outside: n - inside };
}

/**
 * The recursion in exact integer arithmetic (fraction-free), stopping at the first step with |k_i| = 1, or
 * once the work (Σ row length × bits of its entries, a proxy for BigInt cost) passes maxWork.
 */
export function schurCohnExact(ascending: readonly bigint[], maxWork = Infinity): SchurCohnCount {
  let work = 0;
  let row = ascending.slice();
  const n = row.length - 1;
  const shrinks = new Array<boolean>(n);
  let leadBefore = 1n; // leading coefficient of the row before the current one
  let steps = 0;
  while (row.length > 1) {
    const d = row.length - 1;
    const l = row[d]!;
    const c = row[0]!;
    const gap = abs(l) - abs(c);
    if (gap === 0n) return { kind: 'singular', degree: d };
    shrinks[d - 1] = gap > 0n;
    work += d * bitLength(l);
    if (work > maxWork) return { kind: 'stopped', degree: d };
    const divisor = steps >= 2 ? leadBefore : 1n;
    const next = new Array<bigint>(d);
    for (let j = 0; j < d; j++) next[j] = l * row[j + 1]! - c * row[d - 1 - j]!;
    if (divisor !== 1n) {
      // The division is exact in theory; the two entries that decide the next step are checked.
      if (next[0]! % divisor !== 0n || next[d - 1]! % divisor !== 0n)
        throw new Error('schurCohnExact: a fraction-free division left a remainder');
      for (let j = 0; j < d; j++) next[j] = next[j]! / divisor;
    }
    leadBefore = l;
    steps++;
    row = next;
  }
  const inside = countInside(shrinks);
  return { kind: 'counted', inside, outside: n - inside };
}

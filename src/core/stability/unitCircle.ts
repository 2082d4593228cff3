/**
 * The exact verdict when the Schur–Cohn recursion meets |k| = 1: roots on the unit circle, or pairs mirrored
 * in it, are the common roots of A and its reverse A*, so G = gcd(A, A*) holds all of them (with their full
 * multiplicity) and Q = A / G holds none. A is marginally stable exactly when Q has every root inside and G
 * has only simple roots, all on the circle. For the latter, the palindromic part of G is written as
 * z^m·H(z + 1/z) (x = z + 1/z maps the circle onto [−2, 2]) and Sturm's theorem counts the roots of H there.
 */
import {
  degree,
  derivative,
  divideExact,
  evaluate,
  gcd,
  primitive,
  reversed,
  sturmCount,
  type BigPoly,
} from './bigPoly.ts';
import { schurCohnExact } from './schurCohn.ts';

/** What the unit-circle analysis found. */
export type UnitCircleVerdict =
  | { verdict: 'marginal'; inside: number; onCircle: number }
  | { verdict: 'unstable'; why: 'outside' | 'repeated-on-circle' };

/** H with z^-m·R(z) = H(z + 1/z) for a palindromic R of degree 2m (ascending coefficients). */
function inCosineVariable(r: BigPoly): BigPoly {
  const m = degree(r) / 2;
  const h: bigint[] = new Array<bigint>(m + 1).fill(0n);
  h[0] = r[m]!;
  // Dickson polynomials D_j(x) = z^j + z^-j: D_0 = 2, D_1 = x, D_{j+1} = x·D_j − D_{j−1}.
  let prev: bigint[] = [2n];
  let cur: bigint[] = [0n, 1n];
  for (let j = 1; j <= m; j++) {
    const coef = r[m + j]!;
    for (let k = 0; k < cur.length; k++) h[k] = h[k]! + coef * cur[k]!;
    const next = new Array<bigint>(cur.length + 1).fill(0n);
    for (let k = 0; k < cur.length; k++) next[k + 1] = cur[k]!;
    for (let k = 0; k < prev.length; k++) next[k] = next[k]! - prev[k]!;
    prev = cur;
    cur = next;
  }
  return h;
}

/** Whether every root of the square-free s lies on the unit circle. */
function allOnCircle(s: BigPoly): boolean {
  let r = s;
  if (evaluate(r, 1n) === 0n) r = divideExact(r, [-1n, 1n]);
  if (evaluate(r, -1n) === 0n) r = divideExact(r, [1n, 1n]);
  const d = degree(r);
  if (d === 0) return true;
  if (d % 2 !== 0) return false;
  const flipped = reversed(r);
  // With real coefficients and no roots at ±1, roots all on the circle make R palindromic.
  if (!r.every((x, k) => x === flipped[k])) return false;
  const h = inCosineVariable(r);
  return sturmCount(h, -2n, 2n) === degree(h);
}

/**
 * The verdict for an integer polynomial a (ascending, a[0] ≠ 0, degree ≥ 1) whose exact Schur–Cohn run met a
 * step with |k| = 1 (so it is not stable).
 */
export function unitCircleVerdict(a: BigPoly): UnitCircleVerdict {
  const g = gcd(a, reversed(a));
  if (degree(g) === 0) return { verdict: 'unstable', why: 'outside' };
  const q = divideExact(primitive(a), g);
  if (degree(q) > 0) {
    const count = schurCohnExact(q);
    if (count.kind !== 'counted' || count.outside > 0) return { verdict: 'unstable', why: 'outside' };
  }
  const squareFree = divideExact(g, gcd(g, derivative(g)));
  if (!allOnCircle(squareFree)) return { verdict: 'unstable', why: 'outside' };
  if (degree(squareFree) < degree(g)) return { verdict: 'unstable', why: 'repeated-on-circle' };
  return { verdict: 'marginal', inside: degree(q), onCircle: degree(g) };
}

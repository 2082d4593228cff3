/**
 * All roots of a real polynomial: the Aberth–Ehrlich simultaneous iteration from Bini's starting points
 * (roots/aberth.ts, roots/start.ts), a compensated-arithmetic polish of badly conditioned roots
 * (roots/polish.ts), exact conjugate symmetry (roots/conjugate.ts) and verified merging of
 * repeated roots (roots/multiplicity.ts). Degrees 1 and 2 are solved in closed form.
 */
import type { Root } from '../types.ts';
import type { Poly } from '../poly.ts';
import { aberthIterate } from './aberth.ts';
import { startingPoints } from './start.ts';
import { polishIllConditioned } from './polish.ts';
import { symmetrizeConjugates } from './conjugate.ts';
import { findMultipleRoots, listGrouped } from './multiplicity.ts';
import { reseatSharedRoots } from './reseat.ts';
import { refindMisfits } from './misfits.ts';
import { applyBalance, chooseBalance, timesPowerOfTwo } from './balance.ts';

export { rootsBackwardError } from './backwardError.ts';

/** Outcome of a root search: every finite root listed (conjugates included), with diagnostics. */
export interface RootsResult {
  /**
   * Real parts of all finite roots (length = degree after removing leading zero coefficients), each the
   * individual approximation with the smallest backward error; members of a repeated root stay separate
   * here (spread by about ε^(1/m)) and are merged, with a refined value, in `grouped`.
   */
  re: Float64Array;
  /** Imaginary parts; for real input, complex roots come in exactly conjugate pairs. */
  im: Float64Array;
  /** The same roots grouped: a repeated root appears once with its multiplicity; conjugates listed. */
  grouped: Root[];
  /** Number of roots at infinity (leading zero coefficients of the descending-order input). */
  atInfinity: number;
  /** True when every coefficient is zero: every number is a root, and none is listed. */
  zeroPolynomial: boolean;
  /** Whether every root met the stopping test within the iteration limit. */
  converged: boolean;
  /** Sweeps of the simultaneous iteration used (0 for closed forms). */
  iterations: number;
}

export interface RootsOptions {
  /** Limit on sweeps of the simultaneous iteration (default {@link DEFAULT_MAX_ITERATIONS}). */
  maxIterations?: number;
}

/** Default sweep limit; Aberth–Ehrlich from Bini's starts typically needs 10–40 sweeps even at degree 1000. */
export const DEFAULT_MAX_ITERATIONS = 500;

/** Finds all roots of a real polynomial given in descending powers (coefficients must be finite). */
export function findRoots(p: Poly, options: RootsOptions = {}): RootsResult {
  for (let k = 0; k < p.length; k++) {
    if (!Number.isFinite(p[k]!)) {
      throw new RangeError(`findRoots: coefficient ${k} is ${p[k]}; only finite numbers are accepted`);
    }
  }
  let lead = 0;
  while (lead < p.length && p[lead] === 0) lead++;
  if (lead === p.length) return emptyResult(0, true);
  let tail = p.length - 1;
  while (p[tail] === 0) tail--;
  const origin = p.length - 1 - tail;
  const n = tail - lead;
  // Scale by powers of two only, which is exact: dividing by the leading coefficient would round every
  // coefficient and can turn a tight cluster of distinct roots into an exact multiple root. Where some
  // coefficient would be subnormal, the variable is scaled too (roots/balance.ts), and the roots back at the end.
  const balance = chooseBalance(p, lead, n);
  const c = applyBalance(p, lead, n, balance);
  const re = new Float64Array(n + origin);
  const im = new Float64Array(n + origin);
  let converged = true;
  let iterations = 0;
  if (n === 1) re[0] = -c[1]! / c[0]!;
  else if (n === 2) quadratic(c[1]! / c[0]!, c[2]! / c[0]!, re, im);
  else if (n > 2) {
    const zr = re.subarray(0, n);
    const zi = im.subarray(0, n);
    startingPoints(c, zr, zi);
    ({ converged, iterations } = aberthIterate(c, zr, zi, options.maxIterations ?? DEFAULT_MAX_ITERATIONS));
  }
  const zr = re.subarray(0, n);
  const zi = im.subarray(0, n);
  const firstMate = symmetrizeConjugates(c, zr, zi);
  const symmetricR = zr.slice();
  const symmetricI = zi.slice();
  if (n > 2) iterations += polishIllConditioned(c, zr, zi, firstMate);
  if (n > 2) iterations += reseatSharedRoots(c, zr, zi);
  if (n > 2) iterations += refindMisfits(c, zr, zi);
  // Pairing an exactly symmetric set again changes nothing: only a set the stages above moved is paired again.
  const mate =
    sameValues(zr, symmetricR) && sameValues(zi, symmetricI) ? firstMate : symmetrizeConjugates(c, zr, zi);
  const multiple = findMultipleRoots(c, zr, zi, mate);
  const grouped = listGrouped(zr, zi, multiple);
  if (balance.zoom !== 0) {
    const back = -balance.zoom;
    for (let i = 0; i < n; i++) {
      zr[i] = timesPowerOfTwo(zr[i]!, back);
      zi[i] = timesPowerOfTwo(zi[i]!, back);
    }
    for (const g of grouped) {
      g.re = timesPowerOfTwo(g.re, back);
      g.im = timesPowerOfTwo(g.im, back);
    }
  }
  if (origin > 0) grouped.push({ re: 0, im: 0, multiplicity: origin });
  return { re, im, grouped, atInfinity: lead, zeroPolynomial: false, converged, iterations };
}

/** Whether a and b hold the same numbers (bit for bit, but for the sign of zero). */
function sameValues(a: Float64Array, b: Float64Array): boolean {
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return false;
  return true;
}

function emptyResult(atInfinity: number, zeroPolynomial: boolean): RootsResult {
  const re = new Float64Array(0);
  const im = new Float64Array(0);
  return { re, im, grouped: [], atInfinity, zeroPolynomial, converged: true, iterations: 0 };
}

/** Roots of x² + b·x + c without cancellation: the larger-magnitude root first, the other from c / root. */
function quadratic(b: number, c: number, re: Float64Array, im: Float64Array): void {
  const h = -b / 2 + 0; // + 0 turns -0 into 0
  // Scale by s so that h² and c cannot overflow or underflow.
  const s = Math.max(Math.abs(h), Math.sqrt(Math.abs(c)));
  const hs = h / s;
  const disc = hs * hs - c / s / s;
  if (disc < 0) {
    re[0] = h;
    re[1] = h;
    im[0] = s * Math.sqrt(-disc);
    im[1] = -im[0];
    return;
  }
  const big = h + Math.sign(h || 1) * s * Math.sqrt(disc);
  re[0] = big;
  re[1] = big === 0 ? 0 : c / big;
}

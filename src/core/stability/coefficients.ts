/**
 * The stability verdict of a denominator given as coefficients (typed, pasted, or multiplied out from roots),
 * decided for the exact rational numbers those doubles are, never for rounded roots. Two stages:
 *
 * 1. Certified root inclusion: the root finder's approximations get inclusion disks that hold for the exact
 *    polynomial (roots/inclusion.ts). When every group of touching disks lies strictly inside or strictly
 *    outside the unit circle, the count of roots inside and outside is proven.
 * 2. Otherwise the exact Schur–Cohn recursion in integer arithmetic (schurCohn.ts), and at a step with
 *    |k| = 1 the gcd analysis of the roots on the unit circle (unitCircle.ts). The exact recursion's integers
 *    grow with the degree, so past a work limit the roots are first refined with exact evaluation
 *    (roots/exactRefine.ts) and the disks formed again from exact values of p; only if a group of them still
 *    touches the circle does the exact recursion run to the end.
 */
import type { Verdict } from './index.ts';
import { findRoots } from '../roots/index.ts';
import {
  exactInclusionDisks,
  inclusionDisks,
  mixedInclusionDisks,
  type InclusionDisks,
} from '../roots/inclusion.ts';
import { exactPoly } from '../roots/exactEval.ts';
import { refineExactly } from '../roots/exactRefine.ts';
import { toIntegers } from './dyadic.ts';
import { schurCohnExact } from './schurCohn.ts';
import { unitCircleVerdict } from './unitCircle.ts';

/** The verdict for the coefficients as given, with how it was reached. */
export interface CoefficientStability {
  verdict: Verdict;
  /** Poles (roots of the denominator, counted with multiplicity) strictly inside, on and outside the circle, where proven. */
  inside: number | null;
  onCircle: number | null;
  outside: number | null;
  /** A pole on the unit circle is repeated (unstable even with none outside). */
  repeatedOnCircle: boolean;
  /** 'inclusion': proven by certified root inclusion disks; 'exact': by exact integer arithmetic. */
  method: 'inclusion' | 'exact';
  /** One sentence for the user. */
  reason: string;
}

/** Slack on |z| computed in double (hypot and the comparison), relative. */
const MODULUS_SLACK = 4 * Number.EPSILON;

function counted(inside: number, outside: number, method: 'inclusion' | 'exact'): CoefficientStability {
  const how = method === 'exact' ? 'exact test on the coefficients' : 'certified from the coefficients';
  const reason =
    outside === 0
      ? `every pole is strictly inside the unit circle (${how})`
      : `${outside} of ${inside + outside} poles lie outside the unit circle (${how})`;
  return {
    verdict: outside === 0 ? 'stable' : 'unstable',
    inside,
    onCircle: 0,
    outside,
    repeatedOnCircle: false,
    method,
    reason,
  };
}

/**
 * Work limit of the first exact Schur–Cohn attempt (Σ row length × bits, some tens of milliseconds); past it the roots are
 * refined with exact evaluation first, which certifies ill-conditioned high-degree cases far sooner.
 */
export const EXACT_FIRST_WORK = 1e7;

/** Sweeps allowed to the exact-evaluation refinement. */
const EXACT_REFINE_SWEEPS = 40;

/** Verdict from inclusion disks around (re, im), or null when a group of disks touches the circle. */
function byDisks(
  re: Float64Array,
  im: Float64Array,
  disks: InclusionDisks,
  method: 'inclusion' | 'exact',
): CoefficientStability | null {
  const side = new Map<number, number>(); // component -> +1 outside, -1 inside, 0 touching
  for (let i = 0; i < re.length; i++) {
    const mod = Math.hypot(re[i]!, im[i]!);
    const r = disks.radius[i]!;
    const s = mod * (1 + MODULUS_SLACK) + r < 1 ? -1 : mod * (1 - MODULUS_SLACK) - r > 1 ? 1 : 0;
    const id = disks.component[i]!;
    const was = side.get(id);
    side.set(id, was === undefined || was === s ? s : 0);
  }
  let inside = 0;
  let outside = 0;
  for (let i = 0; i < re.length; i++) {
    const s = side.get(disks.component[i]!)!;
    if (s === 0) return null;
    if (s < 0) inside++;
    else outside++;
  }
  return counted(inside, outside, method);
}

/**
 * Stable / marginal / unstable for the denominator a in powers of z^-1 (a[0] multiplies z^0; leading and
 * trailing zeros allowed), decided for the exact values of the doubles. Throws a RangeError for non-finite
 * or all-zero coefficients.
 */
export function stabilityOfCoefficients(a: ArrayLike<number>): CoefficientStability {
  return decide(a, false)!;
}

/**
 * As {@link stabilityOfCoefficients}, but within a page's time: null when the certified stages and the
 * work-limited exact recursion leave the verdict open (a multiplied-out denominator of order 1000 whose
 * coefficients reach 1e234, say), instead of running the exact recursion to the end.
 */
export function boundedStabilityOfCoefficients(a: ArrayLike<number>): CoefficientStability | null {
  return decide(a, true);
}

function decide(a: ArrayLike<number>, bounded: boolean): CoefficientStability | null {
  const all = Array.from(a);
  const bad = all.findIndex((v) => !Number.isFinite(v));
  if (bad >= 0) throw new RangeError(`a[${bad}] is ${all[bad]}; coefficients must be finite numbers`);
  let first = 0;
  while (first < all.length && all[first] === 0) first++;
  if (first === all.length)
    throw new RangeError('the denominator is all zeros; it needs at least one non-zero coefficient');
  let last = all.length - 1;
  while (all[last] === 0) last--;
  const origin = all.length - 1 - last; // poles at z = 0
  const c = Float64Array.from(all.slice(first, last + 1));
  const n = c.length - 1;
  if (n === 0) return counted(origin, 0, 'exact');
  const found = findRoots(c);
  const re = Float64Array.from(found.re);
  const im = Float64Array.from(found.im);
  if (re.length !== n) return exactVerdict(c, null, origin, bounded);
  const disks = inclusionDisks(c, re, im);
  const certified = byDisks(re, im, disks, 'inclusion');
  if (certified) return withOrigin(certified, origin);
  // Usually a few disks spoil the picture (two approximations of a tight pair a rounding apart, whose disks
  // then cover everything): refine just those with exact evaluation and form the disks again, exact values at
  // the refined roots and compensated bounds elsewhere.
  const loose = looseRoots(re, im, disks);
  if (loose.length > 0 && loose.length * n <= LOOSE_WORK) {
    const p = exactPoly(c);
    refineExactly(p, re, im, EXACT_REFINE_SWEEPS, loose, 53);
    const refined = byDisks(re, im, mixedInclusionDisks(c, p, re, im, new Set(loose)), 'inclusion');
    if (refined) return withOrigin(refined, origin);
  }
  return exactVerdict(c, { re, im }, origin, bounded);
}

/**
 * Bound on (loose roots) × degree for the targeted refinement: an exact evaluation costs about the degree
 * squared, so this keeps it to tens of milliseconds (20 roots at degree 200, 4 at degree 1000).
 */
const LOOSE_WORK = 4000;

/**
 * The roots whose disks keep the verdict open: a disk that reaches the unit circle, or one large against the
 * distance to the nearest other approximation (it merges components).
 */
function looseRoots(re: Float64Array, im: Float64Array, disks: InclusionDisks): number[] {
  const n = re.length;
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    const r = disks.radius[i]!;
    const mod = Math.hypot(re[i]!, im[i]!);
    let near = Infinity;
    for (let j = 0; j < n; j++)
      if (j !== i) near = Math.min(near, Math.hypot(re[i]! - re[j]!, im[i]! - im[j]!));
    if (!(r < LOOSE_FRACTION * near) || !(Math.abs(mod - 1) > 2 * r)) out.push(i);
  }
  return out;
}

/** A disk counts as loose when its radius reaches this fraction of the distance to the nearest other root. */
const LOOSE_FRACTION = 0.01;

/** The exact stages: Schur–Cohn in integers (with all roots refined exactly past a work limit), then the circle. */
function exactVerdict(
  c: Float64Array,
  roots: { re: Float64Array; im: Float64Array } | null,
  origin: number,
  bounded: boolean,
): CoefficientStability | null {
  const ints = toIntegers(c).reverse(); // ascending powers
  let count = schurCohnExact(ints, EXACT_FIRST_WORK);
  if (count.kind === 'stopped' && bounded) return null;
  if (count.kind === 'stopped' && roots) {
    const { re, im } = roots;
    const p = exactPoly(c);
    refineExactly(p, re, im, EXACT_REFINE_SWEEPS);
    const refined = byDisks(re, im, exactInclusionDisks(p, re, im), 'inclusion');
    if (refined) return withOrigin(refined, origin);
  }
  if (count.kind === 'stopped') count = schurCohnExact(ints);
  if (count.kind === 'counted') return withOrigin(counted(count.inside, count.outside, 'exact'), origin);
  const uc = unitCircleVerdict(ints);
  if (uc.verdict === 'marginal') {
    return {
      verdict: 'marginal',
      inside: uc.inside + origin,
      onCircle: uc.onCircle,
      outside: 0,
      repeatedOnCircle: false,
      method: 'exact',
      reason: `${uc.onCircle === 1 ? 'a pole lies' : `${uc.onCircle} poles lie`} exactly on the unit circle, none repeated and none outside, so the response neither decays nor grows (exact test on the coefficients)`,
    };
  }
  const repeated = uc.why === 'repeated-on-circle';
  return {
    verdict: 'unstable',
    inside: null,
    onCircle: null,
    outside: repeated ? 0 : null,
    repeatedOnCircle: repeated,
    method: 'exact',
    reason: repeated
      ? 'a pole on the unit circle is repeated, so the response grows (exact test on the coefficients)'
      : 'a pole lies outside the unit circle (exact test on the coefficients)',
  };
}

function withOrigin(s: CoefficientStability, origin: number): CoefficientStability {
  return origin === 0 ? s : { ...s, inside: s.inside === null ? null : s.inside + origin };
}

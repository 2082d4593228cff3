/**
 * Two approximations on one simple root. In exact arithmetic Aberth's iteration keeps approximations apart
 * (each repels the others by 1/(z_i − z_j)), but in floating point two approximations a few units in the last
 * place from one simple root are a fixed point: each one's Newton pull, about 1/(its distance to the root),
 * outweighs the other's repulsion, 1/(their distance), once their distance is larger than their distance to
 * the root. Every approximation then passes every per-root test, while the root they left without an
 * approximation is missing from the set and the set no longer multiplies out to the polynomial (measured:
 * the degree-1024 Butterworth denominator of `npm run bench -- roots`, two conjugate pairs on one pair three
 * units apart, set backward error 0.29; the degree-1024 repeated-roots polynomial, 1.07).
 *
 * Such a pair is recognised by Newton's step from its midpoint, which lands next to the pair when one root is
 * there, together with p' hardly changing across the pair: at two close roots, or a multiple root, p'
 * vanishes nearby and changes by its own size between the members. One member (with its conjugate) is then moved off and refined by Aberth
 * steps against all other approximations held fixed, which is Newton's iteration on the polynomial with
 * those roots divided out (implicit deflation) and so finds the missing root wherever it is. The move is
 * kept only if the set backward error (roots/setBackwardError.ts) falls.
 */
import { aberthCorrection } from './aberth.ts';
import { compensatedEval } from './compensated.ts';
import { logDerivativeFromValues } from './scaleSafe.ts';
import { setBackwardError } from './setBackwardError.ts';
import { twoProd } from '../doubleDoubleArith.ts';

/** Aberth's correction of the approximation being moved (aberthCorrection). */
const correction = new Float64Array(2);

/** The derivative's coefficients as double-double (hi, lo): k·c_k exactly (Dekker's product). */
function derivativeDd(c: Float64Array): { hi: Float64Array; lo: Float64Array } {
  const n = c.length - 1;
  const hi = new Float64Array(Math.max(1, n));
  const lo = new Float64Array(Math.max(1, n));
  const pair = new Float64Array(2);
  for (let i = 0; i < n; i++) {
    twoProd(c[i]!, n - i, pair);
    hi[i] = pair[0]!;
    lo[i] = pair[1]!;
  }
  return { hi, lo };
}

/** Two approximations closer than this (relative to their modulus) are tested as sharing one root. */
const CLOSE = 2 ** -36;

/**
 * Set backward error above which shared roots are looked for: a missing root costs far more than this (0.29
 * and 1.07 in the cases above), while a set at the rounding level, e.g. the approximations of an exact
 * triple root that the multiplicity step merges, is left alone.
 */
const GATE = 1e-12;

/**
 * Newton's step from a pair's midpoint counts as landing at the pair when it is at most this many times
 * their distance (the root need not lie between two approximations a few units apart).
 */
const LANDING = 4;

/** For approximations on one point, Newton's step from it must be below this many units of its modulus. */
const NEAR_ULPS = 16;

/** Relative distance at which p' is compared for two approximations on one point. */
const PROBE = 2 ** -26;

/** p' changing by less than this fraction of itself across a close pair marks the root there as simple. */
const SIMPLE = 2 ** -6;

/** Relative distance by which a moved member starts from the point it shared. */
const START_OFFSET = 2 ** -20;

/** Aberth steps at most for one moved member. */
const MAX_STEPS = 100;

/** A moved member stops once its step is below this many units in the last place of its modulus. */
const STOP_ULPS = 4;

/**
 * p'/p at z from the compensated Horner scheme (roots/compensated.ts) with the derivative's coefficients in
 * double-double, scaled so that |p|² cannot underflow; the reversed polynomial at 1/z for |z| > 1.
 */
export class AccurateLogDerivative {
  private readonly rev: Float64Array;
  private readonly d: { hi: Float64Array; lo: Float64Array };
  private readonly dRev: { hi: Float64Array; lo: Float64Array };
  private readonly v = new Float64Array(4);
  private readonly w = new Float64Array(4);
  constructor(private readonly c: Float64Array) {
    this.rev = c.slice().reverse();
    this.d = derivativeDd(c);
    this.dRev = derivativeDd(this.rev);
  }
  /**
   * Writes [Re, Im] of the derivative, in double-double accuracy, of p at z (|z| ≤ 1) or of the reversed
   * polynomial at 1/z (|z| > 1), as `at` evaluates them; `outside` chooses the form for both of a close pair.
   */
  derivative(x: number, y: number, outside: boolean, out: Float64Array): void {
    const mod2 = x * x + y * y;
    const ux = outside ? x / mod2 : x;
    const uy = outside ? -y / mod2 : y;
    const d = outside ? this.dRev : this.d;
    compensatedEval(d.hi, ux, uy, this.w, d.lo);
    out[0] = this.w[0]!;
    out[1] = this.w[1]!;
  }
  /** |p(z)| from the compensated Horner scheme (of the reversed polynomial at 1/z, times |z|^n, for |z| > 1). */
  modulus(x: number, y: number): number {
    const n = this.c.length - 1;
    const mod2 = x * x + y * y;
    const inside = mod2 <= 1;
    compensatedEval(inside ? this.c : this.rev, inside ? x : x / mod2, inside ? y : -y / mod2, this.v);
    const m = Math.hypot(this.v[0]!, this.v[1]!);
    // Compared only between nearby points, so log-scale is enough and nothing overflows.
    return inside ? Math.log2(m) : Math.log2(m) + (n / 2) * Math.log2(mod2);
  }
  /**
   * An upper bound, relative to |z|, on Newton's step p/p' at the point of the last {@link at} (in the
   * reversed polynomial at 1/z for |z| > 1, where the relative step is the same to first order): the
   * compensated |p| plus 16 times the scheme's error bound γ²·Σ|c_k||z|^k (γ = 8(4n + 2)ε, a margin over
   * Graillat, Langlois and Louvet's bound) plus n·2^-1000 for error terms that leave the normal double range,
   * over the double-double |p'|.
   */
  lastStepBound(): number {
    const n = this.c.length - 1;
    const coeffs = this.lastInside ? this.c : this.rev;
    const mod = Math.hypot(this.lastX, this.lastY);
    let b = 0;
    for (let k = 0; k <= n; k++) b = b * mod + Math.abs(coeffs[k]!);
    const floor = (2 * (4 * n + 2) * Number.EPSILON) ** 2 * b + n * 2 ** -1000;
    return (Math.hypot(this.v[0]!, this.v[1]!) + floor) / (Math.hypot(this.w[0]!, this.w[1]!) * mod);
  }
  private lastInside = true;
  private lastX = 0;
  private lastY = 0;
  /** Writes [Re, Im] of p'(z)/p(z) into out (non-finite where p(z) is 0). */
  at(x: number, y: number, out: Float64Array): void {
    const n = this.c.length - 1;
    const mod2 = x * x + y * y;
    const inside = mod2 <= 1;
    const ux = inside ? x : x / mod2;
    const uy = inside ? y : -y / mod2;
    this.lastInside = inside;
    this.lastX = ux;
    this.lastY = uy;
    compensatedEval(inside ? this.c : this.rev, ux, uy, this.v);
    const d = inside ? this.d : this.dRev;
    compensatedEval(d.hi, ux, uy, this.w, d.lo);
    logDerivativeFromValues(this.v[0]!, this.v[1]!, this.w[0]!, this.w[1]!, inside, ux, uy, n, out);
  }
}

/**
 * Pairs (i, j), i < j, of approximations within CLOSE of each other (on one point included), both above
 * the real axis or both on it (a pair straddling the axis is a conjugate pair, handled by roots/conjugate.ts).
 */
function closePairs(zr: Float64Array, zi: Float64Array): [number, number][] {
  // A plain scan of all pairs: no allocation or sort, which at low degree would cost a noticeable share of a
  // whole root search, and n²/2 comparisons are far below the search's own n² work per sweep.
  const n = zr.length;
  let out: [number, number][] | undefined;
  for (let i = 0; i < n; i++) {
    const xi = zr[i]!;
    const yi = zi[i]!;
    if (yi < 0) continue;
    const tol = CLOSE * Math.hypot(xi, yi);
    for (let j = i + 1; j < n; j++) {
      const yj = zi[j]!;
      if (yj < 0 || (yi === 0) !== (yj === 0)) continue;
      const dx = Math.abs(zr[j]! - xi);
      const dy = Math.abs(yj - yi);
      if (dx <= tol && dy <= tol && Math.hypot(dx, dy) <= tol) (out ??= []).push([i, j]);
    }
  }
  return out ?? [];
}

/** The index of the exact mirror of upper root i (its conjugate in the set), or -1. */
function mirrorOf(zr: Float64Array, zi: Float64Array, i: number): number {
  for (let j = 0; j < zr.length; j++) if (zr[j] === zr[i] && zi[j] === -zi[i]!) return j;
  return -1;
}

/**
 * Finds approximations that share one simple root in the exactly conjugate-symmetric set zr/zi (roots of
 * descending c), moves one member of each such pair to the root left without an approximation, and keeps
 * the moves if the set backward error falls; returns the Aberth steps taken (0 when nothing was shared).
 */
export function reseatSharedRoots(c: Float64Array, zr: Float64Array, zi: Float64Array): number {
  const pairs = closePairs(zr, zi);
  if (pairs.length === 0) return 0;
  const ev = new AccurateLogDerivative(c);
  const g = new Float64Array(2);
  const shared: number[] = [];
  for (const [i, j] of pairs) {
    const mx = (zr[i]! + zr[j]!) / 2;
    const my = zi[i] === 0 ? 0 : (zi[i]! + zi[j]!) / 2;
    ev.at(mx, my, g);
    const newton = 1 / Math.hypot(g[0]!, g[1]!);
    const d = Math.hypot(zr[j]! - zr[i]!, zi[j]! - zi[i]!);
    const size = Math.hypot(mx, my);
    if (!(newton <= LANDING * Math.max(d, NEAR_ULPS * Number.EPSILON * size))) continue;
    // A multiple root (or a cluster) also draws Newton's step into the pair's span, but there p' vanishes
    // nearby and changes by its own size across the pair; at a simple root it hardly changes.
    const outside = mx * mx + my * my > 1;
    ev.derivative(zr[i]!, zi[i]!, outside, g);
    const ar = g[0]!;
    const ai = g[1]!;
    // Two approximations on one point: p' is compared at a point PROBE·|z| away instead.
    if (d === 0) ev.derivative(zr[j]! + PROBE * size, zi[j]!, outside, g);
    else ev.derivative(zr[j]!, zi[j]!, outside, g);
    if (Math.hypot(g[0]! - ar, g[1]! - ai) <= SIMPLE * Math.hypot(ar, ai)) shared.push(j);
  }
  if (shared.length === 0) return 0;
  const before = setBackwardError(c, zr, zi);
  if (!(before > GATE)) return 0;
  const startR = Float64Array.from(zr);
  const startI = Float64Array.from(zi);
  let steps = 0;
  for (const j of shared) {
    const real = zi[j] === 0;
    const mate = real ? -1 : mirrorOf(zr, zi, j);
    if (!real && mate < 0) continue;
    const size = Math.hypot(zr[j]!, zi[j]!);
    zr[j] = zr[j]! + START_OFFSET * size;
    if (!real) zi[j] = zi[j]! + START_OFFSET * size;
    for (let k = 0; k < MAX_STEPS; k++) {
      steps++;
      const x: number = zr[j]!;
      const y: number = zi[j]!;
      ev.at(x, y, g);
      aberthCorrection(g[0]!, g[1]!, x, y, j, zr, zi, correction);
      const sr = correction[0]!;
      const si = real ? 0 : correction[1]!;
      if (!Number.isFinite(sr) || !Number.isFinite(si)) break;
      zr[j] = x - sr;
      zi[j] = y - si;
      if (!real) {
        if (!(zi[j]! > 0)) break; // reached the axis: a real root a lone member cannot stand for
        zr[mate] = zr[j]!;
        zi[mate] = -zi[j]!;
      }
      if (Math.hypot(sr, si) <= STOP_ULPS * Number.EPSILON * Math.hypot(zr[j]!, zi[j]!)) break;
    }
  }
  const after = setBackwardError(c, zr, zi);
  if (!(after < before)) {
    zr.set(startR);
    zi.set(startI);
  }
  return steps;
}

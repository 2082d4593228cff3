/**
 * Final polish of badly conditioned roots: Aberth–Ehrlich sweeps in which p(z) and p'(z) are both compensated
 * (compensatedEvalWithDerivative: one pass, real arithmetic), so the iteration converges to the roots of the given coefficients as if the
 * arithmetic had twice the precision (the refinement strategy of e.g. Graillat, "Accurate simple zeros of
 * polynomials in floating point arithmetic", 2008, with Aberth's correction keeping clustered roots apart).
 * Inside a cluster the plain residual is rounding noise at every point, so a plain-precision stop leaves
 * approximations anywhere in the cluster and the set no longer multiplies out to the polynomial; here every
 * root runs until its compensated step reaches its last bits or stops falling, and keeps its best point.
 * The roots are polished without forcing conjugate symmetry (two real roots that came out of the plain
 * iteration as a conjugate pair must be free to split), and made symmetric again afterwards by comparing
 * compensated residuals.
 */
import { compensatedEvalWithDerivative } from './compensated.ts';
import { logDerivative, relativeResidual } from './horner.ts';
import { freezeLevel } from './aberth.ts';
import { logDerivativeFromValues, modulus } from './scaleSafe.ts';
import { makeMirrors } from './conjugate.ts';

/** Polish a root when its condition number times ε (its forward-error estimate, relative) exceeds this. */
export const POLISH_FORWARD_ERROR = 1e-14;

/** Compensated sweeps at most (a multiple root's approximations close in linearly, so clusters need many). */
export const POLISH_SWEEPS = 60;

/** The polish is undone if a plain residual ends above this many times its start (or the rounding level). */
export const POLISH_GUARD = 64;

/** A root stops once its compensated residual has not improved for this many sweeps. */
export const POLISH_STALL_SWEEPS = 2;

/** A stalled root counts as settled once its last step is below this fraction of its nearest-neighbour distance. */
const SETTLED = 1e-6;

/**
 * Compensated p'/p and relative residual |p(z)| / Σ|c_k||z|^k at z = x + iy, written to out = [Re, Im, res].
 * For |z| > 1 the reversed polynomial q(w) = w^n p(1/w) is evaluated at w = 1/z and p'/p = w(n − w q'/q)
 * (as roots/horner.ts does), so no power of |z| overflows at high degree.
 */
class CompensatedEvaluator {
  private readonly rev: Float64Array;
  private readonly v = new Float64Array(5);
  private readonly g = new Float64Array(3);
  constructor(private readonly c: Float64Array) {
    this.rev = c.slice().reverse();
  }
  logDerivative(x: number, y: number, out: Float64Array): void {
    const n = this.c.length - 1;
    const mod2 = x * x + y * y;
    const inside = mod2 <= 1;
    const ux = inside ? x : x / mod2;
    const uy = inside ? y : -y / mod2;
    // p and p' both compensated, in one pass (division by the real quadratic with roots z and z̄). This used
    // to be complex compensated Horner for p with a plain p', and a second compensated pass over the
    // derivative's double-double coefficients where the plain p' could not be trusted (inside clusters):
    // 1.4 µs against 0.7 µs at degree 64, equally accurate against exact values (roots/exactEval.ts).
    compensatedEvalWithDerivative(inside ? this.c : this.rev, ux, uy, this.v);
    const b = this.v[4]!;
    // p and p' are scaled by one power of two (exact) so that |p|² neither underflows nor overflows: at degree
    // 1024, |p| near a root close to the origin is about 1e-182 and |p|² is 0 in double.
    const size = logDerivativeFromValues(
      this.v[0]!,
      this.v[1]!,
      this.v[2]!,
      this.v[3]!,
      inside,
      ux,
      uy,
      n,
      out,
    );
    out[2] = b === 0 ? 0 : size / b;
  }
  /** The compensated relative residual alone. */
  residual(x: number, y: number): number {
    this.logDerivative(x, y, this.g);
    return this.g[2]!;
  }
}

/**
 * Polishes the badly conditioned approximations in zr/zi (all roots of descending c, conjugates listed,
 * exactly symmetric on entry, mate[i] the index of i's exact mirror or -1, as symmetrizeConjugates returns it)
 * in place and leaves every complex root with its exact mirror; returns the sweeps used. A complex root is polished once and its mate mirrors it, until the pair comes so close to
 * the real axis that it may really be two real roots: then both members go on independently. Real
 * approximations are polished independently from the start (see unsettleRealRoots).
 */
export function polishIllConditioned(
  c: Float64Array,
  zr: Float64Array,
  zi: Float64Array,
  mate: Int32Array,
): number {
  const n = zr.length;
  const absC = c.map(Math.abs);
  const h = new Float64Array(3);
  const active: number[] = [];
  for (let i = 0; i < n; i++) {
    if (zi[i]! < 0) continue;
    // κ = Σ|c_k||z|^k / (|z||p'(z)|) = 1 / (|z| |p'/p| residual), NaN (so polished) where p is exactly 0.
    logDerivative(c, absC, zr[i]!, zi[i]!, h);
    const kappa = 1 / (modulus(zr[i]!, zi[i]!) * modulus(h[0]!, h[1]!) * h[2]!);
    if (!(kappa * Number.EPSILON <= POLISH_FORWARD_ERROR)) active.push(i);
  }
  if (active.length === 0) return 0;
  const ev = new CompensatedEvaluator(c);
  const g = new Float64Array(3);
  const startR = Float64Array.from(zr);
  const startI = Float64Array.from(zi);
  const touched: number[] = [];
  for (const i of active) {
    touched.push(i);
    if (mate[i]! >= 0) touched.push(mate[i]!);
  }
  const plainBefore = new Float64Array(touched.length);
  for (let k = 0; k < touched.length; k++)
    plainBefore[k] = relativeResidual(c, zr[touched[k]!]!, zi[touched[k]!]!);
  // free[i]: i moves on its own (real approximations, released pairs); otherwise i is the upper member of
  // a pair whose mate mirrors it.
  const free = new Uint8Array(n);
  const reals: number[] = [];
  for (const i of active)
    if (zi[i] === 0) {
      free[i] = 1;
      reals.push(i);
    }
  unsettleRealRoots(zr, zi, reals);
  // A mirrored member is not repelled by the free roots (its Aberth correction is taken from its mate's), so
  // a free root can settle on the very point a mirror is put on, and one root of the cluster is then left
  // without an approximation. That is rare and cheap to see afterwards (two approximations on one point);
  // then every pair is released and the sweeps go on, each root repelled by all others.
  let mirroring = true;
  const best = new Float64Array(n).fill(Infinity);
  const stale = new Int32Array(n);
  // Residual level (relative) below which compensated evaluation is noise: γ_{4n+2}², with margin.
  const noise = 64 * ((4 * n + 2) * Number.EPSILON) ** 2;
  const lastStep = new Float64Array(n).fill(Infinity);
  let sweeps = 0;
  let list = active;
  for (;;) {
    while (list.length > 0 && sweeps < POLISH_SWEEPS) {
      sweeps++;
      const next: number[] = [];
      for (const i of list) {
        const x = zr[i]!;
        const y = zi[i]!;
        ev.logDerivative(x, y, g);
        const res = g[2]!;
        if (res === 0) continue; // an exact root
        if (res < best[i]!) {
          best[i] = res;
          stale[i] = 0;
        } else stale[i]!++;
        // p'/p − Σ_{j≠i} 1/(z_i − z_j)
        let ar = g[0]!;
        let ai = g[1]!;
        let nearest = Infinity;
        for (let j = 0; j < n; j++) {
          if (j === i) continue;
          const ur = x - zr[j]!;
          const ui = y - zi[j]!;
          const d2 = ur * ur + ui * ui;
          const inv = 1 / d2;
          ar -= ur * inv;
          ai += ui * inv;
          if (d2 < nearest) nearest = d2;
        }
        // A root whose residual has stopped falling is done once its last step was tiny against the distance to
        // its nearest neighbour (it sits at its root, moving in the rounding noise); a root still travelling
        // through a cluster, whose residual need not fall every sweep, goes on.
        if (stale[i]! >= POLISH_STALL_SWEEPS && (res <= noise || lastStep[i]! < SETTLED * Math.sqrt(nearest)))
          continue;
        const ad = ar * ar + ai * ai;
        const stepR = ar / ad;
        const stepI = -ai / ad;
        if (!Number.isFinite(stepR) || !Number.isFinite(stepI)) continue;
        const step = modulus(stepR, stepI);
        zr[i] = x - stepR;
        zi[i] = y - stepI;
        lastStep[i] = step;
        const m = mate[i]!;
        if (!free[i] && m >= 0) {
          if (zi[i]! <= step) {
            // The pair reaches the axis: release both members to move on their own.
            free[i] = 1;
            free[m] = 1;
            next.push(m);
          } else {
            zr[m] = zr[i]!;
            zi[m] = -zi[i]!;
          }
        }
        if (step > 2 * Number.EPSILON * modulus(x, y)) next.push(i);
      }
      list = next;
    }
    if (!mirroring || sweeps >= POLISH_SWEEPS) break;
    const twins = coincident(zr, zi, touched);
    if (twins.length === 0 || !anyFree(touched, free)) break;
    mirroring = false;
    for (const i of touched) free[i] = 1;
    unsettleRealRoots(zr, zi, twins, true);
    for (const i of touched) stale[i] = 0;
    list = touched;
  }
  restoreSymmetry(ev, zr, zi, touched);
  // Guard against what compensated arithmetic cannot see (products that overflow or underflow at extreme
  // scales): if any polished root's plain residual ends far above both its start and the rounding level,
  // the whole polish is undone.
  const floor = POLISH_GUARD * freezeLevel(n);
  let worse = false;
  for (let k = 0; k < touched.length && !worse; k++) {
    const i = touched[k]!;
    worse = !(relativeResidual(c, zr[i]!, zi[i]!) <= Math.max(floor, POLISH_GUARD * plainBefore[k]!));
  }
  if (worse) {
    zr.set(startR);
    zi.set(startI);
  }
  return sweeps;
}

/** Whether any of `among` moves on its own. */
function anyFree(among: number[], free: Uint8Array): boolean {
  for (const i of among) if (free[i]) return true;
  return false;
}

/**
 * With real coefficients and a conjugate-symmetric set, Aberth's step at a real point is real: two real
 * approximations standing in for a complex pair could never leave the axis. Each real approximation to be
 * polished is pushed off the axis by a tenth of the distance to its nearest neighbour (alternating in
 * sign); a truly real root draws it back.
 */
function unsettleRealRoots(zr: Float64Array, zi: Float64Array, active: number[], anywhere = false): void {
  let sign = 1;
  for (const i of active) {
    if (zi[i] !== 0 && !anywhere) continue;
    let near = Infinity;
    for (let j = 0; j < zr.length; j++) {
      const d = modulus(zr[i]! - zr[j]!, zi[i]! - zi[j]!);
      if (j !== i && d > 0) near = Math.min(near, d);
    }
    if (!Number.isFinite(near)) near = Math.max(1, Math.abs(zr[i]!)) * 1e-3;
    zi[i] = zi[i]! + sign * UNSETTLE_FRACTION * near;
    sign = -sign;
  }
}

/**
 * One member of each group of approximations among `among` that sit on the same point (to within four
 * rounding units): two approximations settled on one root.
 */
function coincident(zr: Float64Array, zi: Float64Array, among: number[]): number[] {
  const order = [...among].sort((a, b) => zr[a]! - zr[b]! || zi[a]! - zi[b]!);
  const out: number[] = [];
  for (let a = 0; a < order.length; a++) {
    const i = order[a]!;
    const tol = 4 * Number.EPSILON * modulus(zr[i]!, zi[i]!);
    for (let b = a + 1; b < order.length && zr[order[b]!]! - zr[i]! <= tol; b++) {
      const j = order[b]!;
      if (Math.abs(zi[j]! - zi[i]!) <= tol) {
        out.push(j);
        break;
      }
    }
  }
  return out;
}

/** A polished root with |im| below this fraction of |z| is tested as a real root. */
const SNAP_CHECK = 1e-4;

/** Fraction of the nearest-neighbour distance by which a real approximation is moved off the axis. */
const UNSETTLE_FRACTION = 0.1;

/**
 * After an unsymmetric polish: a root whose projection onto the real axis has a compensated residual no
 * larger than its own becomes real; the others pair with their nearest mirror, both taking the better
 * member's value; a complex root left without a partner goes onto the real axis.
 */
function restoreSymmetry(
  ev: CompensatedEvaluator,
  zr: Float64Array,
  zi: Float64Array,
  polished: number[],
): void {
  const upper: number[] = [];
  const lower: number[] = [];
  for (const i of polished) {
    if (zi[i] === 0) continue;
    // Only a root this close to the axis can be a real root whose polish left it slightly off.
    if (nearAxis(zr, zi, i)) {
      if (ev.residual(zr[i]!, 0) <= ev.residual(zr[i]!, zi[i]!)) {
        zi[i] = 0;
        continue;
      }
    }
    (zi[i]! > 0 ? upper : lower).push(i);
  }
  // Pairs by mutual nearness (an upper root and the lower one nearest its mirror, each the other's nearest),
  // round by round: a greedy pass in a fixed order can hand a root its neighbour's mirror, and the two
  // would then end on the same point.
  const taken = new Uint8Array(zr.length);
  const pairs: [number, number, number][] = [];
  // Exact mirrors first (mirrored members, and pairs whose free members met): each is the other's nearest
  // at distance 0 and keeps its values, so they leave the search, which then costs only the rest's
  // distances (the search over all pairs was a twentieth of findRoots at Butterworth 32).
  const byMirror = (a: number, b: number) => zr[a]! - zr[b]! || Math.abs(zi[a]!) - Math.abs(zi[b]!);
  const sortedLower = [...lower].sort(byMirror);
  const unmatched: number[] = [];
  let b = 0;
  for (const i of [...upper].sort(byMirror)) {
    while (b < sortedLower.length && byMirror(sortedLower[b]!, i) < 0) b++;
    const j = sortedLower[b];
    if (j !== undefined && zr[j] === zr[i] && zi[j] === -zi[i]!) {
      taken[j] = 1;
      b++;
    } else unmatched.push(i);
  }
  let up = unmatched;
  while (up.length > 0) {
    const low = lower.filter((k) => !taken[k]);
    if (low.length === 0) break;
    const nearestLow = new Map<number, [number, number]>();
    for (const i of up) {
      let j = -1;
      let dist = Infinity;
      for (const k of low) {
        const dd = modulus(zr[k]! - zr[i]!, zi[k]! + zi[i]!);
        if (dd < dist) [j, dist] = [k, dd];
      }
      nearestLow.set(i, [j, dist]);
    }
    const nearestUp = new Map<number, number>();
    for (const k of low) {
      let j = -1;
      let dist = Infinity;
      for (const i of up) {
        const dd = modulus(zr[k]! - zr[i]!, zi[k]! + zi[i]!);
        if (dd < dist) [j, dist] = [i, dd];
      }
      nearestUp.set(k, j);
    }
    const rest: number[] = [];
    for (const i of up) {
      const [j, dist] = nearestLow.get(i)!;
      if (nearestUp.get(j) !== i) rest.push(i);
      else if (
        nearAxis(zr, zi, i) &&
        nearAxis(zr, zi, j) &&
        dist > Math.min(zi[i]!, -zi[j]!) &&
        dist > nearestOther(zr, zi, i, j)
      ) {
        // Two roots at the axis whose mirrors are farther apart than i is from any other root: not one
        // complex root polished twice but members of different clusters (say of a cluster at 1 and one at
        // −1, each slightly off the axis); pairing them would move one across the plane. i goes onto the
        // axis, as an unpaired root does.
        zi[i] = 0;
      } else {
        taken[j] = 1;
        pairs.push([i, j, dist]);
      }
    }
    up = rest;
  }
  for (const i of up) zi[i] = 0; // more roots above the axis than below: the surplus goes onto it
  for (const [i, j, dist] of pairs) {
    // Mates that agree to the last bits need no comparison; otherwise the better residual wins.
    const agree = dist <= 4 * Number.EPSILON * modulus(zr[i]!, zi[i]!);
    makeMirrors(zr, zi, i, j, agree || ev.residual(zr[i]!, zi[i]!) <= ev.residual(zr[j]!, zi[j]!));
  }
  for (const k of lower) if (!taken[k]) zi[k] = 0;
}

/** Whether root i lies so close to the real axis that it may be a real root polished slightly off it. */
function nearAxis(zr: Float64Array, zi: Float64Array, i: number): boolean {
  return Math.abs(zi[i]!) <= SNAP_CHECK * modulus(zr[i]!, zi[i]!);
}

/** Distance from root i to the nearest root other than i and j. */
function nearestOther(zr: Float64Array, zi: Float64Array, i: number, j: number): number {
  let near = Infinity;
  for (let k = 0; k < zr.length; k++)
    if (k !== i && k !== j) near = Math.min(near, modulus(zr[k]! - zr[i]!, zi[k]! - zi[i]!));
  return near;
}

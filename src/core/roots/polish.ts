/**
 * Final polish of badly conditioned roots: Aberth–Ehrlich sweeps in which p(z) and p'(z) come from the
 * compensated Horner scheme, so the iteration converges to the roots of the given coefficients as if the
 * arithmetic had twice the precision (the refinement strategy of e.g. Graillat, "Accurate simple zeros of
 * polynomials in floating point arithmetic", 2008, with Aberth's correction keeping clustered roots apart).
 * Inside a cluster the plain residual is rounding noise at every point, so a plain-precision stop leaves
 * approximations anywhere in the cluster and the set no longer multiplies out to the polynomial; here every
 * root runs until its compensated step reaches its last bits or stops falling, and keeps its best point.
 * The roots are polished without forcing conjugate symmetry (two real roots that came out of the plain
 * iteration as a conjugate pair must be free to split), and made symmetric again afterwards by comparing
 * compensated residuals.
 */
import { compensatedEval, derivativeDd } from './compensated.ts';
import { relativeResidual } from './horner.ts';
import { freezeLevel } from './aberth.ts';

/** Polish a root when its condition number times ε (its forward-error estimate, relative) exceeds this. */
export const POLISH_FORWARD_ERROR = 1e-15;

/** Compensated sweeps at most (a multiple root's approximations close in linearly, so clusters need many). */
export const POLISH_SWEEPS = 60;

/** The polish is undone if a plain residual ends above this many times its start (or the rounding level). */
export const POLISH_GUARD = 64;

/** A root stops once its compensated residual has not improved for this many sweeps. */
export const POLISH_STALL_SWEEPS = 3;

/**
 * Compensated p'/p and relative residual |p(z)| / Σ|c_k||z|^k at z = x + iy, written to out = [Re, Im, res].
 * For |z| > 1 the reversed polynomial q(w) = w^n p(1/w) is evaluated at w = 1/z and p'/p = w(n − w q'/q)
 * (as roots/horner.ts does), so no power of |z| overflows at high degree.
 */
class CompensatedEvaluator {
  private readonly rev: Float64Array;
  private readonly d: { hi: Float64Array; lo: Float64Array };
  private readonly dRev: { hi: Float64Array; lo: Float64Array };
  private readonly absC: Float64Array;
  private readonly absRev: Float64Array;
  private readonly v = new Float64Array(4);
  private readonly w = new Float64Array(4);
  constructor(private readonly c: Float64Array) {
    this.rev = c.slice().reverse();
    this.d = derivativeDd(c);
    this.dRev = derivativeDd(this.rev);
    this.absC = c.map(Math.abs);
    this.absRev = this.rev.map(Math.abs);
  }
  logDerivative(x: number, y: number, out: Float64Array): void {
    const n = this.c.length - 1;
    const mod2 = x * x + y * y;
    const inside = mod2 <= 1;
    const ux = inside ? x : x / mod2;
    const uy = inside ? y : -y / mod2;
    const coeffs = inside ? this.c : this.rev;
    const deriv = inside ? this.d : this.dRev;
    const abs = inside ? this.absC : this.absRev;
    compensatedEval(coeffs, ux, uy, this.v);
    compensatedEval(deriv.hi, ux, uy, this.w, deriv.lo);
    const mod = Math.sqrt(ux * ux + uy * uy);
    let b = 0;
    for (let k = 0; k <= n; k++) b = b * mod + abs[k]!;
    const pr = this.v[0]!;
    const pi = this.v[1]!;
    const pd = pr * pr + pi * pi;
    out[2] = b === 0 ? 0 : Math.sqrt(pd) / b;
    const hr = (this.w[0]! * pr + this.w[1]! * pi) / pd;
    const hi = (this.w[1]! * pr - this.w[0]! * pi) / pd;
    if (inside) {
      out[0] = hr;
      out[1] = hi;
      return;
    }
    // p'/p = w (n − w h)
    const tr = n - (ux * hr - uy * hi);
    const ti = -(ux * hi + uy * hr);
    out[0] = ux * tr - uy * ti;
    out[1] = ux * ti + uy * tr;
  }
}

/**
 * Polishes the badly conditioned approximations in zr/zi (all roots of descending c, conjugates listed) in
 * place and leaves every complex root with its exact mirror; returns the sweeps used.
 */
export function polishIllConditioned(c: Float64Array, zr: Float64Array, zi: Float64Array): number {
  const n = zr.length;
  const ev = new CompensatedEvaluator(c);
  const g = new Float64Array(3);
  const active: number[] = [];
  for (let i = 0; i < n; i++) {
    // κ = Σ|c_k||z|^k / (|z||p'(z)|) = 1 / (|z| |p'/p| residual), Infinity where p' vanishes.
    ev.logDerivative(zr[i]!, zi[i]!, g);
    const kappa = 1 / (Math.hypot(zr[i]!, zi[i]!) * Math.hypot(g[0]!, g[1]!) * g[2]!);
    if (!(kappa * Number.EPSILON <= POLISH_FORWARD_ERROR)) active.push(i);
  }
  if (active.length === 0) return 0;
  const startR = Float64Array.from(zr);
  const startI = Float64Array.from(zi);
  const plainBefore = active.map((i) => relativeResidual(c, zr[i]!, zi[i]!));
  unsettleRealRoots(zr, zi, active);
  const best = new Map<number, number>();
  const stale = new Map<number, number>();
  for (const i of active) {
    ev.logDerivative(zr[i]!, zi[i]!, g);
    best.set(i, g[2]!);
    stale.set(i, 0);
  }
  // Residual level (relative) below which compensated evaluation is noise: γ_{4n+2}², with margin.
  const noise = 64 * ((4 * n + 2) * Number.EPSILON) ** 2;
  let sweeps = 0;
  let list = active;
  while (list.length > 0 && sweeps < POLISH_SWEEPS) {
    sweeps++;
    const next: number[] = [];
    for (const i of list) {
      const x = zr[i]!;
      const y = zi[i]!;
      ev.logDerivative(x, y, g);
      if (g[2] === 0) continue; // an exact root
      // p'/p − Σ_{j≠i} 1/(z_i − z_j)
      let ar = g[0]!;
      let ai = g[1]!;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        const ur = x - zr[j]!;
        const ui = y - zi[j]!;
        const inv = 1 / (ur * ur + ui * ui);
        ar -= ur * inv;
        ai += ui * inv;
      }
      const ad = ar * ar + ai * ai;
      const stepR = ar / ad;
      const stepI = -ai / ad;
      if (!Number.isFinite(stepR) || !Number.isFinite(stepI)) continue;
      zr[i] = x - stepR;
      zi[i] = y - stepI;
      ev.logDerivative(zr[i]!, zi[i]!, g);
      const res = g[2]!;
      if (res < best.get(i)!) {
        best.set(i, res);
        stale.set(i, 0);
      } else stale.set(i, stale.get(i)! + 1);
      const step = Math.hypot(stepR, stepI);
      // Stalling only ends the polish once the residual is at the compensated evaluation's noise level;
      // before that, Aberth's steps inside a cluster need not lower every residual every sweep.
      const settled = res <= noise && stale.get(i)! >= POLISH_STALL_SWEEPS;
      if (res > 0 && step > 2 * Number.EPSILON * Math.hypot(x, y) && !settled) next.push(i);
    }
    list = next;
  }
  restoreSymmetry(ev, zr, zi, active);
  // Guard against what compensated arithmetic cannot see (products that overflow or underflow at extreme
  // scales): if any polished root's plain residual ends far above both its start and the rounding level,
  // the whole polish is undone.
  const floor = POLISH_GUARD * freezeLevel(n);
  if (
    active.some(
      (i, k) => !(relativeResidual(c, zr[i]!, zi[i]!) <= Math.max(floor, POLISH_GUARD * plainBefore[k]!)),
    )
  ) {
    zr.set(startR);
    zi.set(startI);
  }
  return sweeps;
}

/**
 * With real coefficients and a conjugate-symmetric set, Aberth's step at a real point is real: two real
 * approximations standing in for a complex pair could never leave the axis. Each real approximation to be
 * polished is pushed off the axis by a tenth of the distance to its nearest neighbour (alternating in
 * sign); a truly real root draws it back.
 */
function unsettleRealRoots(zr: Float64Array, zi: Float64Array, active: number[]): void {
  let sign = 1;
  for (const i of active) {
    if (zi[i] !== 0) continue;
    let near = Infinity;
    for (let j = 0; j < zr.length; j++)
      if (j !== i) near = Math.min(near, Math.hypot(zr[i]! - zr[j]!, zi[i]! - zi[j]!));
    if (!Number.isFinite(near) || near === 0) near = Math.max(1, Math.abs(zr[i]!)) * 1e-3;
    zi[i] = sign * UNSETTLE_FRACTION * near;
    sign = -sign;
  }
}

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
  const g = new Float64Array(3);
  const residualAt = (x: number, y: number) => {
    ev.logDerivative(x, y, g);
    return g[2]!;
  };
  const upper: number[] = [];
  const lower: number[] = [];
  const residual = new Map<number, number>();
  for (const i of polished) {
    if (zi[i] === 0) continue;
    const own = residualAt(zr[i]!, zi[i]!);
    if (residualAt(zr[i]!, 0) <= own) {
      zi[i] = 0;
      continue;
    }
    residual.set(i, own);
    (zi[i]! > 0 ? upper : lower).push(i);
  }
  // Roots outside the polished set that pair with polished ones keep their partners via the mirror search.
  const taken = new Set<number>();
  upper.sort((a, b) => zi[b]! - zi[a]!);
  for (const i of upper) {
    let j = -1;
    let dist = Infinity;
    for (const k of lower) {
      if (taken.has(k)) continue;
      const dd = Math.hypot(zr[k]! - zr[i]!, zi[k]! + zi[i]!);
      if (dd < dist) [j, dist] = [k, dd];
    }
    if (j < 0) {
      zi[i] = 0;
      continue;
    }
    taken.add(j);
    const keepI = residual.get(i)! <= residual.get(j)!;
    const r = keepI ? zr[i]! : zr[j]!;
    const m = keepI ? zi[i]! : -zi[j]!;
    zr[i] = r;
    zr[j] = r;
    zi[i] = m;
    zi[j] = -m;
  }
  for (const k of lower) if (!taken.has(k)) zi[k] = 0;
}

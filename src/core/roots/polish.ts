/**
 * Final polish of badly conditioned roots: a few Aberth–Ehrlich sweeps in which p(z) comes from the
 * compensated Horner scheme, so the iteration converges to the roots of the given coefficients as if the
 * arithmetic had twice the precision (the refinement strategy of e.g. Graillat, "Accurate simple zeros of
 * polynomials in floating point arithmetic", 2008, with Aberth's correction keeping clustered roots apart).
 * Only roots whose estimated forward error exceeds POLISH_FORWARD_ERROR are touched, since compensated
 * evaluation costs several plain ones.
 */
import { compensatedEval } from './compensated.ts';
import { logDerivative } from './horner.ts';

/** Polish a root when its condition number times ε (its forward-error estimate, relative) exceeds this. */
export const POLISH_FORWARD_ERROR = 1e-12;

/** A root stops polishing once a step is not below this fraction of the one before (noise reached). */
export const POLISH_STALL_RATIO = 0.5;

/** Compensated sweeps at most. */
export const POLISH_SWEEPS = 6;

/**
 * Polishes the badly conditioned approximations in zr/zi (roots of descending c) in place, skipping those
 * with skip(i) true (members of a merged multiple root); returns sweeps used. Conjugate symmetry is kept:
 * a root's mate (mate[i], -1 for real roots) follows it, and real roots stay real. A polished root whose
 * plain residual ends above both its old one and the rounding level `floor` (a sweep budget running out
 * mid-cluster) goes back to where it was, so the backward error never grows.
 */
export function polishIllConditioned(
  c: Float64Array,
  zr: Float64Array,
  zi: Float64Array,
  mate: Int32Array,
  skip: (i: number) => boolean,
  floor: number,
): number {
  const n = zr.length;
  const absC = c.map(Math.abs);
  const g = new Float64Array(3);
  const active: number[] = [];
  const before = new Map<number, [number, number, number]>();
  for (let i = 0; i < n; i++) {
    if (zi[i]! < 0 || skip(i)) continue;
    logDerivative(c, absC, zr[i]!, zi[i]!, g);
    // κ = Σ|c_k||z|^k / (|z||p'(z)|) = 1 / (|z| |p'/p| residual).
    const kappa = 1 / (Math.hypot(zr[i]!, zi[i]!) * Math.hypot(g[0]!, g[1]!) * g[2]!);
    if (kappa * Number.EPSILON <= POLISH_FORWARD_ERROR) continue;
    active.push(i);
    before.set(i, [zr[i]!, zi[i]!, g[2]!]);
  }
  const v = new Float64Array(4);
  const lastStep = new Float64Array(n).fill(Infinity);
  let sweeps = 0;
  let list = active;
  while (list.length > 0 && sweeps < POLISH_SWEEPS) {
    sweeps++;
    const next: number[] = [];
    for (const i of list) {
      const x = zr[i]!;
      const y = zi[i]!;
      compensatedEval(c, x, y, v);
      const pd = v[0]! * v[0]! + v[1]! * v[1]!;
      if (pd === 0) continue;
      // p'/p − Σ_{j≠i} 1/(z_i − z_j)
      let ar = (v[2]! * v[0]! + v[3]! * v[1]!) / pd;
      let ai = (v[3]! * v[0]! - v[2]! * v[1]!) / pd;
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
      const q = mate[i]!;
      if (q >= 0) {
        zi[i] = y - stepI;
        zr[q] = zr[i]!;
        zi[q] = -zi[i]!;
      }
      // Continue only while the steps are above rounding and still shrinking fast (quadratic or better).
      const step = Math.hypot(stepR, stepI);
      if (step > 4 * Number.EPSILON * Math.hypot(x, y) && step < POLISH_STALL_RATIO * lastStep[i]!)
        next.push(i);
      lastStep[i] = step;
    }
    list = next;
  }
  for (const [i, [x, y, residual]] of before) {
    logDerivative(c, absC, zr[i]!, zi[i]!, g);
    if (g[2]! > Math.max(floor, residual)) {
      zr[i] = x;
      zi[i] = y;
      const q = mate[i]!;
      if (q >= 0) {
        zr[q] = x;
        zi[q] = -y;
      }
    }
  }
  return sweeps;
}

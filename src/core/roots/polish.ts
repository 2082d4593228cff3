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

/** Compensated sweeps at most. */
export const POLISH_SWEEPS = 6;

/** Polishes the badly conditioned approximations in zr/zi (roots of descending c) in place; returns sweeps used. */
export function polishIllConditioned(c: Float64Array, zr: Float64Array, zi: Float64Array): number {
  const n = zr.length;
  const absC = c.map(Math.abs);
  const g = new Float64Array(3);
  const active: number[] = [];
  for (let i = 0; i < n; i++) {
    logDerivative(c, absC, zr[i]!, zi[i]!, g);
    // κ = Σ|c_k||z|^k / (|z||p'(z)|) = 1 / (|z| |p'/p| residual).
    const kappa = 1 / (Math.hypot(zr[i]!, zi[i]!) * Math.hypot(g[0]!, g[1]!) * g[2]!);
    if (!(kappa * Number.EPSILON <= POLISH_FORWARD_ERROR)) active.push(i);
  }
  const v = new Float64Array(4);
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
      zi[i] = y - stepI;
      if (Math.hypot(stepR, stepI) > 4 * Number.EPSILON * Math.hypot(x, y)) next.push(i);
    }
    list = next;
  }
  return sweeps;
}

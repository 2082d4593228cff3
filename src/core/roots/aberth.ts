/**
 * The Aberth–Ehrlich simultaneous iteration (O. Aberth, Math. Comp. 27, 1973; L. W. Ehrlich, Comm. ACM 10,
 * 1967) in Gauss–Seidel form: each approximation z_i moves by 1 / (p'/p(z_i) − Σ_{j≠i} 1/(z_i − z_j)),
 * using the already-updated z_j. An approximation is frozen once its residual is at the rounding level and
 * has stopped falling, so late iterations only pay for the roots still moving.
 */
import { logDerivative } from './horner.ts';

/**
 * Freeze an approximation once |p(z)| ≤ ABERTH_STOP_PER_DEGREE · n · ε · Σ|c_k||z|^k: the worst-case
 * rounding error of Horner's rule is about 2nε times that sum, so below it the residual is noise.
 */
export const ABERTH_STOP_PER_DEGREE = 2;

/**
 * Upper limit on that freeze level, below the 1e-13 backward-error goal; at high degree Horner's noise
 * still fluctuates below it, so a root waits for a sweep that lands there.
 */
export const ABERTH_STOP_CAP = 6e-14;

/** Below the rounding level, keep iterating while each sweep still cuts the residual by at least this factor. */
export const ABERTH_STALL_RATIO = 0.25;

/**
 * Freeze at once when the residual is below ABERTH_FLOOR_PER_ROOT_DEGREE · √n · ε: the typical size of
 * Horner's rounding noise, where further steps only move the point within the noise.
 */
export const ABERTH_FLOOR_PER_ROOT_DEGREE = 8;

/** Relative residual (dimensionless) at or below which a degree-n approximation counts as a root. */
export function freezeLevel(n: number): number {
  return Math.min(ABERTH_STOP_PER_DEGREE * n * Number.EPSILON, ABERTH_STOP_CAP);
}

/** Outcome of {@link aberthIterate}. */
export interface AberthOutcome {
  converged: boolean;
  iterations: number;
}

/** Refines zr/zi in place towards the n roots of c (descending, c[0] ≠ 0); at most maxIterations sweeps. */
export function aberthIterate(
  c: Float64Array,
  zr: Float64Array,
  zi: Float64Array,
  maxIterations: number,
): AberthOutcome {
  const n = c.length - 1;
  const absC = new Float64Array(n + 1);
  for (let k = 0; k <= n; k++) absC[k] = Math.abs(c[k]!);
  const stop = freezeLevel(n);
  const floor = ABERTH_FLOOR_PER_ROOT_DEGREE * Math.sqrt(n) * Number.EPSILON;
  const active = new Int32Array(n);
  for (let i = 0; i < n; i++) active[i] = i;
  let remaining = n;
  const g = new Float64Array(3);
  const previous = new Float64Array(n).fill(Infinity);
  let iterations = 0;
  while (remaining > 0 && iterations < maxIterations) {
    iterations++;
    let kept = 0;
    for (let a = 0; a < remaining; a++) {
      const i = active[a]!;
      const x = zr[i]!;
      const y = zi[i]!;
      logDerivative(c, absC, x, y, g);
      const residual = g[2]!;
      if (residual <= floor || (residual <= stop && residual >= ABERTH_STALL_RATIO * previous[i]!)) continue;
      previous[i] = residual;
      let sr = 0;
      let si = 0;
      for (let j = 0; j < i; j++) {
        const ur = x - zr[j]!;
        const ui = y - zi[j]!;
        const inv = 1 / (ur * ur + ui * ui);
        sr += ur * inv;
        si -= ui * inv;
      }
      for (let j = i + 1; j < n; j++) {
        const ur = x - zr[j]!;
        const ui = y - zi[j]!;
        const inv = 1 / (ur * ur + ui * ui);
        sr += ur * inv;
        si -= ui * inv;
      }
      const dr = g[0]! - sr;
      const di = g[1]! - si;
      const dd = dr * dr + di * di;
      const stepR = dr / dd;
      const stepI = -di / dd;
      if (Number.isFinite(stepR) && Number.isFinite(stepI)) {
        zr[i] = x - stepR;
        zi[i] = y - stepI;
      }
      active[kept++] = i;
    }
    remaining = kept;
  }
  return { converged: remaining === 0, iterations };
}

/**
 * Aberth's correction for approximation i at x + jy from g = p'/p there: 1 / (g − Σ_{j≠i} 1/(z − z_j)) over
 * every other approximation in zr/zi, into out as [re, im] (not finite where g or a distance degenerates).
 * The refinements after the iteration (exactRefine.ts, reseat.ts, misfits.ts) step with it.
 */
export function aberthCorrection(
  gr: number,
  gi: number,
  x: number,
  y: number,
  i: number,
  zr: ArrayLike<number>,
  zi: ArrayLike<number>,
  out: Float64Array,
): void {
  let ar = gr;
  let ai = gi;
  for (let j = 0; j < zr.length; j++) {
    if (j === i) continue;
    const ur = x - zr[j]!;
    const ui = y - zi[j]!;
    const inv = 1 / (ur * ur + ui * ui);
    ar -= ur * inv;
    ai += ui * inv;
  }
  const ad = ar * ar + ai * ai;
  out[0] = ar / ad;
  out[1] = -ai / ad;
}

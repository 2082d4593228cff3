/**
 * Exact conjugate symmetry for the roots of a real polynomial. Each root above the real axis is paired
 * with the nearest unused root below it; a pair is accepted at once when its mismatch is smaller than either
 * imaginary part (so two drifted real roots are not glued into a fake pair). The member with the smaller
 * residual |p(z)| / Σ|c_k||z|^k is kept and the other becomes its exact conjugate, so pairing never raises
 * the backward error, even inside a badly conditioned cluster where the pairing is ambiguous.
 */
import { relativeResidual } from './horner.ts';
import { freezeLevel } from './aberth.ts';
import { modulus } from './scaleSafe.ts';

/**
 * Relative distance below which two mates count as the same root: moving a root by this much changes its
 * relative residual by at most about this much, far inside the 1e-13 backward-error goal.
 */
const PAIR_AGREEMENT = 1e-15;

/** Real Newton steps for a root projected onto the real axis. */
const REAL_NEWTON_STEPS = 4;

/**
 * Makes (re, im), the roots of the real polynomial c (descending), exactly conjugate-symmetric in place;
 * returns mate[i] = index of i's conjugate, or -1 for a real root.
 */
export function symmetrizeConjugates(c: Float64Array, re: Float64Array, im: Float64Array): Int32Array {
  const n = re.length;
  const mate = new Int32Array(n).fill(-1);
  const lower: number[] = [];
  const upper: number[] = [];
  for (let i = 0; i < n; i++) {
    if (im[i]! < 0) lower.push(i);
    else if (im[i]! > 0) upper.push(i);
  }
  lower.sort((a, b) => re[a]! - re[b]!);
  upper.sort((a, b) => im[b]! - im[a]!); // most clearly complex roots choose first
  const lowRe = Float64Array.from(lower, (j) => re[j]!);
  const used = new Uint8Array(lower.length);
  for (const i of upper) {
    const k = nearestMirror(re[i]!, -im[i]!, lowRe, lower, im, used);
    if (k < 0) break;
    const j = lower[k]!;
    if (modulus(re[j]! - re[i]!, im[j]! + im[i]!) > Math.min(im[i]!, -im[j]!)) continue;
    used[k] = 1;
    pairUp(c, re, im, mate, i, j);
  }
  // A root left unpaired is a real root that drifted off the axis if its real Newton polish has a residual
  // no worse than before (or at rounding level). The rest only occur in badly conditioned clusters, where
  // Aberth's answers are not symmetric (even the counts above and below the axis may differ): reflecting a
  // root does not change its residual, so they all move above the axis and pair by nearness.
  const rounding = freezeLevel(c.length - 1);
  const rest: number[] = [];
  for (let i = 0; i < n; i++) {
    if (mate[i] !== -1 || im[i] === 0) continue;
    const x = realNewton(c, re[i]!);
    if (relativeResidual(c, x, 0) <= Math.max(rounding, relativeResidual(c, re[i]!, im[i]!))) {
      re[i] = x;
      im[i] = 0;
      continue;
    }
    im[i] = Math.abs(im[i]!);
    rest.push(i);
  }
  for (let a = 0; a < rest.length; a++) {
    const i = rest[a]!;
    if (mate[i] !== -1) continue;
    let best = -1;
    let bestDist = Infinity;
    for (let b = a + 1; b < rest.length; b++) {
      const j = rest[b]!;
      const d = modulus(re[j]! - re[i]!, im[j]! - im[i]!);
      if (mate[j] === -1 && d < bestDist) [best, bestDist] = [j, d];
    }
    if (best < 0) oddOneOut(c, re, im, mate, i, rounding);
    else {
      im[best] = -im[best]!;
      pairUp(c, re, im, mate, i, best);
    }
  }
  return mate;
}

/**
 * The last unpaired root i of a badly conditioned set: it goes onto the real axis if its real Newton polish
 * keeps the residual at rounding level; otherwise the real root with the worst residual gives way to i's
 * conjugate, which keeps every residual small (the one case where a root of the raw set is dropped).
 */
function oddOneOut(
  c: Float64Array,
  re: Float64Array,
  im: Float64Array,
  mate: Int32Array,
  i: number,
  rounding: number,
): void {
  const x = realNewton(c, re[i]!);
  let worst = -1;
  let worstResidual = -1;
  for (let k = 0; k < re.length; k++) {
    if (k === i || im[k] !== 0) continue;
    const r = relativeResidual(c, re[k]!, 0);
    if (r > worstResidual) [worst, worstResidual] = [k, r];
  }
  if (worst < 0 || relativeResidual(c, x, 0) <= rounding) {
    re[i] = x;
    im[i] = 0;
    return;
  }
  re[worst] = re[i]!;
  im[worst] = -im[i]!;
  mate[i] = worst;
  mate[worst] = i;
}

/** Makes i (above the axis) and j (below) an exact conjugate pair, keeping the one with the smaller residual. */
function pairUp(
  c: Float64Array,
  re: Float64Array,
  im: Float64Array,
  mate: Int32Array,
  i: number,
  j: number,
): void {
  // Mates that agree to PAIR_AGREEMENT need no residual comparison: either choice is as good.
  const gap = modulus(re[i]! - re[j]!, im[i]! + im[j]!);
  const keepI =
    gap <= PAIR_AGREEMENT * modulus(re[i]!, im[i]!) ||
    relativeResidual(c, re[i]!, im[i]!) <= relativeResidual(c, re[j]!, im[j]!);
  makeMirrors(re, im, i, j, keepI);
  mate[i] = j;
  mate[j] = i;
}

/**
 * Makes i (upper) and j (lower) exact mirrors: both take the value of i when keepI (j its conjugate), else
 * of j (i its conjugate).
 */
export function makeMirrors(re: Float64Array, im: Float64Array, i: number, j: number, keepI: boolean): void {
  const r = keepI ? re[i]! : re[j]!;
  const m = keepI ? im[i]! : -im[j]!;
  re[i] = r;
  re[j] = r;
  im[i] = m;
  im[j] = -m;
}

/** Position in lower (sorted by real part) of the unused root nearest to x + i·y, or -1. */
function nearestMirror(
  x: number,
  y: number,
  lowRe: Float64Array,
  lower: number[],
  im: Float64Array,
  used: Uint8Array,
): number {
  let lo = 0;
  let hi = lower.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (lowRe[mid]! < x) lo = mid + 1;
    else hi = mid;
  }
  let best = -1;
  let bestDist = Infinity;
  for (let k = lo; k < lower.length && lowRe[k]! - x < bestDist; k++) {
    if (used[k]) continue;
    const d = modulus(lowRe[k]! - x, im[lower[k]!]! - y);
    if (d < bestDist) [best, bestDist] = [k, d];
  }
  for (let k = lo - 1; k >= 0 && x - lowRe[k]! < bestDist; k--) {
    if (used[k]) continue;
    const d = modulus(lowRe[k]! - x, im[lower[k]!]! - y);
    if (d < bestDist) [best, bestDist] = [k, d];
  }
  return best;
}

/** A few Newton steps on the real axis from x, kept only while they lower the residual. */
function realNewton(c: Float64Array, x: number): number {
  let best = x;
  let bestRes = relativeResidual(c, x, 0);
  for (let s = 0; s < REAL_NEWTON_STEPS && bestRes > 0; s++) {
    let p = 0;
    let d = 0;
    for (let k = 0; k < c.length; k++) {
      d = d * best + p;
      p = p * best + c[k]!;
    }
    const next = best - p / d;
    const res = relativeResidual(c, next, 0);
    if (!(res < bestRes)) break;
    best = next;
    bestRes = res;
  }
  return best;
}

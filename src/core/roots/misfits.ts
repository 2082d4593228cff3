/**
 * Last resort for a high-degree root set that still does not multiply out to the polynomial after the polish
 * and the shared-root step: the approximations that are not at a root (their Newton step, from the compensated
 * Horner scheme, is far above their last bits) are found again together, by Aberth steps among themselves with
 * every other approximation held fixed (implicit deflation). They move without conjugate symmetry, from points
 * just off their old places, so that two real approximations can become a conjugate pair or the reverse (the
 * polish keeps pairs mirrored and real approximations of a converged set cannot leave the axis); symmetry is
 * restored afterwards by comparing compensated residuals. Measured on Butterworth denominators of degree 768
 * (cutoff 0.3 of Nyquist: two real approximations where a pair and a real root belonged, set backward error
 * 0.64) and seeded double-pair polynomials of degree 1024. The result is kept only if the set backward error
 * (roots/setBackwardError.ts) falls.
 */
import { aberthCorrection } from './aberth.ts';
import { AccurateLogDerivative } from './reseat.ts';
import { MultiPrecisionEvaluator } from './multiPrecision.ts';
import { setBackwardError } from './setBackwardError.ts';
import { makeMirrors } from './conjugate.ts';

/** Aberth's correction of the approximation being moved (aberthCorrection). */
const correction = new Float64Array(2);

/** What the search needs of an evaluation: p'/p (false where it cannot tell) and log2|p| for comparisons. */
interface Evaluator {
  at(x: number, y: number, out: Float64Array): boolean;
  modulus(x: number, y: number): number;
}

/** Below this degree every measured set multiplies out at the rounding level; the O(n²) check is skipped. */
export const MISFIT_MIN_DEGREE = 128;

/** Set backward error above which misfits are looked for (far above the rounding level of any set here). */
const GATE = 1e-12;

/** An approximation whose Newton step exceeds this fraction of its modulus is not at a root. */
const MISFIT = 2 ** -40;

/** Relative distance by which a misfit starts from its old place, in a direction of its own. */
const START_OFFSET = 2 ** -12;

/** Sweeps at most (the successful searches measured took at most 20). */
const MAX_SWEEPS = 60;

/** The search stops when this many sweeps in a row have not brought more misfits to rest. */
const STALL_SWEEPS = 10;

/** A misfit stops once its step is below this many units in the last place of its modulus. */
const STOP_ULPS = 4;

/** A misfit with |im| below this fraction of its modulus is tested as a real root. */
const SNAP = 1e-4;

/**
 * Finds the misfits of the exactly conjugate-symmetric set zr/zi (roots of descending c) again, as described
 * above, when the set's backward error is above GATE; returns the sweeps taken (0 when nothing was done).
 */
export function refindMisfits(c: Float64Array, zr: Float64Array, zi: Float64Array): number {
  const n = zr.length;
  if (n < MISFIT_MIN_DEGREE) return 0;
  const before = setBackwardError(c, zr, zi);
  if (!(before > GATE)) return 0;
  const dd = new AccurateLogDerivative(c);
  const compensated: Evaluator = {
    at: (x, y, out) => {
      dd.at(x, y, out);
      return true;
    },
    modulus: (x, y) => dd.modulus(x, y),
  };
  const first = search(c, zr, zi, compensated, before);
  if (!(first.error > GATE)) return first.sweeps;
  // Double-double did not reach it (coefficients so small that its error-free products underflow, or a
  // condition beyond its reach): the same search with multi-precision evaluation, slower by about 20x. An
  // approximation whose Newton step double-double bounds below the misfit level is not evaluated again.
  const settled = (x: number, y: number) => {
    dd.at(x, y, g);
    return dd.lastStepBound() <= MISFIT;
  };
  const g = new Float64Array(2);
  return first.sweeps + search(c, zr, zi, new MultiPrecisionEvaluator(c), first.error, settled).sweeps;
}

/**
 * One search with the evaluator ev from the set zr/zi, whose set backward error is `before`: kept if the
 * error falls. Returns the sweeps taken and the set backward error of the set left in zr/zi.
 */
function search(
  c: Float64Array,
  zr: Float64Array,
  zi: Float64Array,
  ev: Evaluator,
  before: number,
  settled: (x: number, y: number) => boolean = () => false,
): { sweeps: number; error: number } {
  const n = zr.length;
  const g = new Float64Array(2);
  const misfits: number[] = [];
  for (let i = 0; i < n; i++) {
    if (settled(zr[i]!, zi[i]!)) continue;
    // A point where p'/p cannot be resolved is taken as a misfit too.
    const resolved = ev.at(zr[i]!, zi[i]!, g);
    const newton = 1 / Math.hypot(g[0]!, g[1]!);
    if (!resolved || !(newton <= MISFIT * Math.hypot(zr[i]!, zi[i]!))) misfits.push(i);
  }
  if (misfits.length === 0) return { sweeps: 0, error: before };
  const startR = Float64Array.from(zr);
  const startI = Float64Array.from(zi);
  misfits.forEach((i, k) => {
    const size = Math.hypot(zr[i]!, zi[i]!) || 1;
    const angle = 0.7 + (2 * Math.PI * k) / misfits.length;
    zr[i] = zr[i]! + START_OFFSET * size * Math.cos(angle);
    zi[i] = zi[i]! + START_OFFSET * size * Math.sin(angle);
  });
  let sweeps = 0;
  let active = misfits;
  let fewest = active.length;
  let stalled = 0;
  while (active.length > 0 && sweeps < MAX_SWEEPS && stalled < STALL_SWEEPS) {
    sweeps++;
    const next: number[] = [];
    for (const i of active) {
      const x = zr[i]!;
      const y = zi[i]!;
      if (!ev.at(x, y, g)) continue;
      aberthCorrection(g[0]!, g[1]!, x, y, i, zr, zi, correction);
      const sr = correction[0]!;
      const si = correction[1]!;
      if (!Number.isFinite(sr) || !Number.isFinite(si)) continue;
      zr[i] = x - sr;
      zi[i] = y - si;
      if (Math.hypot(sr, si) > STOP_ULPS * Number.EPSILON * Math.hypot(zr[i]!, zi[i]!)) next.push(i);
    }
    active = next;
    if (active.length < fewest) {
      fewest = active.length;
      stalled = 0;
    } else stalled++;
  }
  restoreSymmetry(ev, zr, zi, misfits);
  const after = setBackwardError(c, zr, zi);
  if (!(after < before)) {
    zr.set(startR);
    zi.set(startI);
    return { sweeps, error: before };
  }
  return { sweeps, error: after };
}

/**
 * Makes the moved approximations exactly conjugate-symmetric again: one near the axis whose projection onto
 * it has no larger residual becomes real; the others pair by mutual nearness with a mirror, both taking the
 * member with the smaller residual; any left over goes onto the axis.
 */
function restoreSymmetry(ev: Evaluator, zr: Float64Array, zi: Float64Array, moved: number[]): void {
  const upper: number[] = [];
  const lower: number[] = [];
  for (const i of moved) {
    const x = zr[i]!;
    const y = zi[i]!;
    if (y !== 0 && Math.abs(y) <= SNAP * Math.hypot(x, y) && ev.modulus(x, 0) <= ev.modulus(x, y)) zi[i] = 0;
    if (zi[i] === 0) continue;
    (zi[i]! > 0 ? upper : lower).push(i);
  }
  const distance = (i: number, k: number) => Math.hypot(zr[k]! - zr[i]!, zi[k]! + zi[i]!);
  const taken = new Set<number>();
  let open = upper;
  while (open.length > 0) {
    const free = lower.filter((k) => !taken.has(k));
    if (free.length === 0) break;
    const rest: number[] = [];
    for (const i of open) {
      const k = nearest(free, (m) => distance(i, m));
      const back = nearest(
        open.filter((u) => !taken.has(u)),
        (u) => distance(u, k),
      );
      if (back !== i || taken.has(k)) {
        rest.push(i);
        continue;
      }
      taken.add(k);
      taken.add(i);
      makeMirrors(zr, zi, i, k, ev.modulus(zr[i]!, zi[i]!) <= ev.modulus(zr[k]!, zi[k]!));
    }
    if (rest.length === open.length) break;
    open = rest;
  }
  for (const i of [...upper, ...lower]) if (!taken.has(i)) zi[i] = 0;
}

function nearest(among: number[], dist: (i: number) => number): number {
  let best = -1;
  let d = Infinity;
  for (const i of among) {
    const v = dist(i);
    if (v < d) [best, d] = [i, v];
  }
  return best;
}

/**
 * Recognises repeated roots among the approximations of a simultaneous iteration. A root of multiplicity m
 * comes out of Aberth–Ehrlich as m approximations spread over a radius of about ε^(1/m); here such a
 * cluster becomes one root of multiplicity m whose value is the cluster centroid refined by Newton's method
 * on p^(m−1), where the root is simple (the classical deflation-free multiple-root refinement, see e.g.
 * Z. Zeng, "Computing multiple roots of inexact polynomials", Math. Comp. 74, 2005). A cluster is merged
 * only when the merged root reproduces the polynomial as well as the separate approximations do: the
 * remainder of p divided by (z − c)^m, formed in double-double, must be no larger than the remainder of p
 * divided by the product of the cluster's own factors (within MERGE_RATIO and one rounding). A small
 * residual at the centre is not enough: it is small at any point inside a cluster of distinct roots.
 */
import type { Root } from '../types.ts';
import { logDerivative } from './horner.ts';
import { factor, product, remainderSize, type DdPoly } from './doubleDouble.ts';
import { setBackwardError } from './setBackwardError.ts';
import { modulus } from './scaleSafe.ts';

/**
 * Cluster radii tried, relative to the root modulus, largest first. An m-fold root spreads over about
 * ε^(1/m)·(condition), e.g. 1e-8 for m = 2 and 1e-4 for m = 4; the largest radius admits m ≈ 6.
 */
export const CLUSTER_RADII = [1e-1, 3e-2, 5e-3, 1e-3, 2e-4, 3e-5, 3e-6, 3e-7];

/**
 * A candidate cluster is verified only if no other root lies within CLUSTER_ISOLATION times its radius of
 * its centre: the approximations of a multiple root huddle far closer together than to any other root,
 * while evenly spaced distinct roots (a Butterworth cluster) fail this cheaply, without derivatives.
 */
export const CLUSTER_ISOLATION = 3;

/**
 * The cluster-alone remainder test is a cheap first filter (it rejects two distinct roots 1e-7 apart at
 * once); it may pass up to this times the separate remainder, plus PREFILTER_FLOOR·ε, because the
 * set-level test below decides.
 */
export const PREFILTER_RATIO = 16;
export const PREFILTER_FLOOR = 16;

/** When merging every candidate fails the set test, candidates are tried one by one only up to this many. */
export const SEPARATE_CHECKS = 2;

/** A merged set may have at most this times the separate set's backward error (plus MERGE_FLOOR·ε). */
export const MERGE_RATIO = 2;

/** Remainders below this many ε (relative to max|c_k|) are rounding: a merge adding no more is accepted. */
export const MERGE_FLOOR = 2;

/**
 * A two-member cluster is doomed when merging it alone would move the product by more than this times the
 * set test's allowance beyond what the separate set already misses (pairMergeShift): such a merge cannot
 * pass the set test, so a pair whose merge at its mean passes the cluster remainder test is counted as
 * a candidate (as before, it blocks the all-at-once merge and counts towards SEPARATE_CHECKS) without the
 * Newton refinement of its centre, and no set containing it is multiplied out. The margin covers the
 * estimate's own error (the other roots' product taken from a deflation, the centre taken as the pair's
 * mean, not the refined centre): over the benchmark families (degrees 8–1024) and the root and stability tests, the merged
 * set's measured error was never below 0.98 of the estimate, and no pair that passed alone had an
 * estimate above 0.93 of the allowance.
 */
export const HOPELESS_RATIO = 4;

/** Newton steps allowed when refining a cluster centre on p^(m−1). */
const REFINE_STEPS = 12;

/** Verified repeated roots: group[i] indexes clusters (or is -1 for a simple root). */
export interface MultipleRoots {
  group: Int32Array;
  clusters: Root[];
}

/**
 * Finds the verified clusters among the roots (re, im) of the descending polynomial c; each cluster gets
 * its refined value and multiplicity, a conjugate cluster listed separately. mate: conjugate index from
 * symmetrizeConjugates (-1 if real).
 */
export function findMultipleRoots(
  c: Float64Array,
  re: Float64Array,
  im: Float64Array,
  mate: Int32Array,
): MultipleRoots {
  const n = re.length;
  const group = new Int32Array(n).fill(-1);
  const roots: Root[] = [];
  const neighbours = closePairs(re, im, 2 * CLUSTER_RADII[0]!);
  // p, p', p'', … and their coefficients' absolute values, made as the multiplicities tried need them.
  const derivs: Float64Array[] = [c];
  const absDerivs: Float64Array[] = [];
  const reversedC = c.slice().reverse();
  const failedSize = new Int32Array(n);
  // Distance from each root to its nearest neighbour: at a radius below it a root has no cluster (unless it
  // is taken as real with its mate), and no member list need be built.
  const nearest = new Float64Array(n).fill(Infinity);
  const absRoot = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    absRoot[i] = modulus(re[i]!, im[i]!);
    for (const j of neighbours[i]!)
      nearest[i] = Math.min(nearest[i]!, modulus(re[j]! - re[i]!, im[j]! - im[i]!));
  }
  const test = new SetTest(c, re, im, mate);
  // Verified pairs whose merge cannot pass the set test (HOPELESS_RATIO), by root id: they still count as
  // candidates. Candidates: clusters found (a cluster and its mirror count once).
  const doomedIds: boolean[] = [];
  let candidates = 0;
  let anyDoomed = false;
  const verdict = { doomed: false };
  for (const rho of CLUSTER_RADII) {
    for (let i = 0; i < n; i++) {
      if (group[i]! >= 0 || im[i]! < 0 || neighbours[i]!.length === 0) continue;
      const mod = absRoot[i]!;
      const real = im[i]! <= rho * mod;
      // The nearest neighbour of the centre (x, 0) of a real candidate can be closer than i's by up to im[i].
      if (!(real && mate[i]! >= 0) && nearest[i]! > rho * mod + (real ? im[i]! : 0)) continue;
      const cx = re[i]!;
      const cy = real ? 0 : im[i]!;
      const members = [i];
      if (real && mate[i]! >= 0) members.push(mate[i]!);
      for (const j of neighbours[i]!) {
        if (group[j]! >= 0 || j === mate[i]) continue;
        if (modulus(re[j]! - cx, im[j]! - cy) <= rho * mod) members.push(j);
      }
      const m = members.length;
      if (m < 2 || m === failedSize[i] || !isolated(re, im, members, neighbours[i]!, cx, cy)) continue;
      if (real && !matesInside(members, mate)) continue;
      verdict.doomed = false;
      const centre = verifiedCentre(
        c,
        reversedC,
        derivs,
        absDerivs,
        re,
        im,
        members,
        real,
        rho * mod,
        m === 2 ? test : undefined,
        verdict,
      );
      if (!centre) {
        failedSize[i] = m;
        continue;
      }
      const id = roots.length;
      candidates++;
      doomedIds[id] = verdict.doomed;
      anyDoomed ||= verdict.doomed;
      roots.push({ re: centre[0], im: centre[1], multiplicity: m });
      if (!real) roots.push({ re: centre[0], im: -centre[1], multiplicity: m });
      for (const k of members) {
        group[k] = id;
        if (!real) group[mate[k]!] = id + 1;
      }
      // With a doomed pair among more than SEPARATE_CHECKS candidates, keepReproducing can keep nothing
      // (the all-at-once set contains the doomed merge, and one-by-one checks are not tried): stop here.
      if (anyDoomed && candidates > SEPARATE_CHECKS)
        return { group: new Int32Array(n).fill(-1), clusters: [] };
    }
  }
  return keepReproducing(test, group, roots, doomedIds);
}

/** Whether every member's conjugate (if any) is a member too. */
function matesInside(members: number[], mate: Int32Array): boolean {
  for (const k of members) if (mate[k]! >= 0 && !members.includes(mate[k]!)) return false;
  return true;
}

/**
 * The set test of one search: the separate set's backward error and the allowance a merged set must meet,
 * formed once the first candidate needs them.
 */
class SetTest {
  private separateError = NaN;
  private allowanceValue = NaN;

  constructor(
    readonly c: Float64Array,
    readonly re: Float64Array,
    readonly im: Float64Array,
    readonly mate: Int32Array,
  ) {}

  get separate(): number {
    this.form();
    return this.separateError;
  }

  /** MERGE_RATIO × the separate set's error + MERGE_FLOOR·ε. */
  get allowance(): number {
    this.form();
    return this.allowanceValue;
  }

  private form(): void {
    if (!Number.isNaN(this.separateError)) return;
    this.separateError = setBackwardError(this.c, this.re, this.im, this.mate);
    this.allowanceValue = MERGE_RATIO * this.separateError + MERGE_FLOOR * Number.EPSILON;
  }

  /** Whether merging the pair a, b (HOPELESS_RATIO) cannot pass the set test. */
  doomed(a: number, b: number, real: boolean): boolean {
    return (
      pairMergeShift(this.c, this.re, this.im, a, b, real) - this.separate > HOPELESS_RATIO * this.allowance
    );
  }
}

/**
 * Estimate of max_k |Δ_k| / max_k |c_k| for Δ the change of c_0·Π(z − r_i) when the pair a, b (with its
 * mirror when not real) is replaced by its mean μ taken twice. With d = (r_a − r_b)/2, (z − r_a)(z − r_b) =
 * (z − μ)² − d², so Δ = −d²·Q for a real pair and (|d|⁴ − 2·Re(d²·(z − μ̄)²))·Q for a pair and its mirror,
 * Q the product of the other factors, here c divided by the pair's own factor (forward, or on the reversed
 * coefficients when the pair lies outside the unit circle, which keeps the division stable). By the
 * triangle inequality the merged set's backward error is at least this minus the separate set's.
 */
function pairMergeShift(
  c: Float64Array,
  re: Float64Array,
  im: Float64Array,
  a: number,
  b: number,
  real: boolean,
): number {
  const n = c.length - 1;
  const dx = (re[a]! - re[b]!) / 2;
  const dy = (im[a]! - im[b]!) / 2;
  const wr = dx * dx - dy * dy;
  const wi = 2 * dx * dy;
  let own: number[];
  let delta: number[];
  if (real) {
    // Two reals, or a conjugate pair taken as one real double root (then d² = −im²).
    own = [1, -(re[a]! + re[b]!), re[a]! * re[b]! - im[a]! * im[b]!];
    delta = [-wr];
  } else {
    // (z − r_a)(z − r_b) = z² + p1·z + p0 (complex); its product with the mirror is real.
    const p1r = -(re[a]! + re[b]!);
    const p1i = -(im[a]! + im[b]!);
    const p0r = re[a]! * re[b]! - im[a]! * im[b]!;
    const p0i = re[a]! * im[b]! + im[a]! * re[b]!;
    own = [1, 2 * p1r, p1r * p1r + p1i * p1i + 2 * p0r, 2 * (p1r * p0r + p1i * p0i), p0r * p0r + p0i * p0i];
    const mr = (re[a]! + re[b]!) / 2;
    const mi = (im[a]! + im[b]!) / 2;
    // (z − μ̄)² = z² − 2μ̄·z + μ̄²; Re(w·u) for each coefficient u.
    const d4 = (dx * dx + dy * dy) ** 2;
    delta = [
      -2 * wr,
      -2 * (wr * -2 * mr - wi * 2 * mi),
      d4 - 2 * (wr * (mr * mr - mi * mi) - wi * -2 * mr * mi),
    ];
  }
  const k = own.length - 1;
  const q = new Float64Array(n - k + 1);
  if (modulus(re[a]!, im[a]!) <= 1) {
    for (let j = 0; j <= n - k; j++) {
      let s = c[j]!;
      for (let l = 1; l <= Math.min(j, k); l++) s -= own[l]! * q[j - l]!;
      q[j] = s;
    }
  } else {
    // Reversed: c read from its constant end, divided by the reversed factor (leading coefficient own[k]).
    for (let j = 0; j <= n - k; j++) {
      let s = c[n - j]!;
      for (let l = 1; l <= Math.min(j, k); l++) s -= own[k - l]! * q[n - k - (j - l)]!;
      q[n - k - j] = s / own[k]!;
    }
  }
  // Δ = delta·Q has degree n − (k − deg delta): its coefficients line up with c from index k − deg delta.
  const shift = k - (delta.length - 1);
  let worst = 0;
  let scale = 0;
  for (let j = 0; j <= n; j++) {
    let s = 0;
    for (let l = 0; l < delta.length; l++) {
      const t = j - shift - l;
      if (t >= 0 && t < q.length) s += delta[l]! * q[t]!;
    }
    worst = Math.max(worst, Math.abs(s));
    scale = Math.max(scale, Math.abs(c[j]!));
  }
  return worst / scale;
}

/**
 * Keeps the merges whose root set still multiplies out to the polynomial as well as the separate roots
 * (setBackwardError, double-double): all at once when that passes, else each on its own, then together.
 * The remainder test of verifiedCentre looks at the cluster alone; inside a wide cluster of pseudo-roots
 * (the zeros of k·(z + 1)^20 rounded to doubles spread over a ring of radius 0.3) it passes merges that
 * leave the rest of the set unable to reproduce p.
 */
function keepReproducing(test: SetTest, group: Int32Array, roots: Root[], doomed: boolean[]): MultipleRoots {
  if (roots.length === 0) return { group, clusters: roots };
  // lead[id]: the cluster's own id, or its mirror's id for the lower member of a conjugate cluster.
  const lead = new Int32Array(roots.length);
  const ids: number[] = [];
  for (let id = 0; id < roots.length; id++) {
    const r = roots[id]!;
    lead[id] = r.im < 0 && id > 0 && roots[id - 1]!.im === -r.im ? id - 1 : id;
    if (lead[id] === id) ids.push(id);
  }
  const limit = test.allowance;
  const accepted = new Uint8Array(roots.length);
  for (const id of ids) accepted[id] = 1;
  if (!(mergedError(test, group, roots, lead, accepted, doomed) <= limit)) {
    // One by one only for a few candidates: each check multiplies the whole set out.
    accepted.fill(0);
    if (ids.length <= SEPARATE_CHECKS) {
      const alone = new Uint8Array(roots.length);
      for (const id of ids) {
        alone.fill(0);
        alone[id] = 1;
        if (mergedError(test, group, roots, lead, alone, doomed) <= limit) accepted[id] = 1;
      }
    }
    let count = 0;
    for (const id of ids) count += accepted[id]!;
    if (count > 1 && !(mergedError(test, group, roots, lead, accepted, doomed) <= limit)) accepted.fill(0);
  }
  const renumber = new Int32Array(roots.length).fill(-1);
  const kept: Root[] = [];
  for (let id = 0; id < roots.length; id++) {
    if (!accepted[lead[id]!]) continue;
    renumber[id] = kept.length;
    kept.push(roots[id]!);
  }
  const out = new Int32Array(group.length);
  for (let k = 0; k < group.length; k++) out[k] = group[k]! >= 0 ? renumber[group[k]!]! : -1;
  return { group: out, clusters: kept };
}

/** The set error with the accepted clusters (by lead id) merged; Infinity if a doomed one is among them. */
function mergedError(
  test: SetTest,
  group: Int32Array,
  roots: Root[],
  lead: Int32Array,
  accepted: Uint8Array,
  doomed: boolean[],
): number {
  for (let id = 0; id < roots.length; id++) if (accepted[id] && doomed[id]) return Infinity;
  const r = Float64Array.from(test.re);
  const i = Float64Array.from(test.im);
  for (let k = 0; k < r.length; k++) {
    const id = group[k]!;
    if (id >= 0 && accepted[lead[id]!]) {
      r[k] = roots[id]!.re;
      i[k] = roots[id]!.im;
    }
  }
  return setBackwardError(test.c, r, i, test.mate);
}

/** The roots listed once per group: clusters with their multiplicity, simple roots with multiplicity 1. */
export function listGrouped(re: Float64Array, im: Float64Array, found: MultipleRoots): Root[] {
  const out: Root[] = [];
  const listed = new Uint8Array(found.clusters.length);
  for (let i = 0; i < re.length; i++) {
    const id = found.group[i]!;
    if (id < 0) out.push({ re: re[i]!, im: im[i]!, multiplicity: 1 });
    else if (!listed[id]) {
      listed[id] = 1;
      out.push(found.clusters[id]!);
    }
  }
  return out;
}

/** Whether no neighbour outside the cluster comes within CLUSTER_ISOLATION × its radius of its centre. */
function isolated(
  re: Float64Array,
  im: Float64Array,
  members: number[],
  neighbours: number[],
  cx: number,
  cy: number,
): boolean {
  let radius = 0;
  for (const k of members) radius = Math.max(radius, modulus(re[k]! - cx, im[k]! - cy));
  for (const j of neighbours) {
    if (members.includes(j)) continue;
    if (modulus(re[j]! - cx, im[j]! - cy) < CLUSTER_ISOLATION * radius) return false;
  }
  return true;
}

/** For each root, the indices of the other roots within relative distance r (sweep over real parts). */
function closePairs(re: Float64Array, im: Float64Array, r: number): number[][] {
  const n = re.length;
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => re[a]! - re[b]!);
  const out: number[][] = Array.from({ length: n }, () => []);
  for (let a = 0; a < n; a++) {
    const i = order[a]!;
    const mi = modulus(re[i]!, im[i]!);
    const reach = (r * mi) / (1 - r);
    for (let b = a + 1; b < n; b++) {
      const j = order[b]!;
      if (re[j]! - re[i]! > reach) break;
      const d = modulus(re[j]! - re[i]!, im[j]! - im[i]!);
      if (d <= r * Math.max(mi, modulus(re[j]!, im[j]!))) {
        out[i]!.push(j);
        out[j]!.push(i);
      }
    }
  }
  return out;
}

/** Refined centre [re, im] of a cluster if it passes as one m-fold root, else undefined. */
function verifiedCentre(
  c: Float64Array,
  reversedC: Float64Array,
  derivs: Float64Array[],
  absDerivs: Float64Array[],
  re: Float64Array,
  im: Float64Array,
  members: number[],
  real: boolean,
  radius: number,
  pairTest: SetTest | undefined,
  verdict: { doomed: boolean },
): [number, number] | undefined {
  const m = members.length;
  if (m > c.length - 1) return undefined;
  let x0 = 0;
  let y0 = 0;
  for (const k of members) {
    x0 += re[k]!;
    y0 += im[k]!;
  }
  x0 /= m;
  y0 = real ? 0 : y0 / m;
  const separate: DdPoly[] = [];
  for (const k of members) if (im[k]! >= 0) separate.push(factor(re[k]!, im[k]!));
  const outside = modulus(x0, y0) > 1;
  const limit =
    PREFILTER_RATIO * clusterRemainder(c, reversedC, outside, product(separate)) +
    PREFILTER_FLOOR * Number.EPSILON;
  // The polished members' mean is accurate to about ε for a rounding-split multiple root (the split is
  // symmetric to first order); an exact multiple root's approximations converge only linearly, and there
  // Newton on p^(m−1), where the root is simple, finds the centre. The one leaving the smaller remainder
  // stands.
  const atMean = mergedRemainder(c, reversedC, outside, m, x0, y0);
  if (atMean === 0) return [x0, y0];
  // A doomed pair (HOPELESS_RATIO) is only counted, never merged: whether it passes is all that matters.
  // Asked only here, where the cheap part has passed: the estimate needs the whole set's backward error.
  if (atMean <= limit && pairTest?.doomed(members[0]!, members[1]!, real)) {
    verdict.doomed = true;
    return [x0, y0];
  }
  while (derivs.length <= m) derivs.push(derivative(derivs[derivs.length - 1]!));
  const f = derivs[m - 1]!;
  const absF = (absDerivs[m - 1] ??= f.map(Math.abs));
  const g = new Float64Array(3);
  let x = x0;
  let y = y0;
  // Newton converges quadratically on a simple root; once a step is no smaller than the one before, the
  // iterates wander in the rounding noise of p^(m−1) and more steps change nothing but the noise.
  let lastStep = Infinity;
  for (let s = 0; s < REFINE_STEPS; s++) {
    logDerivative(f, absF, x, y, g);
    if (g[2] === 0) break;
    const gd = g[0]! * g[0]! + g[1]! * g[1]!;
    const dx = g[0]! / gd;
    const dy = -g[1]! / gd;
    if (!Number.isFinite(dx) || !Number.isFinite(dy)) break;
    x -= dx;
    y -= dy;
    const step = modulus(dx, dy);
    if (step <= 2 * Number.EPSILON * modulus(x, y) || step >= lastStep) break;
    lastStep = step;
  }
  if (real) y = 0;
  const atNewton =
    modulus(x - x0, y - y0) <= radius ? mergedRemainder(c, reversedC, outside, m, x, y) : Infinity;
  const [best, size0]: [[number, number], number] =
    atNewton < atMean ? [[x, y], atNewton] : [[x0, y0], atMean];
  return size0 <= limit ? best : undefined;
}

/** Remainder size of c divided by (z − (x + iy))^m (with the mirror's factor when y ≠ 0). */
function mergedRemainder(
  c: Float64Array,
  reversedC: Float64Array,
  outside: boolean,
  m: number,
  x: number,
  y: number,
): number {
  return clusterRemainder(c, reversedC, outside, product(new Array<DdPoly>(m).fill(factor(x, y))));
}

/** Remainder size of c divided by f, on the reversed coefficients for a cluster outside the unit circle. */
function clusterRemainder(c: Float64Array, reversedC: Float64Array, outside: boolean, f: DdPoly): number {
  return outside ? remainderSize(reversedC, reversedDd(f)) : remainderSize(c, f);
}

function reversedDd(f: DdPoly): DdPoly {
  return { hi: f.hi.slice().reverse(), lo: f.lo.slice().reverse() };
}

function derivative(p: Float64Array): Float64Array {
  const n = p.length - 1;
  const out = new Float64Array(Math.max(n, 1));
  for (let i = 0; i < n; i++) out[i] = p[i]! * (n - i);
  return out;
}

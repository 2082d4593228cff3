/**
 * Polynomial roots by the Aberth–Ehrlich simultaneous iteration (Aberth 1973, Ehrlich 1967), started from
 * the Newton-polygon circles of Bini (1996), with a final Newton polish. Works on Float64Arrays.
 */
import type { Root } from './types.ts';
import type { Poly } from './poly.ts';

/** Outcome of a root search: every finite root listed (conjugates included), with diagnostics. */
export interface RootsResult {
  /** Real parts of all finite roots (length = degree after removing leading zero coefficients). */
  re: Float64Array;
  /** Imaginary parts; for real input, complex roots come in exactly conjugate pairs. */
  im: Float64Array;
  /** The same roots grouped: a repeated root appears once with its multiplicity; conjugates listed. */
  grouped: Root[];
  /** Number of roots at infinity (leading zero coefficients of the descending-order input). */
  atInfinity: number;
  /** Whether every root met the stopping test within the iteration limit. */
  converged: boolean;
  /** Iterations used. */
  iterations: number;
}

export interface RootsOptions {
  /** Iteration limit for the simultaneous iteration. */
  maxIterations?: number;
}

/** Finds all roots of a real polynomial given in descending powers. */
export function findRoots(p: Poly, options: RootsOptions = {}): RootsResult {
  const maxIterations = options.maxIterations ?? 500;
  let lead = 0;
  while (lead < p.length && p[lead] === 0) lead++;
  let tail = p.length - 1;
  while (tail >= lead && p[tail] === 0) tail--;
  const atInfinity = lead === p.length ? 0 : lead;
  if (tail < lead) {
    return {
      re: new Float64Array(0),
      im: new Float64Array(0),
      grouped: [],
      atInfinity: 0,
      converged: true,
      iterations: 0,
    };
  }
  const originCount = p.length - 1 - tail;
  const c = Float64Array.from({ length: tail - lead + 1 }, (_, i) => p[lead + i]! / p[lead]!);
  const n = c.length - 1;
  const zr = new Float64Array(n);
  const zi = new Float64Array(n);
  initialGuesses(c, zr, zi);
  const done = new Uint8Array(n);
  let iterations = 0;
  let remaining = n;
  const absC = c.map(Math.abs);
  while (remaining > 0 && iterations < maxIterations) {
    iterations++;
    for (let i = 0; i < n; i++) {
      if (done[i]) continue;
      const x = zr[i]!;
      const y = zi[i]!;
      // p and p' at z by Horner, plus the running bound of the rounding error of p(z).
      let pr = c[0]!,
        pi = 0,
        dr = 0,
        di = 0,
        bound = absC[0]!;
      const mod = Math.hypot(x, y);
      for (let k = 1; k <= n; k++) {
        const tdr = dr * x - di * y + pr;
        di = dr * y + di * x + pi;
        dr = tdr;
        const tpr = pr * x - pi * y + c[k]!;
        pi = pr * y + pi * x;
        pr = tpr;
        bound = bound * mod + absC[k]!;
      }
      if (Math.hypot(pr, pi) <= 4 * n * Number.EPSILON * bound) {
        done[i] = 1;
        remaining--;
        continue;
      }
      // Newton ratio N = p/p'.
      const den = dr * dr + di * di;
      const nr = (pr * dr + pi * di) / den;
      const ni = (pi * dr - pr * di) / den;
      // Aberth sum S = sum_{j != i} 1/(z_i - z_j).
      let sr = 0,
        si = 0;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        const ur = x - zr[j]!;
        const ui = y - zi[j]!;
        const ud = ur * ur + ui * ui;
        sr += ur / ud;
        si -= ui / ud;
      }
      // w = N / (1 - N S)
      const qr = 1 - (nr * sr - ni * si);
      const qi = -(nr * si + ni * sr);
      const qd = qr * qr + qi * qi;
      zr[i] = x - (nr * qr + ni * qi) / qd;
      zi[i] = y - (ni * qr - nr * qi) / qd;
    }
  }
  const re = new Float64Array(n + originCount);
  const im = new Float64Array(n + originCount);
  re.set(zr);
  im.set(zi);
  symmetrize(re, im, n);
  return { re, im, grouped: groupRoots(re, im), atInfinity, converged: remaining === 0, iterations };
}

/** Bini's starting points: circles whose radii come from the upper convex hull of (k, log|c_k|). */
function initialGuesses(c: Float64Array, zr: Float64Array, zi: Float64Array): void {
  const n = c.length - 1;
  // Ascending index k = power; c is descending so coefficient of x^k is c[n-k].
  const pts: number[] = [];
  const logs = new Float64Array(n + 1);
  for (let k = 0; k <= n; k++) {
    const v = Math.abs(c[n - k]!);
    logs[k] = v > 0 ? Math.log(v) : -Infinity;
  }
  for (let k = 0; k <= n; k++) {
    if (logs[k] === -Infinity) continue;
    while (pts.length >= 2) {
      const a = pts[pts.length - 2]!;
      const b = pts[pts.length - 1]!;
      const cross = (b - a) * (logs[k]! - logs[a]!) - (k - a) * (logs[b]! - logs[a]!);
      if (cross >= 0) pts.pop();
      else break;
    }
    pts.push(k);
  }
  let idx = 0;
  const sigma = 0.7;
  for (let s = 0; s + 1 < pts.length; s++) {
    const k0 = pts[s]!;
    const k1 = pts[s + 1]!;
    const m = k1 - k0;
    const radius = Math.exp((logs[k0]! - logs[k1]!) / m);
    for (let j = 0; j < m; j++) {
      const ang = (2 * Math.PI * j) / m + (2 * Math.PI * k1) / n + sigma;
      zr[idx] = radius * Math.cos(ang);
      zi[idx] = radius * Math.sin(ang);
      idx++;
    }
  }
}

/** Makes the root set exactly conjugate-symmetric (real input): pairs each upper root with its lower mate. */
function symmetrize(re: Float64Array, im: Float64Array, n: number): void {
  const used = new Uint8Array(n);
  const tol = 1e-10;
  for (let i = 0; i < n; i++) {
    if (used[i]) continue;
    used[i] = 1;
    const scale = Math.max(1, Math.hypot(re[i]!, im[i]!));
    let best = -1;
    let bestDist = Infinity;
    for (let j = 0; j < n; j++) {
      if (used[j]) continue;
      const d = Math.hypot(re[j]! - re[i]!, im[j]! + im[i]!);
      if (d < bestDist) {
        bestDist = d;
        best = j;
      }
    }
    if (Math.abs(im[i]!) <= tol * scale && (best < 0 || Math.abs(im[i]!) < bestDist / 2)) {
      im[i] = 0;
      continue;
    }
    if (best >= 0) {
      used[best] = 1;
      const r = (re[i]! + re[best]!) / 2;
      const m = (Math.abs(im[i]!) + Math.abs(im[best]!)) / 2;
      re[i] = r;
      re[best] = r;
      im[i] = m;
      im[best] = -m;
    } else {
      im[i] = 0;
    }
  }
}

/** Groups numerically coincident roots into one root with a multiplicity. */
export function groupRoots(re: Float64Array, im: Float64Array): Root[] {
  const n = re.length;
  const used = new Uint8Array(n);
  const out: Root[] = [];
  for (let i = 0; i < n; i++) {
    if (used[i]) continue;
    used[i] = 1;
    let sr = re[i]!;
    let si = im[i]!;
    let m = 1;
    const tol = 1e-6 * Math.max(1, Math.hypot(re[i]!, im[i]!));
    for (let j = i + 1; j < n; j++) {
      if (used[j]) continue;
      if (Math.hypot(re[j]! - re[i]!, im[j]! - im[i]!) < tol) {
        used[j] = 1;
        sr += re[j]!;
        si += im[j]!;
        m++;
      }
    }
    out.push({ re: sr / m, im: si / m, multiplicity: m });
  }
  return out;
}

/**
 * Certified inclusion disks for all roots of a polynomial from approximations of them (the Gerschgorin-type
 * theorem of D. Braess & K. P. Hadeler, "Simultaneous inclusion of the zeros of a polynomial", Numer. Math.
 * 21, 1973; used this way in D. A. Bini & G. Fiorentino, "Design, analysis, and implementation of a
 * multiprecision polynomial rootfinder", Numer. Algorithms 23, 2000): with the Weierstrass corrections
 * W_i = p(z_i) / (c_0 Π_{j≠i} (z_i − z_j)), the disks |z − z_i| ≤ n|W_i| contain every root, and each connected
 * component made of k disks holds exactly k roots (with multiplicity). |p(z_i)| is bounded from above by the
 * compensated Horner value plus its error bound, and the product from below, so the disks hold for the exact
 * polynomial the doubles c stand for, not for a rounded one.
 */
import { compensatedEval } from './compensated.ts';
import { exactValues, type ExactPoly } from './exactEval.ts';
import { bitLength } from '../stability/bigMagnitude.ts';

/** Disks and their connected components. */
export interface InclusionDisks {
  /** Radius of the disk around each approximation (Infinity where no bound could be formed). */
  radius: Float64Array;
  /** Component id of each disk; disks that touch share an id. */
  component: Int32Array;
  /** Per approximation: the radius of the disk around it that holds its whole component. */
  spread: Float64Array;
}

const EPS = Number.EPSILON / 2; // unit roundoff

/** γ_k = k·u / (1 − k·u), the usual bound on k rounded operations. */
const gamma = (k: number) => (k * EPS) / (1 - k * EPS);

/**
 * Upper bound on |p(z)| for descending c at z = x + iy: the compensated Horner value (S. Graillat &
 * V. Ménissier-Morain, 2012) plus twice its a-priori error bound ε|res| + γ_{4n+2}²·Σ|c_k||z|^k (from memory;
 * the factor 2 is margin).
 */
function valueBound(c: Float64Array, x: number, y: number, out: Float64Array): number {
  const n = c.length - 1;
  compensatedEval(c, x, y, out);
  const mod = Math.hypot(x, y);
  let b = 0;
  for (let k = 0; k <= n; k++) b = b * mod + Math.abs(c[k]!);
  b *= 1 + gamma(2 * n + 2);
  const g = gamma(4 * n + 2);
  const res = Math.hypot(out[0]!, out[1]!);
  return res * (1 + 4 * EPS) + 2 * (2 * EPS * res + g * g * b);
}

/** Inclusion disks for the roots (re, im) of the descending polynomial c (c[0] ≠ 0, all roots listed). */
export function inclusionDisks(
  c: Float64Array,
  re: ArrayLike<number>,
  im: ArrayLike<number>,
): InclusionDisks {
  const v = new Float64Array(4);
  const log2Value = Float64Array.from({ length: re.length }, (_, i) =>
    Math.log2(valueBound(c, re[i]!, im[i]!, v)),
  );
  return disksFrom(re, im, log2Value, Math.log2(Math.abs(c[0]!)));
}

/**
 * Inclusion disks from exact values of p at the approximations (roots/exactEval.ts): |p(z_i)| is then known
 * to one rounding, so the disks are as small as the approximations are good.
 */
export function exactInclusionDisks(
  p: ExactPoly,
  re: ArrayLike<number>,
  im: ArrayLike<number>,
): InclusionDisks {
  const log2Value = Float64Array.from({ length: re.length }, (_, i) => {
    const v = exactValues(p, re[i]!, im[i]!, false);
    // Two roundings of the parts and one of the modulus, with margin.
    return 0.5 * Math.log2(v.pr * v.pr + v.pi * v.pi) + v.scale + 64 * EPS;
  });
  const lead = p[0]!;
  const log2Lead =
    Math.log2(Math.abs(Number(lead >> BigInt(Math.max(0, bitLength(lead) - 60))))) +
    Math.max(0, bitLength(lead) - 60);
  return disksFrom(re, im, log2Value, log2Lead - 64 * EPS);
}

/**
 * Inclusion disks with |p(z_i)| known exactly at the approximations listed in `exactAt` (after those were
 * refined with exact evaluation) and bounded by compensated evaluation of the doubles c elsewhere; each
 * value is an upper bound either way, so the disks hold for the exact polynomial.
 */
export function mixedInclusionDisks(
  c: Float64Array,
  p: ExactPoly,
  re: ArrayLike<number>,
  im: ArrayLike<number>,
  exactAt: ReadonlySet<number>,
): InclusionDisks {
  const v = new Float64Array(4);
  // The integer coefficients are c·2^s for one common integer s, so s is the rounded difference of the logs.
  const lead = p[0]!;
  const log2LeadP =
    Math.log2(Math.abs(Number(lead >> BigInt(Math.max(0, bitLength(lead) - 60))))) +
    Math.max(0, bitLength(lead) - 60);
  const shift = Math.round(log2LeadP - Math.log2(Math.abs(c[0]!)));
  const log2Value = Float64Array.from({ length: re.length }, (_, i) => {
    if (!exactAt.has(i)) return Math.log2(valueBound(c, re[i]!, im[i]!, v)) + shift;
    const e = exactValues(p, re[i]!, im[i]!, false);
    return 0.5 * Math.log2(e.pr * e.pr + e.pi * e.pi) + e.scale + 64 * EPS;
  });
  return disksFrom(re, im, log2Value, log2LeadP - 64 * EPS);
}

/** Disks |z − z_i| ≤ n·|p(z_i)| / (|c_0| Π|z_i − z_j|) from upper bounds on log2|p(z_i)| and a lower one on log2|c_0|. */
function disksFrom(
  re: ArrayLike<number>,
  im: ArrayLike<number>,
  log2Value: Float64Array,
  log2Lead: number,
): InclusionDisks {
  const n = re.length;
  const radius = new Float64Array(n);
  // Relative error of the product of n − 1 differences computed in double, and of the logarithms.
  const productSlack = 1 + gamma(4 * n + 8);
  for (let i = 0; i < n; i++) {
    if (log2Value[i] === -Infinity) continue;
    let log2Product = log2Lead;
    let coincident = false;
    for (let j = 0; j < n; j++) {
      if (j === i) continue;
      const d = Math.hypot(re[i]! - re[j]!, im[i]! - im[j]!);
      if (d === 0) coincident = true;
      log2Product += Math.log2(d);
    }
    const r = coincident ? Infinity : n * 2 ** (log2Value[i]! - log2Product) * productSlack * (1 + 1e-12);
    radius[i] = Number.isNaN(r) ? Infinity : r;
  }
  const component = components(re, im, radius);
  const spread = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = radius[i]!;
    for (let j = 0; j < n; j++) {
      if (j === i || component[j] !== component[i]) continue;
      s = Math.max(s, Math.hypot(re[i]! - re[j]!, im[i]! - im[j]!) + radius[j]!);
    }
    spread[i] = s;
  }
  return { radius, component, spread };
}

/** Connected components of the disks (union–find over touching pairs). */
function components(re: ArrayLike<number>, im: ArrayLike<number>, radius: Float64Array): Int32Array {
  const n = re.length;
  const parent = Int32Array.from({ length: n }, (_, i) => i);
  const find = (i: number): number => {
    while (parent[i] !== i) {
      parent[i] = parent[parent[i]!]!;
      i = parent[i]!;
    }
    return i;
  };
  for (let i = 0; i < n; i++)
    for (let j = i + 1; j < n; j++)
      if (Math.hypot(re[i]! - re[j]!, im[i]! - im[j]!) <= radius[i]! + radius[j]!) parent[find(i)] = find(j);
  return Int32Array.from({ length: n }, (_, i) => find(i));
}

/**
 * Partial fractions of H(z) = B(z^-1)/A(z^-1) in the convention of scipy.signal.residuez:
 *   H(z) = Σ_i r_i / (1 − p_i z^-1)^(k_i) + Σ_j d_j z^-j,
 * with a repeated pole of multiplicity m listed m times, powers 1..m. Residues come from the Taylor series of
 * B(x)·(1 − p x)^m / A(x) about x = 1/p (x = z^-1), computed as a product of the other poles' factors — the
 * derivative formula for repeated poles, evaluated without forming derivatives of A.
 */
import type { Root, TransferFunction } from './types.ts';
import type { Poly } from './poly.ts';
import { findRoots } from './roots.ts';
import { mergeRepeatedPoles } from './time/repeatedPoles.ts';
import { taylorAt } from './time/taylor.ts';

/** A complex number as a plain pair. */
export interface Complex {
  re: number;
  im: number;
}

/** Partial fractions of a transfer function; residues[i], poles[i], powers[i] describe one fraction. */
export interface PartialFractions {
  residues: Complex[];
  /** Every pole listed (conjugates included), once per power. */
  poles: Complex[];
  /** k of r/(1 − p z^-1)^k: 1..m for a pole of multiplicity m. */
  powers: number[];
  /** FIR part: direct[j] multiplies z^-j. Empty when the system is strictly proper in z^-1. */
  direct: number[];
  /** Whether the pole search converged. */
  converged: boolean;
}

/** Partial-fraction expansion of H(z) in powers of z^-1 (scipy.signal.residuez convention). */
export function partialFractions(tf: TransferFunction): PartialFractions {
  const { b, a } = normalizeTf(tf);
  const roots = findRoots(a);
  return expandOverPoles(b, a, mergeRepeatedPoles(a, roots.grouped), roots.converged);
}

/**
 * Trims trailing zeros (powers of z^-1 that contribute nothing) and divides both by a[0]. Throws when the
 * denominator is zero or its leading coefficient is.
 */
export function normalizeTf(tf: TransferFunction): { b: Float64Array; a: Float64Array } {
  const a = trimTrailingZeros(tf.a);
  const a0 = a[0];
  if (a0 === undefined || a0 === 0 || !Number.isFinite(a0)) {
    throw new Error(
      `partial fractions: the leading denominator coefficient a[0] is ${String(tf.a[0])}; it must be a nonzero number`,
    );
  }
  const b = trimTrailingZeros(tf.b);
  return { b: b.map((v) => v / a0), a: a.map((v) => v / a0) };
}

function trimTrailingZeros(p: readonly number[] | Float64Array): Float64Array {
  let n = p.length;
  while (n > 0 && p[n - 1] === 0) n--;
  return Float64Array.from({ length: n }, (_, i) => p[i]!);
}

/**
 * Expansion of b/a over the given pole groups (conjugates listed separately, multiplicities summing to the
 * degree of a). a must be monic (a[0] = 1) with a nonzero last coefficient.
 */
export function expandOverPoles(
  b: Poly,
  a: Poly,
  groups: readonly Root[],
  converged: boolean,
): PartialFractions {
  const sorted = [...groups].sort(
    (p, q) => Math.hypot(p.re, p.im) - Math.hypot(q.re, q.im) || p.re - q.re || p.im - q.im,
  );
  const out: PartialFractions = { residues: [], poles: [], powers: [], direct: directTerms(b, a), converged };
  const byGroup = new Map<Root, Complex[]>();
  for (const g of sorted) {
    const mirror =
      g.im < 0
        ? sorted.find((h) => h.re === g.re && h.im === -g.im && h.multiplicity === g.multiplicity)
        : undefined;
    const mirrored = mirror && byGroup.get(mirror);
    const residues = mirrored ? mirrored.map((r) => ({ re: r.re, im: -r.im })) : residuesAt(b, g, sorted);
    byGroup.set(g, residues);
    residues.forEach((r, k) => {
      out.residues.push(r);
      out.poles.push({ re: g.re, im: g.im });
      out.powers.push(k + 1);
    });
  }
  return out;
}

/** Quotient of b by a as polynomials in x = z^-1 (long division from the highest power of x). */
function directTerms(b: Poly, a: Poly): number[] {
  const nb = b.length - 1;
  const na = a.length - 1;
  if (nb < na) return [];
  const rem = Float64Array.from(b);
  const q = new Array<number>(nb - na + 1).fill(0);
  const lead = a[na]!;
  for (let k = nb - na; k >= 0; k--) {
    const c = rem[k + na]! / lead;
    q[k] = c;
    for (let i = 0; i <= na; i++) rem[k + i]! -= c * a[i]!;
  }
  return q;
}

/** Residues r_1..r_m of the m-fold pole g: coefficients of (1 − p x)^(m−k) in B(x)(1 − p x)^m / A(x). */
function residuesAt(b: Poly, g: Root, all: readonly Root[]): Complex[] {
  const m = g.multiplicity;
  // x0 = 1/p; expansions in t = x − x0, and 1 − p x = −p t.
  const pm = g.re * g.re + g.im * g.im;
  const x0r = g.re / pm;
  const x0i = -g.im / pm;
  // B has b[k] at x^k: reversed, it is a descending polynomial in x.
  const [numR, numI] = taylorAt(Array.from(b).reverse(), x0r, x0i, m);
  const denR = new Float64Array(m);
  const denI = new Float64Array(m);
  denR[0] = 1;
  for (const h of all) {
    if (h === g) continue;
    // Factor (1 − q x) = (1 − q x0) − q t, raised to its multiplicity.
    const cr = 1 - (h.re * x0r - h.im * x0i);
    const ci = -(h.re * x0i + h.im * x0r);
    for (let rep = 0; rep < h.multiplicity; rep++) {
      for (let j = m - 1; j >= 0; j--) {
        let r = denR[j]! * cr - denI[j]! * ci;
        let i = denR[j]! * ci + denI[j]! * cr;
        if (j > 0) {
          r -= denR[j - 1]! * h.re - denI[j - 1]! * h.im;
          i -= denR[j - 1]! * h.im + denI[j - 1]! * h.re;
        }
        denR[j] = r;
        denI[j] = i;
      }
    }
  }
  // Series quotient g(t) = num / den, then coefficient of u^j = g_j · (−1/p)^j with u = 1 − p x.
  const gR = new Float64Array(m);
  const gI = new Float64Array(m);
  const d0 = denR[0]! * denR[0]! + denI[0]! * denI[0]!;
  for (let j = 0; j < m; j++) {
    let r = numR[j]!;
    let i = numI[j]!;
    for (let k = 1; k <= j; k++) {
      r -= gR[j - k]! * denR[k]! - gI[j - k]! * denI[k]!;
      i -= gR[j - k]! * denI[k]! + gI[j - k]! * denR[k]!;
    }
    gR[j] = (r * denR[0]! + i * denI[0]!) / d0;
    gI[j] = (i * denR[0]! - r * denI[0]!) / d0;
  }
  const residues: Complex[] = new Array<Complex>(m);
  // w = −1/p = −x0
  let wr = 1;
  let wi = 0;
  for (let j = 0; j < m; j++) {
    residues[m - 1 - j] = { re: gR[j]! * wr - gI[j]! * wi, im: gR[j]! * wi + gI[j]! * wr };
    const t = -(wr * x0r - wi * x0i);
    wi = -(wr * x0i + wi * x0r);
    wr = t;
  }
  return residues;
}

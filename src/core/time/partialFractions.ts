/**
 * Partial fractions of H(z) = B(z^-1)/A(z^-1) in the convention of scipy.signal.residuez:
 *   H(z) = Σ_i r_i / (1 − p_i z^-1)^(k_i) + Σ_j d_j z^-j,
 * with a repeated pole of multiplicity m listed m times, powers 1..m. Residues come from the Taylor series of
 * B(x)·(1 − p x)^m / A(x) about x = 1/p (x = z^-1), computed as a product of the other poles' factors — the
 * derivative formula for repeated poles, evaluated without forming derivatives of A.
 */
import type { Complex, Root, TransferFunction, Zpk } from '../types.ts';
import { polyMul } from '../poly.ts';
import { zpkToTf } from '../system/transferFunction.ts';
import { expandRoots, rootCount } from '../system/rootList.ts';
import type { Poly } from '../poly.ts';
import { taylorAt } from './taylor.ts';
import { factorSeries, seriesDiv, seriesMulInPlace, type Series } from './series.ts';

/** First m Taylor coefficients of the numerator N(x), x = z^-1, about the complex point x0. */
export type NumeratorSeries = (x0r: number, x0i: number, m: number) => Series;

/** Numerator series of a polynomial b in powers of z^-1 (b[k] multiplies x^k). */
export function polynomialNumerator(b: Poly): NumeratorSeries {
  const descending = Array.from(b).reverse();
  return (x0r, x0i, m) => taylorAt(descending, x0r, x0i, m);
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
 * degree of a). a must be monic (a[0] = 1) with a nonzero last coefficient. The residues use `numerator`, by
 * default b's own series; a factored numerator gives more accurate residues at high order.
 */
export function expandOverPoles(
  b: Poly,
  a: Poly,
  groups: readonly Root[],
  converged: boolean,
  numerator: NumeratorSeries = polynomialNumerator(b),
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
    const residues = mirrored
      ? mirrored.map((r) => ({ re: r.re, im: -r.im }))
      : residuesAt(numerator, g, sorted);
    byGroup.set(g, residues);
    residues.forEach((r, k) => {
      out.residues.push(r);
      out.poles.push({ re: g.re, im: g.im });
      out.powers.push(k + 1);
    });
  }
  // Coincident groups the merge could not reconcile give infinite residues: report, do not hide.
  out.converged = converged && out.residues.every((r) => Number.isFinite(r.re) && Number.isFinite(r.im));
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

/**
 * Residues r_1..r_m of the m-fold pole g: coefficients of (1 − p x)^(m−k) in N(x)(1 − p x)^m / A(x), from
 * the numerator's series about x0 = 1/p (x = z^-1) and the other poles' factors.
 */
function residuesAt(numerator: NumeratorSeries, g: Root, all: readonly Root[]): Complex[] {
  const m = g.multiplicity;
  const pm = g.re * g.re + g.im * g.im;
  const x0r = g.re / pm;
  const x0i = -g.im / pm;
  // In t = x − x0 the factor 1 − p x is −p t, so u = 1 − p x gives coefficient of u^j = g_j · (−1/p)^j.
  const [gR, gI] = seriesDiv(numerator(x0r, x0i, m), factorSeries(all, x0r, x0i, m, g));
  const residues: Complex[] = new Array<Complex>(m);
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

/**
 * Two poles of a zeros/poles/gain description closer than this (relative to max(1, |p|)) are one repeated
 * pole: they can only be that close by intent (a cosine input at a pole's frequency, a pole placed twice),
 * since the positions are exact numbers rather than computed roots.
 */
export const COINCIDENT_POLE_TOLERANCE = 1e-9;

/** A rational factor b/a in powers of z^-1 multiplying H(z), with its poles listed (conjugates included). */
export interface RationalFactor {
  b: readonly number[];
  a: readonly number[];
  poles: readonly Root[];
}

const UNIT: RationalFactor = { b: [1], a: [1], poles: [] };

/**
 * Partial fractions of H(z)·F(z) for H given by zeros, poles and gain (b/a aligned as zpkToTf, so a pole
 * excess shows as a delay). The poles are used as given, not recomputed from coefficients, so high-order
 * and repeated poles keep full accuracy.
 */
export function partialFractionsZpk(zpk: Zpk, factor: RationalFactor = UNIT): PartialFractions {
  const tf = zpkToTf(zpk);
  const { b, a } = normalizeTf({
    b: Array.from(polyMul(tf.b, factor.b)),
    a: Array.from(polyMul(tf.a, factor.a)),
  });
  const zeros = expandRoots(zpk.zeros);
  const poles = expandRoots(zpk.poles);
  const delay = Math.max(0, rootCount(zpk.poles) - rootCount(zpk.zeros));
  const groups: Root[] = [];
  for (const p of [...poles, ...factor.poles]) {
    // Poles at the origin are the delay already folded into b.
    if (p.re === 0 && p.im === 0) continue;
    const reach = COINCIDENT_POLE_TOLERANCE * Math.max(1, Math.hypot(p.re, p.im));
    const same = groups.find((g) => Math.hypot(g.re - p.re, g.im - p.im) <= reach);
    if (same) same.multiplicity += p.multiplicity;
    else groups.push({ ...p });
  }
  const factorNumerator = polynomialNumerator(factor.b);
  const numerator: NumeratorSeries = (x0r, x0i, m) => {
    // N(x) = k · x^delay · Π(1 − zᵢ x) · b_F(x)
    const s = factorSeries(zeros, x0r, x0i, m);
    seriesMulInPlace(s, factorNumerator(x0r, x0i, m));
    const shift: Series = [Float64Array.of(x0r, 1), Float64Array.of(x0i, 0)];
    for (let k = 0; k < delay; k++) seriesMulInPlace(s, shift);
    for (let j = 0; j < m; j++) {
      s[0][j]! *= zpk.gain;
      s[1][j]! *= zpk.gain;
    }
    return s;
  };
  return expandOverPoles(b, a, groups, true, numerator);
}

/**
 * The decay envelope of the slowest pole: e[n] = rⁿ·Σₖ Cₖ·nᵏ drawn as centre ± e[n], where r is the largest
 * pole radius and Cₖ bounds the modes at that radius (|Σ cᵢ pᵢⁿ| ≤ rⁿ Σ|cᵢ| for poles of radius r).
 */
import type { ClosedForm } from '../../core/time/closedForm.ts';

/** Modes whose pole radius is within this relative distance of the largest count as "the slowest pole". */
export const SAME_RADIUS_REL = 1e-6;
/** When fitting to the data, look at this many time constants of samples (the envelope's reach). */
export const FIT_TIME_CONSTANTS = 1;

/** Σ|c| per power of n over the terms whose pole has radius r (conjugate mates included), or null if none. */
export function envelopeWeights(cf: ClosedForm, r: number): number[] | null {
  const weights: number[] = [];
  let any = false;
  for (const t of cf.terms) {
    const radius = Math.hypot(t.pole.re, t.pole.im);
    if (Math.abs(radius - r) > SAME_RADIUS_REL * r) continue;
    const size = Math.hypot(t.coefficient.re, t.coefficient.im);
    weights[t.power] = (weights[t.power] ?? 0) + size;
    if (size > 0) any = true;
  }
  return any ? Array.from(weights, (w) => w ?? 0) : null;
}

/**
 * A single weight C fitted to data: the smallest C with |y[n] − centre| ≤ C·rⁿ over the first
 * FIT_TIME_CONSTANTS time constants (used when there is no closed form to read the weights from).
 */
export function fitEnvelopeWeight(y: ArrayLike<number>, centre: number, r: number): number {
  const tau = -1 / Math.log(r);
  const count = Math.min(y.length, Math.max(8, Math.ceil(FIT_TIME_CONSTANTS * tau)));
  let c = 0;
  let rn = 1;
  for (let n = 0; n < count; n++) {
    const v = Math.abs(y[n]! - centre) / rn;
    if (v > c) c = v;
    rn *= r;
  }
  return c;
}

/** e[n] = rⁿ·Σₖ weights[k]·nᵏ for n = 0…count−1. */
export function envelopeValues(weights: readonly number[], r: number, count: number): Float64Array {
  const out = new Float64Array(count);
  const logR = Math.log(r);
  for (let n = 0; n < count; n++) {
    let poly = 0;
    let nk = 1;
    for (let k = 0; k < weights.length; k++) {
      poly += weights[k]! * nk;
      nk *= n;
    }
    out[n] = poly * Math.exp(n * logR);
  }
  return out;
}

/**
 * Magnitude-only response of zeros/poles/gain: |H|² as a product of squared distances from e^{iω} to each
 * root and its conjugate. It skips the phase and group delay that the full response computes, which makes
 * judging a mask on every drag frame, and shading the whole z-plane, cheap; it agrees with responseZpk's
 * magnitudeDb to rounding.
 */
import type { Root, Zpk } from '../types.ts';
import type { RadPerSample } from '../units.ts';

/** A running product leaving [1/RESCALE, RESCALE] is folded into a log sum, so no order over- or underflows. */
const RESCALE = 1e150;
const DB_PER_LN_POWER = 10 / Math.LN10;

/** Root coordinates in flat arrays (re, im, multiplicity, +1 zero / −1 pole) for the inner loop. */
function flatten(zpk: Zpk): Float64Array {
  const roots: [Root, number][] = [
    ...zpk.zeros.map((r): [Root, number] => [r, 1]),
    ...zpk.poles.map((r): [Root, number] => [r, -1]),
  ];
  const out = new Float64Array(4 * roots.length);
  roots.forEach(([r, sign], j) => out.set([r.re, Math.abs(r.im), r.multiplicity, sign], 4 * j));
  return out;
}

/** ln|H(z)|² without the gain, from flattened roots at z = c + is (c = cos ω, s = sin ω on the circle). */
function lnPower(flat: Float64Array, c: number, s: number): number {
  let product = 1;
  let lnSum = 0;
  for (let j = 0; j < flat.length; j += 4) {
    const dr = c - flat[j]!;
    const im = flat[j + 1]!;
    const a = s - im;
    let d = dr * dr + a * a;
    if (im !== 0) {
      const b = s + im;
      d *= dr * dr + b * b;
    }
    const m = flat[j + 2]!;
    if (m !== 1) {
      // A power of a multiple root could leave the double range by itself: add its log directly.
      lnSum += flat[j + 3]! * m * Math.log(d);
      continue;
    }
    product = flat[j + 3]! > 0 ? product * d : product / d;
    if (!(product < RESCALE && product > 1 / RESCALE)) {
      lnSum += Math.log(product);
      product = 1;
    }
  }
  return lnSum + Math.log(product);
}

/** 20·log10|H(e^{iω})| in dB at one frequency ω (radians per sample). */
export function magnitudeDbAt(zpk: Zpk, omega: RadPerSample): number {
  const k = 20 * Math.log10(Math.abs(zpk.gain));
  return DB_PER_LN_POWER * lnPower(flatten(zpk), Math.cos(omega), Math.sin(omega)) + k;
}

/** A reader of 20·log10|H(e^{iω})| in dB at single frequencies ω (radians per sample), for repeated calls. */
export function magnitudeDbReader(zpk: Zpk): (omega: RadPerSample) => number {
  const flat = flatten(zpk);
  const k = 20 * Math.log10(Math.abs(zpk.gain));
  return (omega) => DB_PER_LN_POWER * lnPower(flat, Math.cos(omega), Math.sin(omega)) + k;
}

/** 20·log10|H(e^{iω})| in dB at each ω of `omega` (radians per sample), written into `out`. */
export function magnitudeDbZpk(
  zpk: Zpk,
  omega: ArrayLike<number>,
  out: Float64Array = new Float64Array(omega.length),
): Float64Array {
  const flat = flatten(zpk);
  const k = 20 * Math.log10(Math.abs(zpk.gain));
  for (let i = 0; i < omega.length; i++) {
    const w = omega[i]!;
    out[i] = DB_PER_LN_POWER * lnPower(flat, Math.cos(w), Math.sin(w)) + k;
  }
  return out;
}

/** A reader of 20·log10|H(z)| in dB at any point z = x + iy of the plane, for repeated calls. */
export function planeLevelDbReader(zpk: Zpk): (x: number, y: number) => number {
  const flat = flatten(zpk);
  const k = 20 * Math.log10(Math.abs(zpk.gain));
  return (x, y) => DB_PER_LN_POWER * lnPower(flat, x, y) + k;
}

/**
 * Analog zeros/poles/gain used while designing: roots in the s-plane in stored form (im >= 0, conjugate
 * implied), with the gain kept as a sign and a natural log so that high orders at edges near 0 or near
 * Nyquist cannot overflow or underflow on the way to the z-plane.
 */
import type { Root } from '../types.ts';

/** s-plane (or z-plane, after the bilinear transform) zeros/poles with gain = sign·exp(logGain). */
export interface LogGainZpk {
  zeros: Root[];
  poles: Root[];
  logGain: number;
  sign: number;
}

/** A simple root in stored form (im forced to exactly 0 for a real root). */
export const root = (re: number, im = 0, multiplicity = 1): Root => ({ re, im: Math.abs(im), multiplicity });

/** Counts roots including implied conjugates and multiplicities. */
export function countRoots(roots: readonly Root[]): number {
  let n = 0;
  for (const r of roots) n += (r.im === 0 ? 1 : 2) * r.multiplicity;
  return n;
}

/**
 * log|Π(c − r)| and the sign of Π(c − r) over every root and implied conjugate, for real c; a conjugate
 * pair contributes |c − r|² > 0.
 */
export function logProductAt(roots: readonly Root[], c: number): { log: number; sign: number } {
  let log = 0;
  let sign = 1;
  for (const r of roots) {
    if (r.im === 0) {
      const d = c - r.re;
      log += r.multiplicity * Math.log(Math.abs(d));
      if (d < 0 && r.multiplicity % 2 === 1) sign = -sign;
    } else {
      log += r.multiplicity * Math.log((c - r.re) ** 2 + r.im * r.im);
    }
  }
  return { log, sign };
}

/**
 * Zeros of a linear-phase FIR as the root finder returns them, put where the symmetry says they are.
 *
 * The taps of a linear-phase FIR are symmetric or antisymmetric, so with every zero z its reciprocal 1/z* is
 * a zero too (Z-transform of a time-reversed sequence, common practice). A simple zero whose reciprocal is
 * not another zero is therefore its own reciprocal: it lies exactly on the unit circle. The root finder
 * leaves such zeros ~1e-13 off the circle, enough to give the group delay rounding spikes of 1e15 samples
 * right at them; this puts them back on the circle.
 */
import type { Root, Zpk } from '../../types.ts';

/** A zero closer to the circle than this (|1 − |z||), with no reciprocal partner, is taken as on it. */
export const ON_CIRCLE_SNAP = 1e-7;

/** Whether another zero sits at z's reciprocal 1/z* (within `tol`, relative). */
function hasPartner(zeros: readonly Root[], i: number, tol: number): boolean {
  const z = zeros[i]!;
  const r2 = z.re * z.re + z.im * z.im;
  const re = z.re / r2;
  const im = z.im / r2;
  return zeros.some(
    (w, j) => j !== i && Math.hypot(w.re - re, w.im - im) <= tol * Math.max(1, Math.hypot(re, im)),
  );
}

/** The zpk with each simple unpartnered zero within ON_CIRCLE_SNAP of the unit circle moved radially onto it. */
export function snapLinearPhaseZeros(zpk: Zpk): Zpk {
  const zeros = zpk.zeros.map((z, i) => {
    const r = Math.hypot(z.re, z.im);
    if (r === 0 || Math.abs(r - 1) > ON_CIRCLE_SNAP || hasPartner(zpk.zeros, i, 4 * ON_CIRCLE_SNAP)) return z;
    return z.im === 0 ? { ...z, re: Math.sign(z.re) } : { ...z, re: z.re / r, im: z.im / r };
  });
  return { ...zpk, zeros };
}

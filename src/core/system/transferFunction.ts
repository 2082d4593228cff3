/**
 * Zeros/poles/gain -> b/a in powers of z^-1, keeping H(z) = k·Π(z − zᵢ)/Π(z − pᵢ) exact in z; the way back,
 * which needs the root finder, is fromCoefficients.ts (not in the page's first view).
 *
 * Alignment: b and a are read as B(z^-1)/A(z^-1). With more poles than zeros the system delays by
 * (poles − zeros) samples, which shows up as leading zeros of b. scipy's zpk2tf and tf2zpk instead
 * left-align arrays of different lengths, i.e. they describe z^(poles − zeros)·H(z); both agree whenever the
 * counts are equal (tf2zpk also agrees when b and a are first padded with trailing zeros to equal length).
 */
import type { TransferFunction, Zpk } from '../types.ts';
import { polyFromRoots } from '../poly.ts';
import { rootCount } from './rootList.ts';

/**
 * b/a (a[0] = 1) of the zpk. With more zeros than poles H is not causal; the arrays then describe the causal
 * z^-(zeros − poles)·H(z), i.e. extra poles at the origin (scipy zpk2tf's arrays).
 */
export function zpkToTf(zpk: Zpk): TransferFunction {
  const num = polyFromRoots(zpk.zeros);
  const den = polyFromRoots(zpk.poles);
  const delay = Math.max(0, rootCount(zpk.poles) - rootCount(zpk.zeros));
  const b = new Array<number>(delay).fill(0);
  for (const c of num) b.push(zpk.gain * c);
  return { b, a: Array.from(den) };
}

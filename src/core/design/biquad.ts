/** Zeros/poles/gain of a single biquad given by its coefficients, by the quadratic formula. */
import type { Zpk } from '../types.ts';
import { quadraticRoots } from '../system/index.ts';

/**
 * H(z) = (b0 + b1 z⁻¹ + b2 z⁻²)/(a0 + a1 z⁻¹ + a2 z⁻²) with b0, a0 ≠ 0 as zeros/poles/gain (gain b0/a0);
 * roots come from the cancellation-free quadratic formula.
 */
export function biquadToZpk(b: readonly [number, number, number], a: readonly [number, number, number]): Zpk {
  return {
    zeros: quadraticRoots(b[0], b[1], b[2]),
    poles: quadraticRoots(a[0], a[1], a[2]),
    gain: b[0] / a[0],
  };
}

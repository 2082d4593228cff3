/** Backward-error measures for computed polynomial roots. */
import { relativeResidual } from './horner.ts';

/**
 * Largest relative residual max_i |p(z_i)| / Σ_k |a_k||z_i|^k over the given roots (dimensionless): the
 * smallest relative coefficient perturbation making each z_i an exact root, up to a factor of the
 * evaluation's own rounding. Leading and trailing zero coefficients are ignored like findRoots does.
 */
export function rootsBackwardError(
  p: ArrayLike<number>,
  re: ArrayLike<number>,
  im: ArrayLike<number>,
): number {
  let worst = 0;
  for (let i = 0; i < re.length; i++) {
    const r = relativeResidual(p, re[i]!, im[i]!);
    if (!(r <= worst)) worst = r;
  }
  return worst;
}

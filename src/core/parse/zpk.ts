/** Expansion of typed zeros/poles/gain into b/a arrays in powers of z^-1. */
import { polyFromRoots } from '../poly.ts';
import type { TransferFunction, Zpk } from '../types.ts';
import { checkTransferFunction } from './check.ts';
import { fail } from './errors.ts';

/** Number of zeros (conjugates and repeats counted) beyond the number of poles: 0 for a causal system. */
export function zpkExcess(zpk: Zpk): number {
  const count = (rs: Zpk['zeros']) => rs.reduce((n, r) => n + r.multiplicity * (r.im === 0 ? 1 : 2), 0);
  return Math.max(0, count(zpk.zeros) - count(zpk.poles));
}

/** The zpk with `count` more poles at the origin (merged into an existing origin pole): a delay of `count` samples. */
export function withOriginPoles(zpk: Zpk, count: number): Zpk {
  if (count <= 0) return zpk;
  const at = zpk.poles.findIndex((p) => p.re === 0 && p.im === 0);
  const poles = zpk.poles.slice();
  if (at >= 0) poles[at] = { ...poles[at]!, multiplicity: poles[at]!.multiplicity + count };
  else poles.push({ re: 0, im: 0, multiplicity: count });
  return { ...zpk, poles };
}

/**
 * b, a in powers of z^-1 for H(z) = k·Π(z−zᵢ)/Π(z−pᵢ): both polynomials in z are divided by z^max(M, N), so
 * the shorter one gets leading zeros (a delay) — fails when there are more zeros than poles (not causal;
 * parseSystem first adds poles at the origin with withOriginPoles and says so).
 */
export function zpkToTransferFunction(zpk: Zpk): TransferFunction {
  const num = polyFromRoots(zpk.zeros);
  const den = polyFromRoots(zpk.poles);
  const m = num.length - 1;
  const n = den.length - 1;
  if (m > n) {
    fail(
      `H(z) is not causal: ${m} zeros but only ${n} poles (add ${m - n} pole${m - n > 1 ? 's' : ''} at 0 to delay it)`,
      0,
      'at most as many zeros as poles, counting conjugates and repeats',
    );
  }
  const b = [...new Array<number>(n - m).fill(0), ...Array.from(num, (v) => v * zpk.gain)];
  const a = [...Array.from(den)];
  return checkTransferFunction({ b, a }, 0);
}

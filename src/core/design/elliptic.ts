/**
 * Elliptic (Cauer) analog low-pass prototype: equiripple pass band of rp dB up to 1 rad/s and equiripple
 * stop band at least rs dB down. Zeros at i/(k·sn(jK/N, k)) and poles from the Jacobi functions at a shifted
 * imaginary argument, with the selectivity k from the degree equation; the classical Jacobi-function
 * construction (Lutovac, Tošić & Evans, Filter Design for Signal Processing, from memory).
 */
import type { LogGainZpk } from './prototype.ts';
import { logProductAt, root } from './prototype.ts';
import { powerRatioMinusOne } from './chebyshev.ts';
import { ellipticDegree, ellipticF, ellipticK, jacobiElliptic } from './ellipticFunctions.ts';
import type { Root } from '../types.ts';

/** Elliptic prototype of the given order with pass-band ripple rp dB and stop-band attenuation rs dB (rs > rp > 0). */
export function ellipticPrototype(order: number, rippleDb: number, attenuationDb: number): LogGainZpk {
  const eps2 = powerRatioMinusOne(rippleDb);
  const eps = Math.sqrt(eps2);
  if (order === 1) return { zeros: [], poles: [root(-1 / eps)], logGain: -Math.log(eps), sign: 1 };
  // Discrimination k1² = ε²/(10^(rs/10) − 1), then the selectivity k from the degree equation.
  const m1 = eps2 / powerRatioMinusOne(attenuationDb);
  const { m, mc } = ellipticDegree(order, m1);
  const bigK = ellipticK(m, mc);
  // v0 solves sn(i·v0·N·K1/K, k1) = i/ε: by Jacobi's imaginary transformation, sc(v, k1') = 1/ε, so v is an
  // incomplete integral F(atan(1/ε), k1'²).
  const v0 = (bigK * ellipticF(Math.atan(1 / eps), 1 - m1, m1)) / (order * ellipticK(m1));
  const shifted = jacobiElliptic(v0, mc, m);
  const zeros: Root[] = [];
  const poles: Root[] = [];
  for (let j = 1 - (order % 2); j < order; j += 2) {
    const { sn, cn, dn } = jacobiElliptic((j * bigK) / order, m, mc);
    const den = 1 - (dn * shifted.sn) ** 2;
    const re = -(cn * dn * shifted.sn * shifted.cn) / den;
    if (j === 0) {
      poles.push(root(re));
      continue;
    }
    zeros.push(root(0, 1 / (Math.sqrt(m) * sn)));
    poles.push(root(re, (sn * shifted.dn) / den));
  }
  const p = logProductAt(poles, 0);
  const z = logProductAt(zeros, 0);
  let logGain = p.log - z.log;
  if (order % 2 === 0) logGain -= 0.5 * Math.log1p(eps2);
  return { zeros, poles, logGain, sign: p.sign * z.sign };
}

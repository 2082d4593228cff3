/**
 * Chebyshev analog low-pass prototypes. Type I: equiripple pass band of rp dB up to 1 rad/s, poles on an
 * ellipse. Type II (inverse Chebyshev): monotone pass band, equiripple stop band at least rs dB down from
 * 1 rad/s, zeros on the imaginary axis. Pole formulas as in Antoniou, Digital Filters, from memory.
 */
import type { LogGainZpk } from './prototype.ts';
import { logProductAt, root } from './prototype.ts';
import type { Root } from '../types.ts';

/** 10^(dB/10) − 1 without cancellation for small dB. */
export const powerRatioMinusOne = (db: number): number => Math.expm1((db * Math.LN10) / 10);

/** Gain of Π(−p)/Π(−z) over all roots, so the prototype has unit gain at s = 0. */
function dcNormalised(zeros: Root[], poles: Root[]): { logGain: number; sign: number } {
  const p = logProductAt(poles, 0);
  const z = logProductAt(zeros, 0);
  return { logGain: p.log - z.log, sign: p.sign * z.sign };
}

/** Type I prototype: ripple rp dB (> 0) in 0..1 rad/s; an even order has DC gain −rp dB. */
export function chebyshev1Prototype(order: number, rippleDb: number): LogGainZpk {
  const eps2 = powerRatioMinusOne(rippleDb);
  const mu = Math.asinh(1 / Math.sqrt(eps2)) / order;
  const poles: Root[] = [];
  for (let m = 1 - order; m <= 0; m += 2) {
    const theta = (Math.PI * m) / (2 * order);
    poles.push(
      m === 0
        ? root(-Math.sinh(mu))
        : root(-Math.sinh(mu) * Math.cos(theta), -Math.cosh(mu) * Math.sin(theta)),
    );
  }
  const g = dcNormalised([], poles);
  if (order % 2 === 0) g.logGain -= 0.5 * Math.log1p(eps2);
  return { zeros: [], poles, ...g };
}

/** Type II prototype: stop band at least rs dB (> 0) down from 1 rad/s, unit DC gain. */
export function chebyshev2Prototype(order: number, attenuationDb: number): LogGainZpk {
  const mu = Math.asinh(Math.sqrt(powerRatioMinusOne(attenuationDb))) / order;
  const zeros: Root[] = [];
  const poles: Root[] = [];
  for (let m = 1 - order; m <= 0; m += 2) {
    const theta = (Math.PI * m) / (2 * order);
    if (m !== 0) zeros.push(root(0, 1 / Math.sin(-theta)));
    // Inverse of the Chebyshev ellipse point sinh(mu)·Re + i·cosh(mu)·Im of −exp(iθ).
    const re = -Math.sinh(mu) * Math.cos(theta);
    const im = m === 0 ? 0 : -Math.cosh(mu) * Math.sin(theta);
    const d = re * re + im * im;
    poles.push(root(re / d, im / d));
  }
  return { zeros, poles, ...dcNormalised(zeros, poles) };
}

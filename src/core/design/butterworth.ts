/** Butterworth analog low-pass prototype: −3 dB at 1 rad/s, poles evenly spaced on the unit circle. */
import type { LogGainZpk } from './prototype.ts';
import { root } from './prototype.ts';

/** Poles −exp(iπm/2N), m = −N+1, −N+3, … ≤ 0 (the upper half), unit gain; maximally flat (Butterworth, 1930). */
export function butterworthPrototype(order: number): LogGainZpk {
  const poles = [];
  for (let m = 1 - order; m <= 0; m += 2) {
    const theta = (Math.PI * m) / (2 * order);
    poles.push(m === 0 ? root(-1) : root(-Math.cos(theta), -Math.sin(theta)));
  }
  return { zeros: [], poles, logGain: 0, sign: 1 };
}

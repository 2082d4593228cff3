/**
 * Bilinear transform of analog zeros/poles/gain to the z-plane, s = (z − 1)/(z + 1) (the sample-rate factor
 * 2·fs cancels because edges are prewarped as tan(ω/2)); each root maps to (1 + r)/(1 − r) and every zero at
 * infinity lands at z = −1.
 */
import type { Zpk } from '../types.ts';
import { cDiv, cx } from './complex.ts';
import type { LogGainZpk } from './prototype.ts';
import { countRoots, logProductAt, root } from './prototype.ts';
import { hzToOmega, type Hertz } from '../units.ts';

/** Prewarped analog frequency tan(ω/2) = tan(π·f/fs) for an edge f in Hz at sample rate fs. */
export const prewarp = (fHz: Hertz, fs: Hertz): number => Math.tan(hzToOmega(fHz, fs) / 2);

/** z-plane zeros/poles/gain of the analog system under s = (z − 1)/(z + 1). */
export function bilinearZpk(p: LogGainZpk): Zpk {
  const map = (roots: LogGainZpk['zeros']) =>
    roots.map((r) => {
      const v = cDiv(cx(1 + r.re, r.im), cx(1 - r.re, -r.im));
      return root(v.re, r.im === 0 ? 0 : v.im, r.multiplicity);
    });
  const zeros = map(p.zeros);
  const n = countRoots(p.poles) - countRoots(p.zeros);
  if (n > 0) zeros.push(root(-1, 0, n));
  // H(s) = k·Π(s − zᵢ)/Π(s − pᵢ) becomes k·Π(1 − zᵢ)/Π(1 − pᵢ) · Π(z − z′ᵢ)/Π(z − p′ᵢ).
  const z = logProductAt(p.zeros, 1);
  const q = logProductAt(p.poles, 1);
  const gain = p.sign * z.sign * q.sign * Math.exp(p.logGain + z.log - q.log);
  return { zeros, poles: map(p.poles), gain };
}

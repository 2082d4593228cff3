/**
 * Classical IIR designs (Butterworth, Chebyshev I and II, elliptic) in the four band shapes, by an analog
 * prototype, a frequency transformation and the bilinear transform with the edges prewarped, all in
 * zeros/poles/gain form. Edge conventions follow scipy.signal: Butterworth edges are −3 dB points,
 * Chebyshev I and elliptic edges are pass-band edges (−rp dB), Chebyshev II edges are stop-band edges (−rs dB).
 */
import type { Zpk } from '../types.ts';
import { toBandpass, toBandstop, toHighpass, toLowpass } from './analogTransforms.ts';
import { bilinearZpk, prewarp } from './bilinear.ts';
import { butterworthPrototype } from './butterworth.ts';
import { chebyshev1Prototype, chebyshev2Prototype } from './chebyshev.ts';
import { ellipticPrototype } from './elliptic.ts';
import type { LogGainZpk } from './prototype.ts';

/** The four classical families. */
export type IirFamily = 'butterworth' | 'chebyshev1' | 'chebyshev2' | 'elliptic';
/** The four band shapes. */
export type BandShape = 'lowpass' | 'highpass' | 'bandpass' | 'bandstop';

/** Parameters of a classical design; frequencies in Hz at sample rate fs. */
export interface IirParameters {
  family: IirFamily;
  response: BandShape;
  order: number;
  /** One edge (low-/high-pass) or two increasing edges (band-pass/-stop), Hz, inside (0, fs/2). */
  edgesHz: readonly number[];
  fs: number;
  /** Pass-band ripple in dB (Chebyshev I, elliptic). */
  rippleDb?: number;
  /** Stop-band attenuation in dB (Chebyshev II, elliptic). */
  attenuationDb?: number;
}

function prototypeOf(p: IirParameters): LogGainZpk {
  const need = (v: number | undefined, what: string) => {
    if (v === undefined || !(v > 0)) throw new RangeError(`${p.family} needs ${what} > 0 dB`);
    return v;
  };
  switch (p.family) {
    case 'butterworth':
      return butterworthPrototype(p.order);
    case 'chebyshev1':
      return chebyshev1Prototype(p.order, need(p.rippleDb, 'a ripple'));
    case 'chebyshev2':
      return chebyshev2Prototype(p.order, need(p.attenuationDb, 'an attenuation'));
    case 'elliptic':
      return ellipticPrototype(
        p.order,
        need(p.rippleDb, 'a ripple'),
        need(p.attenuationDb, 'an attenuation'),
      );
  }
}

/** Digital zeros/poles/gain of a classical design (inputs assumed validated; see runDesigner for checks). */
export function designIir(p: IirParameters): Zpk {
  const proto = prototypeOf(p);
  const w = p.edgesHz.map((f) => prewarp(f, p.fs));
  const w0 = w[0]!;
  switch (p.response) {
    case 'lowpass':
      return bilinearZpk(toLowpass(proto, w0));
    case 'highpass':
      return bilinearZpk(toHighpass(proto, w0));
    case 'bandpass':
      return bilinearZpk(toBandpass(proto, Math.sqrt(w0 * w[1]!), w[1]! - w0));
    case 'bandstop':
      return bilinearZpk(toBandstop(proto, Math.sqrt(w0 * w[1]!), w[1]! - w0));
  }
}

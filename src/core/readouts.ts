/** Per-root read-outs in the trade's units: frequency, radius, decay, Q and bandwidth, notch depth. */
import type { Complex, Root, Zpk } from './types.ts';
import { responseAt } from './response/pointValue.ts';
import { widthForPoleRadius } from './rootShape.ts';
import { omegaToHz, type Hertz, type RadPerSample } from './units.ts';

/** What one stored root (a conjugate pair counts once) means at the design's sample rate. */
export interface RootReadout {
  root: Root;
  kind: 'pole' | 'zero';
  /** Angle expressed as a frequency, Hz, in [0, fs/2]. */
  frequencyHz: Hertz;
  radius: number;
  /** Angle in radians per sample, in [0, π]. */
  angleRad: RadPerSample;
  /** Poles inside the circle: τ = −1/ln r, samples for the envelope to fall by 1/e. */
  timeConstantSamples?: number;
  timeConstantSeconds?: number;
  /** Poles inside the circle: time for the envelope to fall by 40 dB, ln(100)·τ / fs. */
  decay40dBSeconds?: number;
  /** Complex poles inside the circle: f0 / bandwidth. */
  q?: number;
  /** Complex poles inside the circle: the −3 dB width of a second-order section with poles at this radius, Hz. */
  bandwidthHz?: Hertz;
  /** Zeros within NOTCH_RADIUS_BAND of the circle: |H| in dB at the zero's angle. */
  notchDepthDb?: number;
  notchFrequencyHz?: number;
}

/**
 * Zeros with | |z| − 1 | <= 0.05 are read out as notches. A display choice, not numerics: farther from the
 * circle a zero shapes the response without a dip worth naming.
 */
export const NOTCH_RADIUS_BAND = 0.05;

/**
 * Read-outs for every stored pole, then every stored zero, at sample rate fs (Hz). The bandwidth is the
 * −3 dB width of the second-order notch or resonator whose poles sit at radius r (rootShape.ts; about
 * (1 − r)·fs/π near the circle), the same relation the root editor sets a width or Q by.
 */
export function rootReadouts(zpk: Zpk, fs: Hertz): RootReadout[] {
  const out: RootReadout[] = [];
  for (const p of zpk.poles) {
    const r = base(p, 'pole', fs);
    if (r.radius < 1) {
      const tau = r.radius === 0 ? 0 : -1 / Math.log(r.radius);
      r.timeConstantSamples = tau;
      r.timeConstantSeconds = tau / fs;
      r.decay40dBSeconds = (Math.log(100) * tau) / fs;
      if (p.im > 0) {
        r.bandwidthHz = widthForPoleRadius(r.radius, fs)!;
        r.q = r.frequencyHz / r.bandwidthHz;
      }
    }
    out.push(r);
  }
  for (const z of zpk.zeros) {
    const r = base(z, 'zero', fs);
    if (Math.abs(r.radius - 1) <= NOTCH_RADIUS_BAND) {
      const h = responseAt(zpk, r.angleRad);
      r.notchFrequencyHz = r.frequencyHz;
      r.notchDepthDb = 20 * Math.log10(Math.hypot(h.re, h.im));
    }
    out.push(r);
  }
  return out;
}

/**
 * The frequency a root stands for: its angle on the plane as Hz in [0, fs/2] at sample rate fs (Hz), the
 * same for a root and its conjugate. The one read-out of a root's frequency (table, plane, marker, snapping).
 */
export function rootFrequencyHz(root: Complex, fs: Hertz): Hertz {
  // omegaToHz divides the angle first: a root at z = −1 reads exactly fs/2.
  return omegaToHz(rootAngle(root), fs);
}

/** A root's angle on the plane in radians per sample, in [0, π] (a root and its conjugate alike). */
export function rootAngle(root: Complex): RadPerSample {
  return Math.abs(Math.atan2(root.im, root.re));
}

function base(root: Root, kind: 'pole' | 'zero', fs: number): RootReadout {
  return {
    root,
    kind,
    frequencyHz: rootFrequencyHz(root, fs),
    radius: Math.hypot(root.re, root.im),
    angleRad: rootAngle(root),
  };
}

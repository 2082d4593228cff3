/** Test inputs for the fixed-point simulation, described by kind so the page and the command line share them. */
import { makeImpulse, makeSine, makeStep, makeWhiteNoise } from '../time/inputs.ts';
import { hzToOmega } from '../units.ts';

/**
 * An input signal: amplitude is in data-word units (full scale 1; default 0.5, leaving headroom), a sine's
 * frequency in Hz at the design's sample rate, noise Gaussian with standard deviation `amplitude` and a seed.
 */
export type SignalSpec =
  | { kind: 'impulse' | 'step'; length: number; amplitude?: number }
  | { kind: 'sine'; length: number; frequencyHz: number; amplitude?: number }
  | { kind: 'noise'; length: number; seed: number; amplitude?: number }
  | { kind: 'samples'; values: ArrayLike<number> };

/** Default amplitude of generated inputs: half of full scale. */
export const DEFAULT_SIGNAL_AMPLITUDE = 0.5;

/** The samples of a signal spec, at sample rate fs (Hz). */
export function inputSignal(spec: SignalSpec, fs: number): Float64Array {
  if (spec.kind === 'samples') return Float64Array.from(spec.values);
  const amp = spec.amplitude ?? DEFAULT_SIGNAL_AMPLITUDE;
  const scale = (x: Float64Array) => x.map((v) => v * amp);
  switch (spec.kind) {
    case 'impulse':
      return scale(makeImpulse(spec.length));
    case 'step':
      return scale(makeStep(spec.length));
    case 'sine':
      return scale(makeSine(hzToOmega(spec.frequencyHz, fs), spec.length));
    case 'noise':
      return makeWhiteNoise(spec.length, spec.seed, amp);
  }
}

/**
 * Signals to try a filter on, at a sample rate in Hz: tones, a step, an impulse train, white and pink
 * noise, and mains hum with harmonics and slow drift. Every sample is computed from its index (no running
 * phase), so long signals do not drift and any stretch can be regenerated on its own.
 */
import { makeWhiteNoise } from '../time/inputs.ts';
import { makePinkNoise } from './pinkNoise.ts';
import { hzToOmega } from '../units.ts';

/** One tone a·cos(2π·f·t + phase). */
export interface Tone {
  frequencyHz: number;
  amplitude: number;
  /** Radians; default 0. */
  phase?: number;
}

/** Mains hum: a drifting fundamental and its harmonics. */
export interface HumOptions {
  /** Nominal mains frequency in Hz (default 50). */
  fundamentalHz?: number;
  /** Amplitudes of the fundamental, 2nd, 3rd, ... harmonic (default [0.1, 0.03, 0.02]). */
  harmonicAmplitudes?: readonly number[];
  /** Peak frequency deviation of the fundamental in Hz (default 0.2); harmonic h deviates h times this. */
  driftHz?: number;
  /** Period of the sinusoidal drift in seconds (default 20). */
  driftPeriodSeconds?: number;
}

/** A generated signal described by data, for a menu or a saved view. */
export type GeneratorSpec =
  | { kind: 'tones'; tones: readonly Tone[] }
  | { kind: 'step'; atSeconds?: number; level?: number }
  | { kind: 'impulse-train'; periodSeconds: number; amplitude?: number; offsetSeconds?: number }
  | { kind: 'white-noise'; seed: number; rms?: number }
  | { kind: 'pink-noise'; seed: number; rms?: number }
  | ({ kind: 'hum' } & HumOptions);

/** Sum of tones Σ a·cos(2π·f·k/fs + phase), k = 0..n-1; frequencies in Hz at sample rate fs. */
export function makeTones(n: number, sampleRate: number, tones: readonly Tone[]): Float64Array {
  const x = new Float64Array(n);
  for (const { frequencyHz, amplitude, phase = 0 } of tones) {
    const w = hzToOmega(frequencyHz, sampleRate);
    for (let k = 0; k < n; k++) x[k] = x[k]! + amplitude * Math.cos(w * k + phase);
  }
  return x;
}

/** A step to `level` (default 1) at atSeconds (default 0; the first sample at or after it), zero before. */
export function makeStepAt(n: number, sampleRate: number, atSeconds = 0, level = 1): Float64Array {
  const x = new Float64Array(n);
  x.fill(level, Math.max(0, Math.min(n, Math.ceil(atSeconds * sampleRate - 1e-9))));
  return x;
}

/**
 * Impulses of `amplitude` (default 1) every periodSeconds from offsetSeconds (default 0). A period that is
 * not a whole number of samples puts each impulse on the nearest sample, so spacing varies by one sample.
 */
export function makeImpulseTrain(
  n: number,
  sampleRate: number,
  periodSeconds: number,
  amplitude = 1,
  offsetSeconds = 0,
): Float64Array {
  const period = periodSeconds * sampleRate;
  if (!(period >= 1)) throw new Error(`makeImpulseTrain: a period of ${periodSeconds} s is under one sample`);
  const x = new Float64Array(n);
  for (let m = 0; ; m++) {
    const k = Math.round(offsetSeconds * sampleRate + m * period);
    if (k >= n) break;
    if (k >= 0) x[k] = amplitude;
  }
  return x;
}

/**
 * Mains hum: Σ_h a_h·cos(h·φ(t)) where the fundamental's frequency drifts as f0 + d·sin(2πt/T), so its
 * phase is φ(t) = 2π·f0·t − d·T·cos(2πt/T) (+ d·T, to start at zero phase). Harmonic h drifts h·d Hz.
 */
export function makeHum(n: number, sampleRate: number, options: HumOptions = {}): Float64Array {
  const f0 = options.fundamentalHz ?? 50;
  const amps = options.harmonicAmplitudes ?? [0.1, 0.03, 0.02];
  const d = options.driftHz ?? 0.2;
  const T = options.driftPeriodSeconds ?? 20;
  const x = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const t = k / sampleRate;
    const phi = 2 * Math.PI * f0 * t + d * T * (1 - Math.cos((2 * Math.PI * t) / T));
    let v = 0;
    for (let h = 0; h < amps.length; h++) v += amps[h]! * Math.cos((h + 1) * phi);
    x[k] = v;
  }
  return x;
}

/** n samples at sampleRate (Hz) of the described signal. */
export function generateSignal(spec: GeneratorSpec, n: number, sampleRate: number): Float64Array {
  switch (spec.kind) {
    case 'tones':
      return makeTones(n, sampleRate, spec.tones);
    case 'step':
      return makeStepAt(n, sampleRate, spec.atSeconds, spec.level);
    case 'impulse-train':
      return makeImpulseTrain(n, sampleRate, spec.periodSeconds, spec.amplitude, spec.offsetSeconds);
    case 'white-noise':
      return makeWhiteNoise(n, spec.seed, spec.rms ?? 1);
    case 'pink-noise':
      return makePinkNoise(n, spec.seed, spec.rms ?? 1);
    case 'hum':
      return makeHum(n, sampleRate, spec);
  }
}

/** The sum of several generated signals, n samples at sampleRate Hz. */
export function generateSum(specs: readonly GeneratorSpec[], n: number, sampleRate: number): Float64Array {
  const sum = new Float64Array(n);
  for (const spec of specs) {
    const x = generateSignal(spec, n, sampleRate);
    for (let k = 0; k < n; k++) sum[k] = sum[k]! + x[k]!;
  }
  return sum;
}

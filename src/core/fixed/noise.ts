/**
 * Round-off noise of a fixed-point cascade, predicted by the additive noise model of quantization: each
 * rounding adds an error that is uniform over one step, white, and independent of the signal and of the
 * other roundings; its power at the output is its variance times Σg[n]², g the impulse response from the
 * rounding point to the output (Oppenheim & Schafer, "Discrete-Time Signal Processing", the chapter on
 * quantization effects in IIR structures, from memory; L. B. Jackson, Bell Syst. Tech. J. 49(2), 1970).
 *
 * In this engine's kernel (kernel.ts) a product is exact and every addition is held in the accumulator, so
 * a section rounds exactly once: where its accumulator is shifted back to the data word. The rounded output
 * is what the section feeds back, in direct form I and transposed direct form II alike, so the error of
 * section k reaches the output through 1/A_k(z) · H_{k+1}(z) ⋯ H_N(z) in both structures.
 *
 * The step is one data LSB, q = 2^−(D−1). The classic model's variance q²/12 is for a continuous input; here
 * the accumulator holds F more fraction bits, so the error takes 2^F equally likely values and has variance
 * q²(1 − 2^−2F)/12 and a mean of q/2^(F+1) ('nearest', ties up) or −q(1 − 2^−F)/2 ('truncate'). The means
 * add coherently at the output through each path's DC gain; they are part of the noise power reported.
 */
import type { Section } from '../types.ts';
import { largestPoleRadius, normLength } from '../sections/index.ts';
import type { Implementation } from './implementation.ts';
import { meanSquareDbfs } from './run.ts';

/** The noise one section's rounding puts at the cascade output. */
export interface SectionNoise {
  /** Σ g[n]² of the path from this rounding to the output (dimensionless). */
  noiseGain: number;
  /** G(1), the path's gain at DC, through which the rounding's mean passes. */
  dcGain: number;
  /** Mean-square contribution at the output, value units (full scale 1). */
  power: number;
  /** The same in dB re a full-scale sine. */
  powerDbfs: number;
}

/** Predicted output round-off noise of an implementation. */
export interface RoundoffNoise {
  /** One data LSB as a value, 2^−(D−1). */
  lsb: number;
  /** Fraction bits dropped at each rounding (the post-shift F); 0 means no rounding at all. */
  droppedBits: number;
  /** Variance and mean of one rounding's error, value units. */
  variance: number;
  mean: number;
  /** Per section, in cascade order. */
  sections: SectionNoise[];
  /** Total mean-square noise at the output (variances add; means add coherently), value units. */
  power: number;
  /** Total noise in dB re a full-scale sine. */
  powerDbfs: number;
  /** Its standard deviation in output LSBs. */
  rmsLsb: number;
  /** DC offset the means leave at the output, in LSBs. */
  offsetLsb: number;
  /** Peak gain of the scaled cascade, max |H(e^{iω})|/G: the largest output amplitude of a full-scale input sine. */
  peakGain: number;
  /**
   * Signal-to-noise ratio, dB, of the loudest sine the cascade delivers without overflow: a full-scale input
   * sine at the frequency of peak gain, its output amplitude min(1, peakGain). Comparable across scalings,
   * which trade the signal's level inside the cascade against the noise.
   */
  snrDb: number;
  /** (SNR − 1.76 dB) / 6.02 dB: the bits of an ideal quantizer with the same SNR (common practice). */
  effectiveBits: number;
  /** False when a path's impulse response could not be summed to convergence (poles on or near the circle). */
  converged: boolean;
}

/** Variance and mean of the error of one shift by `dropped` bits to a step q, by the rounding rule. */
export function roundingError(
  q: number,
  dropped: number,
  rounding: Implementation['settings']['rounding'],
): { variance: number; mean: number } {
  if (dropped <= 0) return { variance: 0, mean: 0 };
  const m = 2 ** -dropped;
  const variance = ((q * q) / 12) * (1 - m * m);
  return { variance, mean: rounding === 'nearest' ? (q * m) / 2 : (-q * (1 - m)) / 2 };
}

/** Σ h[n]² of the impulse response of the sections in cascade, summed over `samples` samples. */
function energy(sections: readonly Section[], samples: number): number {
  const h = new Float64Array(samples);
  h[0] = 1;
  for (const [b0, b1, b2, , a1, a2] of sections) {
    let z0 = 0;
    let z1 = 0;
    for (let n = 0; n < samples; n++) {
      const x = h[n]!;
      const y = b0 * x + z0;
      z0 = b1 * x - a1 * y + z1;
      z1 = b2 * x - a2 * y;
      h[n] = y;
    }
  }
  let e = 0;
  for (let n = 0; n < samples; n++) e += h[n]! * h[n]!;
  return e;
}

/** Gain at z = 1 of the sections in cascade (Infinity when a pole sits at z = 1). */
function dcGainOf(sections: readonly Section[]): number {
  let g = 1;
  for (const [b0, b1, b2, a0, a1, a2] of sections) g *= (b0 + b1 + b2) / (a0 + a1 + a2);
  return Number.isNaN(g) ? Infinity : g;
}

/** The round-off noise the implementation's arithmetic adds at its output (the cascade's output, H/G). */
export function roundoffNoise(impl: Implementation): RoundoffNoise {
  const q = 2 ** -(impl.settings.dataWordLength - 1);
  const dropped = impl.postShift;
  const { variance, mean } = roundingError(q, dropped, impl.settings.rounding);
  const quantized = impl.quantized.sections;
  let converged = true;
  const sections = quantized.map((s, k): SectionNoise => {
    const path: Section[] = [[1, 0, 0, 1, s[4], s[5]], ...quantized.slice(k + 1)];
    const radius = largestPoleRadius(path);
    const length = normLength(radius);
    if (!length.converged) converged = false;
    const noiseGain = radius >= 1 ? Infinity : energy(path, length.samples);
    const dcGain = dcGainOf(path);
    const power = (variance ? variance * noiseGain : 0) + (mean ? (mean * dcGain) ** 2 : 0);
    return { noiseGain, dcGain, power, powerDbfs: meanSquareDbfs(power) };
  });
  const offset = mean ? mean * sections.reduce((sum, s) => sum + s.dcGain, 0) : 0;
  const spread = variance ? variance * sections.reduce((sum, s) => sum + s.noiseGain, 0) : 0;
  const power = spread + offset * offset;
  const last = impl.cascade.sections.at(-1);
  const peakGain = last ? 10 ** (last.cascadePeakDb / 20) : 1;
  const signal = 0.5 * Math.min(1, peakGain) ** 2;
  const snrDb = power > 0 ? 10 * Math.log10(signal / power) : Infinity;
  return {
    lsb: q,
    droppedBits: dropped,
    variance,
    mean,
    sections,
    power,
    powerDbfs: meanSquareDbfs(power),
    rmsLsb: Math.sqrt(power) / q,
    offsetLsb: offset / q,
    peakGain,
    snrDb,
    effectiveBits: (snrDb - 1.76) / 6.02,
    converged,
  };
}

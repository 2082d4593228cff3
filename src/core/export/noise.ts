/** The predicted round-off noise of an export, in words (C and CSV comments) and as a JSON object. */
import { roundoffNoise, type Implementation, type RoundoffNoise } from '../fixed/index.ts';

const db = (x: number) => (Number.isFinite(x) ? x.toFixed(1) : x > 0 ? 'inf' : '-inf');

/** The model the figures come from, in one sentence. */
export const NOISE_MODEL =
  'additive noise model: each section rounds once, from the accumulator to the data word, adding an error ' +
  'uniform over one data LSB q, white and independent of the signal, of variance q^2(1-2^-2F)/12 for F ' +
  'dropped bits; it reaches the output through 1/A_k(z) and the sections after k';

/** Sentences stating the predicted output round-off noise (comment lines of the C and CSV exports). */
export function noiseLines(impl: Implementation, noise: RoundoffNoise = roundoffNoise(impl)): string[] {
  if (noise.droppedBits === 0)
    return ['round-off noise: none - the post-shift is 0 bits, so no result is ever rounded'];
  const perSection = noise.sections.map((s) => db(s.powerDbfs)).join(', ');
  return [
    `round-off noise, predicted by the ${NOISE_MODEL}:`,
    `  total ${db(noise.powerDbfs)} dBFS at the cascade output (dB re a full-scale sine), ${noise.rmsLsb.toPrecision(3)} LSB rms` +
      `${Math.abs(noise.offsetLsb) >= 0.005 ? `, DC offset ${noise.offsetLsb.toPrecision(3)} LSB` : ''}`,
    `  SNR ${db(noise.snrDb)} dB for a full-scale input sine at the peak gain (output amplitude ${Math.min(1, noise.peakGain).toPrecision(3)}), ${noise.effectiveBits.toFixed(1)} effective bits` +
      `${noise.converged ? '' : ' (a path did not decay: poles on or very near the unit circle; a lower bound)'}`,
    `  per section, in cascade order: ${perSection} dBFS`,
  ];
}

type Float = { float: number };
const f = (x: number): Float => ({ float: x });

/** The noise figures as the JSON export writes them (floats marked for 17-digit printing). */
export function noiseJson(impl: Implementation, noise: RoundoffNoise = roundoffNoise(impl)) {
  return {
    model: NOISE_MODEL,
    droppedBits: noise.droppedBits,
    lsb: f(noise.lsb),
    perRounding: { variance: f(noise.variance), mean: f(noise.mean) },
    sections: noise.sections.map((s) => ({
      noiseGain: f(s.noiseGain),
      dcGain: f(s.dcGain),
      powerDbfs: f(s.powerDbfs),
    })),
    powerDbfs: f(noise.powerDbfs),
    rmsLsb: f(noise.rmsLsb),
    offsetLsb: f(noise.offsetLsb),
    peakGain: f(noise.peakGain),
    snrFullScaleSineDb: f(noise.snrDb),
    effectiveBits: f(noise.effectiveBits),
    converged: noise.converged,
  };
}

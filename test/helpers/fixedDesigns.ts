/** Designs and inputs the fixed-point tests share: hum notches, an elliptic low-pass, a band-pass, overflowing resonators. */
import { designIir } from '../../src/core/design/index.ts';
import { makeSine, makeWhiteNoise } from '../../src/core/time/inputs.ts';
import type { Zpk } from '../../src/core/types.ts';

/** Notches at 50, 150, 250 Hz (fs 2 kHz) with poles 4 Hz wide: the hopper-scale demo. */
export const hum: Zpk = (() => {
  const fs = 2000;
  const pair = (f: number, r: number) => ({
    re: r * Math.cos((2 * Math.PI * f) / fs),
    im: r * Math.sin((2 * Math.PI * f) / fs),
    multiplicity: 1,
  });
  const r = 1 - (4 * Math.PI) / fs;
  return {
    zeros: [50, 150, 250].map((f) => pair(f, 1)),
    poles: [50, 150, 250].map((f) => pair(f, r)),
    gain: 0.97,
  };
})();

/** 5th-order elliptic low-pass at 120 Hz, fs 1 kHz, 0.5 dB ripple, 60 dB down. */
export const ellip = designIir({
  family: 'elliptic',
  response: 'lowpass',
  order: 5,
  edgesHz: [120],
  fs: 1000,
  rippleDb: 0.5,
  attenuationDb: 60,
});

/** 2nd-order Butterworth band-pass 300–500 Hz at fs 8 kHz (4 poles). */
export const butterBand = designIir({
  family: 'butterworth',
  response: 'bandpass',
  order: 2,
  edgesHz: [300, 500],
  fs: 8000,
});

/** A resonator with gain above 1: unscaled it overflows on loud inputs. */
export const hot: Zpk = {
  zeros: [{ re: -1, im: 0, multiplicity: 2 }],
  poles: [{ re: 0.7, im: 0.6, multiplicity: 1 }],
  gain: 1.5,
};

/** b1 = 3.9 needs Q2.29 in 32 bits; with ±full-scale data the five products pass 2^63 in the accumulator. */
export const hot64: Zpk = { ...hot, gain: 1.95 };

/** Noise near full scale, a loud sine, and full-scale steps: inputs that push the overflow rules (n divisible by 8). */
export function overflowInputs(n: number): Float64Array {
  const x = new Float64Array(n);
  x.set(
    makeWhiteNoise(n / 2, 7, 0.6).map((v) => Math.max(-1.2, Math.min(1.2, v))),
    0,
  );
  x.set(
    makeSine(0.3, n / 4).map((v) => 0.98 * v),
    n / 2,
  );
  x.fill(-1, (3 * n) / 4, (7 * n) / 8);
  x.fill(0.999, (7 * n) / 8);
  return x;
}

/** FIR designs shared by the fixed-point and export tests: taps of our own scenarios, designed by the engine. */
import { runDesigner, type DesignerSpec } from '../../src/core/design/index.ts';
import { zpkToTf } from '../../src/core/system/transferFunction.ts';
import { mulberry32 } from '../../src/core/random.ts';

function tapsOf(spec: Record<string, unknown>): number[] {
  const r = runDesigner(spec as unknown as DesignerSpec);
  if (!r.ok) throw new Error(r.error.message);
  return zpkToTf(r.value.zpk).b;
}

/** Load-cell smoothing: equiripple low-pass, pass to 100 Hz, stop from 150 Hz at 1 kHz, order 40 (41 taps, symmetric). */
export const lowpass41 = tapsOf({
  kind: 'iir',
  fs: 1000,
  response: 'lowpass',
  passbandHz: [100],
  stopbandHz: [150],
  rippleDb: 1,
  attenuationDb: 60,
  family: 'equiripple',
  order: 40,
});

/** The same requirement at order 41: 42 taps, symmetric, no middle tap. */
export const lowpass42 = tapsOf({
  kind: 'iir',
  fs: 1000,
  response: 'lowpass',
  passbandHz: [100],
  stopbandHz: [150],
  rippleDb: 1,
  attenuationDb: 60,
  family: 'equiripple',
  order: 41,
});

/**
 * Vibration channel at 48 kHz: equiripple low-pass of order 128 (129 taps), pass to 4 kHz within 1 dB, 60 dB
 * down from 5 kHz (the drag benchmark's FIR).
 */
export const lowpass129 = tapsOf({
  kind: 'iir',
  fs: 48000,
  response: 'lowpass',
  passbandHz: [4000],
  stopbandHz: [5000],
  rippleDb: 1,
  attenuationDb: 60,
  family: 'equiripple',
  order: 128,
});

/** Rate of a pressure reading: an equiripple differentiator of order 20 up to 200 Hz (antisymmetric taps). */
export const differentiator21 = tapsOf({ kind: 'differentiator', fs: 1000, order: 20, upToHz: 200 });

/** Taps with no symmetry (a decaying random response): the direct form only. */
export const lopsided16 = (() => {
  const rand = mulberry32(77);
  return Array.from({ length: 16 }, (_, k) => (rand() - 0.5) * 0.6 * 0.8 ** k);
})();

/**
 * Anti-alias low-pass at 8 kHz as a designer description: equiripple, flat to 1 kHz within ±0.5 dB, 60 dB down
 * from 1.4 kHz, least order. Its implied mask is two-sided; 8-bit taps cannot hold its stop band.
 */
export const EQUIRIPPLE_LOWPASS_8K = {
  kind: 'iir',
  family: 'equiripple',
  response: 'lowpass',
  order: 'auto',
  passbandHz: [1000],
  stopbandHz: [1400],
  rippleDb: 0.5,
  attenuationDb: 60,
  fs: 8000,
} as unknown as DesignerSpec;

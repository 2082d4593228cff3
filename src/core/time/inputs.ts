/**
 * Test input signals for time responses, as Float64Arrays of n samples starting at sample index 0.
 * The noise source is deterministic: the same seed always gives the same samples on every platform.
 */
import { mulberry32 } from '../random.ts';
import type { RadPerSample } from '../units.ts';

/** Unit impulse δ[k] for k = 0..n-1 (1 at k = 0, zero elsewhere). */
export function makeImpulse(n: number): Float64Array {
  const x = new Float64Array(n);
  if (n > 0) x[0] = 1;
  return x;
}

/** Unit step u[k] for k = 0..n-1 (all ones). */
export function makeStep(n: number): Float64Array {
  return new Float64Array(n).fill(1);
}

/** Cosine cos(omega·k + phase) for k = 0..n-1; omega in radians per sample, phase in radians. */
export function makeSine(omega: RadPerSample, n: number, phase = 0): Float64Array {
  const x = new Float64Array(n);
  // Direct evaluation per sample rather than a recurrence, so long signals do not drift.
  for (let k = 0; k < n; k++) x[k] = Math.cos(omega * k + phase);
  return x;
}

/**
 * Gaussian white noise with standard deviation std (default 1), deterministic in the 32-bit seed:
 * uniform numbers from mulberry32 (T. Ettinger, public domain), mapped to normal ones by the Box–Muller
 * transform (Box & Muller 1958), both outputs of each pair used.
 */
export function makeWhiteNoise(n: number, seed: number, std = 1): Float64Array {
  const next = mulberry32(seed);
  const x = new Float64Array(n);
  for (let k = 0; k < n; k += 2) {
    // 1 - u keeps the logarithm's argument in (0, 1].
    const radius = std * Math.sqrt(-2 * Math.log(1 - next()));
    const angle = 2 * Math.PI * next();
    x[k] = radius * Math.cos(angle);
    if (k + 1 < n) x[k + 1] = radius * Math.sin(angle);
  }
  return x;
}

/**
 * Frequencies in hertz and in radians per sample, kept apart by the compiler. Both are plain numbers that
 * carry an optional unit tag: a bare number (a literal, an array element) is accepted as either, but a value
 * one function returns as Hertz cannot be passed where RadPerSample is asked for, or the other way round.
 * Every conversion between the two goes through hzToOmega and omegaToHz.
 */

/** Radians per sample (normalised angular frequency, π = Nyquist). */
export type RadPerSample = number & { readonly __unit?: 'rad/sample' };
/** Hertz at a sample rate. */
export type Hertz = number & { readonly __unit?: 'Hz' };

/** Hertz at sample rate fs as radians per sample: 2π·f/fs. */
export function hzToOmega(f: Hertz, fs: Hertz): RadPerSample {
  return (2 * Math.PI * f) / fs;
}

/**
 * Radians per sample as hertz at sample rate fs: ω/(2π)·fs. The angle is divided first, so ω = π reads
 * exactly fs/2 (π/(2π) is exactly one half).
 */
export function omegaToHz(omega: RadPerSample, fs: Hertz): Hertz {
  return (omega / (2 * Math.PI)) * fs;
}

/** A grid of frequencies in radians per sample as hertz at sample rate fs. */
export function omegaGridToHz(omega: ArrayLike<number>, fs: Hertz): Float64Array {
  const out = new Float64Array(omega.length);
  for (let i = 0; i < omega.length; i++) out[i] = omegaToHz(omega[i]!, fs);
  return out;
}

/** A grid of frequencies in hertz at sample rate fs as radians per sample, written into `out`. */
export function hzGridToOmega(
  hz: ArrayLike<number>,
  fs: Hertz,
  out: Float64Array = new Float64Array(hz.length),
): Float64Array {
  for (let i = 0; i < hz.length; i++) out[i] = hzToOmega(hz[i]!, fs);
  return out;
}

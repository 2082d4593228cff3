/**
 * First guesses of the order an FIR design needs for a requirement; runFir.ts then designs from the guess
 * and steps to the least order that meets the requirement. Ripples here are the pass band's deviation δp
 * (1 − δp = the loss allowed) and the stop band's δs (its attenuation), as amplitudes.
 */
import { kaiserTaps, WINDOW_FIGURES, type FirWindow } from './windows.ts';

/** δp of a pass-band loss of at most rippleDb: the amplitude may dip to 10^(−rippleDb/20). */
export function passDeviation(rippleDb: number): number {
  return 1 - 10 ** (-rippleDb / 20);
}

/** δs of a stop band attenuated by attenuationDb. */
export function stopDeviation(attenuationDb: number): number {
  return 10 ** (-attenuationDb / 20);
}

/**
 * The attenuation (dB) a window design must reach: the window method's pass-band and stop-band ripples are
 * about equal, so the smaller of δp and δs sets it.
 */
export function windowAttenuationDb(rippleDb: number, attenuationDb: number): number {
  return -20 * Math.log10(Math.min(passDeviation(rippleDb), stopDeviation(attenuationDb)));
}

/**
 * Orders (taps − 1) of the first guess for each method, with `transition` the narrowest transition band in
 * cycles per sample:
 * - Kaiser window: Kaiser's formula (windows.ts);
 * - Hann, Hamming, Blackman: taps ≈ width / Δf (WINDOW_FIGURES, common practice);
 * - equiripple and least squares: Kaiser's estimate for equiripple designs (from memory),
 *   N − 1 ≈ (−20·log10 √(δp·δs) − 13) / (14.6·Δf).
 */
export function firOrderGuess(
  method: FirWindow | 'equiripple' | 'leastsquares',
  transition: number,
  rippleDb: number,
  attenuationDb: number,
): number {
  if (method === 'kaiser')
    return kaiserTaps(windowAttenuationDb(rippleDb, attenuationDb), 2 * Math.PI * transition) - 1;
  if (method === 'equiripple' || method === 'leastsquares') {
    const dp = passDeviation(rippleDb);
    const ds = stopDeviation(attenuationDb);
    return Math.max(1, Math.ceil((-20 * Math.log10(Math.sqrt(dp * ds)) - 13) / (14.6 * transition)));
  }
  return Math.max(1, Math.ceil(WINDOW_FIGURES[method].width / transition) - 1);
}

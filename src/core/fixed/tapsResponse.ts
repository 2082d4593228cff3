/** The response of FIR taps at one frequency, by Horner's rule: the evaluation scipy.signal.freqz makes. */

/**
 * |H(e^jω)|² of H(z) = Σ c[k] z^−k at ω (rad/sample): Horner's rule in e^(−jω) from the last tap, one cosine
 * and one sine per frequency (a sum of c[k]·cos(ωk) would take two per tap), within about 2L·ε·Σ|c[k]| of
 * the exact sum for |H|.
 */
export function tapsMagnitudeSquaredAt(taps: readonly number[], omega: number): number {
  const xr = Math.cos(omega);
  const xi = -Math.sin(omega);
  let re = 0;
  let im = 0;
  for (let k = taps.length - 1; k >= 0; k--) {
    const t = re * xr - im * xi + taps[k]!;
    im = re * xi + im * xr;
    re = t;
  }
  return re * re + im * im;
}

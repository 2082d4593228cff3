/**
 * The response of coefficient lists in powers of z^-1 (FIR taps, or the b and a of H(z) = B/A) at one
 * frequency, by Horner's rule in e^(−jω): the evaluation scipy.signal.freqz makes, one cosine and one sine
 * per frequency (a sum of c[k]·cos(ωk) would take two per coefficient), within about 2L·ε·Σ|c[k]| of the
 * exact sum.
 */

/** Σ c[k]·e^(−jωk) at ω (rad/sample), into out as [re, im]. */
export function coefficientsAt(c: ArrayLike<number>, omega: number, out: Float64Array): void {
  const xr = Math.cos(omega);
  const xi = -Math.sin(omega);
  let re = 0;
  let im = 0;
  for (let k = c.length - 1; k >= 0; k--) {
    const t = re * xr - im * xi + c[k]!;
    im = re * xi + im * xr;
    re = t;
  }
  out[0] = re;
  out[1] = im;
}

const at = new Float64Array(2);

/** |H(e^jω)|² of H(z) = Σ c[k] z^−k at ω (rad/sample). */
export function tapsMagnitudeSquaredAt(taps: readonly number[], omega: number): number {
  coefficientsAt(taps, omega, at);
  return at[0]! * at[0]! + at[1]! * at[1]!;
}

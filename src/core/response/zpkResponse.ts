/** Frequency response of a zeros/poles/gain system, evaluated from the product form. */
import type { Zpk } from '../types.ts';
import { accumulateRoot, finishPhase, kernelState } from './kernel.ts';

/** Complex response and its read-outs at each frequency of `omega` (radians per sample). */
export interface FrequencyResponse {
  /** Frequencies, radians per sample. */
  omega: Float64Array;
  /** Real part of H(e^{iω}). */
  re: Float64Array;
  /** Imaginary part of H(e^{iω}). */
  im: Float64Array;
  /** |H|, linear. */
  magnitude: Float64Array;
  /** 20·log10|H|; −Infinity exactly at a zero on the circle. */
  magnitudeDb: Float64Array;
  /** Phase in radians, wrapped to (−π, π]. */
  phase: Float64Array;
  /** Continuous phase in radians: the analytic sum of per-root phases, on the branch that puts ω = 0 in (−π, π]. */
  phaseUnwrapped: Float64Array;
  /** Group delay in samples, −dφ/dω, summed analytically per root. */
  groupDelay: Float64Array;
}

const TWO_PI = 2 * Math.PI;

/** Shifts x by a multiple of 2π into (−π, π]. */
export function wrapPhase(x: number): number {
  return x - TWO_PI * Math.ceil((x - Math.PI) / TWO_PI);
}

function accumulate(zpk: Zpk, omega: ArrayLike<number>) {
  const st = kernelState(omega);
  let offset = zpk.gain < 0 ? Math.PI : 0;
  for (const z of zpk.zeros) offset += accumulateRoot(st, omega, z, 1);
  for (const p of zpk.poles) offset += accumulateRoot(st, omega, p, -1);
  finishPhase(st);
  return { st, offset };
}

/** H(e^{iω}) = k·Π(e^{iω} − zᵢ)/Π(e^{iω} − pᵢ) at each ω (radians per sample), with phase and group delay. */
export function responseZpk(zpk: Zpk, omega: Float64Array): FrequencyResponse {
  const { st, offset } = accumulate(zpk, omega);
  const atZero = accumulate(zpk, [0]);
  const phase0 = atZero.st.phase[0]! + atZero.offset;
  const shift = offset + wrapPhase(phase0) - phase0;
  const n = omega.length;
  const k = Math.abs(zpk.gain);
  const out: FrequencyResponse = {
    omega,
    re: new Float64Array(n),
    im: new Float64Array(n),
    magnitude: st.magnitude,
    magnitudeDb: new Float64Array(n),
    phase: new Float64Array(n),
    phaseUnwrapped: st.phase,
    groupDelay: st.groupDelay,
  };
  for (let i = 0; i < n; i++) {
    const mag = st.magnitude[i]! * k;
    const ph = st.phase[i]! + shift;
    st.magnitude[i] = mag;
    st.phase[i] = ph;
    out.magnitudeDb[i] = 20 * Math.log10(mag);
    out.phase[i] = wrapPhase(ph);
    out.re[i] = mag * Math.cos(ph);
    out.im[i] = mag * Math.sin(ph);
  }
  return out;
}

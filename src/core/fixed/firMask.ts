/**
 * The requirement mask judged on an FIR's quantized taps (code / 2^F): what the target runs, read from the
 * taps' own response, not from sections. The page's quantized chip and the export warnings both use it.
 */
import { evaluateMaskOn, functionSource, type MaskResult, type RequirementMask } from '../mask/index.ts';
import type { FirImplementation } from './fir.ts';

/** |H| in dB of the quantized taps at a frequency in Hz: the direct sum over the taps. */
export function quantizedTapsDb(impl: FirImplementation): (hz: number) => number {
  const scale = 2 ** -impl.format.fractionBits;
  const c = impl.codes.map((k) => k * scale);
  return (hz) => {
    const w = (2 * Math.PI * hz) / impl.sampleRate;
    let re = 0;
    let im = 0;
    for (let k = 0; k < c.length; k++) {
      re += c[k]! * Math.cos(w * k);
      im -= c[k]! * Math.sin(w * k);
    }
    return 10 * Math.log10(re * re + im * im);
  };
}

/** The mask judged on the quantized taps, or null without a mask (or one with no regions). */
export function firMaskResult(impl: FirImplementation, mask: RequirementMask | undefined): MaskResult | null {
  if (!mask || mask.regions.length === 0) return null;
  return evaluateMaskOn(mask, functionSource(quantizedTapsDb(impl)), impl.sampleRate);
}

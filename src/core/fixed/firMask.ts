/**
 * The requirement mask judged on an FIR's quantized taps (code / 2^F): what the target runs, read from the
 * taps' own response, not from sections. The page's quantized chip and the export warnings both use it.
 */
import { evaluateMaskOn, functionSource, type MaskResult, type RequirementMask } from '../mask/index.ts';
import type { FirImplementation } from './fir.ts';
import { tapsMagnitudeSquaredAt } from '../response/coefficients.ts';

/** |H| in dB of the quantized taps at a frequency in Hz, by Horner's rule over the taps (core/response/coefficients.ts). */
export function quantizedTapsDb(impl: FirImplementation): (hz: number) => number {
  const scale = 2 ** -impl.format.fractionBits;
  const c = impl.codes.map((k) => k * scale);
  return (hz) => 10 * Math.log10(tapsMagnitudeSquaredAt(c, (2 * Math.PI * hz) / impl.sampleRate));
}

/** The mask judged on the quantized taps, or null without a mask (or one with no regions). */
export function firMaskResult(impl: FirImplementation, mask: RequirementMask | undefined): MaskResult | null {
  if (!mask || mask.regions.length === 0) return null;
  return evaluateMaskOn(mask, functionSource(quantizedTapsDb(impl)), impl.sampleRate);
}

/**
 * What an FIR export must warn about (the taps' counterpart of warnings.ts, with the same keys where the
 * meaning is the same): taps clamped to the word, an accumulator some input can overflow, and the quantized
 * taps failing the design's requirement mask. An FIR has no poles, so the stability keys never apply.
 */
import { qName } from '../fixed/index.ts';
import type { FirImplementation } from '../fixed/fir.ts';
import { evaluateMaskOn, functionSource, type RequirementMask } from '../mask/index.ts';
import { maskFailureWarning, type ExportWarning } from './warnings.ts';

/** |H| in dB of the quantized taps (code / 2^F) at hz, sample rate fs: the direct sum over the taps. */
function quantizedTapsDb(impl: FirImplementation): (hz: number) => number {
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

/** The warnings of an FIR implementation; empty when none apply. */
export function firExportWarnings(impl: FirImplementation, mask?: RequirementMask): ExportWarning[] {
  const out: ExportWarning[] = [];
  const q = qName(impl.format);
  const bits = impl.settings.wordLength;
  if (impl.saturatedTaps)
    out.push({
      key: 'coefficients-clamped',
      where: 'taps',
      message: `the largest tap does not fit ${bits} bits even in ${q} and was clamped: the filter is not the designed one`,
    });
  if (!impl.accumulatorSafe)
    out.push({
      key: 'accumulator-can-overflow',
      where: 'accumulator',
      message: `the ${impl.settings.accumulatorBits}-bit accumulator can overflow for some full-scale input; ${impl.accumulatorNeeded} bits hold any input`,
    });
  if (mask && mask.regions.length > 0) {
    const v = evaluateMaskOn(mask, functionSource(quantizedTapsDb(impl)), impl.sampleRate);
    const w = maskFailureWarning(v, `${bits}-bit ${q}`);
    if (w) out.push(w);
  }
  return out;
}

/**
 * What an FIR export must warn about (the taps' counterpart of warnings.ts, with the same keys where the
 * meaning is the same): taps clamped to the word, an accumulator some input can overflow, and the quantized
 * taps failing the design's requirement mask. An FIR has no poles, so the stability keys never apply.
 */
import { qName } from '../fixed/index.ts';
import type { FirImplementation } from '../fixed/fir.ts';
import type { RequirementMask } from '../mask/index.ts';
import { firMaskResult } from '../fixed/firMask.ts';
import { maskFailureWarning, type ExportWarning } from './warnings.ts';

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
  const v = firMaskResult(impl, mask);
  const w = v && maskFailureWarning(v, `${bits}-bit ${q}`);
  if (w) out.push(w);
  return out;
}

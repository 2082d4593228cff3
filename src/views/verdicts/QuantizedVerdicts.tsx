/**
 * The verdicts of the quantized implementation in force, as prominent as the ideal filter's and drawn the
 * same way: the requirement mask chip (beside the ideal one) and the stability banner (below it).
 */
import { qName } from '../../core/fixed/index.ts';
import type { WorkbenchState } from '../../store/store.ts';
import {
  selectImplementation,
  selectQuantizedMaskResult,
  selectRunsAsTaps,
} from '../../store/implementationDerived.ts';
import { selectFirImplementation, selectFirQuantizedMask } from '../../store/firDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { Chip } from '../frequency/mask/MaskChip.tsx';
import { Banner } from '../side/StabilityBanner.tsx';

/**
 * "16-bit Q1.14", or null when the settings do not apply to the design. An FIR runs as taps on the target
 * (store/firDerived.ts), so its format is the taps'.
 */
const formatOf = (s: WorkbenchState) => {
  if (selectRunsAsTaps(s)) {
    const f = selectFirImplementation(s);
    return f?.ok ? `${f.value.settings.wordLength}-bit ${qName(f.value.format)} taps` : null;
  }
  const r = selectImplementation(s);
  return r.ok ? `${r.value.settings.wordLength}-bit ${qName(r.value.quantized.format)}` : null;
};

export function QuantizedMaskChip() {
  const result = useWorkbench((s) =>
    selectRunsAsTaps(s) ? selectFirQuantizedMask(s) : selectQuantizedMaskResult(s),
  );
  const format = useWorkbench(formatOf);
  if (!result || !format) return null;
  return <Chip result={result} who={format} testId="mask-chip-quantized" compact />;
}

/** The quantized filter's stability; none for FIR taps (no feedback: quantized taps are always stable). */
export function QuantizedStability() {
  const hasPoles = useWorkbench((s) => s.design.poles.length > 0);
  const stability = useWorkbench((s) => {
    if (selectRunsAsTaps(s)) return null;
    const r = selectImplementation(s);
    return r.ok ? r.value.stability : null;
  });
  const format = useWorkbench(formatOf);
  if (!stability || !format) return null;
  return (
    <Banner s={stability} hasPoles={hasPoles} who={`Quantized ${format}`} testId="stability-quantized" />
  );
}

/**
 * The verdicts of the quantized implementation in force, as prominent as the ideal filter's and drawn the
 * same way: the requirement mask chip (beside the ideal one) and the stability banner (below it).
 */
import { qName } from '../../core/fixed/index.ts';
import type { WorkbenchState } from '../../store/store.ts';
import { selectImplementation, selectQuantizedMaskResult } from '../../store/implementationDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { Chip } from '../frequency/mask/MaskChip.tsx';
import { Banner } from '../side/StabilityBanner.tsx';

/** "16-bit Q1.14", or null when the settings do not apply to the design. */
const formatOf = (s: WorkbenchState) => {
  const r = selectImplementation(s);
  return r.ok ? `${r.value.settings.wordLength}-bit ${qName(r.value.quantized.format)}` : null;
};

export function QuantizedMaskChip() {
  const result = useWorkbench(selectQuantizedMaskResult);
  const format = useWorkbench(formatOf);
  if (!result || !format) return null;
  return <Chip result={result} who={format} testId="mask-chip-quantized" compact />;
}

export function QuantizedStability() {
  const hasPoles = useWorkbench((s) => s.design.poles.length > 0);
  const stability = useWorkbench((s) => {
    const r = selectImplementation(s);
    return r.ok ? r.value.stability : null;
  });
  const format = useWorkbench(formatOf);
  if (!stability || !format) return null;
  return (
    <Banner s={stability} hasPoles={hasPoles} who={`Quantized ${format}`} testId="stability-quantized" />
  );
}

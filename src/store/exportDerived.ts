/**
 * The export text of the implementation (C, JSON, CSV) and its warnings. Only the Target page shows them, so
 * they live apart from implementationDerived.ts, which the first view needs: the exporters load with the
 * Target page.
 */
import {
  exportC,
  exportCsv,
  exportFirC,
  exportFirCsv,
  exportFirJson,
  exportJson,
  exportWarnings,
  firExportWarnings,
  type ExportWarning,
} from '../core/export/index.ts';
import type { Implementation } from '../core/fixed/index.ts';
import type { RequirementMask } from '../core/mask/index.ts';
import type { FirImplementation } from '../core/fixed/fir.ts';
import { selectFirImplementation } from './firDerived.ts';
import { selectImplementation } from './implementationDerived.ts';
import { memoLast } from './memo.ts';
import type { WorkbenchState } from './store.ts';

/** The export formats the page offers. */
export type ExportFormat = 'c' | 'json' | 'csv';
const exportOf = memoLast(
  (impl: Implementation, format: ExportFormat, cName: string, mask: RequirementMask | undefined): string => {
    const m = mask ? { mask } : {};
    return format === 'c'
      ? exportC(impl, { name: cName, ...m })
      : format === 'json'
        ? exportJson(impl, m)
        : exportCsv(impl, m);
  },
);
const firExportOf = memoLast(
  (
    impl: FirImplementation,
    format: ExportFormat,
    cName: string,
    mask: RequirementMask | undefined,
  ): string => {
    const m = mask ? { mask } : {};
    return format === 'c'
      ? exportFirC(impl, { name: cName, ...m })
      : format === 'json'
        ? exportFirJson(impl, m)
        : exportFirCsv(impl, m);
  },
);
/**
 * The export text of the implementation in a format (C names prefixed by `cName`, a C identifier), or null
 * when the settings do not apply. The design's mask, failed by the quantized filter, is a warning in it.
 */
export function exportText(s: WorkbenchState, format: ExportFormat, cName: string): string | null {
  // an FIR design exports its taps (store/firDerived.ts)
  const fir = selectFirImplementation(s);
  if (fir) return fir.ok ? firExportOf(fir.value, format, cName, s.design.mask) : null;
  const r = selectImplementation(s);
  return r.ok ? exportOf(r.value, format, cName, s.design.mask) : null;
}

const warningsOf = memoLast((impl: Implementation | null, mask: RequirementMask | undefined) =>
  impl ? exportWarnings(impl, mask) : null,
);
/** What the exported files warn about (core/export/warnings.ts), or null when the settings do not apply. */
const firWarningsOf = memoLast((impl: FirImplementation, mask: RequirementMask | undefined) =>
  firExportWarnings(impl, mask),
);
export const selectExportWarnings = (s: WorkbenchState): ExportWarning[] | null => {
  const fir = selectFirImplementation(s);
  if (fir) return fir.ok ? firWarningsOf(fir.value, s.design.mask) : null;
  const r = selectImplementation(s);
  return warningsOf(r.ok ? r.value : null, s.design.mask);
};

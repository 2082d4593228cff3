/**
 * The export text of the implementation (C, JSON, CSV). Only the Target page shows it, so it lives apart
 * from implementationDerived.ts, which the first view needs: the exporters load with the Target page.
 */
import {
  exportC,
  exportCsv,
  exportFirC,
  exportFirCsv,
  exportFirJson,
  exportJson,
} from '../core/export/index.ts';
import type { Implementation } from '../core/fixed/index.ts';
import type { FirImplementation } from '../core/fixed/fir.ts';
import { selectFirImplementation } from './firDerived.ts';
import { selectImplementation } from './implementationDerived.ts';
import { memoLast } from './memo.ts';
import type { WorkbenchState } from './store.ts';

/** The export formats the page offers. */
export type ExportFormat = 'c' | 'json' | 'csv';
const exportOf = memoLast((impl: Implementation, format: ExportFormat, cName: string): string =>
  format === 'c' ? exportC(impl, { name: cName }) : format === 'json' ? exportJson(impl) : exportCsv(impl),
);
const firExportOf = memoLast((impl: FirImplementation, format: ExportFormat, cName: string): string =>
  format === 'c'
    ? exportFirC(impl, { name: cName })
    : format === 'json'
      ? exportFirJson(impl)
      : exportFirCsv(impl),
);
/**
 * The export text of the implementation in a format (C names prefixed by `cName`, a C identifier), or null
 * when the settings do not apply.
 */
export function exportText(s: WorkbenchState, format: ExportFormat, cName: string): string | null {
  // an FIR design exports its taps (store/firDerived.ts)
  const fir = selectFirImplementation(s);
  if (fir) return fir.ok ? firExportOf(fir.value, format, cName) : null;
  const r = selectImplementation(s);
  return r.ok ? exportOf(r.value, format, cName) : null;
}

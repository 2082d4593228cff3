/** Exports: C header, JSON or CSV of the sections, with their conventions, a preview, Copy and Download. */
import { useState } from 'react';
import type { FeedbackSign } from '../../../core/fixed/index.ts';
import { conventionLines, firConventionLines } from '../../../core/export/index.ts';
import { selectFirImplementation } from '../../../store/firDerived.ts';
import { exportText, selectExportWarnings, type ExportFormat } from '../../../store/exportDerived.ts';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { Segmented } from '../../chart/Segmented.tsx';
import { CopyButton } from '../../shared/CopyButton.tsx';
import { downloadText } from '../../shared/download.ts';
import { cPrefix, exportFileName } from '../../shared/fileName.ts';
import { patchSettings, useImplementation, useSettings, useSettled } from './useTarget.ts';

const FORMATS: Record<ExportFormat, { label: string; extension: string; mime: string; what: string }> = {
  c: {
    label: 'C header',
    extension: 'h',
    mime: 'text/x-c',
    what: 'coefficient arrays and C99 processing functions, in double and in fixed point',
  },
  json: {
    label: 'JSON',
    extension: 'json',
    mime: 'application/json',
    what: 'the sections as floats and as integer codes with their Q format',
  },
  csv: {
    label: 'CSV',
    extension: 'csv',
    mime: 'text/csv',
    what: 'one row per section, floats and codes; conventions as # lines',
  },
};

/** What each format holds for an FIR design. */
const FIR_WHAT: Record<ExportFormat, string> = {
  c: 'the taps as doubles and as codes, and C99 processing functions of the chosen form',
  json: 'the taps as floats and as integer codes with their Q format, form and accumulator',
  csv: 'one row per tap, value and code; conventions as # lines',
};

export function ExportPart() {
  const settings = useSettings();
  const impl = useImplementation();
  const name = useWorkbench((s) => s.design.name);
  const [format, setFormat] = useState<ExportFormat>('c');
  const prefix = cPrefix(name);
  const text = useSettled((s) => exportText(s, format, prefix));
  const warnings = useSettled(selectExportWarnings);
  const f = FORMATS[format];
  const fileName = exportFileName(name, f.extension);
  const fir = useSettled(selectFirImplementation);
  const conventions = fir ? (fir.ok ? firConventionLines(fir.value) : []) : impl ? conventionLines(impl) : [];
  return (
    <section className="pw-side-section" aria-labelledby="pw-export-h">
      <h2 id="pw-export-h">Export</h2>
      <Segmented
        label="Export format"
        value={format}
        options={(Object.keys(FORMATS) as ExportFormat[]).map((k) => ({ value: k, label: FORMATS[k].label }))}
        onChange={setFormat}
      />
      <p className="pw-hint pw-block">{fir ? FIR_WHAT[format] : f.what}.</p>
      {!fir && (
        <div className="pw-target-grid">
          <label htmlFor="pw-export-sign">Feedback sign</label>
          <select
            id="pw-export-sign"
            value={settings.feedbackSign}
            onChange={(e) => patchSettings({ feedbackSign: e.target.value as FeedbackSign })}
          >
            <option value="denominator">a1, a2 as in A(z), subtracted</option>
            <option value="negated">−a1, −a2, added</option>
          </select>
        </div>
      )}
      {text === null ? (
        <p className="pw-hint pw-block">Nothing to export: the settings above do not apply.</p>
      ) : (
        <>
          {warnings && warnings.length > 0 && (
            <div className="pw-export-warnings" role="alert" data-testid="export-warnings">
              <strong>
                {warnings.length} warning{warnings.length === 1 ? '' : 's'} written into the file
              </strong>
              <ul>
                {warnings.map((w, i) => (
                  <li key={i}>
                    <code>{w.key}</code> {w.where}: {w.message}
                  </li>
                ))}
              </ul>
            </div>
          )}
          <details className="pw-conventions">
            <summary>Conventions stated in the file</summary>
            <ul>
              {conventions.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          </details>
          <pre
            className="pw-export-preview"
            tabIndex={0}
            aria-label={`${f.label} preview`}
            data-testid="export-preview"
          >
            {text}
          </pre>
          <div className="pw-target-row">
            <CopyButton text={text} label={f.label} />
            <button
              type="button"
              aria-label={`Download ${fileName}`}
              onClick={() => downloadText(text, fileName, f.mime)}
            >
              Download
            </button>
            <span className="pw-hint pw-file-name">{fileName}</span>
          </div>
        </>
      )}
    </section>
  );
}

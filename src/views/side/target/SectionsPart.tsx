/** Sections and structure: ordering, scaling, structure, and the table of second-order sections. */
import { useState } from 'react';
import type { ImplementationSettings } from '../../../core/fixed/index.ts';
import { Segmented } from '../../chart/Segmented.tsx';
import { formatNumber } from '../../shared/format.ts';
import { SectionsTable } from './SectionsTable.tsx';
import { patchSettings, useImplementation, useSettings } from './useTarget.ts';

const ORDERINGS: { value: ImplementationSettings['ordering']; label: string }[] = [
  { value: 'ascending', label: 'Pole radius rising (sharpest last)' },
  { value: 'descending', label: 'Pole radius falling (sharpest first)' },
];

const SCALINGS: { value: ImplementationSettings['scaling']; label: string }[] = [
  { value: 'linf', label: 'Peak gain ≤ 1 (L∞): no sine overflows' },
  { value: 'l2', label: 'Energy gain ≤ 1 (L2): for noise-like input' },
  { value: 'l1', label: 'Σ|h| ≤ 1: no input can overflow' },
  { value: 'none', label: 'None: sections as they come' },
];

/** What each structure keeps per section, in one line; the exports use the structure chosen here. */
const STRUCTURE_WORDS: Record<ImplementationSettings['structure'], string> = {
  df1: 'Direct form I keeps x[n−1], x[n−2], y[n−1], y[n−2] per section as data words; one wide sum per sample.',
  df2t: 'Transposed direct form II keeps two accumulator-wide states per section; fewer delays, wider state.',
};

export function SectionsPart() {
  const settings = useSettings();
  const impl = useImplementation();
  const [show, setShow] = useState<'float' | 'codes'>('float');
  const cascade = impl?.cascade ?? null;
  return (
    <section className="pw-side-section" aria-labelledby="pw-sections-h">
      <h2 id="pw-sections-h">Second-order sections</h2>
      <div className="pw-target-grid">
        <label htmlFor="pw-target-order">Order</label>
        <select
          id="pw-target-order"
          value={settings.ordering}
          onChange={(e) => patchSettings({ ordering: e.target.value as ImplementationSettings['ordering'] })}
        >
          {ORDERINGS.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        <label htmlFor="pw-target-scaling">Scaling</label>
        <select
          id="pw-target-scaling"
          value={settings.scaling}
          onChange={(e) => patchSettings({ scaling: e.target.value as ImplementationSettings['scaling'] })}
        >
          {SCALINGS.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        <span aria-hidden="true">Structure</span>
        <Segmented
          label="Structure"
          value={settings.structure}
          options={[
            { value: 'df1', label: 'Direct form I' },
            { value: 'df2t', label: 'Transposed DF II' },
          ]}
          onChange={(structure) => patchSettings({ structure })}
        />
      </div>
      <p className="pw-hint pw-block" data-testid="structure-note">
        {STRUCTURE_WORDS[settings.structure]} The C, JSON and CSV exports below are written for{' '}
        {settings.structure === 'df1' ? 'direct form I' : 'transposed direct form II'}.
      </p>
      {cascade && cascade.sections.length > 0 ? (
        <>
          <div className="pw-target-row pw-target-between">
            <span className="pw-hint">
              {cascade.sections.length} section{cascade.sections.length > 1 ? 's' : ''}, run top to bottom;
              output × G = {formatNumber(cascade.outputGain, 6)}
            </span>
            <Segmented
              label="Coefficients shown as"
              mini
              value={show}
              options={[
                { value: 'float', label: 'values' },
                { value: 'codes', label: 'codes', title: 'The integer codes stored on the target' },
              ]}
              onChange={setShow}
            />
          </div>
          <SectionsTable impl={impl!} show={show} />
          {cascade.notes.map((n) => (
            <p key={n} className="pw-target-note">
              {n}
            </p>
          ))}
        </>
      ) : (
        <p className="pw-hint pw-block">No poles or zeros: there is nothing to split into sections.</p>
      )}
    </section>
  );
}

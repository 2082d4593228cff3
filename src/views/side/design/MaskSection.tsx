/**
 * The requirement mask by number: one row per region (kind, range in Hz, limits in dB, its live verdict),
 * buttons to add regions, to build the mask from the designer's requirement, and to remove it.
 */
import { memo, useMemo, useState } from 'react';
import type { MaskRegion, MaskRegionKind, MaskRegionPatch } from '../../../core/mask/index.ts';
import { selectDesignerStatus, selectMaskResult } from '../../../store/derived.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { MaskCell } from './MaskCell.tsx';
import { maskVerdictText, regionVerdictText } from './maskText.ts';
import { maskFromDesigner } from '../../../core/mask/index.ts';
import { errorText } from './designErrors.ts';

const store = () => workbenchStore.getState();
const r3 = (v: number) => Number(v.toPrecision(3));

/** The patch that turns a region into another kind, giving it the limit that kind needs. */
function kindPatch(region: MaskRegion, kind: MaskRegionKind): MaskRegionPatch {
  if (kind === 'stop') return { kind, lowerDb: undefined, upperDb: region.upperDb ?? -40 };
  // A pass band is judged on both sides: a floor, and a ceiling above it (+1 dB unless one is set).
  if (kind === 'pass') {
    const lowerDb = region.lowerDb ?? -1;
    return { kind, lowerDb, upperDb: region.upperDb ?? Math.max(1, lowerDb + 1) };
  }
  return { kind };
}

/** The region's own verdict: the only part of a row that changes while a root is dragged. */
function RegionVerdict({ id }: { id: string }) {
  const verdict = useWorkbench((s) => selectMaskResult(s)?.regions.find((r) => r.id === id));
  if (!verdict) return null;
  return (
    <span
      className={verdict.pass ? 'pw-dz-ok' : 'pw-dz-bad'}
      data-testid={`mask-verdict-${id}`}
      data-pass={verdict.pass}
    >
      {verdict.pass ? '✓' : '✗'} {regionVerdictText(verdict)}
    </span>
  );
}

/** The region's fields; drawn again only when the region itself changes. */
const RegionFields = memo(function RegionFields({
  region,
  name,
  onError,
}: {
  region: MaskRegion;
  name: string;
  onError: (message: string | null) => void;
}) {
  const commit = (patch: MaskRegionPatch) => {
    const r = store().updateRegion(region.id, patch);
    return r.ok ? null : errorText(r.error);
  };
  const cell = (key: 'fromHz' | 'toHz' | 'lowerDb' | 'upperDb', what: string) => (
    <td>
      <MaskCell
        name={`${name} ${what}`}
        unit={key === 'fromHz' || key === 'toHz' ? 'Hz' : 'dB'}
        value={region[key]}
        optional={key === 'lowerDb' || key === 'upperDb'}
        onCommit={(v) => commit({ [key]: v })}
        onError={onError}
      />
    </td>
  );
  return (
    <>
      <td>
        <select
          aria-label={`${name} kind`}
          value={region.kind}
          onChange={(e) => onError(commit(kindPatch(region, e.target.value as MaskRegionKind)))}
        >
          <option value="pass">pass</option>
          <option value="stop">stop</option>
          <option value="band">band</option>
        </select>
      </td>
      {cell('fromHz', 'from (Hz)')}
      {cell('toHz', 'to (Hz)')}
      {cell('lowerDb', 'lower limit (dB)')}
      {cell('upperDb', 'upper limit (dB)')}
      <td>
        <button
          type="button"
          className="pw-dz-x"
          aria-label={`Delete ${name.toLowerCase()}`}
          title="Delete this region"
          onClick={() => store().deleteRegion(region.id)}
        >
          ×
        </button>
      </td>
    </>
  );
});

function RegionRow({ region, index }: { region: MaskRegion; index: number }) {
  const failing = useWorkbench(
    (s) => selectMaskResult(s)?.regions.find((r) => r.id === region.id)?.pass === false,
  );
  const [error, setError] = useState<string | null>(null);
  return (
    <>
      <tr
        className={failing ? 'pw-dz-fail' : undefined}
        data-testid={`mask-row-${region.id}`}
        title={region.label}
      >
        <RegionFields region={region} name={`Region ${index + 1}`} onError={setError} />
      </tr>
      <tr className={`pw-dz-verdict-row${failing ? ' pw-dz-fail' : ''}`}>
        <td colSpan={6}>
          <RegionVerdict id={region.id} />
          {error && (
            <span role="alert" className="pw-field-error pw-block">
              {error}
            </span>
          )}
        </td>
      </tr>
    </>
  );
}

/** The mask's overall verdict chip and sentence, live during a drag. */
function MaskHead({ hasRegions }: { hasRegions: boolean }) {
  const result = useWorkbench(selectMaskResult);
  return (
    <>
      <div className="pw-section-head">
        <h2 id="pw-dz-mask-h">Requirement mask</h2>
        {result && hasRegions && (
          <span
            className={`pw-dz-chip ${result.pass ? 'pw-dz-ok' : 'pw-dz-bad'}`}
            data-testid="mask-overall"
            data-pass={result.pass}
          >
            {result.pass ? 'passes' : 'fails'}
          </span>
        )}
      </div>
      {result && hasRegions ? (
        <p className="pw-dz-note">{maskVerdictText(result)}</p>
      ) : (
        <p className="pw-hint pw-dz-note">
          No mask. Add pass and stop regions (frequency range and limits in dB) and the response is judged
          live, also while you drag roots; drag a region's edges on the magnitude plot.
        </p>
      )}
    </>
  );
}

export function MaskSection() {
  const mask = useWorkbench((s) => s.design.mask);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const status = useWorkbench(selectDesignerStatus);
  const implied = useMemo(() => (status ? maskFromDesigner(status.spec) : null), [status]);
  const [error, setError] = useState<string | null>(null);
  const add = (kind: 'pass' | 'stop') => {
    const region =
      kind === 'pass'
        ? { kind, fromHz: 0, toHz: r3(0.05 * fs), lowerDb: -1, upperDb: 1 }
        : { kind, fromHz: r3(0.35 * fs), toHz: fs / 2, upperDb: -40 };
    const r = store().addRegion(region);
    setError(r.ok ? null : errorText(r.error));
  };
  const regions = mask?.regions ?? [];
  return (
    <section className="pw-side-section pw-dz" aria-labelledby="pw-dz-mask-h" data-testid="mask-section">
      <MaskHead hasRegions={regions.length > 0} />
      {regions.length > 0 && (
        <table className="pw-dz-mask">
          <colgroup>
            <col className="pw-dz-col-kind" />
            <col />
            <col />
            <col />
            <col />
            <col className="pw-dz-col-x" />
          </colgroup>
          <thead>
            <tr>
              <th>Kind</th>
              <th>From Hz</th>
              <th>To Hz</th>
              <th title="The response must stay above this">Lower dB</th>
              <th title="The response must stay below this">Upper dB</th>
              <th>
                <span className="pw-visually-hidden">Delete</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {regions.map((r, i) => (
              <RegionRow key={r.id} region={r} index={i} />
            ))}
          </tbody>
        </table>
      )}
      <div className="pw-dz-buttons pw-dz-actions">
        <button type="button" onClick={() => add('pass')}>
          Add pass region
        </button>
        <button type="button" onClick={() => add('stop')}>
          Add stop region
        </button>
        <button
          type="button"
          disabled={!implied}
          title={
            implied
              ? "Replace the mask by the one the designer's requirement implies"
              : 'Design a notch or a classical filter with a requirement first'
          }
          onClick={() => implied && store().setMask(implied)}
        >
          Mask from requirement
        </button>
        {mask && (
          <button type="button" onClick={() => store().setMask(null)}>
            Remove mask
          </button>
        )}
      </div>
      {error && (
        <p role="alert" className="pw-field-error">
          {error}
        </p>
      )}
    </section>
  );
}

/** One row of the root read-out table; clicking it (or Enter/Space on it) selects the root. */
import { memo } from 'react';
import { formatDb, formatHz, formatNumber, formatSeconds } from '../shared/format.ts';
import { describeRow, positionText, type RootRow as Row } from './rootRows.ts';

const dash = <span className="pw-na">—</span>;

interface Props {
  row: Row;
  selected: boolean;
  onSelect: (row: Row) => void;
}

export const RootRow = memo(function RootRow({ row, selected, onSelect }: Props) {
  const r = row.readout;
  const m = r.root.multiplicity;
  const pole = r.kind === 'pole';
  return (
    <tr
      className={selected ? 'pw-selected' : undefined}
      aria-selected={selected}
      tabIndex={0}
      title={describeRow(row)}
      onClick={() => onSelect(row)}
      onKeyDown={(e) => {
        if (e.key === 'Enter' || e.key === ' ') {
          e.preventDefault();
          onSelect(row);
        }
      }}
    >
      <th scope="row" className="pw-root-kind">
        <span className={pole ? 'pw-glyph-pole' : 'pw-glyph-zero'} aria-hidden="true">
          {pole ? '×' : '○'}
        </span>{' '}
        {r.kind}
        {m > 1 && <span className="pw-mult"> ×{m}</span>}
        <span className="pw-root-pos">
          <span className="pw-cell pw-cell-pos">{positionText(r.root.re, r.root.im)}</span>
        </span>
      </th>
      <td>
        <span className="pw-cell">{formatHz(r.frequencyHz)}</span>
      </td>
      <td>
        <span className="pw-cell">{formatNumber(r.radius, 5)}</span>
      </td>
      {pole ? (
        <>
          <td>
            <span className="pw-cell pw-cell-2">
              {r.q !== undefined ? formatNumber(r.q, 3) : dash}
              {r.bandwidthHz !== undefined && <span className="pw-sub">{formatHz(r.bandwidthHz, 3)}</span>}
            </span>
          </td>
          <td>
            <span className="pw-cell pw-cell-2">
              {r.timeConstantSeconds !== undefined ? (
                <>
                  {formatSeconds(r.timeConstantSeconds)}
                  <span className="pw-sub">{formatSeconds(r.decay40dBSeconds ?? NaN)}</span>
                </>
              ) : (
                <span className={r.radius > 1 ? 'pw-grows' : 'pw-sustained'}>
                  {r.radius > 1 ? 'grows' : 'no decay'}
                </span>
              )}
            </span>
          </td>
        </>
      ) : (
        <td
          colSpan={2}
          className="pw-notch"
          title={r.notchFrequencyHz !== undefined ? `Notch at ${formatHz(r.notchFrequencyHz)}` : undefined}
        >
          <span className="pw-cell pw-cell-notch">
            {r.notchDepthDb !== undefined ? <>notch {formatDb(r.notchDepthDb, 3)}</> : dash}
          </span>
        </td>
      )}
    </tr>
  );
});

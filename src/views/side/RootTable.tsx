/** Per-root read-outs: one row per stored root (a conjugate pair is one row); a row selects its root. */
import { useCallback, useMemo } from 'react';
import { selectReadouts } from '../../store/derived.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { RootRow } from './RootRow.tsx';
import { rootRows, sameRef, type RootRow as Row } from './rootRows.ts';

export function RootTable() {
  const readouts = useWorkbench(selectReadouts);
  const selection = useWorkbench((s) => s.selection);
  const rows = useMemo(() => rootRows(readouts), [readouts]);
  const onSelect = useCallback((row: Row) => {
    const { select, selection: current } = workbenchStore.getState();
    select(sameRef(current, row.ref) ? null : row.ref);
  }, []);
  return (
    <section className="pw-side-section" aria-labelledby="pw-roots-h">
      <h2 id="pw-roots-h">Roots, one by one</h2>
      {rows.length === 0 ? (
        <p className="pw-hint">No poles or zeros: H(z) is the gain alone.</p>
      ) : (
        <div className="pw-table-wrap">
          <table className="pw-root-table" data-testid="root-table" aria-labelledby="pw-roots-h">
            <colgroup>
              <col className="pw-col-root" />
              <col className="pw-col-f" />
              <col className="pw-col-r" />
              <col className="pw-col-q" />
              <col className="pw-col-tau" />
            </colgroup>
            <thead>
              <tr>
                <th scope="col">Root</th>
                <th scope="col" title="Frequency of the root's angle">
                  f
                </th>
                <th scope="col" title="Distance from the origin">
                  r
                </th>
                <th
                  scope="col"
                  title="Quality factor (frequency over −3 dB bandwidth), and below it the −3 dB bandwidth estimate (1 − r)·fs/π"
                >
                  Q / BW
                </th>
                <th scope="col" title="Time constant τ, and below it the time to fall by 40 dB">
                  τ / 40 dB
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map((row) => (
                <RootRow key={row.key} row={row} selected={sameRef(selection, row.ref)} onSelect={onSelect} />
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}

/**
 * Levels at chosen frequencies before and after the filter, with the change in dB, and the choice of
 * where to read: the design's notches (default, or 50 Hz harmonics when it has none), a mains series, or
 * frequencies typed by the user. The caption says how the levels were read (a least-squares fit of the
 * tones over the whole recording) and readings near the noise floor are marked.
 */
import { useId } from 'react';
import { selectLevelPlan, type LevelTableData } from '../../store/signalDerived.ts';
import { useLevelTable } from './useSpectra.ts';
import { LEVEL_FLOOR_MARGIN_DB, levelMethod } from '../../core/signal/index.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import type { LevelChoice } from '../../store/signal.ts';
import { formatDb, formatDbFigure, formatHz } from '../shared/format.ts';
import { readListField, type FieldReading } from '../shared/fieldReading.ts';
import { draftInputProps, useDraft } from '../shared/useDraft.ts';

/** A level's figure (the caller writes dB): 3 significant digits by the read-out rule of core/format.ts. */
function db(x: number): string {
  return formatDb(x, 3)
    .replace(/ dB$/, '')
    .replace(/ dB \(.*\)$/, '');
}

/** Whether a level is within LEVEL_FLOOR_MARGIN_DB of its noise floor. */
function nearFloor(level: number | null, floor: number | null): boolean {
  return level !== null && floor !== null && level - floor < LEVEL_FLOOR_MARGIN_DB;
}

/** Whether any reading of the table is near its noise floor. */
function anyNearFloor(table: LevelTableData): boolean {
  return (table.report?.readings ?? []).some(
    (r, i) =>
      nearFloor(r.beforeDb, table.floors[i]?.beforeDb ?? null) ||
      nearFloor(r.afterDb, table.floors[i]?.afterDb ?? null),
  );
}

/** A level, marked "~" when within LEVEL_FLOOR_MARGIN_DB of the noise floor there. */
function LevelCell({ level, floor }: { level: number | null; floor: number | null }) {
  if (level === null) return <td>—</td>;
  const near = nearFloor(level, floor);
  return (
    <td
      className={near ? 'pw-levels-floor' : undefined}
      title={
        near && floor !== null
          ? `Within ${LEVEL_FLOOR_MARGIN_DB} dB of the noise floor here (${db(floor)} dB for this record): the tone may be weaker than this reads.`
          : undefined
      }
    >
      {near ? '~' : ''}
      {db(level)}
    </td>
  );
}

/** A change of level with its sign to 0.1 dB ("+3.2", "−40.1", "0.0", never "−0.0"): core/format.ts's rule. */
function changeDb(x: number): string {
  const t = formatDbFigure(x, 1);
  return x > 0 && t !== '0.0' ? `+${t}` : t;
}

/** Reads "50, 150, 250" into frequencies in Hz (the list policy of typed numbers); a message when it is not such a list. */
export function readFrequencyList(text: string, nyquist: number): FieldReading<number[]> {
  return readListField(text, (x) =>
    x >= 0 && x <= nyquist ? null : `${formatHz(x)} is not a frequency from 0 to ${formatHz(nyquist)}.`,
  );
}

export function LevelTable() {
  const table = useLevelTable();
  const plan = useWorkbench(selectLevelPlan);
  const readings = table?.report?.readings ?? null;
  const choice = useWorkbench((s) => s.signal.levels);
  const nyquist = useWorkbench((s) => (s.signal.current?.sampleRate ?? 2) / 2);
  const id = useId();
  const shown = choice.kind === 'list' ? choice.frequenciesHz.join(', ') : '';
  const draft = useDraft(
    shown,
    (text) => readFrequencyList(text, nyquist),
    (frequenciesHz) => workbenchStore.getState().setLevelChoice({ kind: 'list', frequenciesHz }),
  );
  const error = draft.message;
  const set = (c: LevelChoice) => {
    workbenchStore.getState().setLevelChoice(c);
    draft.cancel();
  };
  return (
    <div className="pw-levels" data-testid="level-readout">
      <h3>
        Levels <span className="pw-levels-sub">at {plan?.reason ?? '—'}</span>
      </h3>
      <div className="pw-levels-choice" role="group" aria-label="Read levels at">
        <button type="button" aria-pressed={choice.kind === 'auto'} onClick={() => set({ kind: 'auto' })}>
          notches
        </button>
        <button
          type="button"
          aria-pressed={choice.kind === 'mains' && choice.fundamentalHz === 50}
          onClick={() => set({ kind: 'mains', fundamentalHz: 50 })}
        >
          50 Hz
        </button>
        <button
          type="button"
          aria-pressed={choice.kind === 'mains' && choice.fundamentalHz === 60}
          onClick={() => set({ kind: 'mains', fundamentalHz: 60 })}
        >
          60 Hz
        </button>
      </div>
      <label className="pw-levels-typed" htmlFor={id}>
        or at
        <input
          id={id}
          type="text"
          size={12}
          placeholder="e.g. 50, 150"
          {...draftInputProps(draft)}
          aria-invalid={error !== null}
          aria-describedby={error ? `${id}-err` : undefined}
        />
        Hz
      </label>
      {error ? (
        <p id={`${id}-err`} className="pw-field-error" role="alert">
          {error}
        </p>
      ) : null}
      {table?.error ? (
        <p className="pw-field-error" role="alert">
          {table.error}
        </p>
      ) : readings && readings.length > 0 ? (
        <table className="pw-levels-table">
          <thead>
            <tr>
              <th scope="col">f</th>
              <th scope="col" title="Where the tone was found and fitted, near the asked frequency">
                found at
              </th>
              <th scope="col">before</th>
              <th scope="col">after</th>
              <th scope="col">change</th>
            </tr>
          </thead>
          <tbody>
            {readings.map((c, i) => (
              <tr key={c.frequencyHz} data-hz={c.frequencyHz}>
                <th scope="row">{formatHz(c.frequencyHz)}</th>
                <td className="pw-levels-found" data-found-hz={c.fittedHz}>
                  {formatHz(c.fittedHz, 6)}
                </td>
                <LevelCell level={c.beforeDb} floor={table!.floors[i]?.beforeDb ?? null} />
                <LevelCell level={c.afterDb} floor={table!.floors[i]?.afterDb ?? null} />
                <td
                  className={c.changeDb !== null && c.changeDb < -0.05 ? 'pw-levels-down' : undefined}
                  data-change-db={c.changeDb ?? undefined}
                >
                  {c.changeDb === null ? '—' : changeDb(c.changeDb)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="pw-levels-note">
          {table
            ? 'No frequency to read below half the sample rate.'
            : 'Levels follow once they are read from the recording.'}
        </p>
      )}
      <p className="pw-levels-note" data-testid="level-method">
        dB re amplitude 1 (dBFS for audio). {table?.report ? `${levelMethod(table.report)}.` : ''}
        {table && anyNearFloor(table)
          ? ` ~ within ${LEVEL_FLOOR_MARGIN_DB} dB of the noise floor: may read high.`
          : ''}
        {table?.shaped
          ? ' While you drag: after = before + |H| at each frequency; measured again on release.'
          : ''}
      </p>
    </div>
  );
}

/**
 * The parts of a composed design: each designed part with its parameters, whether its roots were edited by
 * hand, and buttons to edit, re-run or remove it; the roots placed by hand as a part of their own. Every
 * button is one undo step.
 */
import { selectPartStatuses, type PartStatus } from '../../../store/partsDerived.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { describeDesigner } from './describe.ts';
import { removePartEdit, rerunPartEdit } from '../../../store/partEdits.ts';
import { FAMILY_OPTIONS } from '../../../core/design/index.ts';
import { postNotice } from '../../../store/notices.ts';

const familyLabel = (f: string) => FAMILY_OPTIONS.find((o) => o.value === f)?.label ?? f;

const rootWords = (p: PartStatus) =>
  `${p.zeros} zero${p.zeros === 1 ? '' : 's'}, ${p.poles} pole${p.poles === 1 ? '' : 's'} stored`;

export interface PartsSectionProps {
  /** Puts a designed part's parameters in the form, to change that part. */
  onEdit: (index: number) => void;
  /** The part being changed in the form, if any. */
  editing: number | null;
}

export function PartsSection({ onEdit, editing }: PartsSectionProps) {
  const parts = useWorkbench(selectPartStatuses);
  if (parts.length < 2) return null;
  const rerun = (i: number) => {
    const r = workbenchStore.getState().designerEdit(rerunPartEdit(i));
    if (!r.ok) postNotice('error', `Part ${i + 1} could not be re-run: ${r.error.message}.`);
  };
  return (
    <section className="pw-side-section pw-dz" aria-labelledby="pw-dz-parts-h" data-testid="design-parts">
      <h2 id="pw-dz-parts-h">Parts of the design</h2>
      <p className="pw-hint pw-dz-note">
        A cascade: the response is the product of the parts; the mask below judges the whole.
      </p>
      <ol className="pw-dz-parts">
        {parts.map((p) => {
          const words = p.designer ? describeDesigner(p.designer) : null;
          const name = words ? words.title : 'Placed by hand';
          return (
            <li
              key={p.index}
              className="pw-dz-part"
              data-testid="design-part"
              aria-current={editing === p.index ? 'true' : undefined}
            >
              <div className="pw-dz-part-head">
                <span className="pw-dz-part-title">
                  {p.index + 1}. {name}
                </span>
                {p.editedByHand && (
                  <span className="pw-dz-part-edited" title="Its roots differ from what its designer gives">
                    edited by hand
                  </span>
                )}
              </div>
              <p className="pw-dz-part-params">
                {words ? words.params.map(([k, v]) => `${k} ${v}`).join(' · ') : rootWords(p)}
              </p>
              {p.family && (
                <p className="pw-dz-part-params" data-testid="part-family">
                  Picked {familyLabel(p.family.picked)}:{' '}
                  {p.family.trials
                    .map((t) => `${familyLabel(t.family)} ${t.order ?? 'not designable'}`)
                    .join(', ')}
                </p>
              )}
              <div className="pw-dz-actions">
                {p.designer && (
                  <>
                    <button
                      type="button"
                      className="pw-small-button"
                      onClick={() => onEdit(p.index)}
                      aria-label={`Edit part ${p.index + 1}, ${name}`}
                    >
                      Edit
                    </button>
                    <button
                      type="button"
                      className="pw-small-button"
                      onClick={() => rerun(p.index)}
                      aria-label={`Re-run part ${p.index + 1}, ${name}`}
                      title="Design this part again from its parameters (replaces hand edits of its roots)"
                    >
                      Re-run
                    </button>
                  </>
                )}
                <button
                  type="button"
                  className="pw-small-button"
                  onClick={() => workbenchStore.getState().partsEdit(removePartEdit(p.index))}
                  aria-label={`Remove part ${p.index + 1}, ${name}`}
                  title="Take this part and its roots out of the cascade"
                >
                  Remove
                </button>
              </div>
            </li>
          );
        })}
      </ol>
      <div className="pw-dz-actions">
        <button
          type="button"
          onClick={() => workbenchStore.getState().releaseDesigner()}
          title="Forget the parts and their designers; the roots stay and are yours to edit"
        >
          Release all
        </button>
      </div>
    </section>
  );
}

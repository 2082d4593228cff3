/**
 * What produced the roots: the designer and its parameters, the order it estimated and the margins it
 * reached, whether the roots were edited by hand since, and the buttons to change parameters or release.
 */
import { selectDesignerResult, selectDesignerStatus } from '../../../store/derived.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { formatDb, formatMargin } from '../../shared/format.ts';
import { describeDesigner } from './describe.ts';
import { FamilyTable } from './FamilyTable.tsx';

export function DesignerStatus({ onChangeParameters }: { onChangeParameters: () => void }) {
  const status = useWorkbench(selectDesignerStatus);
  // The designer's own output for the order and margins: computed once per designer description.
  const result = useWorkbench(selectDesignerResult);
  if (!status) return null;
  const words = describeDesigner(status.spec);
  const value = result?.ok ? result.value : null;
  return (
    <section className="pw-side-section pw-dz" aria-labelledby="pw-dz-by-h" data-testid="designer-status">
      <h2 id="pw-dz-by-h">Designed by</h2>
      <p className="pw-dz-title" data-testid="designer-title">
        {words.title}
      </p>
      <dl className="pw-dz-params">
        {words.params.map(([k, v]) => (
          <div key={k}>
            <dt>{k}</dt>
            <dd>{v}</dd>
          </div>
        ))}
      </dl>
      {value?.estimate && (
        <p className="pw-dz-note" data-testid="designer-estimate">
          Estimated order <strong>{value.estimate.order}</strong>
          {!value.estimate.converged && ' (edge search did not fully converge)'}
        </p>
      )}
      {value?.family && <FamilyTable choice={value.family} />}
      {value?.margin && (
        <p className="pw-dz-note" data-testid="designer-margin">
          {status.editedByHand ? 'As designed: p' : 'P'}ass-band loss{' '}
          {formatDb(value.margin.passbandLossDb, 3)} ({formatMargin(value.margin.passMarginDb)}), stop band{' '}
          {formatDb(value.margin.stopbandAttenuationDb, 3)} down ({formatMargin(value.margin.stopMarginDb)})
        </p>
      )}
      {status.editedByHand && (
        <p className="pw-dz-edited" role="status" data-testid="designer-edited">
          Roots edited by hand since the design. Re-running replaces those edits (Undo brings them back);
          Release keeps them and forgets the designer.
        </p>
      )}
      <div className="pw-dz-actions">
        <button type="button" onClick={onChangeParameters} title="Put these parameters in the form below">
          Change parameters
        </button>
        <button
          type="button"
          onClick={() => workbenchStore.getState().releaseDesigner()}
          title="Forget the designer; the roots stay and are yours to edit"
        >
          Release
        </button>
      </div>
    </section>
  );
}

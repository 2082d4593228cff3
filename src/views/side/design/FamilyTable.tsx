/** "Any family": the family the tool picked, with every family's least order and pass-band delay spread. */
import { FAMILY_OPTIONS, FAMILY_TIE_BREAK, type FamilyChoice } from '../../../core/design/index.ts';
import { formatNumber } from '../../shared/format.ts';

const labelOf = (f: string) => FAMILY_OPTIONS.find((o) => o.value === f)?.label ?? f;

export function FamilyTable({ choice }: { choice: FamilyChoice }) {
  return (
    <div className="pw-dz-family" data-testid="family-choice">
      <p className="pw-dz-note">
        Picked <strong>{labelOf(choice.picked)}</strong>: the least order of the four families
        {choice.tieBroken ? `; tied on order, so the ${FAMILY_TIE_BREAK} decided` : ''}.
      </p>
      <table className="pw-dz-family-table">
        <caption className="pw-visually-hidden">Least order of each family for this requirement</caption>
        <thead>
          <tr>
            <th scope="col">Family</th>
            <th scope="col">Order</th>
            <th scope="col" title="Largest minus smallest group delay across the pass band">
              Delay spread (samples)
            </th>
          </tr>
        </thead>
        <tbody>
          {choice.trials.map((t) => (
            <tr key={t.family} aria-current={t.family === choice.picked ? 'true' : undefined}>
              <th scope="row">
                {labelOf(t.family)}
                {t.family === choice.picked ? ' ✓' : ''}
              </th>
              <td>{t.order ?? '—'}</td>
              <td title={t.refused}>
                {t.delaySpreadSamples === undefined
                  ? 'not designable'
                  : formatNumber(t.delaySpreadSamples, 3)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

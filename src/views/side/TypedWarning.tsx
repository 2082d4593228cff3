/**
 * A plain warning when typed coefficients leave roots uncertain: which roots, by how much, and that
 * second-order sections or the roots themselves are the safe form to work in. Nothing shows for roots that
 * were placed or designed, or for typed coefficients that fix every root well.
 */
import { selectTypedDiagnostics } from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { uncertainRoots } from '../../core/system/uncertainRoots.ts';
import { formatNumber } from '../shared/format.ts';
import { positionText } from './rootRows.ts';

/** Uncertain roots listed by name before "and N more". */
const LISTED = 4;

export function TypedWarning() {
  const diag = useWorkbench(selectTypedDiagnostics);
  if (!diag) return null;
  const unsure = uncertainRoots(diag);
  if (diag.converged && unsure.length === 0) return null;
  const worst = unsure.reduce((m, u) => Math.max(m, u.root.errorBound), 0);
  // Roots counted as the polynomial has them: conjugates and multiplicities included.
  const count = unsure.reduce((n, u) => n + u.root.multiplicity * (u.root.im === 0 ? 1 : 2), 0);
  return (
    <section className="pw-side-section pw-typed-warning" role="note" data-testid="typed-warning">
      <h2>These coefficients are ill-conditioned</h2>
      {!diag.converged && (
        <p>The root search did not converge for every root; the roots shown are approximations.</p>
      )}
      {unsure.length > 0 && (
        <>
          <p>
            The coefficients as typed pin {count === 1 ? 'one root' : `${count} roots`} down only to within{' '}
            {formatNumber(worst, 2)}:
          </p>
          <ul>
            {unsure.slice(0, LISTED).map(({ kind, root }, k) => (
              <li key={k}>
                {kind} {positionText(root.re, root.im, 6)}
                {root.multiplicity > 1 ? ` (×${root.multiplicity})` : ''}: uncertain by{' '}
                {formatNumber(root.errorBound, 2)}
              </li>
            ))}
            {unsure.length > LISTED && <li>and {unsure.length - LISTED} more</li>}
          </ul>
        </>
      )}
      <p>
        Small changes in the last digits of b and a move these roots that much. Work with the roots or with
        second-order sections, which hold them exactly; the stability verdict above is decided exactly from
        the coefficients as typed.
      </p>
    </section>
  );
}

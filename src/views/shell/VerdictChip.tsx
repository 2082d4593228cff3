/**
 * A small copy of the stability verdict for the header. Shown only on narrow screens, where the side
 * column (and its banner) sits below the plots; the banner there stays the live region.
 */
import { selectStability } from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';

const WORD = { stable: 'Stable', marginal: 'Marginal', unstable: 'Unstable', checking: 'Checking…' } as const;

export function VerdictChip() {
  // 'checking' until the exact test has arrived (store/exactChecks.ts)
  const verdict = useWorkbench((s) => selectStability(s)?.verdict ?? 'checking');
  return (
    <span className={`pw-verdict-chip pw-stability-${verdict}`} aria-hidden="true">
      {WORD[verdict]}
    </span>
  );
}

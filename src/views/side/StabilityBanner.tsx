/**
 * The stability verdict as a banner no one can miss: green stable, amber marginal, red unstable; grey while
 * the exact test has not arrived (it loads right after the first paint, store/exactChecks.ts), since a
 * verdict is given only once it has run. With a fixed-point target set, a second banner as prominent gives
 * the verdict of the quantized coefficients, and each says which filter it judges.
 */
import type { Stability } from '../../core/stability/index.ts';
import { selectStability } from '../../store/derived.ts';
import { loadExactChecks } from '../../store/exactChecks.ts';
import { selectHasImplementation } from '../../store/implementationDerived.ts';
import { quantizedStability } from '../verdicts/quantizedViews.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { formatNumber } from '../shared/format.ts';
import { positionText } from './rootRows.ts';

const TITLE = { stable: 'Stable', marginal: 'Marginally stable', unstable: 'Unstable' } as const;
const ICON = { stable: '✓', marginal: '!', unstable: '✕' } as const;

/** The engine's reason as a sentence: capital first letter, full stop. */
function sentence(reason: string): string {
  const t = reason.charAt(0).toUpperCase() + reason.slice(1);
  return t.endsWith('.') ? t : `${t}.`;
}

/** The banner before there is a verdict: being checked, or the exact test could not be fetched. */
function Unjudged() {
  const status = useWorkbench((st) => st.exactChecks);
  const failed = status.state === 'failed';
  return (
    <div className="pw-stability pw-stability-checking" data-testid="stability">
      <span className="pw-stability-icon" aria-hidden="true">
        {failed ? '?' : '…'}
      </span>
      <div>
        <strong className="pw-stability-title" role="status" aria-live="polite" aria-atomic="true">
          {failed ? 'Stability not checked' : 'Checking stability…'}
        </strong>
        {failed ? (
          <p className="pw-stability-reason" data-testid="stability-reason" title={status.message}>
            The exact stability test could not be fetched from the server, so there is no verdict yet.{' '}
            <button type="button" onClick={() => void loadExactChecks().catch(() => undefined)}>
              Try again
            </button>
          </p>
        ) : (
          ' · the exact test is loading'
        )}
      </div>
    </div>
  );
}

/** One stability banner (the quantized one is views/verdicts/QuantizedVerdicts.tsx). */
export function Banner({
  s,
  hasPoles,
  who,
  testId,
}: {
  s: Stability;
  hasPoles: boolean;
  who: string | null;
  testId: string;
}) {
  const verdict = s.verdict;
  return (
    <div className={`pw-stability pw-stability-${verdict}`} data-testid={testId}>
      <span className="pw-stability-icon" aria-hidden="true">
        {ICON[verdict]}
      </span>
      <div>
        {who && <span className="pw-stability-who">{who}: </span>}
        {/* Only the verdict is live: the radius changes on every pointer move while dragging. */}
        <strong className="pw-stability-title" role="status" aria-live="polite" aria-atomic="true">
          {TITLE[verdict]}
        </strong>
        {!hasPoles ? (
          ' · no poles (FIR)'
        ) : s.maxPoleRadius === 0 ? (
          ' · every pole at the origin (FIR)'
        ) : (
          <>
            {' · '}
            {/* The phrase wraps as a whole: never the figure alone on the next line. */}
            <span className="pw-stability-radius-phrase">
              largest pole radius{' '}
              <span className="pw-stability-radius">{formatNumber(s.maxPoleRadius, 6)}</span>
            </span>
          </>
        )}
        {(verdict !== 'stable' || s.rootsSuggested) && (
          <p className="pw-stability-reason" data-testid="stability-reason">
            {sentence(s.reason)}
            {s.responsible.length > 2 && (
              <> All of them: {s.responsible.map((p) => positionText(p.re, p.im, 5)).join(', ')}.</>
            )}
          </p>
        )}
      </div>
    </div>
  );
}

export function StabilityBanner() {
  const s = useWorkbench(selectStability);
  const hasPoles = useWorkbench((st) => st.design.poles.length > 0);
  const hasTarget = useWorkbench(selectHasImplementation);
  if (!s) return <Unjudged />;
  return (
    <>
      <Banner s={s} hasPoles={hasPoles} who={hasTarget ? 'Ideal filter' : null} testId="stability" />
      {hasTarget && <quantizedStability.View />}
    </>
  );
}

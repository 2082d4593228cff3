/**
 * The mask's verdicts in the magnitude plot's title row, saying which filter each judges: the ideal filter,
 * and, when a fixed-point target is set, the quantized implementation in force beside it, just as prominent.
 * Each says pass or fail, the worst margin, where, and which limit it is measured against.
 */
import type { MaskRegionResult, MaskResult } from '../../../core/mask/index.ts';
import { selectMaskResult } from '../../../store/derived.ts';
import { selectHasImplementation } from '../../../store/implementationDerived.ts';
import { quantizedMaskChip } from '../../verdicts/quantizedViews.ts';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { formatHz, formatMargin } from '../../shared/format.ts';
import type { PlotRect } from '../layout.ts';

/** "above the upper limit of pass" / "below the lower limit of stop-2", for the worst region. */
function limitWords(r: MaskRegionResult | undefined): string {
  if (!r || r.problem) return '';
  return r.limit === 'upper' ? `, upper limit of ${r.id}` : `, lower limit of ${r.id}`;
}

/** One verdict chip (the quantized one is views/verdicts/QuantizedVerdicts.tsx). */
export function Chip({
  result,
  who,
  testId,
  compact,
}: {
  result: MaskResult;
  who: string;
  testId: string;
  /** Two chips share the title row: the place of the worst point and the count of failing regions are left to the tooltip. */
  compact: boolean;
}) {
  const failing = result.regions.filter((r) => !r.pass).length;
  const m = result.worstMarginDb;
  const worst = result.regions.find((r) => r.id === result.worstRegionId);
  // "passes by 0.0143 dB" after "passes" keeps only "by 0.0143 dB"; other words stay whole.
  const words = formatMargin(m, compact ? 2 : 3).replace(/^(passes|fails) (?=by )/, '');
  const margin =
    Number.isNaN(m) && worst?.problem
      ? worst.problem
      : Number.isFinite(m)
        ? words
        : words.replace(/^(passes|fails): /, '');
  const where =
    m !== Infinity && !Number.isNaN(m) && Number.isFinite(result.worstAtHz)
      ? ` at ${formatHz(result.worstAtHz)}`
      : '';
  return (
    <div
      className={`pw-mask-chip ${result.pass ? 'pw-mask-ok' : 'pw-mask-fail'}${compact ? ' pw-mask-compact' : ''}`}
      data-testid={testId}
      data-pass={result.pass}
      title={`Requirement mask judged on the ${who === 'ideal' ? 'ideal' : `quantized (${who})`} filter, at its tightest point: ${formatMargin(m)}${where}${limitWords(worst)}${result.pass ? '' : `; ${failing} of ${result.regions.length} regions fail`}`}
    >
      <span className="pw-mask-who">{who}</span>
      <b role="status">
        {result.pass ? '✓ passes' : `✗ fails${compact ? '' : ` ${failing}/${result.regions.length}`}`}
      </b>
      <span>
        {margin}
        {!compact && where}
      </span>
    </div>
  );
}

/** Width kept free at the left of the title row for the plot's name and its dB/linear choice, px. */
const TITLE_CONTROLS_PX = 160;

export function MaskChip({ rect }: { rect: PlotRect }) {
  const ideal = useWorkbench(selectMaskResult);
  const hasTarget = useWorkbench(selectHasImplementation);
  if (!ideal || ideal.regions.length === 0) return null;
  return (
    <div
      className="pw-mask-chips"
      style={{
        left: rect.right,
        top: rect.top - 19,
        maxWidth: Math.max(0, rect.right - rect.left - TITLE_CONTROLS_PX),
      }}
    >
      <Chip result={ideal} who="ideal" testId="mask-chip" compact={hasTarget} />
      {hasTarget && <quantizedMaskChip.View />}
    </div>
  );
}

/** The mask's verdict in the magnitude plot's title row: pass or fail, the worst margin and where. */
import { selectMaskResult } from '../../../store/derived.ts';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { formatHz, formatMargin } from '../../shared/format.ts';
import type { PlotRect } from '../layout.ts';

export function MaskChip({ rect }: { rect: PlotRect }) {
  const result = useWorkbench(selectMaskResult);
  if (!result || result.regions.length === 0) return null;
  const failing = result.regions.filter((r) => !r.pass).length;
  const m = result.worstMarginDb;
  // "passes by 0.0143 dB" after "Mask passes" keeps only "by 0.0143 dB"; other words stay whole.
  const words = formatMargin(m).replace(/^(passes|fails) (?=by )/, '');
  const margin = Number.isFinite(m) ? words : words.replace(/^(passes|fails): /, '');
  const where =
    m !== Infinity && !Number.isNaN(m) && Number.isFinite(result.worstAtHz)
      ? ` at ${formatHz(result.worstAtHz)}`
      : '';
  return (
    <div
      className={`pw-mask-chip ${result.pass ? 'pw-mask-ok' : 'pw-mask-fail'}`}
      style={{ left: rect.right, top: rect.top - 19 }}
      data-testid="mask-chip"
      data-pass={result.pass}
      title="Requirement mask: how far the response stays inside its limits (or goes past them) where it comes closest, and where"
    >
      <b role="status">
        {result.pass ? '✓ Mask passes' : `✗ Mask fails (${failing} of ${result.regions.length})`}
      </b>
      <span>
        {margin}
        {where}
      </span>
    </div>
  );
}

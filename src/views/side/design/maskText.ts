/** Words for a mask verdict: pass or fail, by how much and where (the margin words are core/format.ts's). */
import type { MaskRegionResult, MaskResult } from '../../../core/mask/index.ts';
import { formatDb, formatHz, formatMargin } from '../../shared/format.ts';

/** "passes by 0.19 dB at 100 Hz" / "fails by 2.01 dB at 120 Hz" (a margin: positive inside the limits). */
export function marginText(marginDb: number, atHz: number): string {
  const m = formatMargin(marginDb);
  // Where matters for a failure without bound too (which root to move); +∞ and NaN have no place.
  return marginDb !== Infinity && !Number.isNaN(marginDb) && Number.isFinite(atHz)
    ? `${m} at ${formatHz(atHz)}`
    : m;
}

/** One region's verdict in a few words, naming the limit the worst point is measured against. */
export function regionVerdictText(r: MaskRegionResult): string {
  if (r.problem) return `not judged: ${r.problem}`;
  const limit = r.limit === 'upper' ? 'upper limit' : 'lower limit';
  const text = marginText(r.worstMarginDb, r.worstAtHz);
  if (r.pass) return `${text} (${limit})`;
  // A margin of −∞ is a response of ±∞ dB (a zero or a pole on the circle): say the level, not "by ∞ dB".
  if (!Number.isFinite(r.worstMarginDb))
    return `fails: the response is ${formatDb(r.worstDb, 3)} at ${formatHz(r.worstAtHz)}, beyond its ${limit}`;
  return `${text}, ${r.limit === 'upper' ? 'above' : 'below'} its ${limit}`;
}

/** The whole mask's verdict in a few words: how many regions pass, and the tightest one. */
export function maskVerdictText(m: MaskResult): string {
  const n = m.regions.length;
  if (n === 0) return 'no regions: add one to judge the response';
  const failing = m.regions.filter((r) => !r.pass).length;
  const head = failing ? `fails (${failing} of ${n} regions)` : `passes (${n} regions)`;
  const worst = m.regions.find((r) => r.id === m.worstRegionId);
  if (worst?.problem) return `${head}; region “${worst.id}” is not judged: ${worst.problem}`;
  return `${head}; tightest${worst ? ` (${worst.id})` : ''}: ${marginText(m.worstMarginDb, m.worstAtHz)}`;
}

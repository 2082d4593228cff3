/** Words for a mask verdict: pass or fail, the margin in dB and where it is smallest. */
import type { MaskRegionResult, MaskResult } from '../../../core/mask/index.ts';
import { formatHz, formatNumber } from '../../shared/format.ts';

/** "+0.19 dB at 100 Hz" / "−2.01 dB at 120 Hz" (a margin: positive inside the limits). */
export function marginText(marginDb: number, atHz: number): string {
  if (!Number.isFinite(marginDb)) return 'no limit';
  const m = `${marginDb >= 0 ? '+' : ''}${formatNumber(marginDb, 3)} dB`;
  return Number.isFinite(atHz) ? `${m} at ${formatHz(atHz)}` : m;
}

/** One region's verdict in a few words, naming the limit the worst point is measured against. */
export function regionVerdictText(r: MaskRegionResult): string {
  if (r.problem) return `not judged: ${r.problem}`;
  const where = marginText(r.worstMarginDb, r.worstAtHz);
  const limit = r.limit === 'upper' ? 'upper limit' : 'lower limit';
  if (r.pass) return `passes, margin ${where} (${limit})`;
  // A margin of −∞ is a response of ±∞ dB (a zero or a pole on the circle): say the level, not "by ∞ dB".
  if (!Number.isFinite(r.worstMarginDb))
    return `fails: the response is ${formatNumber(r.worstDb, 3)} dB at ${formatHz(r.worstAtHz)}, beyond its ${limit}`;
  return `fails by ${formatNumber(-r.worstMarginDb, 3)} dB at ${formatHz(r.worstAtHz)}, ${r.limit === 'upper' ? 'above' : 'below'} its ${limit}`;
}

/** The whole mask's verdict in a few words. */
export function maskVerdictText(m: MaskResult): string {
  const n = m.regions.length;
  if (n === 0) return 'no regions';
  const failing = m.regions.filter((r) => !r.pass).length;
  const head = failing ? `fails (${failing} of ${n} regions)` : `passes (${n} regions)`;
  return `${head}, worst ${marginText(m.worstMarginDb, m.worstAtHz)}`;
}

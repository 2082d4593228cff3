/** Round-off noise figures and arrangement verdicts in words. */
import type { Arrangement, Headroom, RoundoffNoise } from '../../../core/fixed/index.ts';
import { formatDbFigure, formatNumber } from '../../shared/format.ts';

/** "−86.9" (dB with one decimal, a true minus sign), "−∞" / "∞": the read-out rule of core/format.ts. */
export function db1(x: number): string {
  return formatDbFigure(x, 1);
}

/** One sentence: the total noise, its rms in LSBs, the SNR of a full-scale sine and the effective bits. */
export function noiseSummary(n: RoundoffNoise): string {
  if (n.droppedBits === 0) return 'No result is ever rounded (the post-shift is 0 bits): no round-off noise.';
  const offset = Math.abs(n.offsetLsb) >= 0.005 ? `, a DC offset of ${formatNumber(n.offsetLsb, 3)} LSB` : '';
  const bound = n.converged ? '' : ' (at least: a path did not decay within the summing limit)';
  return (
    `Rounding adds ${db1(n.powerDbfs)} dBFS of noise at the output (${formatNumber(n.rmsLsb, 3)} LSB rms${offset})${bound}: ` +
    `SNR ${db1(n.snrDb)} dB for a full-scale sine at the peak gain${n.peakGain < 0.999 ? ` (which reaches ${formatNumber(n.peakGain, 3)} of full scale at the output)` : ''}, ${n.effectiveBits.toFixed(1)} effective bits.`
  );
}

export const HEADROOM_WORDS: Record<Headroom, { short: string; long: string }> = {
  'any-input': {
    short: 'any input',
    long: 'no input within full scale can overflow a section output (L1 ≤ 1)',
  },
  sine: {
    short: 'sines',
    long: 'no full-scale sinusoid can overflow in steady state (peak gain ≤ 1); other inputs can',
  },
  none: { short: 'can overflow', long: 'a full-scale sinusoid overflows a section output' },
  unknown: { short: 'unknown', long: 'the norms did not converge (poles on or very near the unit circle)' },
};

const ORDER_WORDS = { ascending: 'rising', descending: 'falling' } as const;
const SCALING_WORDS = { linf: 'L∞', l2: 'L2', l1: 'L1', none: 'none' } as const;

/** Ordering, scaling and structure in a few words. */
export function arrangementWords(a: Pick<Arrangement, 'ordering' | 'scaling' | 'structure'>): {
  ordering: string;
  scaling: string;
  structure: string;
} {
  return {
    ordering: ORDER_WORDS[a.ordering],
    scaling: SCALING_WORDS[a.scaling],
    structure: a.structure === 'df1' ? 'DF1' : 'DF2T',
  };
}

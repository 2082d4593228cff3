/** Gain rules: the overall gain k set directly, or chosen so that |H| = 1 (0 dB) at a stated place. */
import type { Root, Zpk } from './types.ts';
import { responseZpk, frequencyGrid, evalZpkAt } from './response/index.ts';
import { hzToOmega } from './units.ts';

export type GainRule =
  | { kind: 'fixed'; value: number }
  | { kind: 'dc' }
  | { kind: 'nyquist' }
  | { kind: 'frequency'; hz: number }
  | { kind: 'peak' };

/** Grid on [0, π] searched for the peak of |H| by the 'peak' rule. */
export const PEAK_SEARCH_POINTS = 8192;

export interface ResolvedGain {
  gain: number;
  /** Why the rule could not be met, when it could not (the gain then falls back to 1). */
  problem: string | null;
}

/** Words for where a rule puts 0 dB, e.g. "DC", "50 Hz". */
export function describeGainRule(rule: GainRule): string {
  switch (rule.kind) {
    case 'fixed':
      return `fixed gain ${rule.value}`;
    case 'dc':
      return 'DC';
    case 'nyquist':
      return 'Nyquist';
    case 'frequency':
      return `${rule.hz} Hz`;
    case 'peak':
      return 'the peak';
  }
}

/** The gain k a rule asks for, given the roots and the sample rate fs (Hz). */
export function resolveGain(zeros: Root[], poles: Root[], rule: GainRule, fs: number): ResolvedGain {
  if (rule.kind === 'fixed') return { gain: rule.value, problem: null };
  const unit: Zpk = { zeros, poles, gain: 1 };
  let mag: number;
  if (rule.kind === 'peak') {
    const r = responseZpk(unit, frequencyGrid(PEAK_SEARCH_POINTS));
    mag = 0;
    for (let i = 0; i < r.magnitude.length; i++) if (r.magnitude[i]! > mag) mag = r.magnitude[i]!;
  } else {
    const omega = rule.kind === 'dc' ? 0 : rule.kind === 'nyquist' ? Math.PI : hzToOmega(rule.hz, fs);
    const h = evalZpkAt(unit, Math.cos(omega), Math.sin(omega));
    mag = Math.hypot(h.re, h.im);
  }
  if (!(mag > 0) || !Number.isFinite(mag)) {
    const what = mag === 0 ? 'zero' : 'infinite';
    return {
      gain: 1,
      problem: `|H| is ${what} at ${describeGainRule(rule)}, so 0 dB there is impossible; the gain stays 1`,
    };
  }
  return { gain: 1 / mag, problem: null };
}

/** A hook that keeps an axis range steady across renders (see settleRange) and starts afresh on a new key. */
import { useState } from 'react';
import { settleRange, type Range } from './range.ts';

/**
 * The range to draw with: follows `wanted` with hysteresis, stays put while `hold` is true, and forgets the
 * past range when `key` changes (e.g. dB ↔ linear, where the old range means nothing).
 */
export function useSettledRange(key: string, data: Range, wanted: Range, hold: boolean): Range {
  const [state, setState] = useState<{ key: string; range: Range } | null>(null);
  const current = state && state.key === key ? state.range : null;
  const next = settleRange(current, data, wanted, hold);
  // Adjusting state while rendering is React's documented way to derive state from changing inputs.
  if (next !== current) setState({ key, range: next });
  return next;
}

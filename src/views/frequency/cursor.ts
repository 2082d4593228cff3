/** Moving the frequency cross-hair by keyboard: steps that feel even on a linear or a log axis. */
import type { Range } from '../chart/range.ts';
import { shortcutAction } from '../shortcuts.ts';

/** Arrow-key steps across the whole axis; Shift (or Page Up/Down) moves ten of them. */
export const CURSOR_STEPS_PER_AXIS = 400;
export const CURSOR_BIG_STEP = 10;

/** Keys that move the cross-hair (the cursor shortcuts) and how far, in small steps; null for any other key. */
export function cursorStepsForKey(key: string, shift: boolean): number | 'start' | 'end' | null {
  const big = shift ? CURSOR_BIG_STEP : 1;
  switch (shortcutAction('cursor', { key, shiftKey: shift })) {
    case 'cursor-forward':
      return big;
    case 'cursor-back':
      return -big;
    case 'cursor-page-forward':
      return CURSOR_BIG_STEP;
    case 'cursor-page-back':
      return -CURSOR_BIG_STEP;
    case 'cursor-first':
      return 'start';
    case 'cursor-last':
      return 'end';
    default:
      return null;
  }
}

/**
 * The cross-hair frequency (Hz) after `steps` small steps from hz within domain [lo, hi]: equal steps in Hz on
 * a linear axis, equal ratios on a log axis, so a step is the same distance on screen either way.
 */
export function stepHz(
  hz: number,
  domain: Range,
  axis: 'linear' | 'log',
  steps: number | 'start' | 'end',
): number {
  const [lo, hi] = domain;
  if (steps === 'start') return lo;
  if (steps === 'end') return hi;
  let next: number;
  if (axis === 'log') {
    const from = hz > 0 ? hz : lo;
    next = from * Math.pow(hi / lo, steps / CURSOR_STEPS_PER_AXIS);
  } else {
    next = hz + (steps * (hi - lo)) / CURSOR_STEPS_PER_AXIS;
  }
  return Math.min(hi, Math.max(lo, next));
}

/** Where the cross-hair starts when the plot gets keyboard focus: the middle of the axis on screen. */
export function startHz(domain: Range, axis: 'linear' | 'log'): number {
  const [lo, hi] = domain;
  return axis === 'log' ? Math.sqrt(lo * hi) : (lo + hi) / 2;
}

/** Significant digits a frequency read-out needs to tell points of the band apart (5 on the whole axis). */
export function hzDigits(band: Range | null): number {
  if (!band) return 5;
  const [lo, hi] = band;
  return Math.min(
    12,
    Math.max(5, Math.ceil(Math.log10(Math.max(Math.abs(lo), Math.abs(hi)) / (hi - lo))) + 4),
  );
}

/** A band in words with the digits that tell its ends apart: "49.99–50.01 Hz", "1.2–3.4 kHz". */
export function formatHzSpan(band: Range): string {
  const [lo, hi] = band;
  const kilo = hi >= 1000;
  const k = kilo ? 1000 : 1;
  const step = (hi - lo) / k;
  const decimals = Math.min(9, Math.max(0, -Math.floor(Math.log10(step)) + 1));
  const f = (v: number) => (v / k).toFixed(decimals);
  return `${f(lo)}–${f(hi)} ${kilo ? 'kHz' : 'Hz'}`;
}

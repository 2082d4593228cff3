/** Tick positions and labels for chart axes: linear (d3's nice steps) and log (decades with 2 and 5). */
import { ticks } from 'd3-array';
import { formatNumber } from '../shared/format.ts';

export interface Tick {
  value: number;
  /** Empty for a minor tick (grid line only). */
  label: string;
}

/**
 * About `count` evenly spaced ticks on [lo, hi] at d3's nice steps (1, 2, 5 × 10^k), labelled by `format`
 * (default: just the digits the step needs).
 */
export function linearTicks(
  lo: number,
  hi: number,
  count: number,
  format: (value: number, step: number) => string = formatTickValue,
): Tick[] {
  if (!(Number.isFinite(lo) && Number.isFinite(hi)) || lo === hi) return [];
  const values = ticks(lo, hi, Math.max(1, Math.round(count)));
  const step = values.length > 1 ? Math.abs(values[1]! - values[0]!) : Math.abs(hi - lo);
  return values.map((value) => ({ value, label: format(value, step) }));
}

/** A tick value with only the digits its step needs, e.g. 0.25 with step 0.05, 1k for 1000 at large steps. */
export function formatTickValue(value: number, step: number): string {
  if (value === 0 || Math.abs(value) < step * 1e-9) return '0';
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  if (decimals > 6 || Math.abs(value) >= 1e6) return formatNumber(value, 3);
  return value.toFixed(decimals).replace(/^-/, '−');
}

/**
 * Ticks for a log axis on [lo, hi] (both > 0): every 1…9 × 10^k as a grid line; labels on the decades, and
 * on 2 and 5 as well while the axis spans few decades (so a narrow log axis still reads).
 */
export function logTicks(lo: number, hi: number, maxLabels = 8): Tick[] {
  if (!(lo > 0 && hi > lo && Number.isFinite(hi))) return [];
  const first = Math.floor(Math.log10(lo));
  const last = Math.ceil(Math.log10(hi));
  const decades = Math.log10(hi / lo);
  const withMids = decades * 3 <= maxLabels;
  const ticks: Tick[] = [];
  for (let k = first; k <= last; k++) {
    const base = 10 ** k;
    for (let m = 1; m <= 9; m++) {
      const value = m * base;
      if (value < lo * (1 - 1e-9) || value > hi * (1 + 1e-9)) continue;
      const labelled = m === 1 || (withMids && (m === 2 || m === 5));
      ticks.push({ value, label: labelled ? formatHzTick(value) : '' });
    }
  }
  return ticks;
}

/** A compact frequency label for an axis: 50, 2.5k, 1M. */
export function formatHzTick(hz: number): string {
  const a = Math.abs(hz);
  if (a >= 1e6) return `${formatNumber(hz / 1e6, 3)}M`;
  if (a >= 1e3) return `${formatNumber(hz / 1e3, 3)}k`;
  return formatNumber(hz, 3);
}

/**
 * A frequency tick label at a linear step: compact (50, 2.5k) while the step is 100 Hz or more, and with the
 * decimals the step needs on a zoomed axis (49.995, 50.000, 50.005), so neighbouring labels never read alike.
 */
export function formatHzStepTick(hz: number, step: number): string {
  return step >= 100 ? formatHzTick(hz) : formatTickValue(hz, step);
}

/** Steps that read well for angles in degrees (multiples of 15° up to whole turns and beyond). */
export const DEGREE_STEPS = [15, 30, 45, 90, 180, 360, 720, 1440, 2880, 5760, 11520] as const;

/**
 * About `count` ticks on [lo, hi] at the smallest step from `steps` that gives no more than `count + 1`
 * ticks, e.g. degrees on a phase axis; falls back to linearTicks beyond the largest step.
 */
export function stepTicks(lo: number, hi: number, count: number, steps: readonly number[]): Tick[] {
  if (!(Number.isFinite(lo) && Number.isFinite(hi)) || lo >= hi) return [];
  const step = steps.find((s) => Math.floor(hi / s) - Math.ceil(lo / s) + 1 <= Math.max(2, count) + 1);
  if (step === undefined) return linearTicks(lo, hi, count);
  const ticks: Tick[] = [];
  for (let k = Math.ceil(lo / step); k * step <= hi; k++)
    ticks.push({ value: k * step, label: formatTickValue(k * step, step) });
  return ticks;
}

/**
 * Linear ticks for an axis `lengthPx` long with labels at least `minGapPx` apart: d3's count is only a hint,
 * so fewer are asked for until the step it picks leaves room.
 */
export function spacedTicks(lo: number, hi: number, lengthPx: number, minGapPx: number): Tick[] {
  for (let count = Math.max(2, Math.floor(lengthPx / minGapPx)); count >= 1; count--) {
    const ticks = linearTicks(lo, hi, count);
    const step = ticks.length > 1 ? Math.abs(ticks[1]!.value - ticks[0]!.value) : Infinity;
    if ((step / Math.abs(hi - lo)) * lengthPx >= minGapPx || count === 1) return ticks;
  }
  return [];
}

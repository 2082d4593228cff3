/** Where the time plot sits in its box, and which unit reads best on the seconds axis. */
import type { PlotRect } from '../frequency/layout.ts';

/** Room for y labels on the left, the sample axis below and the seconds axis above. */
export const TIME_MARGIN = { left: 58, right: 12, top: 30, bottom: 32 } as const;

/** The plot rectangle for a width × height box. */
export function timeLayout(width: number, height: number): PlotRect {
  return {
    left: TIME_MARGIN.left,
    right: Math.max(TIME_MARGIN.left + 1, width - TIME_MARGIN.right),
    top: TIME_MARGIN.top,
    bottom: Math.max(TIME_MARGIN.top + 1, height - TIME_MARGIN.bottom),
  };
}

/** The unit for a time axis spanning `seconds`: s, ms or µs, with the factor from seconds. */
export function timeUnit(seconds: number): { unit: 's' | 'ms' | 'µs'; factor: number } {
  if (seconds >= 2) return { unit: 's', factor: 1 };
  if (seconds >= 2e-3) return { unit: 'ms', factor: 1e3 };
  return { unit: 'µs', factor: 1e6 };
}

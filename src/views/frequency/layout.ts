/** Where the three frequency plots sit inside the chart's box (pure, in CSS pixels). */

export interface PlotRect {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export interface FrequencyLayout {
  magnitude: PlotRect;
  phase: PlotRect;
  delay: PlotRect;
  /** y of the shared frequency axis. */
  axisY: number;
}

/** Room for y-axis labels on the left, tick labels and the axis title below, and plot titles above. */
export const FREQ_MARGIN = { left: 56, right: 14, top: 18, bottom: 34 } as const;
/** Gap between stacked plots, room for the next plot's title. */
export const FREQ_GAP = 20;
/** Share of the stacked height given to magnitude; phase and group delay split the rest. */
export const MAGNITUDE_SHARE = 0.56;

/** Rectangles of the magnitude (large, top), phase and group-delay plots for a width × height box. */
export function frequencyLayout(width: number, height: number): FrequencyLayout {
  const left = FREQ_MARGIN.left;
  const right = Math.max(left + 1, width - FREQ_MARGIN.right);
  const top = FREQ_MARGIN.top;
  const bottom = Math.max(top + 3, height - FREQ_MARGIN.bottom);
  const usable = Math.max(3, bottom - top - 2 * FREQ_GAP);
  const hMag = Math.round(usable * MAGNITUDE_SHARE);
  const hSmall = Math.round((usable - hMag) / 2);
  const magnitude = { left, right, top, bottom: top + hMag };
  const phase = {
    left,
    right,
    top: magnitude.bottom + FREQ_GAP,
    bottom: magnitude.bottom + FREQ_GAP + hSmall,
  };
  const delay = { left, right, top: phase.bottom + FREQ_GAP, bottom };
  return { magnitude, phase, delay, axisY: bottom };
}

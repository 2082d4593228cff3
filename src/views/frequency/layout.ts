/** Where the frequency plots sit inside the chart's box (pure, in CSS pixels). */

export interface PlotRect {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export type PlotKey = 'magnitude' | 'phase' | 'delay';

export interface FrequencyLayout {
  /** The plots shown, top to bottom; magnitude always first. */
  plots: { key: PlotKey; rect: PlotRect }[];
  /** y of the shared frequency axis. */
  axisY: number;
  /** True when only magnitude and one other plot fit (the other two take turns below magnitude). */
  compact: boolean;
}

/** Room for y-axis labels on the left, tick labels and the axis title below, a title row above. */
export const FREQ_MARGIN = { left: 52, right: 14, top: 20, bottom: 32 } as const;
/** Gap between stacked plots: the next plot's title row. */
export const FREQ_GAP = 22;
/** Share of the plotting height given to magnitude. */
export const MAGNITUDE_SHARE = 0.56;
/** Below this box height the three plots would be too thin to read: phase and delay then share a slot. */
export const STACK_MIN_HEIGHT = 300;

/**
 * Rectangles of the plots for a width × height box: magnitude on top, then phase and group delay (or, in a
 * short box, whichever of them `second` names).
 */
export function frequencyLayout(
  width: number,
  height: number,
  second: 'phase' | 'delay' = 'phase',
): FrequencyLayout {
  const compact = height < STACK_MIN_HEIGHT;
  const left = FREQ_MARGIN.left;
  const right = Math.max(left + 1, width - FREQ_MARGIN.right);
  const top = FREQ_MARGIN.top;
  const bottom = Math.max(top + 3, height - FREQ_MARGIN.bottom);
  const keys: PlotKey[] = compact ? ['magnitude', second] : ['magnitude', 'phase', 'delay'];
  const usable = Math.max(keys.length, bottom - top - (keys.length - 1) * FREQ_GAP);
  const hMag = Math.round(usable * (compact ? 0.6 : MAGNITUDE_SHARE));
  const hRest = (usable - hMag) / (keys.length - 1);
  const plots: FrequencyLayout['plots'] = [];
  let y = top;
  keys.forEach((key, i) => {
    const last = i === keys.length - 1;
    const h = i === 0 ? hMag : Math.round(hRest);
    const rect = { left, right, top: y, bottom: last ? bottom : y + h };
    plots.push({ key, rect });
    y = rect.bottom + FREQ_GAP;
  });
  return { plots, axisY: bottom, compact };
}

/** The rectangle of one plot, if shown. */
export function plotRect(layout: FrequencyLayout, key: PlotKey): PlotRect | undefined {
  return layout.plots.find((p) => p.key === key)?.rect;
}

/** The three views a picture can be taken of: where each lives on the page and what it is called. */

export type PictureView = 'plane' | 'frequency' | 'time';

export interface PictureViewInfo {
  /** Shown in the title line and the menus. */
  label: string;
  /** File-name part. */
  slug: string;
  /** The view's panel on the page. */
  section: string;
  /** The view's drawing inside its panel. */
  svg: string;
}

export const PICTURE_VIEWS: Record<PictureView, PictureViewInfo> = {
  plane: {
    label: 'z-plane',
    slug: 'z-plane',
    section: 'section[aria-label="z-plane"]',
    svg: 'svg.pw-plane-svg',
  },
  frequency: {
    label: 'Frequency response',
    slug: 'frequency',
    section: 'section[aria-label="frequency response"]',
    svg: '.pw-chart-box > svg.pw-chart',
  },
  time: {
    label: 'Time response',
    slug: 'time',
    section: 'section[aria-label="time response"]',
    svg: '.pw-chart-box svg.pw-chart',
  },
};

export const PICTURE_VIEW_ORDER: readonly PictureView[] = ['plane', 'frequency', 'time'];

/**
 * A plot title as a picture shows it: the quantity with the unit or mode chosen beside it on the page,
 * e.g. ("Magnitude", "dB") → "Magnitude (dB)", ("Phase (°)", "unwrapped") → "Phase (°), unwrapped".
 */
export function plotTitleText(name: string, choice: string | null): string {
  const n = name.trim();
  const c = choice?.trim();
  if (!c) return n;
  return n.includes('(') ? `${n}, ${c}` : `${n} (${c})`;
}

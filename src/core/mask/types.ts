/** Requirement masks: frequency regions of the magnitude response with limits in dB, and their verdicts. */

/**
 * What a region asks for. 'pass': the response must stay above lowerDb (and below upperDb when given);
 * 'stop': the response must stay below upperDb; 'band': any limits, at least one.
 */
export type MaskRegionKind = 'pass' | 'stop' | 'band';

/** One region of a mask: a frequency range in Hz and limits on 20·log10|H| in dB. */
export interface MaskRegion {
  /** Unique within its mask; stable while the region is edited (the page keys its drawing on it). */
  id: string;
  kind: MaskRegionKind;
  /** Lower edge, Hz, in [0, fs/2]. */
  fromHz: number;
  /** Upper edge, Hz, in (fromHz, fs/2]. */
  toHz: number;
  /** The response must not exceed this, dB. */
  upperDb?: number;
  /** The response must not fall below this, dB. */
  lowerDb?: number;
  /** Optional words shown beside the region, e.g. "hum, 3rd harmonic". */
  label?: string;
}

/** A requirement mask: regions judged independently; the mask passes when every region passes. */
export interface RequirementMask {
  regions: MaskRegion[];
}

/** Which limit a worst point is closest to breaking (or breaks). */
export type MaskLimit = 'upper' | 'lower';

/** Verdict on one region. Margins in dB: positive = inside the limits by that much, negative = outside. */
export interface MaskRegionResult {
  id: string;
  pass: boolean;
  /** Smallest distance to a limit over the region, dB (+Infinity when nothing limits it). */
  worstMarginDb: number;
  /** Where the worst margin occurs, Hz (NaN when the region could not be judged). */
  worstAtHz: number;
  /** The response there, dB. */
  worstDb: number;
  /** The limit the worst point is measured against. */
  limit: MaskLimit;
  /** Why the region could not be judged (e.g. it lies above Nyquist at the current sample rate). */
  problem?: string;
}

/** Verdict on a whole mask: every region, and the worst of them. */
export interface MaskResult {
  pass: boolean;
  regions: MaskRegionResult[];
  /** The worst region margin, dB (+Infinity for a mask without regions). */
  worstMarginDb: number;
  worstAtHz: number;
  /** Id of the region with the worst margin, or null for a mask without regions. */
  worstRegionId: string | null;
}

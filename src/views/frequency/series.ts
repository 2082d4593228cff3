/**
 * What the three frequency plots show for the current view settings: which response array, in which unit,
 * and the axis range the data asks for. Pure functions of the engine's FrequencyResponse.
 */
import type { FrequencyResponse } from '../../core/response/index.ts';
import type { ViewSettings } from '../../store/view.ts';
import {
  DB_MIN_SPAN,
  dbExtent,
  dbRange,
  finiteExtent,
  niceRange,
  steppedRange,
  type Range,
} from '../chart/range.ts';
import { DEGREE_STEPS } from '../chart/ticks.ts';

/** One plotted quantity: the values, a factor converting them to the axis unit, and the axis title. */
export interface Series {
  /** Identifies the quantity and unit; a new key restarts the axis range. */
  key: string;
  values: Float64Array;
  /** Multiply values by this to get axis units. */
  scale: number;
  title: string;
  /** Range of the data in axis units, and the nice range it asks for. */
  data: Range;
  wanted: Range;
  /** Vertical pixel jump beyond which the curve breaks (as a fraction of the plot height), for wrapped phase. */
  breakFraction?: number;
  /** Tick at multiples of 15°, 45°, 90°… (an angle axis) instead of 1-2-5 steps. */
  degrees?: boolean;
}

export const DEG_PER_RAD = 180 / Math.PI;
/** Smallest span of the unwrapped-phase axis, degrees. */
export const PHASE_MIN_SPAN_DEG = 90;
/** Smallest span of the group-delay axis, samples (converted for ms). */
export const DELAY_MIN_SPAN_SAMPLES = 2;

function scaled(ext: Range | null, scale: number, fallback: Range): Range {
  if (!ext) return fallback;
  const a = ext[0] * scale;
  const b = ext[1] * scale;
  return a <= b ? [a, b] : [b, a];
}

/** How far above the curve's top a mask's upper limit may lift the dB axis so it is drawn, dB. */
export const MASK_LIMIT_HEADROOM_DB = 20;
/** A limit this close above the top is drawn on the top edge instead (the axis is not lifted for it), dB. */
export const MASK_LIMIT_EDGE_DB = 0.5;

/**
 * The magnitude plot: dB (floor at most DB_FLOOR_BELOW_PEAK under the peak) or linear from zero. In dB the
 * axis reaches up to `limitTopDb` (the highest upper limit of the mask, when it lies at most
 * MASK_LIMIT_HEADROOM_DB above the curve), so a pass band's ceiling is drawn and can be dragged.
 */
export function magnitudeSeries(
  r: FrequencyResponse,
  scale: ViewSettings['magnitudeScale'],
  limitTopDb = -Infinity,
): Series {
  if (scale === 'db') {
    const data = dbExtent(r.magnitudeDb);
    const lift = limitTopDb > data[1] + MASK_LIMIT_EDGE_DB && limitTopDb <= data[1] + MASK_LIMIT_HEADROOM_DB;
    const withLimit: Range = lift ? [data[0], limitTopDb] : data;
    return {
      key: 'db',
      values: r.magnitudeDb,
      scale: 1,
      title: 'Magnitude (dB)',
      data: withLimit,
      wanted: lift ? niceRange(withLimit[0], withLimit[1], DB_MIN_SPAN) : dbRange(r.magnitudeDb),
    };
  }
  const ext = finiteExtent(r.magnitude);
  const top = ext ? ext[1] : 1;
  return {
    key: 'linear',
    values: r.magnitude,
    scale: 1,
    title: 'Magnitude (linear, |H|)',
    data: [0, top],
    wanted: niceRange(0, top > 0 ? top : 1, 0),
  };
}

/** The phase plot in degrees: wrapped (fixed ±180°) or unwrapped (range from the data). */
export function phaseSeries(r: FrequencyResponse, mode: ViewSettings['phaseMode']): Series {
  if (mode === 'wrapped') {
    return {
      key: 'wrapped',
      values: r.phase,
      scale: DEG_PER_RAD,
      title: 'Phase, wrapped (°)',
      data: [-180, 180],
      wanted: [-180, 180],
      breakFraction: 0.6,
      degrees: true,
    };
  }
  const data = scaled(finiteExtent(r.phaseUnwrapped), DEG_PER_RAD, [-180, 180]);
  return {
    key: 'unwrapped',
    values: r.phaseUnwrapped,
    scale: DEG_PER_RAD,
    title: 'Phase, unwrapped (°)',
    data,
    wanted: steppedRange(data[0], data[1], PHASE_MIN_SPAN_DEG, DEGREE_STEPS, 4),
    degrees: true,
  };
}

/** The group-delay plot in samples or milliseconds at sample rate fs (Hz). */
export function delaySeries(r: FrequencyResponse, unit: ViewSettings['delayUnit'], fs: number): Series {
  const scale = unit === 'ms' ? 1000 / fs : 1;
  const data = scaled(finiteExtent(r.groupDelay), scale, [0, 1]);
  return {
    key: `${unit}@${unit === 'ms' ? fs : 1}`,
    values: r.groupDelay,
    scale,
    title: unit === 'ms' ? 'Group delay (ms)' : 'Group delay (samples)',
    data,
    wanted: niceRange(data[0], data[1], DELAY_MIN_SPAN_SAMPLES * scale, 4),
  };
}

/**
 * The frequency axis domain in Hz: the zoomed band when there is one; otherwise [0, fs/2] on a linear axis,
 * from the lowest positive grid point on a log axis.
 */
export function frequencyDomain(
  hz: Float64Array,
  fs: number,
  axis: ViewSettings['frequencyAxis'],
  band: Range | null = null,
): Range {
  if (band) return band;
  const top = fs / 2;
  if (axis === 'linear') return [0, top];
  for (let i = 0; i < hz.length; i++) if (hz[i]! > 0) return [hz[i]!, top];
  return [top / 1000, top];
}

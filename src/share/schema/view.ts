/** The view settings worth sharing with a design: how its responses are shown (not panning or snapping). */
import { z } from 'zod';
import type { ViewSettings } from '../../store/view.ts';
import { finite } from './common.ts';
import { RESPONSE_POINTS_MAX, RESPONSE_POINTS_MIN, TIME_SAMPLES_MAX, TIME_SAMPLES_MIN } from './limits.ts';

/** Keys of ViewSettings that travel with a design in links, files and saved sessions. */
export const SHARED_VIEW_KEYS = [
  'magnitudeScale',
  'phaseMode',
  'delayUnit',
  'frequencyAxis',
  'responsePoints',
  'timeInput',
  'sineHz',
  'timeSamples',
  'timeStyle',
  'noiseSeed',
] as const satisfies readonly (keyof ViewSettings)[];

export type SharedViewKey = (typeof SHARED_VIEW_KEYS)[number];
/** The shared view settings; a missing key keeps the reader's own setting. */
export type SharedView = Partial<Pick<ViewSettings, SharedViewKey>>;

export const sharedView = z.object({
  magnitudeScale: z.enum(['db', 'linear']).exactOptional(),
  phaseMode: z.enum(['wrapped', 'unwrapped']).exactOptional(),
  delayUnit: z.enum(['samples', 'ms']).exactOptional(),
  frequencyAxis: z.enum(['linear', 'log']).exactOptional(),
  responsePoints: z.number().int().min(RESPONSE_POINTS_MIN).max(RESPONSE_POINTS_MAX).exactOptional(),
  timeInput: z.enum(['impulse', 'step', 'sine', 'noise']).exactOptional(),
  sineHz: finite.refine((v) => v >= 0, 'must be ≥ 0 Hz').exactOptional(),
  timeSamples: z.number().int().min(TIME_SAMPLES_MIN).max(TIME_SAMPLES_MAX).exactOptional(),
  timeStyle: z.enum(['stems', 'line']).exactOptional(),
  noiseSeed: z.number().int().min(0).max(0xffff_ffff).exactOptional(),
});

type Parsed = z.output<typeof sharedView>;
export const viewSchemaMatches: [Parsed] extends [SharedView]
  ? [SharedView] extends [Parsed]
    ? true
    : false
  : false = true;

/** The shared part of full view settings, keeping only values that differ from `defaults` (shorter links). */
export function pickSharedView(view: ViewSettings, defaults?: ViewSettings): SharedView {
  const out: Record<string, unknown> = {};
  for (const key of SHARED_VIEW_KEYS) {
    if (!defaults || !Object.is(view[key], defaults[key])) out[key] = view[key];
  }
  return out as SharedView;
}

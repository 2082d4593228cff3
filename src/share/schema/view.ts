/** Zod schema of the view settings worth sharing with a design (how its responses are shown). */
import { z } from 'zod';
import { finite } from './common.ts';
import {
  RESPONSE_POINTS_MAX,
  RESPONSE_POINTS_MIN,
  TIME_SAMPLES_MAX,
  TIME_SAMPLES_MIN,
} from '../../core/model/limits.ts';
import type { SharedView } from '../../core/model/view.ts';

/** A shown band (low, high) with low < high, or null for the whole axis. */
const span = (low: number, what: string) =>
  z
    .tuple([finite, finite])
    .refine(([a, b]) => a >= low && a < b, `${what}: the first value must be ≥ ${low} and below the second`)
    .readonly()
    .nullable()
    .exactOptional();

/** Schema of the shared view settings (SharedView in src/core/model/view.ts). */
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
  frequencySpan: span(0, 'frequency band (Hz)'),
  timeSpan: span(-1, 'sample span'),
});

type Parsed = z.output<typeof sharedView>;
export const viewSchemaMatches: [Parsed] extends [SharedView]
  ? [SharedView] extends [Parsed]
    ? true
    : false
  : false = true;

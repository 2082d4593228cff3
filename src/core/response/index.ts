/** Frequency response from the product form (zeros/poles/gain or sections), never from expanded b/a. */
import type { Section } from '../types.ts';
import { sectionsToZpk } from '../system/sectionsConvert.ts';
import { responseZpk } from './zpkResponse.ts';
import type { FrequencyResponse } from './zpkResponse.ts';

export { frequencyGrid, DEFAULT_LOG_GRID_MIN } from './grid.ts';
export { responseZpk, wrapPhase } from './zpkResponse.ts';
export { refineAtRoots, rootAngles, REFINE_RADIUS_BAND } from './refine.ts';
export type { FrequencyResponse } from './zpkResponse.ts';
export { responseAt, evalZpkAt } from './pointValue.ts';
export { GROUP_DELAY_CIRCLE_SNAP } from './kernel.ts';
export { surfaceLevelsDb, SURFACE_FLOOR_DB, SURFACE_CEILING_DB } from './surface.ts';
export type { PlaneRect } from './surface.ts';

/** Response of a cascade of second-order sections at each ω (radians per sample), via each section's roots. */
export function responseSections(sections: readonly Section[], omega: Float64Array): FrequencyResponse {
  return responseZpk(sectionsToZpk(sections), omega);
}

/** Group delay in seconds from group delay in samples at sample rate fs (Hz). */
export function groupDelaySeconds(samples: Float64Array, fs: number): Float64Array {
  const out = new Float64Array(samples.length);
  for (let i = 0; i < samples.length; i++) out[i] = samples[i]! / fs;
  return out;
}

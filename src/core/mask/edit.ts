/** Pure edits of a requirement mask: add, change, delete and drag regions; each returns a new mask. */
import type { Result } from '../types.ts';
import type { MaskRegion, RequirementMask } from './types.ts';
import { regionProblem } from './validate.ts';

/** Narrowest region a drag leaves, as a fraction of the sample rate. */
export const MIN_REGION_WIDTH_FRACTION = 1e-6;
/** Smallest gap between an upper and a lower limit that a drag leaves, dB. */
export const MIN_LIMIT_GAP_DB = 0.001;

/** Changes to a region; a key given as undefined removes that field (a limit or the label). */
export type MaskRegionPatch = { [K in Exclude<keyof MaskRegion, 'id'>]?: MaskRegion[K] | undefined };

/** The draggable parts of a region. */
export type RegionEdge = 'fromHz' | 'toHz' | 'upperDb' | 'lowerDb';

/** An id not yet used in the mask: r1, r2, … */
export function nextRegionId(mask: RequirementMask): string {
  let n = mask.regions.length + 1;
  const used = new Set(mask.regions.map((r) => r.id));
  for (let i = 1; i <= n; i++) if (!used.has(`r${i}`)) return `r${i}`;
  while (used.has(`r${n}`)) n++;
  return `r${n}`;
}

/** The mask with a region added (an id is chosen when none is given), or why the region is not accepted. */
export function addRegion(
  mask: RequirementMask,
  region: Omit<MaskRegion, 'id'> & { id?: string },
  fs: number,
): Result<{ mask: RequirementMask; id: string }> {
  const id = region.id ?? nextRegionId(mask);
  if (mask.regions.some((r) => r.id === id))
    return {
      ok: false,
      error: { message: `region id ${JSON.stringify(id)} is already used`, expected: 'a new id' },
    };
  const full: MaskRegion = { ...region, id };
  const problem = regionProblem(full, fs);
  if (problem) return { ok: false, error: problem };
  return { ok: true, value: { mask: { regions: [...mask.regions, full] }, id } };
}

/** A region with a patch applied (undefined values remove the field). */
export function patchRegion(region: MaskRegion, patch: MaskRegionPatch): MaskRegion {
  const out: Record<string, unknown> = { ...region };
  for (const [k, v] of Object.entries(patch)) {
    if (v === undefined) delete out[k];
    else out[k] = v;
  }
  return out as unknown as MaskRegion;
}

/** The mask with region `id` changed, or why the change is not accepted (unknown id, bad region). */
export function updateRegion(
  mask: RequirementMask,
  id: string,
  patch: MaskRegionPatch,
  fs: number,
): Result<RequirementMask> {
  const i = mask.regions.findIndex((r) => r.id === id);
  if (i < 0)
    return {
      ok: false,
      error: {
        message: `no region with id ${JSON.stringify(id)}`,
        expected: 'the id of a region in the mask',
      },
    };
  const next = patchRegion(mask.regions[i]!, patch);
  const problem = regionProblem(next, fs);
  if (problem) return { ok: false, error: problem };
  const regions = mask.regions.slice();
  regions[i] = next;
  return { ok: true, value: { regions } };
}

/** The mask without region `id` (the same mask when there is none). */
export function deleteRegion(mask: RequirementMask, id: string): RequirementMask {
  return mask.regions.some((r) => r.id === id) ? { regions: mask.regions.filter((r) => r.id !== id) } : mask;
}

/**
 * The mask with one edge or limit of region `id` moved towards `value` (Hz or dB), clamped so the region
 * stays valid: edges inside [0, fs/2] and at least MIN_REGION_WIDTH_FRACTION·fs apart, the upper limit at
 * least MIN_LIMIT_GAP_DB above the lower. Never fails, so a drag can call it on every frame; an unknown
 * id, a missing limit or a non-finite value leaves the mask unchanged (the same object).
 */
export function moveRegionEdge(
  mask: RequirementMask,
  id: string,
  edge: RegionEdge,
  value: number,
  fs: number,
): RequirementMask {
  const i = mask.regions.findIndex((r) => r.id === id);
  const old = mask.regions[i];
  if (!old || !Number.isFinite(value) || old[edge] === undefined) return mask;
  const gap = MIN_REGION_WIDTH_FRACTION * fs;
  let v = value;
  if (edge === 'fromHz') v = Math.min(Math.max(0, v), old.toHz - gap);
  if (edge === 'toHz') v = Math.max(Math.min(fs / 2, v), old.fromHz + gap);
  if (edge === 'upperDb' && old.lowerDb !== undefined) v = Math.max(v, old.lowerDb + MIN_LIMIT_GAP_DB);
  if (edge === 'lowerDb' && old.upperDb !== undefined) v = Math.min(v, old.upperDb - MIN_LIMIT_GAP_DB);
  if (v === old[edge]) return mask;
  const regions = mask.regions.slice();
  regions[i] = { ...old, [edge]: v };
  return { regions };
}

/**
 * The whole design's mask when a part is added to the cascade: the whole keeps judging the whole. The part's
 * stop regions join the mask, and the mask's pass regions give way where the new part does not promise to
 * be flat (outside its own pass regions), so a notch added inside a low-pass's pass band carves its stop
 * region out of that pass band instead of contradicting it. The part's own pass regions are not added: the
 * cascade's pass band is the one already asked for (a notch's "flat elsewhere" would contradict a
 * low-pass's stop band).
 */
import type { MaskRegion, RequirementMask } from './types.ts';

/** Regions narrower than this fraction of the sample rate are dropped after carving (slivers). */
export const CARVE_SLIVER_FRACTION = 1e-6;

/** [from, to] minus the union of `holes`, as the intervals that remain. */
function subtract(from: number, to: number, holes: readonly [number, number][]): [number, number][] {
  let pieces: [number, number][] = [[from, to]];
  for (const [a, b] of holes)
    pieces = pieces.flatMap(([lo, hi]): [number, number][] => {
      if (b <= lo || a >= hi) return [[lo, hi]];
      const out: [number, number][] = [];
      if (a > lo) out.push([lo, a]);
      if (b < hi) out.push([b, hi]);
      return out;
    });
  return pieces;
}

/** The intervals of [0, fs/2] outside the mask's pass regions (where it does not promise to stay flat). */
function notFlat(mask: RequirementMask, fs: number): [number, number][] {
  const pass = mask.regions.filter((r) => r.kind === 'pass').map((r): [number, number] => [r.fromHz, r.toHz]);
  return subtract(0, fs / 2, pass);
}

/** The whole design's mask after adding a part whose own requirement implies `added` (fs in Hz). */
export function composeMask(whole: RequirementMask, added: RequirementMask, fs: number): RequirementMask {
  const holes = notFlat(added, fs);
  const sliver = CARVE_SLIVER_FRACTION * fs;
  const regions: MaskRegion[] = [];
  for (const r of whole.regions) {
    if (r.kind !== 'pass') {
      regions.push(r);
      continue;
    }
    const pieces = subtract(r.fromHz, r.toHz, holes).filter(([a, b]) => b - a > sliver);
    pieces.forEach(([fromHz, toHz], i) =>
      regions.push({ ...r, fromHz, toHz, id: i === 0 ? r.id : `${r.id}-${i + 1}` }),
    );
  }
  for (const r of added.regions) if (r.kind !== 'pass') regions.push(r);
  // Pieces of a split region and the part's regions may repeat an id: the later ones get a suffix.
  const all = new Set(regions.map((r) => r.id));
  const used = new Set<string>();
  return {
    regions: regions.map((r) => {
      let id = r.id;
      for (let k = 2; used.has(id) || (id !== r.id && all.has(id)); k++) id = `${r.id}-${k}`;
      used.add(id);
      return id === r.id ? r : { ...r, id };
    }),
  };
}

/**
 * Whether two masks are the same requirement, region by region in order, whatever the order of their keys
 * (a mask read back from a design file lists its keys in the file's order, not the order it was built in).
 */
import type { MaskRegion, RequirementMask } from './types.ts';

const sameRegion = (a: MaskRegion, b: MaskRegion) =>
  a.id === b.id &&
  a.kind === b.kind &&
  a.fromHz === b.fromHz &&
  a.toHz === b.toHz &&
  a.upperDb === b.upperDb &&
  a.lowerDb === b.lowerDb &&
  a.label === b.label;

export function sameMask(
  a: RequirementMask | null | undefined,
  b: RequirementMask | null | undefined,
): boolean {
  if (!a || !b) return !a && !b;
  return a.regions.length === b.regions.length && a.regions.every((r, i) => sameRegion(r, b.regions[i]!));
}

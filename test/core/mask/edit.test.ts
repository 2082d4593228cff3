import { describe, it, expect } from 'vitest';
import {
  addRegion,
  deleteRegion,
  moveRegionEdge,
  nextRegionId,
  updateRegion,
  MIN_LIMIT_GAP_DB,
  MIN_REGION_WIDTH_FRACTION,
  type RequirementMask,
} from '../../../src/core/mask/index.ts';

const FS = 1000;
const mask: RequirementMask = {
  regions: [
    { id: 'r1', kind: 'pass', fromHz: 0, toHz: 100, lowerDb: -1, upperDb: 1 },
    { id: 'r3', kind: 'stop', fromHz: 200, toHz: 500, upperDb: -40 },
  ],
};

describe('mask edits', () => {
  it('chooses the first free id', () => {
    expect(nextRegionId(mask)).toBe('r2');
    expect(nextRegionId({ regions: [] })).toBe('r1');
  });

  it('adds a region with a new id, refusing a bad one with the reason', () => {
    const r = addRegion(mask, { kind: 'stop', fromHz: 120, toHz: 130, upperDb: -20 }, FS);
    expect(r.ok && r.value.id).toBe('r2');
    expect(r.ok && r.value.mask.regions).toHaveLength(3);
    expect(mask.regions).toHaveLength(2); // the old mask is untouched
    const bad = addRegion(mask, { kind: 'stop', fromHz: 130, toHz: 120, upperDb: -20 }, FS);
    expect(!bad.ok && bad.error.message).toMatch(/fromHz = 130 Hz is not below toHz = 120 Hz/);
    const dup = addRegion(mask, { id: 'r1', kind: 'stop', fromHz: 120, toHz: 130, upperDb: -20 }, FS);
    expect(!dup.ok && dup.error.message).toMatch(/already used/);
  });

  it('updates by id; an undefined value removes a limit; a change that breaks the region is refused', () => {
    const r = updateRegion(mask, 'r1', { upperDb: undefined, toHz: 90 }, FS);
    expect(r.ok && r.value.regions[0]).toEqual({ id: 'r1', kind: 'pass', fromHz: 0, toHz: 90, lowerDb: -1 });
    const bad = updateRegion(mask, 'r1', { lowerDb: undefined }, FS);
    expect(!bad.ok && bad.error.message).toMatch(/needs a lower limit/);
    const missing = updateRegion(mask, 'nope', { toHz: 90 }, FS);
    expect(!missing.ok && missing.error.message).toMatch(/no region with id "nope"/);
  });

  it('deletes by id (the same mask when the id is unknown)', () => {
    expect(deleteRegion(mask, 'r1').regions.map((r) => r.id)).toEqual(['r3']);
    expect(deleteRegion(mask, 'x')).toBe(mask);
  });

  it('drags edges and limits, clamped so the region stays valid', () => {
    const at = (m: RequirementMask) => m.regions[0]!;
    expect(at(moveRegionEdge(mask, 'r1', 'toHz', 150, FS)).toHz).toBe(150);
    expect(at(moveRegionEdge(mask, 'r1', 'toHz', 900, FS)).toHz).toBe(500);
    expect(at(moveRegionEdge(mask, 'r1', 'fromHz', -5, FS))).toBe(mask.regions[0]); // already at 0: unchanged
    expect(at(moveRegionEdge(mask, 'r1', 'fromHz', 200, FS)).fromHz).toBe(
      100 - MIN_REGION_WIDTH_FRACTION * FS,
    );
    expect(at(moveRegionEdge(mask, 'r1', 'upperDb', -3, FS)).upperDb).toBe(-1 + MIN_LIMIT_GAP_DB);
    expect(at(moveRegionEdge(mask, 'r1', 'lowerDb', 3, FS)).lowerDb).toBe(1 - MIN_LIMIT_GAP_DB);
    expect(moveRegionEdge(mask, 'r3', 'lowerDb', -90, FS)).toBe(mask); // a stop region has no lower limit
    expect(moveRegionEdge(mask, 'r1', 'toHz', NaN, FS)).toBe(mask);
    expect(moveRegionEdge(mask, 'nope', 'toHz', 10, FS)).toBe(mask);
  });
});

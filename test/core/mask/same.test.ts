import { describe, expect, it } from 'vitest';
import { sameMask } from '../../../src/core/mask/same.ts';

describe('sameMask', () => {
  const pass = { id: 'pass', kind: 'pass' as const, fromHz: 0, toHz: 100, lowerDb: -1, upperDb: 1 };
  it('ignores the order of keys (a mask read back from a file) but not any value', () => {
    const reordered = { upperDb: 1, lowerDb: -1, toHz: 100, fromHz: 0, kind: 'pass' as const, id: 'pass' };
    expect(JSON.stringify({ regions: [pass] })).not.toBe(JSON.stringify({ regions: [reordered] }));
    expect(sameMask({ regions: [pass] }, { regions: [reordered] })).toBe(true);
    expect(sameMask({ regions: [pass] }, { regions: [{ ...pass, upperDb: 2 }] })).toBe(false);
    const { upperDb: _u, ...floorOnly } = pass;
    expect(sameMask({ regions: [pass] }, { regions: [floorOnly] })).toBe(false);
    expect(sameMask({ regions: [pass] }, { regions: [pass, pass] })).toBe(false);
    expect(sameMask(null, undefined)).toBe(true);
    expect(sameMask({ regions: [pass] }, null)).toBe(false);
  });
});
